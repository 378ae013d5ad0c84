"use client";

import { ROLE_LABELS, ROLES, type Role } from "@/lib/users/rules";

// A manufacturer account holds no lab role (the server refuses the mix): ticking one clears the other kind.
function withRole(roles: Role[], role: Role): Role[] {
  if (role === "manufacturer") return ["manufacturer"];
  return [...roles.filter((r) => r !== "manufacturer"), role];
}

export function RoleCheckboxes({ value, onChange, idPrefix }: { value: Role[]; onChange: (roles: Role[]) => void; idPrefix: string }) {
  return (
    <fieldset className="flex flex-wrap gap-3">
      <legend className="sr-only">Roles</legend>
      {ROLES.map((role) => (
        <label key={role} htmlFor={`${idPrefix}-${role}`} className="flex items-center gap-1.5 text-sm">
          <input
            id={`${idPrefix}-${role}`}
            type="checkbox"
            checked={value.includes(role)}
            onChange={(e) => onChange(e.target.checked ? withRole(value, role) : value.filter((r) => r !== role))}
            className="h-4 w-4 accent-wick-600"
          />
          {ROLE_LABELS[role]}
        </label>
      ))}
    </fieldset>
  );
}
