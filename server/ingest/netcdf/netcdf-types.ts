/** What the NetCDF decoder hands to the rest of the ingest pipeline. */
import type { GridGeometry } from "../../../shared/grid/geometry-types.ts";

export type NetcdfLevelType = "isobaric" | "surface" | "heightAboveGround";

export interface NetcdfVariable {
  name: string;
  /** CF standard_name, or null when the file gives none. */
  standardName: string | null;
  longName: string | null;
  /** Unit of `values` after conversion to SI (e.g. "K", "Pa", "m s-1"); unknown units pass through. */
  units: string;
  /** Unit as declared in the file, or null. */
  sourceUnits: string | null;
  /** The variable's dimension names in file order. */
  dims: string[];
  /**
   * Geometry of `values`, one object shared by every variable on the same grid. On a projected
   * grid `uvRelativeToGrid` is true when the file holds grid-relative winds (x_wind, y_wind).
   */
  geometry: GridGeometry;
  /** "surface" stands for any single-level field without a vertical coordinate (mean sea level included). */
  levelType: NetcdfLevelType;
  /** Pa for isobaric, metres above ground for heightAboveGround, null for a single surface field. */
  levels: number[] | null;
  /** Valid times, ISO 8601 UTC; a single null when the file gives no time for this variable. */
  times: Array<string | null>;
  /** Model run (forecast reference time), ISO 8601 UTC, or null. */
  runTime: string | null;
  /** values[timeIndex][levelIndex]: canonical layout (index = j * nx + i, south-west first), NaN = missing. */
  values: Float32Array[][];
  /** Number of NaN values over all slices. */
  missingCount: number;
}

export interface SkippedVariable {
  name: string;
  reason: string;
}

export interface NetcdfDataset {
  format: "netcdf3" | "netcdf4";
  /** Global attributes (text, or numbers as arrays), e.g. title, source, institution. */
  globalAttributes: Record<string, string | readonly number[]>;
  variables: NetcdfVariable[];
  /** Gridded variables that were left out, with the reason (an unsupported vertical coordinate, say). */
  skipped: SkippedVariable[];
}
