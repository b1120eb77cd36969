import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { useNavigate, useSearchParams } from "react-router-dom";
import type { TriggerSummaryDto } from "@shared/api/triggers.ts";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { PageHeader } from "@/components/ui/page-header.tsx";
import { useToast } from "@/components/ui/toaster.tsx";
import { VirtualList, type VirtualListHandle } from "@/components/ui/virtual-list.tsx";
import { triggerPath } from "@/config/paths.ts";
import { usePageShortcuts } from "@/hooks/use-page-shortcuts.ts";
import { describeError, describeErrorLine } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { useActiveTriggers } from "../api/get-active-triggers.ts";
import { useTimeline } from "../api/get-timeline.ts";
import { useAcknowledgeTrigger } from "../api/trigger-actions.ts";
import { useTimelineKeys } from "../hooks/use-timeline-keys.ts";
import { filterOptions, filtersFromSearch, filterTimeline, hasFilters, searchFromFilters, type TimelineFilters } from "../timeline/timeline-filters.ts";
import { buildTimelineRows, type TimelineRow } from "../timeline/timeline-rows.ts";
import { stepSelection, TIMELINE_SHORTCUTS, type TimelineKeyAction } from "../timeline/timeline-selection.ts";
import { AcknowledgeDialog } from "./acknowledge-dialog.tsx";
import { HandoverDialog } from "./handover-dialog.tsx";
import { DayHeadingRow, DAY_ROW_HEIGHT, EscalationEntryRow, GridEntryRow, LIGHT_ROW_HEIGHT, OtherEntryRow } from "./light-entry-rows.tsx";
import { TimelineToolbar } from "./timeline-toolbar.tsx";
import { TriggerEntryRow, TRIGGER_ROW_HEIGHT } from "./trigger-entry-row.tsx";

const rowHeight = (row: TimelineRow) => (row.type === "day" ? DAY_ROW_HEIGHT : row.entry.kind === "trigger" ? TRIGGER_ROW_HEIGHT : LIGHT_ROW_HEIGHT);
const rowKey = (row: TimelineRow) => row.key;
/** Rows the keys move between: triggers and escalations (each is about one trigger). */
const selectableKey = (row: TimelineRow) => (row.type === "entry" && (row.entry.kind === "trigger" || row.entry.kind === "escalation") ? row.key : null);

/** The trigger a row is about, when it is loaded. */
function triggerOfRow(row: TimelineRow | undefined, byId: ReadonlyMap<number, TriggerSummaryDto>): TriggerSummaryDto | undefined {
  if (!row || row.type !== "entry") return undefined;
  if (row.entry.kind === "trigger") return row.entry.trigger;
  if (row.entry.kind === "escalation") return byId.get(row.entry.triggerId);
  return undefined;
}

/** Counts for the line under the title: what needs a forecaster now. */
function ActiveSummary({ triggers }: { triggers: readonly TriggerSummaryDto[] | undefined }) {
  if (!triggers) return null;
  const open = triggers.filter((t) => t.state === "open").length;
  const acknowledged = triggers.filter((t) => t.state === "acknowledged").length;
  return (
    <span data-testid="active-summary">
      <span className={open > 0 ? "font-semibold text-caution" : ""}>{formatCount(open, "open trigger")}</span>, {formatCount(acknowledged, "acknowledged", "acknowledged")}
    </span>
  );
}

/**
 * The forecaster's home: every trigger, grid arrival and escalation, newest first and grouped by
 * UTC day, filtered from the URL, updated live, and driven from the keyboard (j / k / a / Enter / h).
 */
export function TimelinePage({ canAcknowledge }: { canAcknowledge: boolean }) {
  const [search, setSearch] = useSearchParams();
  const navigate = useNavigate();
  const toast = useToast();
  const timeline = useTimeline();
  const active = useActiveTriggers();
  const acknowledge = useAcknowledgeTrigger();
  const list = useRef<VirtualListHandle>(null);
  const [selected, setSelected] = useState<string | null>(null);
  const [acknowledging, setAcknowledging] = useState<TriggerSummaryDto | null>(null);
  const [handoverOpen, setHandoverOpen] = useState(false);
  usePageShortcuts(TIMELINE_SHORTCUTS);

  const filters = filtersFromSearch(search);
  const entries = useMemo(() => timeline.data?.pages.flatMap((page) => page.entries) ?? [], [timeline.data]);
  const options = useMemo(() => filterOptions(entries), [entries]);
  const rows = useMemo(() => buildTimelineRows(filterTimeline(entries, filters)), [entries, search.toString()]);
  const triggersById = useMemo(() => new Map(entries.flatMap((e) => (e.kind === "trigger" ? [[e.trigger.id, e.trigger] as const] : []))), [entries]);
  const selectableKeys = useMemo(() => rows.map(selectableKey), [rows]);
  const selectedIndex = selected === null ? -1 : rows.findIndex((row) => row.key === selected);

  useEffect(() => {
    if (selectedIndex >= 0) list.current?.reveal(selectedIndex);
  }, [selectedIndex]);

  const setFilters = (next: TimelineFilters) => setSearch(searchFromFilters(next, search), { replace: true });
  const { fetchNextPage, hasNextPage, isFetchingNextPage } = timeline;
  const loadOlder = useCallback(() => {
    if (hasNextPage && !isFetchingNextPage) void fetchNextPage();
  }, [fetchNextPage, hasNextPage, isFetchingNextPage]);

  const startAcknowledge = (withNote: boolean) => {
    const trigger = triggerOfRow(rows[selectedIndex], triggersById);
    if (!trigger) return toast.info("Select a trigger first", "j and k move the selection.");
    if (!canAcknowledge) return toast.info("Your roles cannot acknowledge triggers", "Forecasters and leads can.");
    if (trigger.state !== "open") return toast.info(`This trigger is ${trigger.state}`, "Only open triggers can be acknowledged.");
    if (withNote) return setAcknowledging(trigger);
    acknowledge.mutate(
      { triggerId: trigger.id },
      {
        onSuccess: () => toast.success(`Acknowledged: ${trigger.rule.name} · ${trigger.zone.code}`),
        onError: (error) => toast.error("Not acknowledged", describeErrorLine(error)),
      },
    );
  };

  useTimelineKeys((action: TimelineKeyAction) => {
    if (action.type === "move") setSelected(stepSelection(selectableKeys, selectedIndex >= 0 ? selected : null, action.step));
    else if (action.type === "acknowledge") startAcknowledge(action.withNote);
    else if (action.type === "handover") setHandoverOpen(true);
    else if (action.type === "open") {
      const trigger = triggerOfRow(rows[selectedIndex], triggersById);
      const row = rows[selectedIndex];
      const id = trigger?.id ?? (row?.type === "entry" && row.entry.kind === "escalation" ? row.entry.triggerId : null);
      if (id !== null) navigate(triggerPath(id));
    }
  });

  const renderRow = (row: TimelineRow) => {
    if (row.type === "day") return <DayHeadingRow day={row.day} count={row.count} />;
    const isSelected = row.key === selected;
    const select = () => setSelected(row.key);
    switch (row.entry.kind) {
      case "trigger":
        return <TriggerEntryRow trigger={row.entry.trigger} selected={isSelected} onSelect={select} />;
      case "escalation":
        return <EscalationEntryRow entry={row.entry} trigger={triggersById.get(row.entry.triggerId)} selected={isSelected} onSelect={select} />;
      case "grid":
        return <GridEntryRow entry={row.entry} />;
      case "other":
        return <OtherEntryRow entry={row.entry} />;
    }
  };

  return (
    <>
      <PageHeader
        title="Timeline"
        description={
          <>
            <ActiveSummary triggers={active.data} /> · newest first · UTC with local time beside · <kbd className="font-mono">?</kbd> lists the keys
          </>
        }
        actions={
          <Button onClick={() => setHandoverOpen(true)} title="Handover list (h)">
            Handover
          </Button>
        }
      />
      <TimelineToolbar filters={filters} onFilters={setFilters} zones={options.zones} rules={options.rules} />
      <div className="rounded-b-md border border-line bg-surface">
        {timeline.isPending ? (
          <Loading label="Loading the timeline…" />
        ) : timeline.isError ? (
          <div className="p-4">
            <Notice tone="danger" title="The timeline could not be loaded">
              {describeError(timeline.error).message}
            </Notice>
          </div>
        ) : rows.length === 0 ? (
          <p className="px-4 py-10 text-center text-muted">
            {hasFilters(filters) ? "Nothing on the loaded timeline matches these filters." : "Nothing yet. Triggers appear here the moment a rule matches a new frame; grid arrivals are listed too."}
          </p>
        ) : (
          <VirtualList ref={list} rows={rows} rowHeight={rowHeight} rowKey={rowKey} renderRow={renderRow} height="calc(100vh - 15rem)" label="Timeline entries" onNearEnd={loadOlder} />
        )}
      </div>
      <p className="mt-1.5 text-xs text-muted" aria-live="polite">
        {isFetchingNextPage ? "Loading older entries…" : hasNextPage ? "Scroll down for older entries." : entries.length > 0 ? `All ${formatCount(entries.length, "entry", "entries")} loaded.` : ""}
      </p>
      <AcknowledgeDialog trigger={acknowledging} onClose={() => setAcknowledging(null)} onDone={(t) => toast.success(`Acknowledged: ${t.rule.name} · ${t.zone.code}`)} />
      <HandoverDialog open={handoverOpen} onClose={() => setHandoverOpen(false)} triggers={active.data ?? []} />
    </>
  );
}
