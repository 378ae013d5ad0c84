import Link from "next/link";
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { Logo } from "@/components/shell/logo";
import { currentActor } from "@/lib/auth/session";
import { outboxEnabled } from "@/lib/mailbox/service";
import { isStaff } from "@/lib/users/rules";

// Pages anyone may read; signed-in people keep their navigation.
export default async function SharedLayout({ children }: { children: ReactNode }) {
  const actor = await currentActor();
  if (actor)
    return (
      <AppShell user={actor} devTools={isStaff(actor) && outboxEnabled()}>
        {children}
      </AppShell>
    );
  return (
    <div className="min-h-screen">
      <header className="bg-ink-900 text-ink-50">
        <div className="mx-auto flex max-w-6xl items-center justify-between px-4 py-3">
          <span className="flex items-center gap-2 text-lg font-bold">
            <Logo /> Wickmark
          </span>
          <Link href="/sign-in" className="text-sm font-semibold underline">
            Sign in
          </Link>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-3xl px-4 py-8">
        {children}
      </main>
    </div>
  );
}
