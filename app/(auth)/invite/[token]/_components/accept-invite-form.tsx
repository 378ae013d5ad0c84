"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ApiError, fetchJson } from "@/lib/http/client";

export function AcceptInviteForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const password = String(form.get("password") ?? "");
    if (password !== form.get("confirm")) {
      setFields({ confirm: "The two passwords are not the same." });
      return;
    }
    setBusy(true);
    setError(null);
    setFields({});
    try {
      await fetchJson(`/api/invites/${encodeURIComponent(token)}`, { method: "POST", body: { password } });
      const result = await signIn("credentials", { email, password, redirect: false });
      if (result?.error) throw new ApiError(result.error, 401);
      router.replace("/");
      router.refresh();
    } catch (err) {
      const apiErr = err instanceof ApiError ? err : new ApiError("Something went wrong. Try again.", 0);
      setError(apiErr.message);
      setFields(apiErr.fields);
      setBusy(false);
    }
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      {error && <Notice tone="error">{error}</Notice>}
      <Field id="password" name="password" type="password" label="New password" autoComplete="new-password" error={fields.password} required />
      <Field id="confirm" name="confirm" type="password" label="Repeat the password" autoComplete="new-password" error={fields.confirm} required />
      <Button type="submit" disabled={busy} className="w-full">
        {busy ? "Saving…" : "Set password and sign in"}
      </Button>
    </form>
  );
}
