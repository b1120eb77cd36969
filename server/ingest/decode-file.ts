import type { GridFileFormat } from "./detect-format.ts";
import type { GridRecord } from "./grid-record.ts";

/** Decodes a grid file into format-neutral records. */
export function decodeGridFile(_bytes: Uint8Array, format: GridFileFormat): GridRecord[] {
  // Wired to the GRIB2 and NetCDF decoders once they land (issue 4).
  throw new Error(`Decoding ${format} files is not wired up yet.`);
}
