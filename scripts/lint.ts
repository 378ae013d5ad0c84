import { spawnSync } from "node:child_process";
import path from "node:path";
import { projectRoot } from "./services/service";

// `npm run lint` checks lint and format over the whole tree (biome.jsonc); `npm run format`
// (`lint --write`) fixes what Biome can. Run through bootstrap.sh, so the packages are installed first.
const biome = path.join(projectRoot, "node_modules", ".bin", "biome");
const args = process.argv.includes("--write") ? ["check", "--write", "."] : ["ci", "."];
const r = spawnSync(biome, args, { cwd: projectRoot, stdio: "inherit" });
if (r.error) console.error(`[lint] could not run Biome (${r.error.message}); run npm ci first.`);
process.exit(r.status ?? 1);
