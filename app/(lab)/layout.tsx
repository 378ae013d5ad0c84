import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { requirePageActor } from "@/lib/auth/page-guard";
import { outboxEnabled } from "@/lib/mailbox/service";
import { STAFF_ROLES } from "@/lib/users/rules";

// Lab staff pages. The real checks are in each service; this keeps manufacturers and visitors out.
export default async function LabLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor(STAFF_ROLES);
  return (
    <AppShell user={actor} devTools={outboxEnabled()}>
      {children}
    </AppShell>
  );
}
