// The browser's side of the clip upload API, and the PUT of one part straight to storage.
import type { TrimSource } from "@/lib/clips/schema";
import { fetchJson } from "@/lib/http/client";
import { PartError, pausedError } from "@/lib/uploads/browser/errors";
import type { Network, Transport, UploadState } from "@/lib/uploads/browser/multipart";

export interface StartAnswer {
  clipId: string;
  status: "uploading" | "rejected";
  rejectReason: string | null;
  partSize: number;
  partCount: number;
}

/** Starts an upload; a file refused from its size alone comes back as `rejected` with the reason. */
export function startUpload(runId: string, file: File, trim?: TrimSource): Promise<StartAnswer> {
  return fetchJson<StartAnswer>(`/api/runs/${runId}/clips`, {
    method: "POST",
    body: { fileName: file.name, size: file.size, contentType: file.type || guessType(file.name), ...(trim ? { trim } : {}) },
  });
}

const TYPES: Record<string, string> = {
  mp4: "video/mp4",
  m4v: "video/mp4",
  mov: "video/quicktime",
  mkv: "video/x-matroska",
  webm: "video/webm",
  avi: "video/x-msvideo",
  ts: "video/mp2t",
  mts: "video/mp2t",
};

export function guessType(name: string): string {
  return TYPES[name.split(".").pop()?.toLowerCase() ?? ""] ?? "";
}

/** XMLHttpRequest, because fetch does not report upload progress. */
function putPart(url: string, body: Blob, onSent: (bytes: number) => void, signal: AbortSignal): Promise<string> {
  return new Promise((resolve, reject) => {
    if (signal.aborted) return reject(pausedError());
    const xhr = new XMLHttpRequest();
    const onAbort = () => xhr.abort();
    signal.addEventListener("abort", onAbort, { once: true });
    const settle = (fn: () => void) => {
      signal.removeEventListener("abort", onAbort);
      fn();
    };
    xhr.open("PUT", url);
    xhr.upload.onprogress = (e) => onSent(e.loaded);
    xhr.onload = () =>
      settle(() => {
        const etag = xhr.getResponseHeader("ETag");
        if (xhr.status >= 200 && xhr.status < 300 && etag) resolve(etag);
        else if (xhr.status >= 200 && xhr.status < 300)
          reject(new PartError("Storage accepted the part but did not show its ETag: the bucket's CORS rules must expose the ETag header.", false));
        else
          reject(
            new PartError(
              `Storage answered ${xhr.status} to a part.`,
              xhr.status === 403 || xhr.status === 408 || xhr.status === 429 || xhr.status >= 500,
              xhr.status,
            ),
          );
      });
    xhr.onerror = () => settle(() => reject(new PartError("The connection to storage was lost.", true)));
    xhr.ontimeout = () => settle(() => reject(new PartError("Storage did not answer in time.", true)));
    xhr.onabort = () => settle(() => reject(pausedError()));
    xhr.send(body);
  });
}

export const browserTransport: Transport = {
  state: (clipId) => fetchJson<UploadState>(`/api/clips/${clipId}/upload`),
  sign: (clipId, partNumbers) =>
    fetchJson<{ urls: { partNumber: number; url: string }[] }>(`/api/clips/${clipId}/parts/sign`, { method: "POST", body: { partNumbers } }).then(
      (r) => r.urls,
    ),
  put: putPart,
  record: (clipId, partNumber, etag, size) =>
    fetchJson(`/api/clips/${clipId}/parts/${partNumber}`, { method: "PUT", body: { etag, size } }).then(() => undefined),
  complete: (clipId) => fetchJson<{ status: string }>(`/api/clips/${clipId}/complete`, { method: "POST" }),
};

export const browserNetwork: Network = {
  isOnline: () => navigator.onLine,
  whenOnline: (signal) =>
    new Promise((resolve, reject) => {
      if (navigator.onLine) return resolve();
      const done = () => {
        window.removeEventListener("online", done);
        signal.removeEventListener("abort", stop);
        resolve();
      };
      const stop = () => {
        window.removeEventListener("online", done);
        reject(pausedError());
      };
      window.addEventListener("online", done);
      signal.addEventListener("abort", stop, { once: true });
    }),
};
