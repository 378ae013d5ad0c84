// Pure statistics and measurement helpers, each checked against published values in tests/unit.
export { durationUncertainty, durationUncertaintyOfMarks } from "./uncertainty";
export { frameToTimecode, timecodeToFrame, type FrameRate } from "./timecode";
