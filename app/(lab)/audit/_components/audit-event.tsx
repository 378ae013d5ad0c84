import Link from "next/link";
import type { AuditEventView } from "@/lib/audit/hooks";
import { LocalTime } from "@/components/ui/local-time";
import { ChangeDiff } from "./change-diff";
import { RECORD_KINDS, recordLabel } from "./audit-words";

/** One event: when, who, what, on which record, and its before and after. */
export function AuditEvent({ e, onRecord }: { e: AuditEventView; onRecord: (entity: string, entityId: string) => void }) {
  const href = e.entityId ? RECORD_KINDS[e.entity]?.href?.(e.entityId) : undefined;
  return (
    <li data-testid="audit-event" className="space-y-2 rounded-lg border border-ink-100 bg-white p-4 shadow-sm">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1 text-sm">
        <span className="font-mono font-semibold">{e.action}</span>
        <span className="text-ink-600">
          <LocalTime iso={e.at} />
        </span>
        <span>by {e.actor ? e.actor.name : <em>the system</em>}</span>
        <span className="text-ink-600">
          {recordLabel(e.entity)}
          {e.entityId && (
            <>
              {" "}
              <button
                type="button"
                className="font-mono text-xs underline"
                title="Show only this record's events"
                onClick={() => onRecord(e.entity, e.entityId!)}
              >
                {e.entityId}
              </button>
            </>
          )}
          {href && (
            <>
              {" "}
              ·{" "}
              <Link href={href} className="font-semibold text-wick-700 underline">
                open
              </Link>
            </>
          )}
        </span>
      </div>
      {e.hidden ? (
        <p className="text-sm text-ink-600">Details {e.hidden}: you also read drops, and this event could tell you what another reader marked.</p>
      ) : (
        <ChangeDiff before={e.before} after={e.after} />
      )}
      {e.requestId && <p className="text-xs text-ink-600">Request {e.requestId}</p>}
    </li>
  );
}
