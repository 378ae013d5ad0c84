"use client";

import type { SignatureView, SignOffView } from "@/lib/signoff/hooks";
import { LocalTime } from "@/components/ui/local-time";
import { changeLines } from "./change-lines";

type Entry =
  | { kind: "signed"; revision: number; at: string; s: SignatureView }
  | { kind: "reopened"; revision: number; at: string; r: SignOffView["reopenings"][number] };

/** Every signature and re-opening, oldest first, as a record a reviewer of the lab can follow. */
export function SignoffHistory({ view }: { view: SignOffView }) {
  const entries: Entry[] = [
    ...view.signatures.map((s) => ({ kind: "signed" as const, revision: s.revision, at: s.signedAt, s })),
    ...view.reopenings.map((r) => ({ kind: "reopened" as const, revision: r.revision, at: r.reopenedAt, r })),
  ].sort((a, b) => a.at.localeCompare(b.at));
  if (entries.length === 0) return <p className="text-sm text-ink-600">No signatures or re-openings yet.</p>;
  return (
    <ol className="space-y-3 border-l-2 border-ink-100 pl-4" aria-label="Signatures and re-openings">
      {entries.map((e) =>
        e.kind === "signed" ? (
          <li key={`s${e.revision}`} data-testid="signature" className="text-sm">
            <p>
              <strong>Revision {e.revision} signed off</strong> by {e.s.signedBy}, <LocalTime iso={e.at} />.
            </p>
            <p className="text-ink-600">Meaning of the signature: &ldquo;{e.s.meaning}&rdquo;.</p>
            {e.s.changes ? (
              <div className="mt-1">
                <p className="font-semibold">Changed since revision {e.revision - 1}:</p>
                <ul className="list-disc pl-5">
                  {changeLines(e.s.changes).map((l) => (
                    <li key={l}>{l}</li>
                  ))}
                </ul>
              </div>
            ) : (
              <p className="text-ink-600">First signature: no earlier revision to compare with.</p>
            )}
          </li>
        ) : (
          <li key={`r${e.revision}`} data-testid="reopening" className="text-sm">
            <p>
              <strong>Re-opened as revision {e.revision}</strong> by {e.r.reopenedBy}, <LocalTime iso={e.at} />.
            </p>
            <p className="text-ink-600">Reason: {e.r.reason}</p>
          </li>
        ),
      )}
    </ol>
  );
}
