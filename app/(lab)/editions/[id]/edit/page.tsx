import Link from "next/link";
import { requirePageActor } from "@/lib/auth/page-guard";
import { EditionCaution } from "../../_components/edition-caution";
import { EditionFormLoader } from "../../_components/edition-form-loader";

export const metadata = { title: "Correct edition" };

export default async function EditEditionPage({ params }: { params: Promise<{ id: string }> }) {
  await requirePageActor(["lead"]);
  const { id } = await params;
  return (
    <div className="space-y-6">
      <div>
        <Link href={`/editions/${id}`} className="text-sm font-semibold text-wick-700 underline">
          Back to the edition
        </Link>
        <h1 className="mt-2 text-3xl font-bold">Correct an edition</h1>
        <p className="mt-1 text-ink-600">Only an edition that no submission uses yet can be corrected.</p>
      </div>
      <EditionCaution />
      <EditionFormLoader mode="edit" id={id} />
    </div>
  );
}
