import { randomBytes } from "node:crypto";
import { expect } from "vitest";
import type { Client } from "./app";

// Intake records made through the real API by a signed-in technician or lead.
const tag = () => randomBytes(3).toString("hex");
export const today = () => new Date().toISOString().slice(0, 10);

export const goodRun = (over: Record<string, unknown> = {}) => ({
  testedAt: new Date().toISOString(),
  roomTemp: { value: 22, unit: "C" },
  surfaceTemp: { value: 22, unit: "C" },
  prepMethod: "Wipe, abrade, wipe",
  roughnessRaUm: [0.42, 0.44],
  oilLot: "LOT-1",
  dispenserCheck: { value: 12, unit: "mg" },
  ...over,
});

async function created<T>(res: Response, key: string): Promise<T> {
  const text = await res.text();
  expect(res.status, text).toBe(201);
  return JSON.parse(text)[key] as T;
}

export async function newSubmission(
  c: Client,
  organisationId: string,
  over: Record<string, unknown> = {},
): Promise<{ id: string; reference: string; editionId: string }> {
  return created(
    await c.post("/api/submissions", {
      organisationId,
      modelName: `Test model ${tag()}`,
      kind: "approval",
      weightClassesLb: [15, 16],
      receivedOn: today(),
      ...over,
    }),
    "submission",
  );
}

export async function newSample(c: Client, submissionId: string, over: Record<string, unknown> = {}): Promise<{ id: string; serial: string }> {
  const body = {
    serial: `T-${tag()}`,
    weight: { value: 16, unit: "lb" },
    receivedAt: new Date(Date.now() - 48 * 3_600_000).toISOString(),
    acclimationStartedAt: new Date(Date.now() - 30 * 3_600_000).toISOString(),
    ...over,
  };
  return created(await c.post(`/api/submissions/${submissionId}/samples`, body), "sample");
}

export async function newRun(
  c: Client,
  sampleId: string,
  over: Record<string, unknown> = {},
): Promise<{ id: string; flags: { code: string; message: string }[]; dropCount: number; needsAcceptance: boolean }> {
  return created(await c.post(`/api/samples/${sampleId}/runs`, goodRun(over)), "run");
}

export const editionBody = (over: Record<string, unknown> = {}) => ({
  name: `Test edition ${tag()}`,
  effectiveFrom: "2030-01-01",
  minAbsorptionS: 135,
  criterion: "ball_mean",
  dropsPerBall: 3,
  guardBandS: 10,
  roundSizes: [2, 8, 24],
  toleranceCoverage: 0.9,
  toleranceConfidence: 0.95,
  readingToleranceS: 0.5,
  minAcclimationH: 24,
  surfaceTempMinC: 20,
  surfaceTempMaxC: 24,
  roughnessMaxSdUm: 0.1,
  sources: { minAbsorptionS: "test value" },
  ...over,
});

export async function newEdition(c: Client, over: Record<string, unknown> = {}): Promise<{ id: string; name: string }> {
  return created(await c.post("/api/editions", editionBody(over)), "edition");
}

export const uniqueName = (what: string) => `${what} ${tag()}`;
