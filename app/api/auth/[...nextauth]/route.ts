import type { NextRequest } from "next/server";
import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";

// next-auth's own endpoints (sign-in, session, CSRF, sign-out); credentials are checked in lib/auth.
const handler = (req: NextRequest, ctx: { params: Promise<{ nextauth: string[] }> }) => NextAuth(req, ctx, authOptions());

export { handler as GET, handler as POST };
