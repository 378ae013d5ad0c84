// Where a visitor was going when asked to sign in: the proxy passes each page's path and query to
// the layouts in this request header, and sign-in takes it back as `next`.
export const RETURN_TO_HEADER = "x-wickmark-return-to";

/** Only same-site paths: an open redirect would let a link send people elsewhere after sign-in. */
export function safeReturnPath(next: string | null | undefined): string | null {
  return next?.startsWith("/") && !next.startsWith("//") && !next.startsWith("/\\") ? next : null;
}

/** The sign-in page, remembering the page to return to. */
export function signInPath(returnTo: string | null | undefined): string {
  const to = safeReturnPath(returnTo);
  return to ? `/sign-in?next=${encodeURIComponent(to)}` : "/sign-in";
}
