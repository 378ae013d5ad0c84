"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { TextareaField } from "@/components/ui/textarea-field";
import type { OrganisationRow as Organisation } from "@/lib/organisations/service";
import { apiError } from "@/components/ui/form-errors";
import { useSaveOrganisation } from "@/lib/organisations/hooks";
import { contactsError, parseContacts } from "./contacts";

export function OrganisationRow({ organisation: o }: { organisation: Organisation }) {
  const save = useSaveOrganisation(o.id);
  const [editing, setEditing] = useState(false);
  const [sent, setSent] = useState<string[]>([]);
  const err = apiError(save.error);
  const prefix = `org-${o.id}`;

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const contactEmails = parseContacts(String(data.get("contacts") ?? ""));
    setSent(contactEmails);
    save.mutate({ name: String(data.get("name") ?? ""), contactEmails }, { onSuccess: () => setEditing(false) });
  }

  if (editing) {
    return (
      <tr className="border-t border-ink-100 align-top">
        <td colSpan={3} className="px-3 py-3">
          <form onSubmit={onSubmit} noValidate aria-label={`Edit ${o.name}`} className="grid gap-3 md:grid-cols-2">
            <Field id={`${prefix}-name`} name="name" label="Name" defaultValue={o.name} maxLength={120} error={err?.fields.name} />
            <TextareaField
              id={`${prefix}-contacts`}
              name="contacts"
              label="Contact e-mails"
              rows={3}
              defaultValue={o.contactEmails.join("\n")}
              hint="One address per line."
              error={contactsError(err, sent)}
            />
            <div className="space-y-2 md:col-span-2">
              {err && (
                <p role="alert" className="text-sm text-bad-700">
                  {err.message}
                </p>
              )}
              <div className="flex gap-2">
                <Button type="submit" disabled={save.isPending}>
                  {save.isPending ? "Saving…" : "Save"}
                </Button>
                <Button
                  type="button"
                  kind="secondary"
                  onClick={() => {
                    setEditing(false);
                    save.reset();
                  }}
                >
                  Cancel
                </Button>
              </div>
            </div>
          </form>
        </td>
      </tr>
    );
  }
  return (
    <tr className="border-t border-ink-100 align-top">
      <th scope="row" className="px-3 py-3 font-semibold">
        {o.name}
      </th>
      <td className="px-3 py-3">
        {o.contactEmails.length ? (
          <ul>
            {o.contactEmails.map((m) => (
              <li key={m} className="break-all">
                {m}
              </li>
            ))}
          </ul>
        ) : (
          <span className="text-wick-700">No contact address: notices cannot be sent.</span>
        )}
      </td>
      <td className="px-3 py-3 text-right">
        <Button kind="secondary" onClick={() => setEditing(true)} aria-label={`Edit ${o.name}`}>
          Edit
        </Button>
      </td>
    </tr>
  );
}
