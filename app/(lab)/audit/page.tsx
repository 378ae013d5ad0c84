import { requirePageActor } from "@/lib/auth/page-guard";
import { FILTER_KEYS, type AuditFilters } from "@/lib/audit/filters";
import { AuditView } from "./_components/audit-view";

export const metadata = { title: "Audit" };

export default async function AuditPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageActor(["lead"]);
  const sp = await searchParams;
  const filters: AuditFilters = {};
  for (const k of FILTER_KEYS) {
    const v = sp[k];
    const one = Array.isArray(v) ? v[0] : v;
    if (one) filters[k] = one;
  }
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Audit</h1>
        <p className="mt-1 max-w-3xl text-ink-600">
          Every change to the lab&apos;s records, every sign-in and every sign-off, newest first, with what the record held before and after. The log cannot be
          edited or deleted.
        </p>
      </div>
      <AuditView filters={filters} />
    </div>
  );
}
