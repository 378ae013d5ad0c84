import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

// Finds every API route handler in app/api and the HTTP methods each exports.
const root = path.resolve(import.meta.dirname, "../../app/api");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"];

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) =>
    d.isDirectory() ? walk(path.join(dir, d.name)) : d.name === "route.ts" ? [path.join(dir, d.name)] : [],
  );
}

/** "GET /api/users/[id]" for each exported method of each route file. */
export function discoverRoutes(): string[] {
  return walk(root)
    .flatMap((file) => {
      const src = readFileSync(file, "utf8");
      const route = `/api/${path.relative(root, path.dirname(file)).split(path.sep).join("/")}`;
      return METHODS.filter((m) => new RegExp(`export\\s+(const|async function|function)\\s+${m}\\b|\\bas\\s+${m}\\b`).test(src)).map((m) => `${m} ${route}`);
    })
    .sort();
}
