import { requirePageActor } from "@/lib/auth/page-guard";
import { InviteForm } from "./_components/invite-form";
import { UsersTable } from "./_components/users-table";

export const metadata = { title: "Users" };

export default async function UsersPage() {
  const actor = await requirePageActor(["lead"]);
  return (
    <div className="space-y-8">
      <h1 className="text-3xl font-bold">Users</h1>
      <InviteForm />
      <UsersTable selfId={actor.id} />
    </div>
  );
}
