import { createContext, Fragment, useContext, useState } from "react";
import { createColumnHelper, useTable, type SortingState } from "@tanstack/react-table";
import { Link } from "react-router-dom";
import type { HistoryTriggerDto } from "@shared/api/history.ts";
import { severityLevel } from "@shared/rules/index.ts";
import { SeverityChip } from "@/components/ui/severity-chip.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { triggerPath } from "@/config/paths.ts";
import { formatUtcDateTime, formatUtcTime } from "@/lib/time.ts";
import { formatMinutes } from "../format-verification.ts";
import { SortableHead, sortableFeatures } from "./sortable-table.tsx";
import { TriggerStateLabel } from "./trigger-state-label.tsx";
import { TriggerStory } from "./trigger-story.tsx";

interface Expansion {
  isExpanded: (id: number) => boolean;
  toggle: (id: number) => void;
}

// Columns live at module scope (stable for the table); the rows' open/closed state reaches them here.
const ExpansionContext = createContext<Expansion>({ isExpanded: () => false, toggle: () => {} });

function ExpandButton({ id }: { id: number }) {
  const { isExpanded, toggle } = useContext(ExpansionContext);
  const open = isExpanded(id);
  return (
    <button
      type="button"
      onClick={() => toggle(id)}
      aria-expanded={open}
      aria-controls={`history-story-${id}`}
      aria-label={`${open ? "Hide" : "Show"} the events and messages of trigger ${id}`}
      className="h-6 w-6 rounded text-muted hover:bg-raised hover:text-ink"
    >
      <span aria-hidden="true" className={`inline-block transition-transform ${open ? "rotate-90" : ""}`}>
        ▸
      </span>
    </button>
  );
}

const column = createColumnHelper<typeof sortableFeatures, HistoryTriggerDto>();

/** Valid times as "18:00–21:00Z" on one day, or with dates when they span two. */
function validSpan(t: HistoryTriggerDto): string {
  if (t.firstValidTime.slice(0, 10) === t.lastValidTime.slice(0, 10)) return `${formatUtcDateTime(t.firstValidTime).slice(0, 10)} ${formatUtcTime(t.firstValidTime).slice(0, 5)}–${formatUtcTime(t.lastValidTime)}`;
  return `${formatUtcDateTime(t.firstValidTime)} – ${formatUtcDateTime(t.lastValidTime)}`;
}

const columns = column.columns([
  column.display({
    id: "expand",
    header: () => <span className="sr-only">Story</span>,
    cell: ({ row }) => <ExpandButton id={row.original.id} />,
  }),
  column.accessor("id", {
    header: "#",
    sortFn: "basic",
    cell: (info) => (
      <Link to={triggerPath(info.getValue())} className="font-mono text-xs tabular-nums text-accent hover:underline">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("openedAt", { header: "Opened (UTC · local)", sortFn: "text", cell: (info) => <Timestamp value={info.getValue()} /> }),
  column.accessor((t) => `${t.rule.name} v${t.rule.version}`, { id: "rule", header: "Rule (version)", sortFn: "alphanumeric" }),
  column.accessor((t) => t.zone.code, { id: "zone", header: "Zone", sortFn: "text", cell: (info) => <span title={info.row.original.zone.name}>{info.getValue()}</span> }),
  column.accessor((t) => severityLevel(t.severity).rank, { id: "severity", header: "Severity", sortFn: "basic", cell: (info) => <SeverityChip severity={info.row.original.severity} /> }),
  column.accessor("state", { header: "State", sortFn: "text", cell: (info) => <TriggerStateLabel state={info.getValue()} /> }),
  column.accessor("firstValidTime", { header: "Valid (UTC)", sortFn: "text", cell: (info) => <span className="font-mono text-xs whitespace-nowrap">{validSpan(info.row.original)}</span> }),
  // Missing values are `undefined` to the table, so unacknowledged rows sort last either way.
  column.accessor((t) => t.acknowledgedBy ?? undefined, {
    id: "acknowledgedBy",
    header: "Acknowledged by",
    sortFn: "text",
    sortUndefined: "last",
    cell: (info) => info.getValue() ?? <span className="text-muted">nobody</span>,
  }),
  column.accessor((t) => t.minutesToAcknowledge ?? undefined, {
    id: "minutesToAcknowledge",
    header: "Time to acknowledge",
    sortFn: "basic",
    sortUndefined: "last",
    cell: (info) => <span className="font-mono text-xs tabular-nums">{formatMinutes(info.getValue())}</span>,
  }),
  column.accessor("escalations", { header: "Escalations", sortFn: "basic", cell: (info) => <span className="tabular-nums">{info.getValue()}</span> }),
  column.accessor((t) => t.notificationsFailed * 10_000 + t.notificationsSent, {
    id: "messages",
    header: "Messages sent / failed",
    sortFn: "basic",
    cell: (info) => (
      <span className="tabular-nums">
        {info.row.original.notificationsSent} / <span className={info.row.original.notificationsFailed > 0 ? "font-semibold text-danger" : ""}>{info.row.original.notificationsFailed}</span>
      </span>
    ),
  }),
]);

/** Every trigger of the filtered history; headers sort, and each row opens its story of events and messages. */
export function HistoryTable({ triggers }: { triggers: HistoryTriggerDto[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "openedAt", desc: true }]);
  const [expanded, setExpanded] = useState<ReadonlySet<number>>(new Set());
  const toggle = (id: number) =>
    setExpanded((current) => {
      const next = new Set(current);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  const table = useTable({ features: sortableFeatures, columns, data: triggers, getRowId: (t) => String(t.id), state: { sorting }, onSortingChange: setSorting });
  const columnCount = table.getAllLeafColumns().length;
  return (
    <ExpansionContext.Provider value={{ isExpanded: (id) => expanded.has(id), toggle }}>
    <div className="overflow-x-auto rounded-md border border-line bg-surface">
      <table className="w-full text-left" aria-label="Trigger history">
        <SortableHead table={table} />
        <tbody>
          {table.getRowModel().rows.length === 0 && (
            <tr>
              <td colSpan={columnCount} className="px-3 py-6 text-center text-muted">
                No trigger matches these filters.
              </td>
            </tr>
          )}
          {table.getRowModel().rows.map((row) => {
            const open = expanded.has(row.original.id);
            return (
              <Fragment key={row.id}>
                <tr className={`border-b border-line ${open ? "bg-raised/60" : ""}`} data-trigger={row.original.id}>
                  {row.getAllCells().map((cell) => (
                    <td key={cell.id} className="px-3 py-1.5 align-middle">
                      <table.FlexRender cell={cell} />
                    </td>
                  ))}
                </tr>
                {open && (
                  <tr id={`history-story-${row.original.id}`} className="border-b border-line bg-raised/30">
                    <td colSpan={columnCount} className="px-3 py-3">
                      <TriggerStory triggerId={row.original.id} />
                    </td>
                  </tr>
                )}
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </div>
    </ExpansionContext.Provider>
  );
}
