"use client";

import Link from "next/link";
import { useEffect, useId, useRef, useState } from "react";
import type { NavItem } from "./nav-items";

export const isCurrent = (path: string, href: string) => path === href || path.startsWith(`${href}/`);
export const linkClass = (current: boolean) =>
  `block whitespace-nowrap rounded-md px-2 py-2 text-sm font-semibold ${current ? "bg-wick-500 text-ink-900" : "text-ink-100 hover:bg-ink-800"}`;

/** A disclosure on the bar: a button that opens a short list of links; Escape or a click outside closes it. */
export function NavMenu({ label, items, path }: { label: string; items: NavItem[]; path: string }) {
  const [open, setOpen] = useState(false);
  const [openedAt, setOpenedAt] = useState(path);
  const box = useRef<HTMLLIElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const id = useId();
  // Following a link closes the menu.
  if (open && openedAt !== path) setOpen(false);
  useEffect(() => {
    if (!open) return;
    const away = (e: MouseEvent) => !box.current?.contains(e.target as Node) && setOpen(false);
    // Escape closes the menu and puts focus back on its button, so a keyboard user is not left nowhere.
    const esc = (e: KeyboardEvent) => {
      if (e.key !== "Escape") return;
      setOpen(false);
      button.current?.focus();
    };
    document.addEventListener("mousedown", away);
    document.addEventListener("keydown", esc);
    return () => {
      document.removeEventListener("mousedown", away);
      document.removeEventListener("keydown", esc);
    };
  }, [open]);
  const current = items.some((i) => isCurrent(path, i.href));
  return (
    <li ref={box} className="relative">
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={id}
        onClick={() => {
          setOpenedAt(path);
          setOpen(!open);
        }}
        className={`${linkClass(current)} flex items-center gap-1`}
      >
        {label}
        <svg viewBox="0 0 10 6" className={`h-2 w-2.5 ${open ? "rotate-180" : ""}`} aria-hidden="true">
          <path d="M1 1l4 4 4-4" stroke="currentColor" strokeWidth="1.6" fill="none" />
        </svg>
      </button>
      <ul id={id} hidden={!open} className="absolute left-0 z-20 mt-1 min-w-44 rounded-md border border-ink-600 bg-ink-900 p-1 shadow-lg">
        {items.map((i) => (
          <li key={i.href}>
            <Link
              href={i.href}
              onClick={() => setOpen(false)}
              aria-current={isCurrent(path, i.href) ? "page" : undefined}
              className={linkClass(isCurrent(path, i.href))}
            >
              {i.label}
            </Link>
          </li>
        ))}
      </ul>
    </li>
  );
}
