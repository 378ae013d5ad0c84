import { DetailList } from "@/components/ui/detail-list";
import { LocalTime } from "@/components/ui/local-time";
import { formatBytes } from "@/lib/numbers";
import type { ClipView } from "@/lib/clips/hooks";
import { containerName, describeIndex, indexDuration, proxyDecision, seconds } from "@/lib/clips/words";
import { ShaField } from "./sha-field";

const pending = (what: string) => <span className="text-ink-600">{what}</span>;

/** Size, checksum, container, the frame index in words and the proxy decision. */
export function ClipFacts({ clip }: { clip: ClipView }) {
  const ix = clip.index;
  const sizes =
    clip.storedSize !== null && clip.storedSize !== clip.declaredSize
      ? `${formatBytes(clip.storedSize)} stored (${formatBytes(clip.declaredSize)} declared)`
      : formatBytes(clip.storedSize ?? clip.declaredSize);
  const items = [
    { label: "Size", value: `${sizes} · ${clip.storedSize ?? clip.declaredSize} bytes` },
    { label: "Container", value: clip.format ? <span title={clip.format}>{containerName(clip.format)}</span> : pending("not probed yet") },
    { label: "Uploaded", value: <LocalTime iso={clip.createdAt} /> },
    { label: "Ready at", value: clip.readyAt ? <LocalTime iso={clip.readyAt} /> : pending("not yet") },
    ...(clip.trim ? [{ label: "Cut from", value: clip.trim.note }] : []),
  ];
  const proxy = proxyDecision(clip);
  return (
    <div className="space-y-4">
      <DetailList items={items} />
      <div>
        <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-600">SHA-256 of the stored bytes</h3>
        <div className="mt-0.5">{clip.sha256 ? <ShaField sha256={clip.sha256} /> : pending("not computed yet")}</div>
      </div>
      <div>
        <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-600">Frame index</h3>
        {ix ? (
          <>
            <p className="mt-0.5">{describeIndex(ix)}.</p>
            <p className="text-sm text-ink-600">
              Lasts {seconds(Number(indexDuration(ix).toFixed(3)))}; keyframes at most {seconds(Number(ix.maxKeyframeIntervalS.toFixed(2)))} apart; time base{" "}
              {ix.timeBase.num}/{ix.timeBase.den} s.
            </p>
          </>
        ) : (
          <p className="mt-0.5">{pending("Not built yet.")}</p>
        )}
      </div>
      <div>
        <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-600">Stepping proxy</h3>
        <p className="mt-0.5">{proxy ?? pending("Not decided yet.")}</p>
      </div>
    </div>
  );
}
