"use client";

import { useState, type FormEvent } from "react";
import { apiError } from "@/components/ui/form-errors";
import { useSubmissionResults } from "@/lib/results/hooks";
import { useSignResults } from "@/lib/signoff/hooks";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { signRefusal } from "@/lib/signoff/rules";

/** The lead re-enters their password to sign; the server's refusal is shown in its own words. */
export function SignForm({ submissionId, revision }: { submissionId: string; revision: number }) {
  const [password, setPassword] = useState("");
  const sign = useSignResults(submissionId);
  const err = apiError(sign.error);
  // Said before the password is typed; the server checks it again when the lead signs.
  const results = useSubmissionResults(submissionId).data;
  const notYet = results ? signRefusal({ ballCount: results.balls.length, ...results.decision }) : null;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    sign.mutate({ password }, { onSuccess: () => setPassword("") });
  };
  return (
    <form onSubmit={submit} noValidate aria-label="Sign off results" className="space-y-3">
      <h3 className="text-lg font-semibold">Sign off results (revision {revision})</h3>
      <p className="max-w-3xl text-sm">
        Your signature means <strong>&ldquo;results reviewed and released&rdquo;</strong>: you have reviewed these results and release them to the manufacturer,
        who is told by e-mail. It locks this submission&apos;s readings, rulings, runs and samples until a lead re-opens it with a reason. It records your name
        and the time.
      </p>
      {notYet && <Notice tone="warn">Not ready to sign: {notYet}</Notice>}
      <div className="max-w-sm">
        <Field
          id="signoff-password"
          type="password"
          autoComplete="current-password"
          label="Your password, to sign"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={err?.fields.password ? err.message : undefined}
        />
      </div>
      {err && !err.fields.password && <Notice tone="error">{err.message}</Notice>}
      <Button type="submit" disabled={sign.isPending}>
        {sign.isPending ? "Signing…" : "Sign off results"}
      </Button>
    </form>
  );
}
