// What the demo's read submission, D-2026-0002 (Hollow Lantern), is made of: one synthetic
// recording per ball with three drops of a chosen absorption time, and how its two readers mark them.

export const DEMO_READ_SUBMISSION = "D-2026-0002";

export interface DemoBall {
  serial: string;
  /** Seed of the synthetic recording: where the drops sit and when each is dispensed. */
  seed: number;
  /**
   * True absorption time of each drop, seconds. INVENTED for the demo, not measured anywhere:
   * chosen so that against the demo edition (135 s minimum, 10 s guard band, ball mean) every ball
   * passes, four ball means fall inside the guard band (so round 3 is asked for), and one ball has
   * one outlying drop (HL-2104: Dixon's r10 = 12.8 / 12.9 ≈ 0.99 > 0.970, the 95 % critical value
   * for n = 3, Rorabacher 1991).
   */
  durations: [number, number, number];
  /** A lead's reason for accepting a run whose conditions are flagged. */
  acceptReason?: string;
}

export const DEMO_BALLS: DemoBall[] = [
  { serial: "HL-2001", seed: 201, durations: [151.2, 148.7, 153.4] }, // mean 151.10
  { serial: "HL-2002", seed: 202, durations: [143.1, 140.6, 145.2] }, // mean 142.97, guard band
  {
    serial: "HL-2101",
    seed: 211,
    durations: [139.4, 141.8, 137.9], // mean 139.70, guard band
    acceptReason: "Acclimation 14 h: accepted for the demo; conditions otherwise within the edition.",
  },
  { serial: "HL-2102", seed: 212, durations: [157.6, 160.3, 158.8] }, // mean 158.90
  { serial: "HL-2103", seed: 213, durations: [147.9, 150.2, 146.4] }, // mean 148.17
  { serial: "HL-2104", seed: 214, durations: [146.0, 146.1, 158.9] }, // mean 150.33, one outlying drop
  { serial: "HL-2105", seed: 215, durations: [136.8, 138.9, 137.5] }, // mean 137.73, guard band
  { serial: "HL-2106", seed: 216, durations: [154.1, 152.3, 155.6] }, // mean 154.00
  { serial: "HL-2107", seed: 217, durations: [143.9, 145.8, 142.9] }, // mean 144.20, guard band
  { serial: "HL-2108", seed: 218, durations: [149.5, 147.2, 151.0] }, // mean 149.23
];

/**
 * Clip length for three drops taking turns in equal slots: a drop is dispensed up to 22 % into
 * its slot (scripts/clips/synth-plan.ts), so each slot is the longest drop ÷ 0.75, in whole seconds.
 */
export function clipLengthS(durations: readonly number[]): number {
  return durations.length * Math.ceil(Math.max(...durations) / 0.75);
}

export interface Marks {
  dispenseFrame: number;
  clearFrame: number;
}

/**
 * The second reader's marks: the true frames, except one frame late on the clear mark of every
 * second drop and one frame late on the dispense mark of the third drop of every other ball. One
 * frame is far inside the demo edition's 0.5 s reading tolerance at any demo frame rate (≥ 4 fps).
 */
export function secondReaderMarks(ballIndex: number, ordinal: number, truth: Marks): Marks {
  if (ordinal === 2) return { ...truth, clearFrame: truth.clearFrame + 1 };
  if (ordinal === 3 && ballIndex % 2 === 1) return { ...truth, dispenseFrame: truth.dispenseFrame + 1 };
  return truth;
}
