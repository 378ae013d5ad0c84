import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { AppError } from "@/lib/errors";
import { describeInvite } from "@/lib/users/invites";
import { AcceptInviteForm } from "./_components/accept-invite-form";

export const metadata = { title: "Accept invitation" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let invite: { email: string; name: string };
  try {
    invite = await describeInvite(token);
  } catch (err) {
    if (!(err instanceof AppError)) throw err;
    return (
      <div className="space-y-4">
        <h1 className="text-2xl font-bold">Invitation</h1>
        <Notice tone="error">{err.message}</Notice>
        <Link href="/sign-in" className="font-semibold text-wick-700 underline">
          Go to sign-in
        </Link>
      </div>
    );
  }
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Welcome, {invite.name}</h1>
      <p className="text-sm text-ink-600">
        Choose a password for <span className="font-semibold">{invite.email}</span>. It must be at least 10 characters.
      </p>
      <AcceptInviteForm token={token} email={invite.email} />
    </div>
  );
}
