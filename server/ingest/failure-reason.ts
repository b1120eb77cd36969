import { Grib2DecodeError } from "./grib2/errors.ts";
import { NetcdfDecodeError } from "./netcdf/errors.ts";
import { FrameAssemblyError } from "./assemble-frames.ts";
import { GridShapeError, InvalidProfileError } from "../../shared/meteo/errors.ts";

const EXPLAINED = [Grib2DecodeError, NetcdfDecodeError, FrameAssemblyError, GridShapeError, InvalidProfileError];

/**
 * The reason shown on a failed ingest job. Errors the decoders and checks raise already say what is
 * wrong with the file; anything else is a fault of ours, and says so rather than showing a bare
 * programming message to a forecaster.
 */
export function ingestFailureReason(error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  if (EXPLAINED.some((kind) => error instanceof kind)) return message;
  return `Bellwether could not process this file because of an internal error (the server log has the details): ${message}`;
}
