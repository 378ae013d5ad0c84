import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

// Which modules the browser may load. A module that reaches the database, storage, mail, the job
// queue, the environment's secrets or node's own modules must carry `import "server-only"`, so that
// Next refuses to build a page whose client code imports it; and no module a client component
// reaches (by a value import: `import type` is erased) may be one of them.
const root = path.resolve(import.meta.dirname, "../..");
const SKIP = new Set(["node_modules", ".next", ".next-test", ".git", ".data", "public", "test-results"]);
const SERVER_PACKAGES = /^(node:|knex$|pg$|pg-boss$|pdfkit$|nodemailer$|next-auth$|next\/headers$|@aws-sdk\/)/;
const SERVER_MODULES = /^lib\/(db|storage|smtp|jobs|env)\.ts$|(^|\/)(queries|service|[a-z-]+-queries|[a-z-]+-service)\.ts$/;
const IMPORT = /^\s*(?:import|export)\s+(type\s+)?(?:([^;]*?)\s+from\s+)?"([^"]+)"/gm;

function sourceFiles(dir: string, out: string[] = []): string[] {
  for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
    if (SKIP.has(e.name)) continue;
    const p = path.join(dir, e.name);
    if (e.isDirectory()) sourceFiles(p, out);
    else if (/\.tsx?$/.test(e.name)) out.push(path.relative(root, p));
  }
  return out;
}

function resolveLocal(spec: string, from: string): string | null {
  const base = spec.startsWith("@/") ? spec.slice(2) : spec.startsWith(".") ? path.normalize(path.join(path.dirname(from), spec)) : null;
  if (base === null) return null;
  for (const ext of [".ts", ".tsx", "/index.ts", "/index.tsx"]) if (fs.existsSync(path.join(root, base + ext))) return base + ext;
  return null;
}

/** Value imports of a file: local modules resolved to their paths, packages by name. */
function valueImports(file: string): { local: string[]; packages: string[] } {
  const text = fs.readFileSync(path.join(root, file), "utf8");
  const local: string[] = [];
  const packages: string[] = [];
  for (const m of text.matchAll(IMPORT)) {
    const clause = m[2] ?? "";
    const named = /^\{([\s\S]*)\}$/.exec(clause.trim());
    const typeOnly = m[1] || (named?.[1].split(",").every((p) => !p.trim() || p.trim().startsWith("type ")) ?? false);
    if (typeOnly) continue;
    const r = resolveLocal(m[3], file);
    if (r) local.push(r);
    else if (!m[3].startsWith(".") && !m[3].startsWith("@/")) packages.push(m[3]);
  }
  return { local, packages };
}

const files = sourceFiles(root);
const graph = new Map(files.map((f) => [f, valueImports(f)]));
const isServer = (f: string) => SERVER_MODULES.test(f) || (graph.get(f)?.packages.some((p) => SERVER_PACKAGES.test(p)) ?? false);
const marked = (f: string) => /^import "server-only";$/m.test(fs.readFileSync(path.join(root, f), "utf8"));

describe("server-only modules", () => {
  it('every lib module that reaches the server\'s resources says so with import "server-only"', () => {
    const unmarked = files.filter((f) => f.startsWith("lib/") && isServer(f) && !marked(f));
    expect(unmarked).toEqual([]);
  });

  it("no module that client code loads is marked server-only or imports a server package", () => {
    const clients = files.filter((f) => /^\s*["']use client["']/.test(fs.readFileSync(path.join(root, f), "utf8")));
    expect(clients.length).toBeGreaterThan(20);
    const seen = new Set<string>();
    const stack = [...clients];
    while (stack.length) {
      const f = stack.pop()!;
      if (seen.has(f)) continue;
      seen.add(f);
      stack.push(...(graph.get(f)?.local ?? []));
    }
    const wrong = [...seen].filter((f) => marked(f) || isServer(f)).sort();
    expect(wrong).toEqual([]);
  });
});
