import type { GridGeometry } from "../../../shared/grid/geometry-types.ts";
import type { EarthShape } from "./earth-shape.ts";
import type { ParameterInfo } from "./parameters.ts";
import type { EnsembleMember, StatisticalPeriod } from "./product-templates.ts";

/** A field's metadata, as listed without unpacking its values. */
export interface Grib2FieldInfo {
  /** 0-based position of the field in the file (fields of multi-field messages count separately). */
  index: number;
  /** 1-based GRIB message number, as used in error messages. */
  messageNumber: number;
  /** 0-based position of the field inside its message. */
  fieldInMessage: number;
  /** Byte offset and length of the whole message in the file. */
  byteOffset: number;
  byteLength: number;
  /** WMO-No. 306 Code Table 0.0 discipline, Code Table 4.1 category, Code Table 4.2 number. */
  discipline: number;
  category: number;
  number: number;
  parameter: ParameterInfo;
  /** "isobaric" | "surface" | "heightAboveGround" | "meanSea" | other name or "level-type-<code>". */
  levelType: string;
  /** In the level's SI unit: Pa for isobaric, m for heights; 0 for surfaces without a value. */
  level: number;
  /** The second fixed surface of a layer, or null for a single level. */
  secondLevel: { levelType: string; level: number } | null;
  /** ISO 8601 UTC. */
  refTime: string;
  forecastSeconds: number;
  validTime: string;
  /** Present for statistically processed fields (templates 4.8 and 4.11); validTime is the period's end. */
  statistics: StatisticalPeriod | null;
  ensemble: EnsembleMember | null;
  productTemplate: number;
  dataTemplate: number;
  gridTemplate: number;
  geometry: GridGeometry;
  earthShape: EarthShape;
  centre: number;
  subCentre: number;
  /** Code Table 4.3: 0 analysis, 1 initialisation, 2 forecast, ... */
  generatingProcessType: number;
  bitsPerValue: number;
  /** Values actually packed in section 7 (grid points minus bitmap-missing points). */
  packedValueCount: number;
  hasBitmap: boolean;
  /** Scanning mode octet as stored (values are returned in canonical order regardless). */
  scanningMode: number;
}

/** A decoded field: metadata plus values in the canonical layout (index = j * nx + i, (0, 0) south-west). */
export interface Grib2Message extends Grib2FieldInfo {
  values: Float32Array;
  /** Points with no value (bitmap or missing value codes); their values are NaN. */
  missingCount: number;
}
