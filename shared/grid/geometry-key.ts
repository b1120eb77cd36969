/**
 * A stable string naming a grid's shape and placement, used as a cache key and to tell whether two
 * fields share a grid. It leaves out `uvRelativeToGrid`, which changes how winds are read but not
 * where the points are.
 */
import type { GridGeometry } from "./geometry-types.ts";

// Rounding keeps keys equal for values that differ only by decoding noise
// (1e-6° is about 0.1 m; 1e-3 m is far below any grid length).
const degrees = (value: number): string => value.toFixed(6);
const metres = (value: number): string => value.toFixed(3);

export function geometryKey(geometry: GridGeometry): string {
  const common = `${geometry.kind}:${geometry.nx}x${geometry.ny}:R${metres(geometry.earthRadius)}:${degrees(geometry.lat0)},${degrees(geometry.lon0)}`;
  switch (geometry.kind) {
    case "latlon":
      return `${common}:d${degrees(geometry.dlat)},${degrees(geometry.dlon)}`;
    case "lambert":
      return `${common}:d${metres(geometry.dx)},${metres(geometry.dy)}:v${degrees(geometry.lonV)}:s${degrees(geometry.latin1)},${degrees(geometry.latin2)}`;
    case "polar":
      return `${common}:d${metres(geometry.dx)},${metres(geometry.dy)}:v${degrees(geometry.lonV)}:t${degrees(geometry.latTrue)}:${geometry.southPole ? "S" : "N"}`;
  }
}
