import { useState } from "react";
import { createColumnHelper, useTable, type SortingState } from "@tanstack/react-table";
import type { MatchedReportDto } from "@shared/api/verification.ts";
import { Chip } from "@/components/ui/chip.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { describeReport, formatMinutes, formatPlace } from "../format-verification.ts";
import { SortableHead, sortableFeatures } from "./sortable-table.tsx";

const OUTCOME = {
  detected: { label: "Detected", tone: "ok" },
  late: { label: "Late", tone: "caution" },
  missed: { label: "Missed", tone: "danger" },
} as const;

const column = createColumnHelper<typeof sortableFeatures, MatchedReportDto>();
const columns = column.columns([
  column.accessor("time", { header: "Time (UTC · local)", sortFn: "text", cell: (info) => <Timestamp value={info.getValue()} /> }),
  column.accessor((r) => describeReport(r), { id: "report", header: "Report", sortFn: "alphanumeric" }),
  column.accessor((r) => formatPlace(r.latitude, r.longitude), { id: "place", header: "Place", enableSorting: false, cell: (info) => <span className="font-mono text-xs">{info.getValue()}</span> }),
  column.accessor("outcome", { header: "Outcome", sortFn: "text", cell: (info) => <Chip tone={OUTCOME[info.getValue()].tone}>{OUTCOME[info.getValue()].label}</Chip> }),
  column.accessor((r) => (r.triggerIds.length ? r.triggerIds : r.lateTriggerIds).join(", "), {
    id: "triggers",
    header: "Triggers",
    enableSorting: false,
    cell: (info) => <span className="font-mono text-xs">{info.getValue() || "—"}</span>,
  }),
  column.accessor((r) => r.leadMinutes ?? undefined, { id: "lead", header: "Lead time", sortFn: "basic", sortUndefined: "last", cell: (info) => <span className="font-mono text-xs tabular-nums">{formatMinutes(info.getValue())}</span> }),
  column.accessor("remarks", {
    header: "Remarks",
    enableSorting: false,
    cell: (info) => (
      <span className="text-xs">
        {info.row.original.invented && <Chip className="mr-1">invented</Chip>}
        {info.getValue()}
      </span>
    ),
  }),
]);

/** The scored reports: what each was matched to, or why not ("late": before its trigger opened). */
export function MatchedReportsTable({ reports }: { reports: MatchedReportDto[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "time", desc: false }]);
  const table = useTable({ features: sortableFeatures, columns, data: reports, getRowId: (r) => String(r.id), state: { sorting }, onSortingChange: setSorting });
  return (
    <div className="overflow-x-auto rounded-md border border-line bg-surface">
      <table className="w-full text-left" aria-label="Scored storm reports">
        <SortableHead table={table} />
        <tbody>
          {reports.length === 0 && (
            <tr>
              <td colSpan={columns.length} className="px-3 py-6 text-center text-muted">
                No storm report of these kinds lies in the rule's zones during the period.
              </td>
            </tr>
          )}
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} data-report={row.original.id} className="border-b border-line">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-3 py-1.5 align-middle">
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
