"use client";

import { formatInstant } from "@/components/ui/dates";
import { DetailList } from "@/components/ui/detail-list";
import { hoursAndMinutes } from "@/lib/numbers";
import type { RunView } from "@/lib/runs/view";
import { formatTemperature } from "@/lib/units/rules";

const DISPENSER_UNIT = { mg: "mg", uL: "µL" } as const;
const orNone = (s: string) => s || <span className="text-ink-600">not given</span>;

export function RunConditions({ run }: { run: RunView }) {
  const r = run.roughness;
  const items = [
    { label: "Tested at", value: formatInstant(run.testedAt) },
    { label: "Room temperature", value: formatTemperature(run.roomTempC) },
    { label: "Surface temperature", value: formatTemperature(run.surfaceTempC) },
    {
      label: "Acclimation before the test",
      value: run.acclimationH === null ? <span className="text-wick-700">not recorded</span> : hoursAndMinutes(run.acclimationH),
    },
    { label: "Preparation method", value: run.prepMethod },
    { label: "Abrasive", value: orNone(run.prepAbrasive) },
    { label: "Pad cycle position", value: orNone(run.prepPadPosition) },
    { label: "Roughness readings (Ra)", value: r.n ? `${run.roughnessRaUm.join(", ")} µm` : "none" },
    { label: "Roughness mean", value: r.mean === null ? "—" : `${r.mean.toFixed(3)} µm` },
    { label: "Roughness SD", value: r.sd === null ? "needs two readings" : `${r.sd.toFixed(3)} µm (n = ${r.n})` },
    { label: "Oil lot", value: run.oilLot },
    {
      label: "Dispenser check",
      value: run.dispenserCheckValue === null ? orNone("") : `${run.dispenserCheckValue} ${DISPENSER_UNIT[run.dispenserCheckUnit ?? "mg"]}`,
    },
    { label: "Camera", value: orNone(run.cameraId) },
    { label: "Technician", value: run.technicianName },
  ];
  return (
    <div className="space-y-4">
      <DetailList items={items} wide />
      {run.prepNotes && (
        <div>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-600">Preparation notes</h3>
          <p className="mt-0.5 whitespace-pre-wrap">{run.prepNotes}</p>
        </div>
      )}
      {run.notes && (
        <div>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-600">Notes</h3>
          <p className="mt-0.5 whitespace-pre-wrap">{run.notes}</p>
        </div>
      )}
    </div>
  );
}
