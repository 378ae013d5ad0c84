"use client";

import { countingReadings } from "@/lib/readings/rules";
import { useMemo, useRef, useState } from "react";
import { milliseconds as s } from "@/lib/clips/words";
import { useClip, useFrameIndex } from "@/lib/clips/hooks";
import { useDrop } from "@/lib/drops/hooks";
import { useRuling } from "@/lib/rulings/hooks";
import { FramePlayer, type FramePlayerControl, type PlayerMark } from "@/components/player/lazy-frame-player";
import { MarkStatus, useMarkGate } from "@/components/player/mark-gate";
import { Notice } from "@/components/ui/notice";
import { DropHeader } from "../../_components/drop-header";
import { ReadingPair } from "./reading-pair";
import { RulingForm, type Choice, type ThirdMarks } from "./ruling-form";

/** A lead settles a discrepancy: both readings on the same clip, then a ruling with a reason. */
export function RulingDesk({ id, actorId }: { id: string; actorId: string }) {
  const q = useDrop(id);
  const ruling = useRuling(id);
  const clipId = q.data?.clip?.id ?? "";
  const clip = useClip(clipId, Boolean(clipId));
  const frames = useFrameIndex(clipId, Boolean(clipId) && q.data?.clip?.status === "ready");
  const control = useRef<FramePlayerControl>(null);
  const gate = useMarkGate(control);
  const [choice, setChoice] = useState<Choice | null>(null);
  const [third, setThird] = useState<ThirdMarks>({ dispenseFrame: null, clearFrame: null });
  const drop = q.data;
  const marks = useMemo<PlayerMark[]>(() => {
    const shown = countingReadings(drop?.readings ?? []);
    const m = shown.flatMap((r) => [
      ...(r.dispenseFrame === null ? [] : [{ frame: r.dispenseFrame, label: `Dispense (${r.reviewerName})`, kind: "dispense" as const }]),
      ...(r.clearFrame === null ? [] : [{ frame: r.clearFrame, label: `Clear (${r.reviewerName})`, kind: "clear" as const }]),
    ]);
    if (third.dispenseFrame !== null) m.push({ frame: third.dispenseFrame, label: "Dispense (third)", kind: "dispense" });
    if (third.clearFrame !== null) m.push({ frame: third.clearFrame, label: "Clear (third)", kind: "clear" });
    return m;
  }, [drop, third]);

  if (q.isPending || ruling.isPending)
    return (
      <p role="status" className="text-ink-600">
        Loading the drop…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const d = q.data;
  const party = d.readings.some((r) => r.reviewerId === actorId);
  const open = d.state === "discrepancy" && !ruling.data && !party;
  const markThird = (which: keyof ThirdMarks) =>
    gate.attempt(which === "dispenseFrame" ? "Third reading's dispense" : "Third reading's clear", (f) => setThird((t) => ({ ...t, [which]: f })));
  const keys =
    open && choice === "third"
      ? [
          { key: "d", label: "Mark the frame on screen as the third reading's dispense frame", run: () => markThird("dispenseFrame") },
          { key: "e", label: "Mark the frame on screen as the third reading's clear frame", run: () => markThird("clearFrame") },
        ]
      : [];
  const jump = (f: number) => control.current?.goToFrame(f);
  return (
    <div className="space-y-6">
      <DropHeader drop={d} />
      <p className="max-w-3xl text-sm text-ink-600">
        The governing specification and the lab&apos;s own accredited procedure decide how a disagreement is settled; the tolerance shown is the edition&apos;s,
        an example until the lab sets its own.
      </p>
      <ReadingPair drop={d} onJump={jump} />
      {clip.data?.playback && frames.data && (
        <FramePlayer
          src={clip.data.playback.url}
          poster={clip.data.posterUrl}
          title={clip.data.originalName}
          frames={frames.data}
          offsetPts={clip.data.playback.offsetPts}
          initialFrame={d.startFrame ?? 0}
          marks={marks}
          filmstrip={clip.data.filmstrip}
          extraKeys={keys}
          onFrameChange={gate.onFrameChange}
          controlRef={control}
        >
          {keys.length > 0 && <MarkStatus refused={gate.refused} />}
        </FramePlayer>
      )}
      <section aria-label="Ruling" className="max-w-2xl rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
        {ruling.data && (
          <Notice tone="ok">
            Ruled by {ruling.data.ruledBy.name}: the {ruling.data.chosen} reading, {s(ruling.data.timeS)}. Reason: {ruling.data.reason}
          </Notice>
        )}
        {!ruling.data && party && <Notice tone="warn">You read this drop yourself, so you cannot rule on it: another lead must rule.</Notice>}
        {!ruling.data && !party && d.state !== "discrepancy" && (
          <Notice>This drop is {d.state ?? "being read"}: only a drop whose readings disagree is ruled.</Notice>
        )}
        {open && <RulingForm dropId={id} choice={choice} onChoice={setChoice} third={third} />}
      </section>
    </div>
  );
}
