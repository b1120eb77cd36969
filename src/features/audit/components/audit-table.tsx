import { Fragment, useState } from "react";
import { createColumnHelper, tableFeatures, useTable } from "@tanstack/react-table";
import type { AuditEntryDto } from "@shared/api/audit.ts";
import { DataTableHead } from "@/components/ui/data-table-head.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { AuditEntryDetail } from "./audit-entry-detail.tsx";

interface TableMeta {
  isExpanded: (id: number) => boolean;
  toggle: (id: number) => void;
}

// Module scope so the table keeps the same features and columns between renders; expansion state
// is the page's own and reaches the cells through the table meta.
const features = tableFeatures({ tableMeta: {} as TableMeta });
const column = createColumnHelper<typeof features, AuditEntryDto>();

const columns = column.columns([
  column.display({
    id: "expand",
    header: () => <span className="sr-only">Details</span>,
    cell: ({ row, table }) => {
      const { isExpanded, toggle } = table.options.meta!;
      const open = isExpanded(row.original.id);
      return (
        <button
          type="button"
          onClick={() => toggle(row.original.id)}
          aria-expanded={open}
          aria-controls={`audit-detail-${row.original.id}`}
          aria-label={`${open ? "Hide" : "Show"} before and after for entry ${row.original.id}`}
          className="h-6 w-6 rounded text-muted hover:bg-raised hover:text-ink"
        >
          <span aria-hidden="true" className={`inline-block transition-transform ${open ? "rotate-90" : ""}`}>
            ▸
          </span>
        </button>
      );
    },
  }),
  column.accessor("id", { header: "#", cell: (info) => <span className="font-mono text-xs tabular-nums">{info.getValue()}</span> }),
  column.accessor("at", { header: "Time (UTC · local)", cell: (info) => <Timestamp value={info.getValue()} /> }),
  column.accessor("actor", {
    header: "Actor",
    cell: (info) => (
      <span className="font-mono text-xs" title={info.row.original.actorRoles.join(", ") || undefined}>
        {info.getValue() ?? <span className="text-muted">system</span>}
      </span>
    ),
  }),
  column.accessor("action", { header: "Action", cell: (info) => <span className="font-mono text-xs">{info.getValue()}</span> }),
  column.accessor((entry) => `${entry.targetType}${entry.targetId ? ` #${entry.targetId}` : ""}`, {
    id: "target",
    header: "Target",
    cell: (info) => <span className="font-mono text-xs">{info.getValue()}</span>,
  }),
]);

export function AuditTable({ entries }: { entries: AuditEntryDto[] }) {
  const [expanded, setExpanded] = useState<ReadonlySet<number>>(new Set());
  const toggle = (id: number) =>
    setExpanded((current) => {
      const next = new Set(current);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  const table = useTable({
    features,
    columns,
    data: entries,
    getRowId: (entry) => String(entry.id),
    meta: { isExpanded: (id) => expanded.has(id), toggle },
  });
  const columnCount = table.getAllLeafColumns().length;

  return (
    <div className="overflow-x-auto rounded-md border border-line bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">Audit trail entries, newest first</caption>
        <DataTableHead table={table} />
        <tbody>
          {table.getRowModel().rows.length === 0 && (
            <tr>
              <td colSpan={columnCount} className="px-3 py-6 text-center text-muted">
                No entries match these filters.
              </td>
            </tr>
          )}
          {table.getRowModel().rows.map((row) => {
            const open = expanded.has(row.original.id);
            return (
              <Fragment key={row.id}>
                <tr className={`border-b border-line ${open ? "bg-raised/60" : ""}`}>
                  {row.getAllCells().map((cell) => (
                    <td key={cell.id} className="px-3 py-1.5 align-middle">
                      <table.FlexRender cell={cell} />
                    </td>
                  ))}
                </tr>
                {open && (
                  <tr id={`audit-detail-${row.original.id}`} className="border-b border-line bg-raised/30">
                    <td colSpan={columnCount}>
                      <AuditEntryDetail entry={row.original} />
                    </td>
                  </tr>
                )}
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
