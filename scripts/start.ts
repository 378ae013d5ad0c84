import path from "node:path";
import { startNext, startWorker, buildApp } from "./app";
import { migrateAndSeed } from "./database";
import { PROFILES } from "./profiles";
import type { Service } from "./services/service";
import { startStack } from "./stack";
import { db } from "../lib/db";
import { DEMO_PASSWORD, DEMO_USERS } from "../seeds/demo";
import { seedDemoClips } from "../seeds/demo-clips";
import { seedDemoReadings } from "../seeds/demo-results";

// `npm start` (and `npm run dev` with --dev): everything on loopback, data kept between runs.
const dev = process.argv.includes("--dev");
const profile = PROFILES.dev;
const log = (s: string) => console.log(`[wickmark] ${s}`);

async function main() {
  const stack = await startStack(profile, log);
  // The orchestrator itself uses lib/ (the demo recordings), with the same settings as the app.
  Object.assign(process.env, stack.env);
  const running: Service[] = [...stack.services];
  let stopping = false;
  const shutdown = async (why: string, code: number) => {
    if (stopping) return;
    stopping = true;
    log(`${why}: stopping…`);
    for (const s of running.reverse()) await s.stop().catch(() => {});
    log("stopped");
    process.exit(code);
  };
  process.on("SIGINT", () => void shutdown("SIGINT", 0));
  process.on("SIGTERM", () => void shutdown("SIGTERM", 0));

  try {
    await migrateAndSeed(stack.env, log);
    if (!dev) await buildApp(stack.env, profile.distDir, log);
    const logs = path.join(profile.dataDir, "logs");
    running.push(await startWorker(stack.env, path.join(logs, "worker.log")));
    running.push(await startNext(stack.env, profile.ports.app, dev ? "dev" : "start", path.join(logs, "app.log")));
  } catch (err) {
    console.error(`[wickmark] ${err instanceof Error ? err.message : err}`);
    await shutdown("start-up failed", 1);
    return;
  }

  log(`Wickmark is running at ${stack.env.APP_URL}${dev ? " (development mode, hot reload)" : ""}`);
  log(`Demo accounts (password "${DEMO_PASSWORD}"):`);
  for (const u of DEMO_USERS) log(`  ${u.roles.join(" + ").padEnd(18)} ${u.email}`);
  log(`Logs are in ${path.relative(process.cwd(), logs())}. Press Ctrl-C to stop.`);
  // In the background, one after the other: the app is already served.
  const why = (err: unknown) => (err instanceof Error ? err.message : String(err));
  void seedDemoClips(db(), path.join(profile.dataDir, "demo-clips"), log)
    .catch((err) => log(`demo recordings not made: ${why(err)}`))
    .then(() => seedDemoReadings(db(), path.join(profile.dataDir, "demo-readings"), log))
    .catch((err) => log(`demo readings not made: ${why(err)}`));
}

const logs = () => path.join(profile.dataDir, "logs");

main();
