import { detectNetcdfFlavour } from "./netcdf/detect-format.ts";

export type GridFileFormat = "grib2" | "netcdf";

/**
 * The file's format from its first bytes, never from its name: "GRIB" with edition 2 in octet 8
 * (WMO Manual on Codes, GRIB2 section 0), or a NetCDF classic / 64-bit offset / HDF5 signature.
 */
export function detectGridFormat(head: Uint8Array): GridFileFormat | null {
  if (head.length >= 8 && head[0] === 0x47 && head[1] === 0x52 && head[2] === 0x49 && head[3] === 0x42 && head[7] === 2) return "grib2";
  const flavour = detectNetcdfFlavour(head);
  return flavour === "classic" || flavour === "64-bit-offset" || flavour === "hdf5" ? "netcdf" : null;
}

/** What to tell someone whose file is neither. */
export function describeUnknownFormat(head: Uint8Array): string {
  if (head.length >= 8 && head[0] === 0x47 && head[1] === 0x52 && head[2] === 0x49 && head[3] === 0x42) {
    return `The file is GRIB edition ${head[7]}; Bellwether reads GRIB edition 2 only.`;
  }
  if (head.length >= 4 && head[0] === 0x43 && head[1] === 0x44 && head[2] === 0x46 && head[3] === 5) {
    return "The file is NetCDF CDF-5 (64-bit data), which Bellwether does not read; write classic, 64-bit offset or NetCDF-4.";
  }
  return "The file is neither GRIB2 nor NetCDF (its first bytes match no known signature).";
}
