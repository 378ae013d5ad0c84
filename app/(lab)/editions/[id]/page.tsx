import Link from "next/link";
import { requirePageActor } from "@/lib/auth/page-guard";
import { hasRole, STAFF_ROLES } from "@/lib/users/rules";
import { EditionCaution } from "../_components/edition-caution";
import { EditionDetail } from "../_components/edition-detail";

export const metadata = { title: "Specification edition" };

export default async function EditionPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor(STAFF_ROLES);
  const { id } = await params;
  return (
    <div className="space-y-6">
      <p>
        <Link href="/editions" className="text-sm font-semibold text-wick-700 underline">
          Back to editions
        </Link>
      </p>
      <EditionDetail id={id} isLead={hasRole(actor, "lead")} />
      <EditionCaution />
    </div>
  );
}
