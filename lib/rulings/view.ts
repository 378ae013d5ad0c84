import type { RulingRow } from "./queries";

export interface RulingView {
  id: string;
  dropId: string;
  chosen: "first" | "second" | "third";
  readingId: string;
  timeS: number;
  reason: string;
  ruledBy: { id: string; name: string };
  ruledAt: string;
}

export function toRulingView(r: RulingRow): RulingView {
  return {
    id: r.id,
    dropId: r.dropId,
    chosen: r.chosen,
    readingId: r.readingId,
    timeS: r.timeS,
    reason: r.reason,
    ruledBy: { id: r.ruledBy, name: r.ruledByName },
    ruledAt: r.ruledAt.toISOString(),
  };
}
