"use client";

import { Notice } from "@/components/ui/notice";
import { useOrganisationList } from "@/lib/organisations/hooks";
import { OrganisationRow } from "./organisation-row";

export function OrganisationsTable() {
  const q = useOrganisationList();
  if (q.isPending)
    return (
      <p className="text-ink-600" role="status">
        Loading organisations…
      </p>
    );
  if (q.isError) return <Notice tone="error">{q.error.message}</Notice>;
  return (
    <div className="overflow-x-auto rounded-lg border border-ink-100 bg-white shadow-sm">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Manufacturers and their contact addresses</caption>
        <thead className="bg-ink-50 text-ink-600">
          <tr>
            <th scope="col" className="px-3 py-2">
              Organisation
            </th>
            <th scope="col" className="px-3 py-2">
              Contact e-mails
            </th>
            <th scope="col" className="px-3 py-2">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {q.data.map((o) => (
            <OrganisationRow key={o.id} organisation={o} />
          ))}
          {q.data.length === 0 && (
            <tr>
              <td colSpan={3} className="px-3 py-6 text-center text-ink-600">
                No organisations yet.
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </div>
  );
}
