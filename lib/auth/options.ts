import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { env } from "../env";
import { AppError } from "../errors";
import { authenticate } from "./sign-in";

/** The client address for throttling: the first hop of X-Forwarded-For (Next sets it when absent). */
export function clientAddress(headers: Record<string, unknown> | Headers | undefined): string {
  const get = (name: string): string | undefined => {
    if (!headers) return undefined;
    if (headers instanceof Headers) return headers.get(name) ?? undefined;
    const v = headers[name];
    return Array.isArray(v) ? String(v[0]) : typeof v === "string" ? v : undefined;
  };
  const forwarded = get("x-forwarded-for")?.split(",")[0]?.trim();
  return (forwarded || get("x-real-ip") || "unknown").slice(0, 64);
}

// The JWT carries only the user id: roles and the active flag are re-read on every request.
export function authOptions(): NextAuthOptions {
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
    pages: { signIn: "/sign-in", error: "/sign-in" },
    providers: [
      CredentialsProvider({
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(credentials, req) {
          try {
            const user = await authenticate(credentials, clientAddress(req?.headers));
            return { id: user.id, email: user.email, name: user.name };
          } catch (err) {
            // next-auth passes an Error's message back to the sign-in form as it is.
            if (err instanceof AppError) throw new Error(err.message);
            console.error("sign-in failed unexpectedly", err);
            throw new Error("Sign-in is not available right now. Try again in a moment.");
          }
        },
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user) token.sub = user.id;
        return { sub: token.sub, iat: token.iat, exp: token.exp, jti: token.jti };
      },
      session({ session, token }) {
        return { expires: session.expires, user: { id: token.sub } } as typeof session;
      },
    },
  };
}
