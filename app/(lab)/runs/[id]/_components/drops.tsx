"use client";

import { Notice } from "@/components/ui/notice";
import { useRunClips } from "@/lib/clips/hooks";
import { useRunDrops } from "@/lib/drops/hooks";
import { DropRow } from "./drop-row";

/**
 * The run's drops and where each sits on a recording. Technicians and leads place them; reviewers
 * go from here to the drop's reading.
 */
export function Drops({ runId, canEdit, canRead }: { runId: string; canEdit: boolean; canRead: boolean }) {
  const drops = useRunDrops(runId);
  const clips = useRunClips(runId);
  const ready = (clips.data ?? []).filter((c) => c.status === "ready");

  return (
    <section aria-labelledby="drops-heading" className="space-y-4">
      <h2 id="drops-heading" className="text-xl font-semibold">
        Drops
      </h2>
      {canEdit && (
        <p className="max-w-3xl text-sm text-ink-600">
          Place each drop on the recording it appears in, at a frame shortly before the oil is dispensed: reviewers start reading from there. Several drops may
          share one recording.
        </p>
      )}
      {canEdit && clips.data && ready.length === 0 && <Notice>Drops can be placed once a recording of this run is ready.</Notice>}
      {drops.isPending && (
        <p className="text-ink-600" role="status">
          Loading the drops…
        </p>
      )}
      {drops.isError && <Notice tone="error">{drops.error.message}</Notice>}
      {drops.data && drops.data.length === 0 && <p className="text-ink-600">This run has no drops.</p>}
      {drops.data && drops.data.length > 0 && (
        <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Drops of this run, in the order they were dispensed</caption>
            <thead className="bg-ink-50 text-ink-600">
              <tr>
                <th scope="col" className="px-3 py-2">
                  Drop
                </th>
                <th scope="col" className="px-3 py-2">
                  Recording
                </th>
                <th scope="col" className="px-3 py-2">
                  Start frame
                </th>
                <th scope="col" className="px-3 py-2">
                  State
                </th>
                {canEdit && (
                  <th scope="col" className="px-3 py-2">
                    Place on a recording
                  </th>
                )}
                {canRead && (
                  <th scope="col" className="px-3 py-2">
                    <span className="sr-only">Reading</span>
                  </th>
                )}
              </tr>
            </thead>
            <tbody>
              {drops.data.map((d) => (
                <DropRow key={d.id} drop={d} readyClips={ready} canEdit={canEdit} canRead={canRead} />
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
