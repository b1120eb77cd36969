import type { GridGeometry } from "../../shared/grid/geometry-types.ts";

/** The model quantities frame assembly understands, whatever the file format called them. */
export type ModelParameter =
  | "temperature"
  | "dewpoint"
  | "relative_humidity"
  | "specific_humidity"
  | "u_wind"
  | "v_wind"
  | "geopotential_height"
  | "pressure"
  | "surface_height";

export type LevelKind = "isobaric" | "surface" | "height_above_ground" | "other";

/**
 * One decoded 2-D field, format-neutral, in SI units (K, Pa, m s⁻¹, gpm, kg kg⁻¹, RH as a
 * fraction 0–1), canonical point order (see shared/grid/geometry-types.ts).
 */
export interface GridRecord {
  /** Null for fields Bellwether does not use; they are listed, never an error. */
  parameter: ModelParameter | null;
  /** What the file called it, for messages (e.g. "TMP (0-0-0)" or "air_temperature"). */
  sourceName: string;
  levelKind: LevelKind;
  /** Pa for isobaric levels, m for heights above ground, 0 otherwise. */
  level: number;
  model: string;
  runTime: string;
  validTime: string;
  geometry: GridGeometry;
  values: Float32Array;
}

export function describeLevel(record: Pick<GridRecord, "levelKind" | "level">): string {
  switch (record.levelKind) {
    case "isobaric":
      return `${Math.round(record.level / 100)} hPa`;
    case "height_above_ground":
      return `${record.level} m above ground`;
    case "surface":
      return "surface";
    default:
      return "other level";
  }
}
