import { useState, type FormEvent } from "react";
import type { CompareQuery, MatchingOptionsDto } from "@shared/api/verification.ts";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { SelectField } from "@/components/ui/select-field.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatUtcCycle, formatUtcDateTime } from "@/lib/time.ts";
import { useRuleVersions } from "../api/get-filter-options.ts";
import { useVersionComparison } from "../api/get-verification.ts";
import { PerformanceDiagram } from "../charts/performance-diagram.tsx";
import { formatMinutes, formatScore } from "../format-verification.ts";

const SERIES = [
  { colour: "var(--bw-accent)", shape: "circle" as const },
  { colour: "var(--bw-focus)", shape: "diamond" as const },
];

/**
 * Two versions of one rule run over the same newest stored runs (nobody is notified) and scored
 * against the same reports, so a lead sees what a change would have done before switching.
 */
export function VersionComparePanel({ ruleId, options }: { ruleId: number; options: MatchingOptionsDto }) {
  const versions = useRuleVersions(ruleId);
  const [pick, setPick] = useState<{ a: string; b: string; runs: string }>({ a: "", b: "", runs: "3" });
  const [query, setQuery] = useState<CompareQuery | null>(null);
  const [error, setError] = useState<string | null>(null);
  const comparison = useVersionComparison(query);
  const list = versions.data ?? [];
  const a = pick.a || (list[1] ? String(list[1].id) : "");
  const b = pick.b || (list[0] ? String(list[0].id) : "");

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const runs = Number(pick.runs);
    if (!a || !b || a === b) return setError("Pick two different versions.");
    if (!(Number.isInteger(runs) && runs >= 1 && runs <= 20)) return setError("Runs is a whole number from 1 to 20.");
    setError(null);
    setQuery({ ruleId, versionA: Number(a), versionB: Number(b), runs, ...options });
  };

  return (
    <Panel title="Compare two versions over the same stored frames and reports">
      {list.length < 2 ? (
        <p className="text-muted">This rule has one version only; save an edit of it to compare.</p>
      ) : (
        <form onSubmit={submit} aria-label="Version comparison" className="mb-3 flex flex-wrap items-end gap-3">
          <SelectField label="Version A" value={a} onChange={(e) => setPick((p) => ({ ...p, a: e.target.value }))}>
            {list.map((v) => (
              <option key={v.id} value={v.id}>
                v{v.version} — {v.definition.expression}
              </option>
            ))}
          </SelectField>
          <SelectField label="Version B" value={b} onChange={(e) => setPick((p) => ({ ...p, b: e.target.value }))}>
            {list.map((v) => (
              <option key={v.id} value={v.id}>
                v{v.version} — {v.definition.expression}
              </option>
            ))}
          </SelectField>
          <TextField label="Newest runs" type="number" min={1} max={20} className="w-28" value={pick.runs} onChange={(e) => setPick((p) => ({ ...p, runs: e.target.value }))} error={error ?? undefined} />
          <Button type="submit" variant="primary" size="sm" disabled={comparison.isFetching}>
            {comparison.isFetching ? "Simulating…" : "Compare"}
          </Button>
        </form>
      )}
      {comparison.isFetching && <Loading label="Evaluating both versions on every stored frame…" />}
      {comparison.isError && (
        <Notice tone="danger" title="Could not compare">
          {describeError(comparison.error).message}
        </Notice>
      )}
      {comparison.data && !comparison.isFetching && (
        <div className="flex flex-col gap-3" data-testid="comparison-result">
          <p className="text-xs text-muted">
            Simulated over {comparison.data.frames} stored frames of {comparison.data.runs.map((r) => `${r.model} ${formatUtcCycle(r.runTime)}`).join(", ") || "no run"}; nobody was
            notified. Scored against {comparison.data.reports.length} reports
            {comparison.data.from && comparison.data.to ? ` from ${formatUtcDateTime(comparison.data.from)} to ${formatUtcDateTime(comparison.data.to)}` : ""}. A simulated trigger opens
            when its frame was stored (for a run loaded long after its time, at the run time).
          </p>
          <div className="overflow-x-auto rounded-md border border-line">
            <table className="w-full text-left" aria-label="Versions compared">
              <thead className="border-b border-line bg-raised text-xs text-muted">
                <tr>
                  {["Version", "Expression", "Would open", "Verified", "False alarms", "Detected", "Missed", "POD", "FAR", "CSI", "Bias", "Median lead"].map((h) => (
                    <th key={h} scope="col" className="px-3 py-2 font-medium whitespace-nowrap">
                      {h}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {comparison.data.versions.map((v) => (
                  <tr key={v.versionId} data-version={v.version} className="border-b border-line">
                    <th scope="row" className="px-3 py-1.5 font-medium">
                      v{v.version}
                    </th>
                    <td className="px-3 py-1.5 font-mono text-xs">{v.expression}</td>
                    {[v.triggers.length, v.counts.verifiedTriggers, v.counts.falseAlarms, v.counts.detectedReports, v.counts.misses].map((n, k) => (
                      <td key={k} className="px-3 py-1.5 font-mono text-xs tabular-nums">
                        {n}
                      </td>
                    ))}
                    {[v.scores.pod, v.scores.far, v.scores.csi, v.scores.bias].map((s, k) => (
                      <td key={`s${k}`} className="px-3 py-1.5 font-mono text-xs tabular-nums">
                        {formatScore(s)}
                      </td>
                    ))}
                    <td className="px-3 py-1.5 font-mono text-xs tabular-nums">{formatMinutes(v.leadTime.median)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <PerformanceDiagram
            title="Versions compared"
            points={comparison.data.versions.map((v, k) => ({ id: `v${v.versionId}`, label: `v${v.version}`, successRatio: v.scores.successRatio, pod: v.scores.pod, ...SERIES[k % SERIES.length]! }))}
          />
        </div>
      )}
    </Panel>
  );
}
