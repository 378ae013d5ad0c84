import type { Role } from "@/lib/users/rules";

export interface NavItem {
  href: string;
  label: string;
  roles: readonly Role[];
  /** Shown only when the local mail fake is configured (development and tests). */
  devOnly?: boolean;
  /** Kept under one "Administration" menu when a person has two or more of them, so the bar stays one line. */
  admin?: boolean;
}

const STAFF: Role[] = ["technician", "reviewer", "lead"];

// The server refuses what a role may not do; this list only decides what is worth showing.
export const NAV_ITEMS: NavItem[] = [
  { href: "/overview", label: "Overview", roles: STAFF },
  { href: "/submissions", label: "Submissions", roles: STAFF },
  { href: "/queue", label: "Reading queue", roles: ["reviewer"] },
  { href: "/discrepancies", label: "Discrepancies", roles: ["lead"] },
  { href: "/agreement", label: "Reviewer agreement", roles: ["lead"] },
  // Every staff member may read the editions; reviewers rarely need to, so they are not offered them here.
  { href: "/editions", label: "Editions", roles: ["lead", "technician"], admin: true },
  { href: "/organisations", label: "Organisations", roles: ["lead"], admin: true },
  { href: "/users", label: "Users", roles: ["lead"], admin: true },
  { href: "/audit", label: "Audit", roles: ["lead"], admin: true },
  { href: "/outbox", label: "Outbox", roles: ["lead"], devOnly: true, admin: true },
  { href: "/portal", label: "Our submissions", roles: ["manufacturer"] },
  { href: "/help", label: "Help", roles: [...STAFF, "manufacturer"] },
];

export function navFor(roles: readonly Role[], devTools: boolean): NavItem[] {
  return NAV_ITEMS.filter((i) => i.roles.some((r) => roles.includes(r)) && (!i.devOnly || devTools));
}

/**
 * The bar's items around the Administration menu, which stands where its first item would (no menu
 * when only one item would be in it).
 */
export function splitNav(items: NavItem[]): { before: NavItem[]; admin: NavItem[]; after: NavItem[] } {
  const admin = items.filter((i) => i.admin);
  if (admin.length < 2) return { before: items, admin: [], after: [] };
  const at = items.indexOf(admin[0]);
  return { before: items.slice(0, at), admin, after: items.slice(at).filter((i) => !i.admin) };
}
