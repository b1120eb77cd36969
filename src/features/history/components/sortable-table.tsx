import { createSortedRowModel, rowSortingFeature, sortFn_alphanumeric, sortFn_basic, sortFn_datetime, sortFn_text, tableFeatures, type ReactTable, type RowData } from "@tanstack/react-table";

/**
 * The table features every list of this area uses: client-side sorting over the loaded rows
 * (the server already filtered them; sorting a few thousand rows in the browser is instant).
 */
export const sortableFeatures = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, text: sortFn_text, datetime: sortFn_datetime, basic: sortFn_basic },
});
export type SortableFeatures = typeof sortableFeatures;

const ARIA_SORT = { asc: "ascending", desc: "descending" } as const;

/** Header cells that sort on click (or Enter), with aria-sort so screen readers announce the order. */
export function SortableHead<TData extends RowData>({ table }: { table: ReactTable<SortableFeatures, TData> }) {
  return (
    <thead className="border-b border-line bg-raised text-xs text-muted">
      {table.getHeaderGroups().map((group) => (
        <tr key={group.id}>
          {group.headers.map((header) => {
            const sorted = header.column.getIsSorted();
            const canSort = header.column.getCanSort();
            return (
              <th key={header.id} scope="col" aria-sort={sorted ? ARIA_SORT[sorted] : canSort ? "none" : undefined} className="px-3 py-2 font-medium whitespace-nowrap">
                {header.isPlaceholder ? null : canSort ? (
                  <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-ink">
                    <table.FlexRender header={header} />
                    <span aria-hidden="true" className="w-2 text-[10px]">
                      {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}
                    </span>
                  </button>
                ) : (
                  <table.FlexRender header={header} />
                )}
              </th>
            );
          })}
        </tr>
      ))}
    </thead>
  );
}
