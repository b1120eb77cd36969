import { formatNumber } from "@/lib/format-units.ts";
import { pageCount, pageRange } from "@/lib/paging.ts";
import { Button } from "./button.tsx";

/** Previous/next paging with the visible range and a page-size choice. Pages are 1-based. */
export function Pager({
  page,
  pageSize,
  total,
  pageSizes,
  onPageChange,
  onPageSizeChange,
  noun = "entries",
  busy = false,
}: {
  page: number;
  pageSize: number;
  total: number;
  pageSizes: readonly number[];
  onPageChange: (page: number) => void;
  onPageSizeChange: (pageSize: number) => void;
  noun?: string;
  busy?: boolean;
}) {
  const pages = pageCount(pageSize, total);
  const range = pageRange(page, pageSize, total);
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3 py-2 text-sm">
      <p className="text-muted" aria-live="polite">
        {range
          ? `${noun[0]!.toUpperCase()}${noun.slice(1)} ${formatNumber(range.first)}–${formatNumber(range.last)} of ${formatNumber(total)}`
          : total === 0
            ? `No ${noun}`
            : `Past the last page (${formatNumber(total)} ${noun} in all)`}
        {busy && " · loading…"}
      </p>
      <div className="flex items-center gap-2">
        <label className="flex items-center gap-1.5 text-muted">
          Per page
          <select
            value={pageSize}
            onChange={(event) => onPageSizeChange(Number(event.target.value))}
            className="h-7 rounded border border-line bg-canvas px-1.5 text-ink"
          >
            {pageSizes.map((size) => (
              <option key={size} value={size}>
                {size}
              </option>
            ))}
          </select>
        </label>
        <Button size="sm" onClick={() => onPageChange(page - 1)} disabled={page <= 1}>
          Previous
        </Button>
        <span className="font-mono text-xs text-muted tabular-nums">
          Page {formatNumber(page)} of {formatNumber(pages)}
        </span>
        <Button size="sm" onClick={() => onPageChange(page + 1)} disabled={page >= pages}>
          Next
        </Button>
      </div>
    </nav>
  );
}
