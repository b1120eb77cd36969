import { useEffect, useImperativeHandle, useMemo, useRef, useState, type ReactNode, type Ref } from "react";
import { layoutRows, scrollTopToReveal, visibleRows } from "@/lib/windowing.ts";

export interface VirtualListHandle {
  /** Scrolls just enough to show row `index` whole, with a little room around it. */
  reveal(index: number): void;
}

/**
 * A scroll box that renders only the rows near its visible part, so thousands of rows scroll as
 * smoothly as a dozen. Each row's height is known up front (`rowHeight`), which keeps the layout
 * exact without measuring: rows must not grow past their height (truncate long text).
 */
export function VirtualList<Row>({
  rows,
  rowHeight,
  rowKey,
  renderRow,
  height,
  label,
  onNearEnd,
  ref,
}: {
  rows: readonly Row[];
  rowHeight: (row: Row) => number;
  rowKey: (row: Row) => string;
  renderRow: (row: Row, index: number) => ReactNode;
  /** CSS height of the scroll box ("calc(100vh - 12rem)"). */
  height: string;
  label: string;
  /** Called when the user scrolls within a screen of the end (to load older entries). */
  onNearEnd?: () => void;
  ref?: Ref<VirtualListHandle>;
}) {
  const box = useRef<HTMLDivElement>(null);
  const [scrollTop, setScrollTop] = useState(0);
  const [viewport, setViewport] = useState(800);
  const offsets = useMemo(() => layoutRows(rows.map(rowHeight)), [rows, rowHeight]);
  const total = offsets[offsets.length - 1]!;

  useEffect(() => {
    const element = box.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => setViewport(entry!.contentRect.height));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  useImperativeHandle(
    ref,
    () => ({
      reveal(index: number) {
        const element = box.current;
        if (!element) return;
        const next = scrollTopToReveal(offsets, index, element.scrollTop, element.clientHeight, 48);
        if (next !== element.scrollTop) element.scrollTop = next;
      },
    }),
    [offsets],
  );

  useEffect(() => {
    if (onNearEnd && rows.length > 0 && scrollTop + viewport >= total - viewport) onNearEnd();
  }, [scrollTop, viewport, total, rows.length, onNearEnd]);

  const { start, end } = visibleRows(offsets, scrollTop, viewport);
  const shown: ReactNode[] = [];
  for (let index = start; index < end; index++) {
    const row = rows[index]!;
    shown.push(
      <div
        key={rowKey(row)}
        role="listitem"
        aria-setsize={rows.length}
        aria-posinset={index + 1}
        className="absolute inset-x-0"
        style={{ top: offsets[index], height: offsets[index + 1]! - offsets[index]! }}
      >
        {renderRow(row, index)}
      </div>,
    );
  }

  return (
    <div ref={box} className="relative overflow-y-auto" style={{ height }} onScroll={(event) => setScrollTop(event.currentTarget.scrollTop)}>
      <div role="list" aria-label={label} className="relative" style={{ height: total }}>
        {shown}
      </div>
    </div>
  );
}
