import { Caution } from "@/components/shell/caution";
import { requirePageActor } from "@/lib/auth/page-guard";
import { AgreementView } from "./_components/agreement-view";

export const metadata = { title: "Reviewer agreement" };

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function AgreementPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageActor(["lead"]);
  const sp = await searchParams;
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-3xl font-bold">Reviewer agreement</h1>
        <p className="mt-1 max-w-3xl text-ink-600">
          How closely the two blind readings of the same drops agree, over the drops whose second reading was submitted in the period. Drops still being read
          are not counted.
        </p>
      </div>
      <Caution />
      <AgreementView from={one(sp.from)} to={one(sp.to)} />
    </div>
  );
}
