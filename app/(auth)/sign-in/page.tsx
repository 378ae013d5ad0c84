import { redirect } from "next/navigation";
import { homeFor } from "@/lib/auth/page-guard";
import { safeReturnPath } from "@/lib/auth/return-to";
import { currentActor } from "@/lib/auth/session";
import { SignInForm } from "./_components/sign-in-form";

export const metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; email?: string }> }) {
  const actor = await currentActor();
  if (actor) redirect(homeFor(actor));
  const { next, email } = await searchParams;
  const safeNext = safeReturnPath(next) ?? "/";
  return (
    <>
      <h1 className="mb-4 text-2xl font-bold">Sign in</h1>
      <SignInForm next={safeNext} email={email ?? ""} />
    </>
  );
}
