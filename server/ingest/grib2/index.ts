/** GRIB2 decoder: public surface. Everything else in this folder is internal. */
export { decodeGrib2, scanGrib2, type DecodeOptions } from "./decode.ts";
export { loadGrib2Codecs } from "./codecs.ts";
export { decodeGrib2ForBenchmark } from "./bench-hook.ts";
export { Grib2DecodeError } from "./errors.ts";
export type { Grib2FieldInfo, Grib2Message } from "./field-types.ts";
export type { EarthShape } from "./earth-shape.ts";
export type { ParameterInfo } from "./parameters.ts";
export type { StatisticalPeriod, EnsembleMember } from "./product-templates.ts";
