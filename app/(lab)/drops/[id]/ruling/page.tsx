import { requirePageActor } from "@/lib/auth/page-guard";
import { RulingDesk } from "./_components/ruling-desk";

export const metadata = { title: "Ruling" };

export default async function RulingPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor(["lead"]);
  const { id } = await params;
  return <RulingDesk id={id} actorId={actor.id} />;
}
