// Frame quantisation uncertainty of a duration between two marks, after the GUM (JCGM 100:2008).

/**
 * Each mark is read to the nearest frame: a rectangular distribution of width Δ, half-width Δ/2,
 * so u = (Δ/2)/√3 = Δ/√12 (GUM 4.3.7); a duration between two such marks: u = √2·Δ/√12 = Δ/√6.
 * Expanded uncertainty with coverage factor k = 2.
 */
export function durationUncertainty(frameInterval: number): { standard: number; expanded: number } {
  const standard = frameInterval / Math.sqrt(6);
  return { standard, expanded: 2 * standard };
}

/** The same for marks on frames of different intervals (variable frame rate): u² = Δ₁²/12 + Δ₂²/12. */
export function durationUncertaintyOfMarks(dispenseInterval: number, clearInterval: number): { standard: number; expanded: number } {
  const standard = Math.sqrt((dispenseInterval ** 2 + clearInterval ** 2) / 12);
  return { standard, expanded: 2 * standard };
}
