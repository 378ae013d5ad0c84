"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ApiError } from "@/lib/http/client";
import type { Role } from "@/lib/users/rules";
import { RoleCheckboxes } from "./role-checkboxes";
import { useOrganisationList } from "@/lib/organisations/hooks";
import { useInvite } from "./users-api";

export function InviteForm() {
  const invite = useInvite();
  const organisations = useOrganisationList();
  const [roles, setRoles] = useState<Role[]>(["technician"]);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const manufacturer = roles.includes("manufacturer");
  const err = invite.error instanceof ApiError ? invite.error : null;

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = new FormData(form);
    const organisationId = manufacturer ? String(data.get("organisationId") || "") || null : null;
    setSentTo(null);
    invite.mutate(
      { email: String(data.get("email") ?? ""), name: String(data.get("name") ?? ""), roles, organisationId },
      {
        onSuccess: (r) => {
          setSentTo(r.user.email);
          form.reset();
          setRoles(["technician"]);
        },
      },
    );
  }

  return (
    <section aria-labelledby="invite-heading" className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="invite-heading" className="text-lg font-semibold">
        Invite a person
      </h2>
      <form onSubmit={onSubmit} className="mt-4 grid gap-4 md:grid-cols-2" noValidate>
        <Field id="invite-name" name="name" label="Name" maxLength={120} error={err?.fields.name} required />
        <Field id="invite-email" name="email" type="email" label="E-mail" error={err?.fields.email} required />
        <div className="space-y-1 md:col-span-2">
          <span className="block text-sm font-semibold text-ink-800">Roles</span>
          <RoleCheckboxes idPrefix="invite-role" value={roles} onChange={setRoles} />
          {err?.fields.roles && <p className="text-sm text-bad-700">{err.fields.roles}</p>}
        </div>
        {manufacturer && (
          <div className="space-y-1">
            <label htmlFor="invite-org" className="block text-sm font-semibold text-ink-800">
              Organisation
            </label>
            <select id="invite-org" name="organisationId" className="block w-full rounded-md border border-ink-200 bg-white px-3 py-2">
              <option value="">Choose…</option>
              {organisations.data?.map((o) => (
                <option key={o.id} value={o.id}>
                  {o.name}
                </option>
              ))}
            </select>
            {err?.fields.organisationId && <p className="text-sm text-bad-700">{err.fields.organisationId}</p>}
          </div>
        )}
        <div className="space-y-3 md:col-span-2">
          {err && <Notice tone="error">{err.message}</Notice>}
          {sentTo && <Notice tone="ok">Invitation sent to {sentTo}.</Notice>}
          <Button type="submit" disabled={invite.isPending}>
            {invite.isPending ? "Sending…" : "Send invitation"}
          </Button>
        </div>
      </form>
    </section>
  );
}
