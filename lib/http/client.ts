// The browser side of the one error shape: turns an API error body back into words for the UI.
import type { ErrorBody, FieldErrors } from "../errors";

export class ApiError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly fields: FieldErrors = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export async function fetchJson<T>(url: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: init.method ?? "GET",
      headers: init.body === undefined ? undefined : { "content-type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      cache: "no-store",
    });
  } catch {
    throw new ApiError("The server could not be reached. Check your connection and try again.", 0);
  }
  const text = await res.text();
  let data: unknown;
  try {
    data = text ? JSON.parse(text) : undefined;
  } catch {
    // A non-JSON answer (a proxy error page, say) still gets a message in words below.
  }
  if (!res.ok) {
    const err = (data as ErrorBody | undefined)?.error;
    throw new ApiError(err?.message ?? `The server answered ${res.status}. Try again in a moment.`, res.status, err?.fields);
  }
  return data as T;
}
