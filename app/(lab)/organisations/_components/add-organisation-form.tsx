"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { TextareaField } from "@/components/ui/textarea-field";
import { apiError } from "@/components/ui/form-errors";
import { useSaveOrganisation } from "@/lib/organisations/hooks";
import { contactsError, parseContacts } from "./contacts";

export function AddOrganisationForm() {
  const save = useSaveOrganisation(null);
  const [sent, setSent] = useState<string[]>([]);
  const [added, setAdded] = useState<string | null>(null);
  const err = apiError(save.error);

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = new FormData(form);
    const contactEmails = parseContacts(String(data.get("contacts") ?? ""));
    setSent(contactEmails);
    setAdded(null);
    save.mutate(
      { name: String(data.get("name") ?? ""), contactEmails },
      {
        onSuccess: (o) => {
          setAdded(`${o.name} was added.`);
          form.reset();
        },
      },
    );
  }

  return (
    <section aria-labelledby="add-org-heading" className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="add-org-heading" className="text-lg font-semibold">
        Add a manufacturer
      </h2>
      <form onSubmit={onSubmit} noValidate className="mt-4 grid gap-4 md:grid-cols-2">
        <Field id="org-name" name="name" label="Name" maxLength={120} error={err?.fields.name} required />
        <TextareaField
          id="org-contacts"
          name="contacts"
          label="Contact e-mails"
          rows={2}
          hint="One address per line, or separated by commas."
          error={contactsError(err, sent)}
        />
        <div className="space-y-3 md:col-span-2">
          {err && <Notice tone="error">{err.message}</Notice>}
          {added && <Notice tone="ok">{added}</Notice>}
          <Button type="submit" disabled={save.isPending}>
            {save.isPending ? "Adding…" : "Add organisation"}
          </Button>
        </div>
      </form>
    </section>
  );
}
