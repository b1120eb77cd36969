import { useSearchParams } from "react-router-dom";
import type { AuditQuery } from "@shared/api/audit.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { Pager } from "@/components/ui/pager.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { useAuditPage } from "../api/get-audit-page.ts";
import { AUDIT_PAGE_SIZES, auditQueryFromSearch, filtersOf, searchFromAuditQuery, withFilters } from "../audit-search-params.ts";
import { AuditFilters } from "./audit-filters.tsx";
import { AuditTable } from "./audit-table.tsx";
import { ChainStatus } from "./chain-status.tsx";
import { AuditExportLink } from "./audit-export-link.tsx";
import { ScheduledCheck } from "./scheduled-check.tsx";

export function AuditPage() {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = auditQueryFromSearch(searchParams);
  const auditPage = useAuditPage(query);
  const go = (next: AuditQuery) => setSearchParams(searchFromAuditQuery(next));
  const filterKey = searchFromAuditQuery({ ...query, page: 1 }).toString();

  return (
    <>
      <PageHeader
        title="Audit trail"
        description="Every change made in Bellwether, who made it and when. Entries are chained by hash, so an edit made behind the application's back shows up as a break."
        actions={<AuditExportLink query={query} />}
      />
      <SectionBoundary label="the chain status">
        <ChainStatus />
        <ScheduledCheck />
      </SectionBoundary>
      {/* Re-mount the form when the URL's filters change (back button, shared link). */}
      <AuditFilters key={filterKey} value={filtersOf(query)} onApply={(filters) => go(withFilters(query, filters))} />
      <SectionBoundary label="the audit entries" resetKey={searchParams.toString()}>
        {auditPage.isPending && <Loading label="Loading entries…" />}
        {auditPage.isError && (
          <Notice tone="danger" title="Could not load the audit trail">
            {describeError(auditPage.error).message}
          </Notice>
        )}
        {auditPage.data && (
          <>
            <AuditTable key={`${query.page}:${filterKey}`} entries={auditPage.data.entries} />
            <Pager
              page={query.page}
              pageSize={query.pageSize}
              total={auditPage.data.total}
              pageSizes={AUDIT_PAGE_SIZES}
              busy={auditPage.isPlaceholderData}
              onPageChange={(page) => go({ ...query, page })}
              onPageSizeChange={(pageSize) => go({ ...query, pageSize, page: 1 })}
            />
          </>
        )}
      </SectionBoundary>
    </>
  );
}
