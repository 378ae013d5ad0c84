"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "./nav-items";

export function NavLinks({ items }: { items: NavItem[] }) {
  const path = usePathname();
  return (
    <ul className="flex flex-wrap">
      {items.map((i) => {
        const current = path === i.href || path.startsWith(`${i.href}/`);
        return (
          <li key={i.href}>
            <Link
              href={i.href}
              aria-current={current ? "page" : undefined}
              className={`block rounded-md px-2 py-2 text-sm font-semibold ${current ? "bg-wick-500 text-ink-900" : "text-ink-100 hover:bg-ink-800"}`}
            >
              {i.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
