import { ZodError } from "zod";

export type ErrorCode =
  | "bad_request"
  | "validation"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "gone"
  | "unsupported_media_type"
  | "too_many_requests"
  | "unavailable"
  | "internal";

const STATUS: Record<ErrorCode, number> = {
  bad_request: 400,
  validation: 422,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  unsupported_media_type: 415,
  too_many_requests: 429,
  unavailable: 503,
  internal: 500,
};

export type FieldErrors = Record<string, string>;

/** The one error type services throw; `message` is shown to the user as it is. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly fields?: FieldErrors;
  readonly details?: unknown;

  constructor(code: ErrorCode, message: string, opts: { status?: number; fields?: FieldErrors; details?: unknown; cause?: unknown } = {}) {
    super(message, { cause: opts.cause });
    this.name = "AppError";
    this.code = code;
    this.status = opts.status ?? STATUS[code];
    this.fields = opts.fields;
    this.details = opts.details;
  }
}

export interface ErrorBody {
  error: { code: ErrorCode; message: string; fields?: FieldErrors; requestId: string };
}

export function fieldErrorsOf(err: ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of err.issues) {
    const key = issue.path.join(".") || "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

export function validationError(err: ZodError): AppError {
  const fields = fieldErrorsOf(err);
  // Each message names its field in words already ("Name must be…"), so the summary just joins them.
  const list = Object.values(fields).map((v) => (/[.!?]$/.test(v) ? v : `${v}.`));
  return new AppError("validation", `Please correct the form. ${list.join(" ")}`, { fields });
}

/** Maps any thrown value to the single JSON error shape; unknown errors are logged, never echoed. */
export function toResponse(err: unknown, requestId: string): Response {
  const appErr = err instanceof AppError ? err : err instanceof ZodError ? validationError(err) : undefined;
  if (appErr) {
    const body: ErrorBody = { error: { code: appErr.code, message: appErr.message, fields: appErr.fields, requestId } };
    return Response.json(body, { status: appErr.status, headers: { "x-request-id": requestId } });
  }
  console.error(`[${requestId}] unhandled error`, err);
  const body: ErrorBody = {
    error: { code: "internal", message: `Something went wrong on the server. Quote reference ${requestId} when reporting it.`, requestId },
  };
  return Response.json(body, { status: 500, headers: { "x-request-id": requestId } });
}
