import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError } from "@/lib/http/client";

/**
 * Puts the server's field errors ({"weight.value": "…"}) on the form's own fields. `place` turns a
 * server path into a form path, or null when the form has no such field (the summary still names it).
 */
export function placeServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, place: (path: string) => string | null = (p) => p): void {
  if (!(err instanceof ApiError)) return;
  for (const [path, message] of Object.entries(err.fields)) {
    const target = place(path);
    if (target) setError(target as Path<T>, { type: "server", message });
  }
}

/** The first message anywhere under a field's error (arrays and objects of errors included). */
export function firstMessage(error: unknown): string | undefined {
  if (!error || typeof error !== "object") return undefined;
  const e = error as { message?: unknown };
  if (typeof e.message === "string" && e.message) return e.message;
  // `ref` holds the DOM element; only nested field errors are worth a look.
  for (const [k, v] of Object.entries(error)) {
    if (k !== "ref" && k !== "types" && v && typeof v === "object") {
      const m = firstMessage(v);
      if (m) return m;
    }
  }
  return undefined;
}

export const apiError = (err: unknown): ApiError | null => (err instanceof ApiError ? err : null);
