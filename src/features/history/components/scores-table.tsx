import type { ScoreRowDto, VerificationDto } from "@shared/api/verification.ts";
import { formatMinutes, formatScore } from "../format-verification.ts";

type Row = Omit<ScoreRowDto, "ruleId" | "ruleName" | "versionId" | "version">;

const HEADERS = ["Triggers", "Reports", "Verified triggers", "False alarms", "Detected reports", "Missed reports", "POD", "FAR", "CSI", "Bias", "Median lead", "90th pct lead"];

function Cells({ row }: { row: Row }) {
  const values = [
    row.triggers,
    row.reports,
    row.counts.verifiedTriggers,
    row.counts.falseAlarms,
    row.counts.detectedReports,
    row.counts.misses,
    formatScore(row.scores.pod),
    formatScore(row.scores.far),
    formatScore(row.scores.csi),
    formatScore(row.scores.bias),
    formatMinutes(row.leadTime.median),
    formatMinutes(row.leadTime.p90),
  ];
  return (
    <>
      {values.map((v, k) => (
        <td key={HEADERS[k]} data-column={HEADERS[k]} className="px-3 py-1.5 text-right font-mono text-xs tabular-nums">
          {v}
        </td>
      ))}
    </>
  );
}

/**
 * Counts and scores of the selection, per rule and per version. POD and misses count reports,
 * FAR and false alarms count triggers; CSI follows from POD and the success ratio (Roebber 2009),
 * bias is triggers per report (Wilks 2011, §8.2).
 */
export function ScoresTable({ result, overallLabel }: { result: VerificationDto; overallLabel: string }) {
  const rows: Array<{ key: string; label: string; group: string; row: Row }> = [
    { key: "overall", label: overallLabel, group: "Selection", row: result.overall },
    ...result.byRule.map((r) => ({ key: `rule-${r.ruleId}`, label: r.ruleName, group: "Rule", row: r })),
    ...result.byVersion.map((r) => ({ key: `version-${r.versionId}`, label: `${r.ruleName} v${r.version}`, group: "Version", row: r })),
  ];
  return (
    <div className="overflow-x-auto rounded-md border border-line bg-surface">
      <table className="w-full text-left" aria-label="Verification scores">
        <thead className="border-b border-line bg-raised text-xs text-muted">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Scored
            </th>
            {HEADERS.map((h) => (
              <th key={h} scope="col" className="px-3 py-2 text-right font-medium whitespace-nowrap">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map(({ key, label, group, row }) => (
            <tr key={key} data-row={key} className={`border-b border-line ${group === "Selection" ? "font-semibold" : ""}`}>
              <th scope="row" className="px-3 py-1.5 font-normal whitespace-nowrap">
                <span className="mr-1.5 text-xs text-muted">{group}</span>
                {label}
              </th>
              <Cells row={row} />
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
