import { NextResponse, type NextRequest } from "next/server";
import { RETURN_TO_HEADER, signInPath } from "@/lib/auth/return-to";

// Convenience only: sends visitors without a session cookie to sign-in, remembering the page (and
// its query) they were going to. Every page passes through here except the API, Next's own files and
// files with an extension, so a new staff or portal page needs nothing added; only the public pages
// are named. Each page's path also goes on to the layouts, whose guard sends an expired session to
// sign-in the same way. The real checks are in the layouts and in every service.
const SESSION_COOKIES = ["next-auth.session-token", "__Secure-next-auth.session-token"];

/** Pages anyone may open. A public page missing here asks its visitors to sign in: noticed at once. */
const PUBLIC = [/^\/$/, /^\/sign-in(\/|$)/, /^\/invite(\/|$)/, /^\/help(\/|$)/];

export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  const query = new URLSearchParams(request.nextUrl.search);
  query.delete("_rsc");
  const target = pathname + (query.size ? `?${query}` : "");
  if (PUBLIC.some((p) => p.test(pathname)) || SESSION_COOKIES.some((c) => request.cookies.has(c))) {
    const headers = new Headers(request.headers);
    headers.set(RETURN_TO_HEADER, target);
    return NextResponse.next({ request: { headers } });
  }
  return NextResponse.redirect(new URL(signInPath(target), request.url));
}

export const config = {
  matcher: ["/((?!api/|_next/|.*\\..*).*)"],
};
