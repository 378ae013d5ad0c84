import { requirePageActor } from "@/lib/auth/page-guard";
import { hasRole, STAFF_ROLES } from "@/lib/users/rules";
import { ReadingRoom } from "./_components/reading-room";

export const metadata = { title: "Drop" };

export default async function DropPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor(STAFF_ROLES);
  const { id } = await params;
  return <ReadingRoom id={id} canRead={hasRole(actor, "reviewer")} />;
}
