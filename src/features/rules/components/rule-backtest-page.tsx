import { useMemo, useState } from "react";
import { Link } from "react-router-dom";
import { backtestInput, type RuleDefinition } from "@shared/api/rules.ts";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { SelectField } from "@/components/ui/select-field.tsx";
import { rulePaths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { formatUtcCycle, formatUtcDateTime } from "@/lib/time.ts";
import { useBacktestRule } from "../api/backtest-rule.ts";
import { useRule } from "../api/get-rule.ts";
import { useRuleVersions } from "../api/get-rule-versions.ts";
import type { BacktestDto } from "../api/rule-map-dtos.ts";
import { BacktestFrameCard } from "../backtest/backtest-frame-card.tsx";
import { NumberField } from "../editor/number-field.tsx";
import type { ZoneOption } from "../editor/rule-editor-types.ts";
import { describeCoolDown, describePersistence } from "../rule-descriptions.ts";

/** A rule version run over the stored frames of the last N runs, notifying nobody. */
export function RuleBacktestPage({ ruleId, zones }: { ruleId: number; zones: readonly ZoneOption[] }) {
  const rule = useRule(ruleId);
  const versions = useRuleVersions(ruleId);
  const backtest = useBacktestRule();
  const [versionId, setVersionId] = useState<number | null>(null);
  const [runs, setRuns] = useState(3);
  const chosen = versionId ?? rule.data?.current.id ?? null;
  const parsed = backtestInput.safeParse({ versionId: chosen ?? undefined, runs });

  return (
    <>
      <PageHeader
        title={rule.data ? `Backtest of ${rule.data.name}` : "Backtest"}
        description="Runs a saved version over the frames already stored, with persistence and cool-down applied as the live engine would. Nobody is notified."
        actions={
          <Link to={rulePaths.detail(ruleId)} className="inline-flex h-9 items-center rounded border border-line bg-raised px-3.5 text-sm font-medium hover:border-muted">
            Open the rule
          </Link>
        }
      />
      <div className="flex flex-col gap-4">
        <Panel>
          <form
            className="flex flex-wrap items-end gap-3"
            onSubmit={(event) => {
              event.preventDefault();
              if (parsed.success) backtest.mutate({ ruleId, input: parsed.data });
            }}
          >
            <SelectField label="Version" value={chosen ?? ""} onChange={(e) => setVersionId(Number(e.target.value))} className="w-80">
              {(versions.data ?? []).map((v) => (
                <option key={v.id} value={v.id}>
                  v{v.version} · {formatUtcDateTime(v.createdAt)} · {v.createdBy ?? "system"}
                </option>
              ))}
            </SelectField>
            <NumberField
              label="Model runs (newest first)"
              integer
              value={runs}
              onChange={setRuns}
              className="w-48"
              error={parsed.success ? undefined : parsed.error.issues.find((i) => i.path[0] === "runs")?.message}
            />
            <Button type="submit" variant="primary" disabled={!parsed.success || backtest.isPending}>
              {backtest.isPending ? "Running…" : "Run backtest"}
            </Button>
          </form>
        </Panel>
        {backtest.isPending && <Loading label="Checking every stored frame…" />}
        {backtest.isError && (
          <Notice tone="danger" title="The backtest did not run">
            {describeError(backtest.error).message}
          </Notice>
        )}
        {backtest.data && <BacktestResult result={backtest.data} zones={zones} definition={versions.data?.find((v) => v.id === backtest.data.versionId)?.definition ?? null} />}
      </div>
    </>
  );
}

function BacktestResult({ result, zones, definition }: { result: BacktestDto; zones: readonly ZoneOption[]; definition: RuleDefinition | null }) {
  const zoneById = useMemo(() => new Map(zones.map((z) => [z.id, z])), [zones]);
  const outlines = useMemo(
    () => (definition?.zoneIds ?? []).map((id) => zoneById.get(id)?.geometry).filter((g) => g !== undefined),
    [definition, zoneById],
  );
  const runCount = new Set(result.frames.map((f) => f.frame.runTime)).size;
  if (result.frames.length === 0) return <Notice title="No stored frames">There is nothing to run the rule over yet.</Notice>;
  return (
    <div className="flex flex-col gap-3">
      <Panel title={`Version ${result.version}: would have opened ${formatCount(result.wouldOpen, "trigger")}`}>
        <p className="text-muted">
          Over {formatCount(result.frames.length, "frame")} of {formatCount(runCount, "run")}.
          {definition && ` Persistence: ${describePersistence(definition.persistenceFrames)}. Cool-down: ${describeCoolDown(definition.coolDownHours)}.`}
        </p>
        {result.opened.length > 0 && (
          <ul className="mt-2 flex flex-col gap-0.5" aria-label="Triggers it would have opened">
            {result.opened.map((o, k) => (
              <li key={k} className="font-mono text-xs">
                <span className="font-medium">{zoneById.get(o.zoneId)?.code ?? `#${o.zoneId}`}</span> · run {formatUtcCycle(o.runTime)} · from {formatUtcDateTime(o.firstValidTime)}
              </li>
            ))}
          </ul>
        )}
      </Panel>
      <p className="text-xs text-muted">
        Each card is one stored frame: hatched, where the rule held inside its zones. Per zone: the coverage where the spatial condition was
        met (— where not), and <span className="text-accent">opens</span> where a trigger would have opened.
      </p>
      <section aria-label="Frames" className="grid grid-cols-[repeat(auto-fill,minmax(15rem,1fr))] gap-2">
        {result.frames.map((frame) => (
          <BacktestFrameCard key={frame.frame.id} frame={frame} geometry={result.geometry} zones={zoneById} outlines={outlines} />
        ))}
      </section>
    </div>
  );
}
