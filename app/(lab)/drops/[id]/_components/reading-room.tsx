"use client";

import { countingReadings } from "@/lib/readings/rules";
import { isBeingRead } from "@/lib/drops/states";
import { useMemo, useRef } from "react";
import { useClip, useFrameIndex } from "@/lib/clips/hooks";
import { useDrop, useSaveMarks, type DropView } from "@/lib/drops/hooks";
import { FramePlayer, type FramePlayerControl, type PlayerMark } from "@/components/player/lazy-frame-player";
import { MarkStatus, markButtonProps, useMarkGate } from "@/components/player/mark-gate";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { DropHeader } from "./drop-header";
import { MarkPanel } from "./mark-panel";
import { ReadingsTable } from "./readings-table";

/** The marks drawn on the scrubber: the viewer's own draft, or every visible reading that counts. */
function marksOf(drop: DropView): PlayerMark[] {
  const shown = drop.myDraft ? [drop.myDraft] : countingReadings(drop.readings);
  return shown.flatMap((r) => {
    const who = shown.length > 1 ? ` (${r.reviewerName})` : "";
    const m: PlayerMark[] = [];
    if (r.dispenseFrame !== null) m.push({ frame: r.dispenseFrame, label: `Dispense${who}`, kind: "dispense" });
    if (r.clearFrame !== null) m.push({ frame: r.clearFrame, label: `Clear${who}`, kind: "clear" });
    return m;
  });
}

export function ReadingRoom({ id, canRead }: { id: string; canRead: boolean }) {
  const q = useDrop(id);
  const clipId = q.data?.clip?.id ?? "";
  const clip = useClip(clipId, Boolean(clipId));
  const frames = useFrameIndex(clipId, Boolean(clipId) && q.data?.clip?.status === "ready");
  const control = useRef<FramePlayerControl>(null);
  const gate = useMarkGate(control);
  const drop = q.data;
  const save = useSaveMarks(id, drop?.myDraft?.id ?? null);
  const marks = useMemo(() => (drop ? marksOf(drop) : []), [drop]);

  if (q.isPending)
    return (
      <p role="status" className="text-ink-600">
        Loading the drop…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  const d = q.data;
  const settled = d.state !== null && !isBeingRead(d.state);
  const canMark = canRead && d.clip?.status === "ready" && (d.myDraft !== null || (!d.mySubmitted && !settled));
  const mark = (which: "dispenseFrame" | "clearFrame") => {
    if (!save.isPending) gate.attempt(which === "dispenseFrame" ? "Dispense" : "Clear", (frame) => save.mutate({ [which]: frame }));
  };
  const markKeys = canMark
    ? [
        { key: "d", label: "Mark the frame on screen as the dispense frame", run: () => mark("dispenseFrame") },
        { key: "e", label: "Mark the frame on screen as the clear frame (the end of the drop)", run: () => mark("clearFrame") },
      ]
    : [];
  const jump = (f: number) => control.current?.goToFrame(f);

  return (
    <div className="space-y-6">
      <DropHeader drop={d} />
      {!d.clip && <Notice tone="warn">This drop is not placed on a clip yet: a technician places it on the run&apos;s page.</Notice>}
      {d.clip && d.clip.status !== "ready" && <Notice tone="error">The clip is not ready for reading ({d.clip.rejectReason ?? d.clip.status}).</Notice>}
      <div className="grid gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(18rem,1fr)]">
        <div className="min-w-0">
          {clip.data?.playback && frames.data ? (
            <FramePlayer
              src={clip.data.playback.url}
              poster={clip.data.posterUrl}
              title={clip.data.originalName}
              frames={frames.data}
              offsetPts={clip.data.playback.offsetPts}
              initialFrame={d.myDraft?.dispenseFrame ?? d.startFrame ?? 0}
              marks={marks}
              filmstrip={clip.data.filmstrip}
              onFrameChange={gate.onFrameChange}
              extraKeys={markKeys}
              controlRef={control}
            >
              {canMark && (
                <>
                  <Button {...markButtonProps(gate.seen, save.isPending)} onClick={() => mark("dispenseFrame")}>
                    Mark dispense (D)
                  </Button>
                  <Button {...markButtonProps(gate.seen, save.isPending)} onClick={() => mark("clearFrame")}>
                    Mark clear (E)
                  </Button>
                  <MarkStatus refused={gate.refused} />
                </>
              )}
            </FramePlayer>
          ) : (
            d.clip?.status === "ready" && (
              <p role="status" className="text-ink-600">
                Loading the clip…
              </p>
            )
          )}
          {save.error && (
            <div className="mt-3">
              <Notice tone="error">{save.error.message}</Notice>
            </div>
          )}
        </div>
        <aside aria-label="Your reading" className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
          <h2 className="text-xl font-semibold">Your reading</h2>
          {canRead ? <MarkPanel drop={d} onJump={jump} /> : <p className="text-sm text-ink-700">Only reviewers read drops.</p>}
        </aside>
      </div>
      <ReadingsTable drop={d} onJump={jump} />
    </div>
  );
}
