// The processing steps of a clip and its states. Pure.

export const STEPS = ["verify", "hash", "index", "proxy", "thumbnails"] as const;
export type Step = (typeof STEPS)[number];
export const STEP_LABELS: Record<Step, string> = {
  verify: "Verify the file is a readable video",
  hash: "SHA-256 of the stored bytes",
  index: "Frame index (timestamp of every frame)",
  proxy: "Stepping proxy",
  thumbnails: "Poster and filmstrip",
};
export type ClipStatus = "uploading" | "processing" | "ready" | "rejected" | "failed";
