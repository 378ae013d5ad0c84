import { requirePageActor } from "@/lib/auth/page-guard";
import { canEditIntake } from "@/lib/submissions/policy";
import { hasRole, STAFF_ROLES } from "@/lib/users/rules";
import { RunDetail } from "./_components/run-detail";

export const metadata = { title: "Run" };

export default async function RunPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor(STAFF_ROLES);
  const { id } = await params;
  return <RunDetail id={id} canEdit={canEditIntake(actor)} isLead={hasRole(actor, "lead")} isReviewer={hasRole(actor, "reviewer")} />;
}
