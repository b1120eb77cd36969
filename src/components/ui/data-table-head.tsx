import type { ReactTable, RowData, TableFeatures } from "@tanstack/react-table";

/** The header rows of a TanStack table, styled once for every table in the app. */
export function DataTableHead<TFeatures extends TableFeatures, TData extends RowData>({ table }: { table: ReactTable<TFeatures, TData> }) {
  return (
    <thead className="border-b border-line bg-raised text-xs text-muted">
      {table.getHeaderGroups().map((group) => (
        <tr key={group.id}>
          {group.headers.map((header) => (
            <th key={header.id} scope="col" className="px-3 py-2 font-medium whitespace-nowrap">
              {header.isPlaceholder ? null : <table.FlexRender header={header} />}
            </th>
          ))}
        </tr>
      ))}
    </thead>
  );
}
