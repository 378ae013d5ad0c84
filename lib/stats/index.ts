// Pure statistics and measurement helpers, each checked against published values in tests/unit.
export { durationUncertainty, durationUncertaintyOfMarks } from "./uncertainty";
export { frameToTimecode, timecodeToFrame, type FrameRate } from "./timecode";
export { toleranceFactor, natrellaFactor, lowerToleranceLimit } from "./tolerance";
export { fractionBelow, cpkInterval } from "./capability";
export { dixonQ, grubbs } from "./outliers";
export { pooledRepeatability, REPEATABILITY_FACTOR } from "./repeatability";
export { intraclass, blandAltman } from "./agreement";
export { welchInterval, summarize, type SampleSummary } from "./welch";
export {
  normalCdf,
  normalQuantile,
  studentTCdf,
  studentTQuantile,
  nonCentralTCdf,
  nonCentralTQuantile,
  regularizedBeta,
  logGamma,
} from "./distributions";
