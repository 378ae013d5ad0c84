import "server-only";
import { UUID_PATTERN } from "../schema-parts";
import { randomUUID } from "node:crypto";
import type { z } from "zod";
import type { Actor } from "../auth/actor";
import { currentActor } from "../auth/session";
import { AppError, toResponse, validationError } from "../errors";
import { hasAnyRole, ROLE_LABELS, type Role } from "../users/rules";

type Params = Record<string, string | string[]>;
type Schema = z.ZodType | undefined;
type Out<S extends Schema> = S extends z.ZodType ? z.output<S> : undefined;

/** Who may call: a role (any of a list), anyone signed in, or everyone. */
export type Access = { role: Role | Role[] } | { signedIn: true } | { public: true };

interface Ctx<B extends Schema, Q extends Schema, A> {
  req: Request;
  actor: A;
  params: Params;
  body: Out<B>;
  query: Out<Q>;
  requestId: string;
}

type ActorOf<T extends Access> = T extends { public: true } ? Actor | null : Actor;

/**
 * Every API route handler goes through here: session lookup, role check, zod parsing of the JSON
 * body and query, and the one error shape. Handlers return data (sent as JSON) or a Response.
 */
export function route<T extends Access, B extends Schema = undefined, Q extends Schema = undefined>(
  opts: T & { body?: B; query?: Q; status?: number },
  handler: (ctx: Ctx<B, Q, ActorOf<T>>) => Promise<unknown>,
) {
  return async (req: Request, context: { params: Promise<Params> }): Promise<Response> => {
    const requestId = req.headers.get("x-request-id")?.slice(0, 64) || randomUUID();
    try {
      const actor = await currentActor(requestId);
      if (!("public" in opts)) requireAccess(actor, opts);
      const body = opts.body ? await parseBody(req, opts.body) : undefined;
      const query = opts.query ? parseQuery(req, opts.query) : undefined;
      const params = (await context?.params) ?? {};
      const result = await handler({ req, actor: actor as ActorOf<T>, params, body: body as Out<B>, query: query as Out<Q>, requestId });
      if (result instanceof Response) return result;
      return Response.json(result ?? { ok: true }, { status: opts.status ?? 200, headers: { "x-request-id": requestId } });
    } catch (err) {
      return toResponse(err, requestId);
    }
  };
}

function requireAccess(actor: Actor | null, opts: Access): asserts actor is Actor {
  if (!actor) throw new AppError("unauthenticated", "Please sign in first.");
  if ("role" in opts) {
    const roles = Array.isArray(opts.role) ? opts.role : [opts.role];
    if (!hasAnyRole(actor, roles)) {
      const names = roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(" or ");
      throw new AppError("forbidden", `This needs the ${names} role.`);
    }
  }
}

async function parseBody(req: Request, schema: z.ZodType): Promise<unknown> {
  // Requiring JSON also stops cross-site form posts: a browser cannot send it without CORS approval.
  const type = req.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("application/json")) {
    throw new AppError("unsupported_media_type", "Send the request body as JSON (Content-Type: application/json).");
  }
  const text = await req.text();
  let raw: unknown;
  try {
    raw = text.trim() === "" ? {} : JSON.parse(text);
  } catch {
    throw new AppError("validation", "The request body is not valid JSON.", { fields: { _: "The request body is not valid JSON." } });
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw validationError(parsed.error);
  return parsed.data;
}

function parseQuery(req: Request, schema: z.ZodType): unknown {
  const raw = Object.fromEntries(new URL(req.url).searchParams);
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw validationError(parsed.error);
  return parsed.data;
}

export function param(params: Params, name: string): string {
  const v = params[name];
  return Array.isArray(v) ? v.join("/") : v;
}

/** A uuid path segment; anything else is simply not found (never a database error). */
export function idParam(params: Params, name: string, what: string): string {
  const v = param(params, name);
  if (!v || !UUID_PATTERN.test(v)) throw new AppError("not_found", `No such ${what}.`);
  return v.toLowerCase();
}
