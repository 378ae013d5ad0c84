import Link from "next/link";
import { DetailList } from "@/components/ui/detail-list";
import { requirePageActor } from "@/lib/auth/page-guard";
import { hasRole, ROLE_LABELS } from "@/lib/users/rules";
import { NotificationSettings } from "./_components/notification-settings";

export const metadata = { title: "Your account" };

// Every signed-in person's own page: who they are here, and which e-mails they get.
export default async function AccountPage() {
  const actor = await requirePageActor();
  const items = [
    { label: "Name", value: actor.name },
    { label: "E-mail", value: actor.email },
    { label: "Roles", value: actor.roles.map((r) => ROLE_LABELS[r]).join(", ") },
  ];
  return (
    <div className="max-w-3xl space-y-8">
      <div className="space-y-4">
        <h1 className="text-3xl font-bold">Your account</h1>
        <DetailList items={items} wide />
        <p className="text-sm text-ink-600">A lead changes names and roles on the Users page.</p>
      </div>
      <NotificationSettings />
      {hasRole(actor, "lead") && (
        <section aria-labelledby="lab-mail-heading" className="space-y-2">
          <h2 id="lab-mail-heading" className="text-xl font-semibold">
            The lab&apos;s mail
          </h2>
          <p className="text-ink-800">
            <Link href="/mail" className="font-semibold text-wick-700 underline">
              Sent mail
            </Link>{" "}
            lists every notice the lab has sent or is still trying to send, with its delivery state, attempts and the last error.
          </p>
        </section>
      )}
    </div>
  );
}
