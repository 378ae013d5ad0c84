import { requirePageActor } from "@/lib/auth/page-guard";
import { STAFF_ROLES } from "@/lib/users/rules";
import { ClipDetail } from "./_components/clip-detail";

export const metadata = { title: "Clip" };

export default async function ClipPage({ params }: { params: Promise<{ id: string }> }) {
  await requirePageActor(STAFF_ROLES);
  const { id } = await params;
  return <ClipDetail id={id} />;
}
