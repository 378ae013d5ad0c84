import { requirePageActor } from "@/lib/auth/page-guard";
import { ROLE_LABELS, STAFF_ROLES, type Role } from "@/lib/users/rules";
import { QueueCount } from "./_components/queue-count";

export const metadata = { title: "Overview" };

const DUTIES: Partial<Record<Role, string[]>> = {
  technician: ["Log submissions and sample balls", "Record test conditions for each run", "Upload drop recordings"],
  reviewer: ["Mark the dispense and clear frames of each drop", "Give blind second readings of other reviewers' drops"],
  lead: ["Rule on discrepancies between readings", "Sign results off and release reports", "Manage users and specification editions"],
};

export default async function OverviewPage() {
  const actor = await requirePageActor(STAFF_ROLES);
  const roles = actor.roles.filter((r) => DUTIES[r]);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Overview</h1>
        <p className="mt-1 text-ink-600">Signed in as {actor.name}. What your roles let you do:</p>
      </div>
      <div className="grid gap-4 md:grid-cols-3">
        {roles.map((role) => (
          <section key={role} className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
            <h2 className="text-sm font-semibold uppercase tracking-wide text-wick-700">As {ROLE_LABELS[role].toLowerCase()}</h2>
            <ul className="mt-3 list-disc space-y-1 pl-5 text-ink-800">
              {DUTIES[role]!.map((d) => (
                <li key={d}>{d}</li>
              ))}
            </ul>
            {role === "reviewer" && <QueueCount />}
          </section>
        ))}
      </div>
    </div>
  );
}
