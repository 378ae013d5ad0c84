"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => void signOut({ callbackUrl: "/sign-in" })}
      className="rounded-md border border-ink-200 px-3 py-1.5 text-sm text-ink-50 hover:bg-ink-800"
    >
      Sign out
    </button>
  );
}
