import { spawnSync } from "node:child_process";
import path from "node:path";
import { describe, expect, it } from "vitest";

// The linter and formatter (Biome, biome.jsonc) over the whole tree, as part of `npm test`, so a
// violation fails CI like any other test. `npx biome check --write .` fixes what it can.
const root = path.resolve(import.meta.dirname, "../..");

describe("code style", () => {
  it("the whole tree is clean under `biome ci` (lint and format)", () => {
    const r = spawnSync(path.join(root, "node_modules/.bin/biome"), ["ci", "--colors=off", "--max-diagnostics=20", "."], { cwd: root, encoding: "utf8" });
    expect(r.status, r.error ? `Biome did not run (${r.error.message}): run npm ci first.` : `${r.stdout}\n${r.stderr}`).toBe(0);
  });
});
