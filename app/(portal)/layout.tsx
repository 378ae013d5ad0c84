import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { requirePageActor } from "@/lib/auth/page-guard";

// The manufacturer's portal: only accounts holding the manufacturer role.
export default async function PortalLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor(["manufacturer"]);
  return (
    <AppShell user={actor} devTools={false}>
      {children}
    </AppShell>
  );
}
