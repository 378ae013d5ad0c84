import { UUID_PATTERN } from "@/lib/schema-parts";
import { notFound } from "next/navigation";
import type { Actor } from "@/lib/auth/actor";
import { getEdition } from "@/lib/editions/service";
import { AppError } from "@/lib/errors";
import { visibleSample } from "@/lib/samples/service";
import { visibleSubmission } from "@/lib/submissions/service";

/** The sample, its submission and its edition's limits, or the not-found page. */
export async function sampleContext(actor: Actor, id: string) {
  if (!UUID_PATTERN.test(id)) notFound();
  try {
    const sample = await visibleSample(actor, id);
    const submission = await visibleSubmission(actor, sample.submissionId);
    const e = await getEdition(actor, submission.editionId);
    const limits = {
      surfaceTempMinC: e.surfaceTempMinC,
      surfaceTempMaxC: e.surfaceTempMaxC,
      roughnessMaxSdUm: e.roughnessMaxSdUm,
      minAcclimationH: e.minAcclimationH,
    };
    return { sample, submission, limits };
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
}
