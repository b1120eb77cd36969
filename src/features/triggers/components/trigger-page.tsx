import { useMemo, type ReactNode } from "react";
import { Link, useSearchParams } from "react-router-dom";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { Panel } from "@/components/ui/panel.tsx";
import { SectionBoundary } from "@/components/errors/section-boundary.tsx";
import { SeverityChip } from "@/components/ui/severity-chip.tsx";
import { paths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { useTrigger } from "../api/get-trigger.ts";
import { defaultFrameId, expressionFields, expressionOf, framesOfTrigger } from "../detail/trigger-frames.ts";
import { CoverageChart } from "./coverage-chart.tsx";
import { TriggerActionsPanel, type TriggerPermissions } from "./trigger-actions-panel.tsx";
import { TriggerEvents } from "./trigger-events.tsx";
import { TriggerFacts } from "./trigger-facts.tsx";
import { TriggerFramesTable } from "./trigger-frames-table.tsx";
import { TriggerMapPanel } from "./trigger-map-panel.tsx";
import { TriggerStateChip } from "./trigger-state-chip.tsx";

/**
 * One trigger: what fired (rule version, zone, run, valid times), the matched area on the map over
 * the field that fired, the values per frame and across runs, its events, and the actions the
 * signed-in roles may take. `deliveries` is the slot for who was notified and how that went.
 */
export function TriggerPage({ triggerId, permissions, deliveries }: { triggerId: number; permissions: TriggerPermissions; deliveries?: ReactNode }) {
  const trigger = useTrigger(triggerId);
  const [search, setSearch] = useSearchParams();
  const frames = useMemo(() => framesOfTrigger(trigger.data?.frames ?? []), [trigger.data]);
  const fieldKeys = useMemo(() => (trigger.data ? expressionFields(expressionOf(trigger.data)) : []), [trigger.data]);

  if (trigger.isPending) return <Loading label={`Loading trigger ${triggerId}…`} />;
  if (trigger.isError) {
    return (
      <>
        <PageHeader title={`Trigger ${triggerId}`} />
        <Notice tone="danger" title="This trigger could not be loaded">
          {describeError(trigger.error).message} <Link to={paths.timeline} className="text-accent underline">Back to the timeline</Link>
        </Notice>
      </>
    );
  }
  const t = trigger.data;
  const asked = Number(search.get("frame"));
  const selectedFrameId = frames.some((frame) => frame.frameId === asked) ? asked : defaultFrameId(frames);
  const selectFrame = (frameId: number) => {
    const next = new URLSearchParams(search);
    next.set("frame", String(frameId));
    setSearch(next, { replace: true });
  };

  return (
    <>
      <PageHeader
        title={`${t.rule.name} · ${t.zone.code}`}
        description={
          <span className="flex flex-wrap items-center gap-2">
            <SeverityChip severity={t.severity} />
            <TriggerStateChip state={t.state} />
            <span>
              Trigger {t.id} in {t.zone.name}.
            </span>
            <Link to={paths.timeline} className="text-accent hover:underline">
              Timeline
            </Link>
          </span>
        }
      />
      <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_26rem]">
        <div className="flex min-w-0 flex-col gap-4">
          <SectionBoundary label="the map">
            <TriggerMapPanel trigger={t} />
          </SectionBoundary>
          <TriggerFramesTable frames={frames} fieldKeys={fieldKeys} selectedFrameId={selectedFrameId} onSelect={selectFrame} />
          {/* Slot: who was notified and how delivery went (the route fills it from the notifications feature); wide tables need the main column. */}
          {deliveries}
          <Panel title="Coverage across runs">
            <CoverageChart frames={frames} />
          </Panel>
        </div>
        <div className="flex min-w-0 flex-col gap-4">
          <TriggerFacts trigger={t} />
          <TriggerActionsPanel trigger={t} permissions={permissions} />
          <TriggerEvents events={t.events} />
        </div>
      </div>
    </>
  );
}
