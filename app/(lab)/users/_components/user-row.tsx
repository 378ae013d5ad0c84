"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/http/client";
import { ROLE_LABELS, type Role } from "@/lib/users/rules";
import type { UserView } from "@/lib/users/view";
import { RoleCheckboxes } from "./role-checkboxes";
import { useReinvite, useUpdateUser } from "./users-api";

const STATUS_STYLE = {
  active: "bg-ok-100 text-ok-700",
  invited: "bg-wick-100 text-wick-700",
  deactivated: "bg-ink-100 text-ink-600",
} as const;

export function UserRow({ user, isSelf }: { user: UserView; isSelf: boolean }) {
  const update = useUpdateUser();
  const reinvite = useReinvite();
  const [editing, setEditing] = useState(false);
  const [roles, setRoles] = useState<Role[]>(user.roles);
  const error = [update.error, reinvite.error].find((e) => e instanceof ApiError) as ApiError | undefined;

  return (
    <tr className="border-t border-ink-100 align-top">
      <td className="px-3 py-3">
        <div className="font-semibold">{user.name}</div>
        <div className="text-sm text-ink-600">{user.email}</div>
        {user.organisationName && <div className="text-sm text-ink-600">{user.organisationName}</div>}
      </td>
      <td className="px-3 py-3">
        {editing ? (
          <div className="space-y-2">
            <RoleCheckboxes idPrefix={`roles-${user.id}`} value={roles} onChange={setRoles} />
            <div className="flex gap-2">
              <Button onClick={() => update.mutate({ id: user.id, change: { roles } }, { onSuccess: () => setEditing(false) })} disabled={update.isPending}>
                Save roles
              </Button>
              <Button
                kind="secondary"
                onClick={() => {
                  setEditing(false);
                  setRoles(user.roles);
                }}
              >
                Cancel
              </Button>
            </div>
          </div>
        ) : (
          <span>{user.roles.map((r) => ROLE_LABELS[r]).join(", ")}</span>
        )}
      </td>
      <td className="px-3 py-3">
        <span className={`rounded-full px-2 py-0.5 text-xs font-semibold ${STATUS_STYLE[user.status]}`}>{user.status}</span>
      </td>
      <td className="space-y-2 px-3 py-3">
        <div className="flex flex-wrap gap-2">
          {!editing && (
            <Button kind="secondary" onClick={() => setEditing(true)} aria-label={`Change roles of ${user.name}`}>
              Roles
            </Button>
          )}
          {user.status === "invited" && (
            <Button kind="secondary" onClick={() => reinvite.mutate(user.id)} disabled={reinvite.isPending}>
              Send new link
            </Button>
          )}
          {!isSelf && user.status !== "deactivated" && (
            <Button kind="danger" onClick={() => update.mutate({ id: user.id, change: { active: false } })} aria-label={`Deactivate ${user.name}`}>
              Deactivate
            </Button>
          )}
          {user.status === "deactivated" && (
            <Button kind="secondary" onClick={() => update.mutate({ id: user.id, change: { active: true } })}>
              Reactivate
            </Button>
          )}
        </div>
        {error && (
          <p role="alert" className="text-sm text-bad-700">
            {error.message}
          </p>
        )}
        {reinvite.isSuccess && (
          <p role="status" className="text-sm text-ok-700">
            A new link was sent.
          </p>
        )}
      </td>
    </tr>
  );
}
