import { z } from "zod";
import { instantFromInput, localInput } from "@/components/ui/dates";
import { runInputSchema, type RunInput } from "@/lib/runs/schema";
import type { RunView } from "@/lib/runs/view";

// The run form checks with the API's own schema, except where a browser control holds the value
// differently: a local date and time, roughness rows as objects (one per input), a blank dispenser check.
const api = runInputSchema.shape;

export const runFormSchema = z.object({
  ...api,
  testedAt: z
    .string()
    .trim()
    .min(1, "Tested at is required.")
    .transform((v, ctx) => {
      const iso = instantFromInput(v);
      if (!iso) ctx.addIssue({ code: "custom", message: "Tested at is not a date and time." });
      return iso ?? "";
    }),
  roughnessRaUm: z
    .array(z.object({ ra: api.roughnessRaUm.unwrap().element }))
    .max(30, "At most 30 roughness readings.")
    .transform((rows) => rows.map((r) => r.ra)),
  dispenserCheck: z
    .object({ value: z.string(), unit: z.enum(["mg", "uL"]) })
    .transform((d): RunInput["dispenserCheck"] => (d.value.trim() ? d : null))
    .pipe(api.dispenserCheck),
});

export type RunFormInput = z.input<typeof runFormSchema>;
export type RunFormOutput = z.output<typeof runFormSchema>;

/** A server error path as the form names it: the API's `roughnessRaUm.2` is the third row's input. */
export function formPath(path: string): string {
  const row = /^roughnessRaUm\.(\d+)$/.exec(path);
  return row ? `roughnessRaUm.${row[1]}.ra` : path;
}

export function blankRun(): RunFormInput {
  return {
    testedAt: localInput(),
    roomTemp: { value: "", unit: "C" },
    surfaceTemp: { value: "", unit: "C" },
    prepMethod: "",
    prepAbrasive: "",
    prepPadPosition: "",
    prepNotes: "",
    roughnessRaUm: [{ ra: "" }, { ra: "" }, { ra: "" }],
    oilLot: "",
    dispenserCheck: { value: "", unit: "mg" },
    cameraId: "",
    notes: "",
  };
}

/** A recorded run, for editing: temperatures come back in °C, as stored. */
export function runDefaults(r: RunView): RunFormInput {
  return {
    testedAt: localInput(r.testedAt),
    roomTemp: { value: String(r.roomTempC), unit: "C" },
    surfaceTemp: { value: String(r.surfaceTempC), unit: "C" },
    prepMethod: r.prepMethod,
    prepAbrasive: r.prepAbrasive,
    prepPadPosition: r.prepPadPosition,
    prepNotes: r.prepNotes,
    roughnessRaUm: r.roughnessRaUm.map((ra) => ({ ra: String(ra) })),
    oilLot: r.oilLot,
    dispenserCheck: { value: r.dispenserCheckValue === null ? "" : String(r.dispenserCheckValue), unit: r.dispenserCheckUnit ?? "mg" },
    cameraId: r.cameraId,
    notes: r.notes,
  };
}

export const TEMPERATURE_UNITS = [
  { value: "C", label: "°C" },
  { value: "F", label: "°F" },
] as const;

export const DISPENSER_UNITS = [
  { value: "mg", label: "mg" },
  { value: "uL", label: "µL" },
] as const;

/** The edition's limits that the form can mention while the technician types. */
export interface RunLimits {
  surfaceTempMinC: number;
  surfaceTempMaxC: number;
  roughnessMaxSdUm: number;
  minAcclimationH: number;
}
