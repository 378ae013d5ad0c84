"use client";

import { useQuery } from "@tanstack/react-query";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "@/lib/http/client";
import type { FakeMessage } from "@/lib/mailbox/service";

// Links in the text become clickable, so a person trying the demo can follow an invitation.
function Linked({ text }: { text: string }) {
  return (
    <>
      {text.split(/(https?:\/\/\S+)/g).map((part, i) =>
        /^https?:\/\//.test(part) ? (
          // biome-ignore lint/suspicious/noArrayIndexKey: the parts of one fixed text, never reordered
          <a key={i} href={part} className="break-all font-semibold text-wick-700 underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </>
  );
}

export function OutboxList() {
  const q = useQuery({
    queryKey: ["outbox"],
    queryFn: () => fetchJson<{ messages: FakeMessage[] }>("/api/dev/outbox").then((r) => r.messages),
    refetchInterval: 5000,
  });
  if (q.isPending) return <p className="text-ink-600">Loading messages…</p>;
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  if (q.data.length === 0) return <p className="text-ink-600">No messages yet. Invite someone from the Users page.</p>;
  return (
    <ul className="space-y-4">
      {q.data.map((m) => (
        <li key={m.id} className="rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
          <p className="text-sm text-ink-600">
            To {m.to.join(", ")} · {new Date(m.receivedAt).toLocaleString()}
          </p>
          <p className="mt-1 font-semibold">{m.subject}</p>
          <pre className="mt-2 whitespace-pre-wrap font-sans text-sm text-ink-800">
            <Linked text={m.text} />
          </pre>
        </li>
      ))}
    </ul>
  );
}
