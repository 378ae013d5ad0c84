"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { splitNav, type NavItem } from "./nav-items";
import { isCurrent, linkClass, NavMenu } from "./nav-menu";

function NavLink({ item, path }: { item: NavItem; path: string }) {
  return (
    <li>
      <Link href={item.href} aria-current={isCurrent(path, item.href) ? "page" : undefined} className={linkClass(isCurrent(path, item.href))}>
        {item.label}
      </Link>
    </li>
  );
}

export function NavLinks({ items }: { items: NavItem[] }) {
  const path = usePathname();
  const { before, admin, after } = splitNav(items);
  return (
    <ul className="flex flex-wrap items-center">
      {before.map((i) => (
        <NavLink key={i.href} item={i} path={path} />
      ))}
      {admin.length > 0 && <NavMenu label="Administration" items={admin} path={path} />}
      {after.map((i) => (
        <NavLink key={i.href} item={i} path={path} />
      ))}
    </ul>
  );
}
