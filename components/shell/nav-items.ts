import type { Role } from "@/lib/users/rules";

export interface NavItem {
  href: string;
  label: string;
  roles: readonly Role[];
  /** Shown only when the local mail fake is configured (development and tests). */
  devOnly?: boolean;
}

const STAFF: Role[] = ["technician", "reviewer", "lead"];

// The server refuses what a role may not do; this list only decides what is worth showing.
export const NAV_ITEMS: NavItem[] = [
  { href: "/overview", label: "Overview", roles: STAFF },
  { href: "/users", label: "Users", roles: ["lead"] },
  { href: "/outbox", label: "Outbox", roles: ["lead"], devOnly: true },
  { href: "/portal", label: "Our submissions", roles: ["manufacturer"] },
  { href: "/help", label: "Help", roles: [...STAFF, "manufacturer"] },
];

export function navFor(roles: readonly Role[], devTools: boolean): NavItem[] {
  return NAV_ITEMS.filter((i) => i.roles.some((r) => roles.includes(r)) && (!i.devOnly || devTools));
}
