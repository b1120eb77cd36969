import { useMemo } from "react";
import { useSearchParams } from "react-router-dom";
import { can } from "@shared/auth/permissions.ts";
import type { VerificationDto, VerificationQuery } from "@shared/api/verification.ts";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { useSignedInUser } from "@/lib/auth.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatUtcDateTime } from "@/lib/time.ts";
import { useVerification } from "../api/get-verification.ts";
import { LeadTimeHistogram } from "../charts/lead-time-histogram.tsx";
import { PerformanceDiagram } from "../charts/performance-diagram.tsx";
import { diagramPoints } from "../charts/diagram-points.ts";
import { ReportMap, type MapZone } from "../charts/report-map.tsx";
import { searchFromVerificationQuery, verificationQueryFromSearch } from "../verification-search-params.ts";
import { MatchedReportsTable } from "./matched-reports-table.tsx";
import { ScoresTable } from "./scores-table.tsx";
import { StormReportUpload } from "./storm-report-upload.tsx";
import { VerificationFilters } from "./verification-filters.tsx";
import { VersionComparePanel } from "./version-compare-panel.tsx";

function zoneStatus(result: VerificationDto): MapZone[] {
  return result.zones.map((z) => {
    const own = result.triggers.filter((t) => t.zoneId === z.id);
    return { id: z.id, code: z.code, geometry: z.geometry, status: own.some((t) => t.verified) ? "verified" : own.length > 0 ? "false-alarm" : "quiet" };
  });
}

/** Scores of rules against storm reports, with the charts, the map, each report's outcome, version comparison and report upload. */
export function VerificationPage() {
  const user = useSignedInUser();
  const [searchParams, setSearchParams] = useSearchParams();
  const now = useMemo(() => new Date(), []);
  const query = verificationQueryFromSearch(searchParams, now);
  const result = useVerification(query);
  const key = searchFromVerificationQuery(query).toString();
  const apply = (next: VerificationQuery) => setSearchParams(searchFromVerificationQuery(next));
  const data = result.data;
  const overallLabel = data && query.ruleVersionId ? (data.byVersion[0] ? `${data.byVersion[0].ruleName} v${data.byVersion[0].version}` : "This version") : query.ruleId ? (data?.byRule[0]?.ruleName ?? "This rule") : "Every rule together";
  const invented = data?.reports.some((r) => r.invented) ?? false;

  return (
    <>
      <PageHeader
        title="Rule verification"
        description="How well the rules' triggers matched observed storm reports: hits, misses and false alarms, the standard scores (Wilks 2011), lead times, and a performance diagram (Roebber 2009)."
      />
      <VerificationFilters key={key} value={query} onApply={apply} />
      <SectionBoundary label="the verification" resetKey={key}>
        {result.isPending && <Loading label="Matching triggers and reports…" />}
        {result.isError && (
          <Notice tone="danger" title="Could not score">
            {describeError(result.error).message}
          </Notice>
        )}
        {data && (
          <div className="flex flex-col gap-4" data-testid="verification-result">
            <p className="text-xs text-muted">
              Triggers whose valid times overlap {formatUtcDateTime(data.from)} – {formatUtcDateTime(data.to)}; reports in that period inside the rules' zones
              {data.options.distanceKm > 0 ? ` or within ${data.options.distanceKm} km` : ""}; a report counts for a trigger from its opening until {data.options.windowHours} h after its
              last valid time ({data.options.space === "zone" ? "inside its zone" : "near the area where its rule matched"}).
            </p>
            {invented && (
              <Notice tone="caution" title="Invented demo reports">
                The storm reports of the demo office are made up for the demonstration; they are not observations.
              </Notice>
            )}
            <ScoresTable result={data} overallLabel={overallLabel} />
            <div className="grid gap-4 xl:grid-cols-2">
              <Panel title="Performance diagram">
                <PerformanceDiagram title="Performance of the selection" points={diagramPoints(data, overallLabel)} />
              </Panel>
              <Panel title="Lead time">
                <LeadTimeHistogram title="Lead time of detected reports" minutes={data.overall.leadTime.minutes} median={data.overall.leadTime.median} p90={data.overall.leadTime.p90} />
              </Panel>
            </div>
            <Panel title="Map of zones and reports">
              <ReportMap title="Scored zones and storm reports" zones={zoneStatus(data)} reports={data.reports} />
            </Panel>
            <section aria-labelledby="scored-reports-title" className="flex flex-col gap-2">
              <h2 id="scored-reports-title" className="text-sm font-semibold">
                Storm reports and their outcome
              </h2>
              <MatchedReportsTable reports={data.reports} />
            </section>
            {query.ruleId && can(user.roles, "verification.compare") && <VersionComparePanel ruleId={query.ruleId} options={data.options} />}
          </div>
        )}
      </SectionBoundary>
      {can(user.roles, "reports.upload") && (
        <div className="mt-4">
          <StormReportUpload />
        </div>
      )}
    </>
  );
}
