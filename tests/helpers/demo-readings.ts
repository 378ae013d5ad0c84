import { mkdirSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { db } from "@/lib/db";
import { seedDemoReadings, type DemoReadingsResult } from "@/seeds/demo-results";

// The demo's read submission on the test stack. Several test files need it; whichever comes first
// reads it (the seed takes an advisory lock and is idempotent), and all of them share one folder so
// the renders' truth files are there for every one of them. Small recordings keep it quick.
export const DEMO_READINGS_DIR = path.join(process.env.TEST_TMP_DIR ?? os.tmpdir(), "wickmark-demo-readings");
export const SMALL_DEMO_CLIPS = { width: 160, height: 90, fps: "10", noise: 2, clipTimeoutS: 600 };

export function ensureDemoReadings(log: (s: string) => void = () => {}): Promise<DemoReadingsResult> {
  mkdirSync(DEMO_READINGS_DIR, { recursive: true });
  return seedDemoReadings(db(), DEMO_READINGS_DIR, log, SMALL_DEMO_CLIPS);
}
