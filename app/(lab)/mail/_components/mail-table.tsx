"use client";

import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { formatInstant } from "@/components/ui/dates";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "@/lib/http/client";
import { KINDS, MAX_ATTEMPTS } from "@/lib/notifications/rules";
import type { MailListRow } from "@/lib/notifications/view";

const STATES = [
  { value: "", label: "Every state" },
  { value: "pending", label: "Queued" },
  { value: "sending", label: "Sending" },
  { value: "sent", label: "Sent" },
  { value: "failed", label: "Failed" },
] as const;

function stateWords(m: MailListRow): { text: string; tone: string } {
  if (m.status === "sent") return { text: "Sent", tone: "bg-ok-100 text-ok-700" };
  if (m.status === "failed")
    return m.attempts >= MAX_ATTEMPTS
      ? { text: "Failed, no more attempts", tone: "bg-bad-100 text-bad-700" }
      : { text: "Failed, will retry", tone: "bg-wick-100 text-wick-700" };
  return { text: m.status === "sending" ? "Sending" : "Queued", tone: "bg-ink-100 text-ink-800" };
}

/** The newest 200 outbox rows, refreshed while the page is open. */
export function MailTable() {
  const [status, setStatus] = useState("");
  const q = useQuery({
    queryKey: ["mail", status],
    queryFn: () => fetchJson<{ mail: MailListRow[] }>(`/api/mail${status ? `?status=${status}` : ""}`).then((r) => r.mail),
    refetchInterval: 10_000,
  });
  return (
    <div className="space-y-3">
      <label className="flex items-center gap-2 text-sm font-semibold text-ink-800">
        Show
        <select value={status} onChange={(e) => setStatus(e.target.value)} className="rounded-md border border-ink-200 bg-white px-2 py-1 font-normal">
          {STATES.map((s) => (
            <option key={s.value} value={s.value}>
              {s.label}
            </option>
          ))}
        </select>
      </label>
      {q.isPending && (
        <p className="text-ink-600" role="status">
          Loading the mail…
        </p>
      )}
      {q.isError && <Notice tone="error">{q.error.message}</Notice>}
      {q.data?.length === 0 && <p className="text-ink-600">No mail in this state.</p>}
      {!!q.data?.length && (
        <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Mail the lab sends, newest first</caption>
            <thead className="bg-ink-50 text-ink-600">
              <tr>
                {["State", "Attempts", "To", "Subject", "Written", "Sent", "Last error"].map((h) => (
                  <th key={h} scope="col" className="px-3 py-2">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {q.data.map((m) => {
                const s = stateWords(m);
                return (
                  <tr key={m.id} className="border-t border-ink-100 align-top">
                    <td className="px-3 py-2">
                      <span className={`whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ${s.tone}`}>{s.text}</span>
                    </td>
                    <td className="px-3 py-2 tabular-nums">{m.attempts}</td>
                    <td className="break-all px-3 py-2">{m.toAddress}</td>
                    <td className="px-3 py-2">
                      <span className="font-semibold">{m.subject}</span>
                      <br />
                      <span className="text-xs text-ink-600">{KINDS[m.kind]?.label ?? m.kind}</span>
                    </td>
                    <td className="whitespace-nowrap px-3 py-2">{formatInstant(m.createdAt)}</td>
                    <td className="whitespace-nowrap px-3 py-2">{m.sentAt ? formatInstant(m.sentAt) : "—"}</td>
                    <td className="max-w-xs break-words px-3 py-2 text-bad-700">{m.lastError ?? ""}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
