import type { GridFileFormat } from "./detect-format.ts";
import type { GridRecord } from "./grid-record.ts";
import { decodeGrib2, loadGrib2Codecs } from "./grib2/index.ts";
import { grib2ToRecords } from "./grib2-records.ts";
import { decodeNetcdf } from "./netcdf/index.ts";
import { netcdfToGridRecords } from "./netcdf-grid-records.ts";

/** Decodes a grid file into format-neutral records (SI units, canonical point order). */
export async function decodeGridFile(bytes: Uint8Array, format: GridFileFormat): Promise<GridRecord[]> {
  if (format === "grib2") {
    // The JPEG 2000 codec is WebAssembly and loads once, asynchronously.
    await loadGrib2Codecs();
    return grib2ToRecords(decodeGrib2(bytes));
  }
  // NetCDF-4 needs the HDF5 WebAssembly, which decodeNetcdf loads on first use.
  return netcdfToGridRecords(await decodeNetcdf(bytes));
}
