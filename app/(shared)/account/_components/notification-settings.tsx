"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "@/lib/http/client";
import type { NotificationSetting } from "@/lib/notifications/view";

const KEY = ["account", "notifications"] as const;

/** The caller's own e-mail notices: the optional ones switch off and on, the essential ones stay on and say why. */
export function NotificationSettings() {
  const qc = useQueryClient();
  const q = useQuery({ queryKey: KEY, queryFn: () => fetchJson<{ settings: NotificationSetting[] }>("/api/account/notifications").then((r) => r.settings) });
  const save = useMutation({
    mutationFn: (optOut: string[]) =>
      fetchJson<{ settings: NotificationSetting[] }>("/api/account/notifications", { method: "PUT", body: { optOut } }).then((r) => r.settings),
    onSuccess: (settings) => qc.setQueryData(KEY, settings),
  });
  const [off, setOff] = useState<Set<string> | null>(null);
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading your notices…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const switchedOff = off ?? new Set(q.data.filter((s) => !s.on).map((s) => s.kind));
  const mine = q.data.filter((s) => s.appliesToYou);

  function toggle(kind: string, on: boolean) {
    const next = new Set(switchedOff);
    if (on) next.delete(kind);
    else next.add(kind);
    setOff(next);
    save.reset();
  }
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    save.mutate([...switchedOff], { onSuccess: () => setOff(null) });
  }

  return (
    <form onSubmit={onSubmit} aria-labelledby="notices-heading" className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="notices-heading" className="text-xl font-semibold">
        E-mail notices
      </h2>
      {mine.length === 0 && <p className="text-ink-600">No e-mail notices go to your roles.</p>}
      <ul className="space-y-3">
        {mine.map((s) => (
          <li key={s.kind} className="flex gap-3">
            <input
              id={`notice-${s.kind}`}
              type="checkbox"
              className="mt-1 h-4 w-4"
              checked={s.essential || !switchedOff.has(s.kind)}
              disabled={s.essential}
              onChange={(e) => toggle(s.kind, e.target.checked)}
              aria-describedby={s.essential ? `why-${s.kind}` : undefined}
            />
            <div>
              <label htmlFor={`notice-${s.kind}`} className="font-semibold text-ink-900">
                {s.label}
              </label>
              {s.essential && (
                <p id={`why-${s.kind}`} className="text-sm text-ink-600">
                  Always on: {s.why}
                </p>
              )}
            </div>
          </li>
        ))}
      </ul>
      {save.isError && <Notice tone="error">{save.error.message} Your choices are kept here; try saving again.</Notice>}
      {save.isSuccess && <Notice tone="ok">Saved. Switched-off notices stop with the next mail.</Notice>}
      {mine.some((s) => !s.essential) && (
        <Button type="submit" disabled={save.isPending}>
          {save.isPending ? "Saving…" : "Save notices"}
        </Button>
      )}
    </form>
  );
}
