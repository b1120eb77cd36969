import { Link, useSearchParams } from "react-router-dom";
import { MAX_HISTORY_TRIGGERS, type HistoryFilters as Filters } from "@shared/api/history.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { paths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { triggerHistoryCsvUrl, useTriggerHistory } from "../api/get-trigger-history.ts";
import { historyFiltersFromSearch, searchFromHistoryFilters } from "../history-search-params.ts";
import { HistoryFilters } from "./history-filters.tsx";
import { HistorySummary } from "./history-summary.tsx";
import { HistoryTable } from "./history-table.tsx";

const LINK_BUTTON = "inline-flex h-7 items-center rounded border border-line bg-raised px-2.5 text-xs font-medium text-ink hover:border-muted";

/** The alert history for managers: filters, the review's figures, every trigger, CSV and a printable report. */
export function HistoryPage() {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = historyFiltersFromSearch(searchParams);
  const history = useTriggerHistory({ ...filters, limit: MAX_HISTORY_TRIGGERS });
  const search = searchFromHistoryFilters(filters).toString();
  const apply = (next: Filters) => setSearchParams(searchFromHistoryFilters(next));

  return (
    <>
      <PageHeader
        title="Alert history"
        description="What fired, who was told, and how fast someone acknowledged. Filter, sort, open a trigger's story, and export the same set."
        actions={
          <>
            <a href={triggerHistoryCsvUrl(filters)} download className={LINK_BUTTON}>
              Export CSV
            </a>
            <Link to={`${paths.historyReport}${search ? `?${search}` : ""}`} className={LINK_BUTTON}>
              Printable event report
            </Link>
            <Link to={paths.verification} className={LINK_BUTTON}>
              Verification
            </Link>
          </>
        }
      />
      <HistoryFilters key={search} value={filters} acknowledgers={history.data?.acknowledgers ?? []} onApply={apply} />
      <SectionBoundary label="the alert history" resetKey={search}>
        {history.isPending && <Loading label="Loading the history…" />}
        {history.isError && (
          <Notice tone="danger" title="Could not load the history">
            {describeError(history.error).message}
          </Notice>
        )}
        {history.data && (
          <>
            {history.data.truncated && (
              <div className="mb-3">
                <Notice tone="caution" title={`Only the newest ${MAX_HISTORY_TRIGGERS.toLocaleString("en-US")} triggers are shown`}>
                  Narrow the period or the filters; the figures cover the triggers shown.
                </Notice>
              </div>
            )}
            <HistorySummary summary={history.data.summary} />
            <HistoryTable triggers={history.data.triggers} />
          </>
        )}
      </SectionBoundary>
    </>
  );
}
