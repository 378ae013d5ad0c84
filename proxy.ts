import { NextResponse, type NextRequest } from "next/server";

// Convenience only: send visitors without a session cookie to sign-in, remembering where they were
// going. The real checks are in the layouts and in every service.
const SESSION_COOKIES = ["next-auth.session-token", "__Secure-next-auth.session-token"];

export function proxy(request: NextRequest) {
  if (SESSION_COOKIES.some((c) => request.cookies.has(c))) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?next=${encodeURIComponent(request.nextUrl.pathname)}`;
  return NextResponse.redirect(url);
}

export const config = {
  matcher: [
    "/overview/:path*",
    "/submissions/:path*",
    "/samples/:path*",
    "/runs/:path*",
    "/editions/:path*",
    "/organisations/:path*",
    "/users/:path*",
    "/outbox/:path*",
    "/portal/:path*",
    "/account/:path*",
    "/mail/:path*",
  ],
};
