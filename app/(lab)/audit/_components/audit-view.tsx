"use client";

import { usePathname, useRouter } from "next/navigation";
import { auditSearch, useAudit, type AuditFilters } from "@/lib/audit/hooks";
import { apiError } from "@/components/ui/form-errors";
import { Notice } from "@/components/ui/notice";
import { Pager } from "@/components/ui/pager";
import { AuditEvent } from "./audit-event";
import { AuditFiltersForm } from "./audit-filters";

/** The filters live in the address, so a reload or a shared link shows the same events. */
export function AuditView({ filters }: { filters: AuditFilters }) {
  const router = useRouter();
  const pathname = usePathname();
  const q = useAudit(filters);
  const err = apiError(q.error);
  const go = (f: AuditFilters) => {
    const search = auditSearch(f);
    router.replace(search ? `${pathname}?${search}` : pathname, { scroll: false });
  };
  const data = q.isError ? undefined : q.data;
  return (
    <div className="space-y-6">
      <AuditFiltersForm filters={filters} errors={err?.fields ?? {}} busy={q.isFetching} onApply={(f) => go({ ...f, pageSize: filters.pageSize })} />
      {q.isPending && (
        <p className="text-ink-600" role="status">
          Loading the events…
        </p>
      )}
      {q.isError && <Notice tone="error">{q.error.message}</Notice>}
      {data && (
        <>
          {data.total === 0 && <p className="text-ink-600">No events match these filters.</p>}
          <ol className="space-y-3" aria-label="Events, newest first">
            {data.events.map((e) => (
              <AuditEvent key={e.id} e={e} onRecord={(entity, entityId) => go({ entity, entityId, pageSize: filters.pageSize })} />
            ))}
          </ol>
          {data.total > 0 && (
            <Pager
              label="Pages of events"
              page={data.page}
              pageSize={data.pageSize}
              total={data.total}
              onPage={(p) => go({ ...filters, page: String(p) })}
              onPageSize={(n) => go({ ...filters, page: undefined, pageSize: String(n) })}
            />
          )}
        </>
      )}
    </div>
  );
}
