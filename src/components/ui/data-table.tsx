import type { ReactTable, RowData, TableFeatures } from "@tanstack/react-table";
import { DataTableHead } from "./data-table-head.tsx";

/**
 * A whole TanStack table in the app's one table style: bordered box, shared header, one row per
 * record. `rowClassName` tints a row from its record (a disabled rule, a zone that covers nothing).
 */
export function DataTable<TFeatures extends TableFeatures, TData extends RowData>({
  table,
  caption,
  rowClassName,
}: {
  table: ReactTable<TFeatures, TData>;
  caption: string;
  rowClassName?: (record: TData) => string;
}) {
  return (
    <div className="overflow-x-auto rounded-md border border-line bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">{caption}</caption>
        <DataTableHead table={table} />
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className={`border-b border-line last:border-0 ${rowClassName?.(row.original) ?? ""}`}>
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-3 py-1.5 align-top">
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
