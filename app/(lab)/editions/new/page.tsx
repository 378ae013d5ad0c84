import { UUID_PATTERN } from "@/lib/schema-parts";
import Link from "next/link";
import { requirePageActor } from "@/lib/auth/page-guard";
import { EditionCaution } from "../_components/edition-caution";
import { EditionFormLoader } from "../_components/edition-form-loader";

export const metadata = { title: "New edition" };

export default async function NewEditionPage({ searchParams }: { searchParams: Promise<{ from?: string }> }) {
  await requirePageActor(["lead"]);
  const { from } = await searchParams;
  return (
    <div className="space-y-6">
      <div>
        <Link href="/editions" className="text-sm font-semibold text-wick-700 underline">
          Back to editions
        </Link>
        <h1 className="mt-2 text-3xl font-bold">New specification edition</h1>
      </div>
      <EditionCaution />
      <EditionFormLoader mode="new" id={from && UUID_PATTERN.test(from) ? from : null} />
    </div>
  );
}
