import { randomBytes } from "node:crypto";

// Talks to the real app that `npm test` started, the way a browser would: cookies and CSRF included.
export const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3100";

/** A made-up client address, so each test has its own per-address sign-in throttle. */
export const someAddress = () => `198.51.100.${1 + (randomBytes(1)[0] % 250)}-${randomBytes(3).toString("hex")}`;

export class Client {
  cookies = new Map<string, string>();
  constructor(readonly address = someAddress()) {}

  private cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  private keep(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair.indexOf("=");
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1);
      if (/expires=Thu, 01 Jan 1970/i.test(line) || value === "") this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  async request(method: string, path: string, opts: { json?: unknown; raw?: string; type?: string; form?: Record<string, string> } = {}): Promise<Response> {
    const headers: Record<string, string> = { "x-forwarded-for": this.address, cookie: this.cookieHeader() };
    let body: string | undefined;
    if (opts.json !== undefined) {
      headers["content-type"] = "application/json";
      body = JSON.stringify(opts.json);
    } else if (opts.raw !== undefined) {
      headers["content-type"] = opts.type ?? "application/json";
      body = opts.raw;
    } else if (opts.form) {
      headers["content-type"] = "application/x-www-form-urlencoded";
      body = new URLSearchParams(opts.form).toString();
    }
    const res = await fetch(`${APP_URL}${path}`, { method, headers, body, redirect: "manual" });
    this.keep(res);
    return res;
  }

  get = (path: string) => this.request("GET", path);
  post = (path: string, json?: unknown) => this.request("POST", path, { json: json ?? {} });
  patch = (path: string, json: unknown) => this.request("PATCH", path, { json });

  /** Signs in through next-auth's credentials endpoint; returns the error message, or null on success. */
  async signIn(email: string, password: string): Promise<string | null> {
    const csrf = (await (await this.get("/api/auth/csrf")).json()) as { csrfToken: string };
    const res = await this.request("POST", "/api/auth/callback/credentials", {
      form: { email, password, csrfToken: csrf.csrfToken, callbackUrl: `${APP_URL}/`, json: "true" },
    });
    const location = res.headers.get("location") ?? ((await res.json().catch(() => ({}))) as { url?: string }).url ?? "";
    const error = new URL(location, APP_URL).searchParams.get("error");
    if (error) return error;
    return this.cookies.has("next-auth.session-token") ? null : `no session cookie (status ${res.status})`;
  }
}

export async function signedIn(email: string, password: string): Promise<Client> {
  const c = new Client();
  const err = await c.signIn(email, password);
  if (err) throw new Error(`sign-in as ${email} failed: ${err}`);
  return c;
}
