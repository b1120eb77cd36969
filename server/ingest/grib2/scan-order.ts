import { isCanonicalScan, type ScanMode } from "./scan-mode.ts";

/**
 * Reorders values from the message's scanning order (WMO-No. 306, Flag Table 3.4) into Bellwether's canonical
 * layout: index = j * nx + i, i eastward, j northward, (0, 0) at the south-west corner. Returns `values` itself
 * when it is already canonical, otherwise a new array.
 */
export function toCanonicalOrder(values: Float32Array, nx: number, ny: number, scan: ScanMode): Float32Array {
  if (isCanonicalScan(scan)) return values;
  const out = new Float32Array(values.length);
  if (scan.jConsecutive) reorderColumns(values, nx, ny, scan, out);
  else reorderRows(values, nx, ny, scan, out);
  return out;
}

/** Points along i are consecutive: each stored row is one grid row. */
function reorderRows(values: Float32Array, nx: number, ny: number, scan: ScanMode, out: Float32Array): void {
  for (let r = 0; r < ny; r++) {
    const from = r * nx;
    const to = (scan.jPositive ? r : ny - 1 - r) * nx;
    // With alternate-direction scanning every second stored row runs the other way.
    const westward = scan.iNegative !== (scan.alternateRows && (r & 1) === 1);
    if (!westward) {
      out.set(values.subarray(from, from + nx), to);
    } else {
      const last = to + nx - 1;
      for (let c = 0; c < nx; c++) out[last - c] = values[from + c];
    }
  }
}

/** Points along j are consecutive: each stored run is one grid column. */
function reorderColumns(values: Float32Array, nx: number, ny: number, scan: ScanMode, out: Float32Array): void {
  for (let r = 0; r < nx; r++) {
    const from = r * ny;
    const i = scan.iNegative ? nx - 1 - r : r;
    const southward = !scan.jPositive !== (scan.alternateRows && (r & 1) === 1);
    for (let c = 0; c < ny; c++) {
      const j = southward ? ny - 1 - c : c;
      out[j * nx + i] = values[from + c];
    }
  }
}
