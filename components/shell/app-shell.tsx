import Link from "next/link";
import type { ReactNode } from "react";
import { ROLE_LABELS, type Role } from "@/lib/users/rules";
import { Caution } from "./caution";
import { Logo } from "./logo";
import { navFor } from "./nav-items";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";

interface ShellUser {
  name: string;
  roles: Role[];
}

/** The signed-in frame: brand bar with role-based navigation, content, and the standing caution. */
export function AppShell({ user, devTools, children }: { user: ShellUser; devTools: boolean; children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-paper focus:p-2">
        Skip to content
      </a>
      <header className="bg-ink-900 text-ink-50">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3">
          <Link href="/" className="flex items-center gap-2 text-lg font-bold tracking-tight">
            <Logo /> Wickmark
          </Link>
          <nav aria-label="Main" className="flex-1">
            <NavLinks items={navFor(user.roles, devTools)} />
          </nav>
          <div className="flex items-center gap-3 text-sm">
            {/* Name over roles, so a lead with several roles leaves the navigation room for one line. */}
            {/* The name opens the person's own account page (notices, details). */}
            <Link
              href="/account"
              aria-label={`Your account: ${user.name}`}
              title="Your account"
              className="flex flex-col items-end rounded-md px-1 leading-tight hover:bg-ink-800"
            >
              <span className="font-semibold underline decoration-ink-600 underline-offset-2">{user.name}</span>
              <span className="text-xs text-ink-200">{user.roles.map((r) => ROLE_LABELS[r]).join(" · ")}</span>
            </Link>
            <SignOutButton />
          </div>
        </div>
        <div className="h-1 bg-gradient-to-r from-wick-500 via-wick-300 to-ink-600" />
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-8">
        {children}
      </main>
      <footer className="border-t border-ink-100 bg-ink-50">
        <div className="mx-auto max-w-6xl px-4 py-4">
          <Caution compact />
        </div>
      </footer>
    </div>
  );
}
