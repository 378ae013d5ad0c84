import type { ReportFile } from "../reports/service";

// Files the API sends for download (the report, the exports).

/** A file as an HTTP response: downloaded, never cached by shared caches. */
export function fileResponse(f: ReportFile): Response {
  const body = typeof f.body === "string" ? f.body : new Uint8Array(f.body);
  return new Response(body, {
    headers: { "content-type": f.contentType, "content-disposition": `attachment; filename="${f.fileName}"`, "cache-control": "private, no-store" },
  });
}
