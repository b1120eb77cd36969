/**
 * Entry point of the NetCDF decoder: bytes in, CF-interpreted gridded variables out.
 * Classic and 64-bit offset files go through netcdfjs, NetCDF-4 through h5wasm.
 */
import { NetcdfDecodeError } from "./errors.ts";
import { detectNetcdfFlavour } from "./detect-format.ts";
import { readClassicNetcdf } from "./classic-reader.ts";
import { withHdf5Netcdf } from "./hdf5-reader.ts";
import { interpretCfDataset } from "./cf-dataset.ts";
import type { NetcdfDataset } from "./netcdf-types.ts";

/**
 * Decodes a NetCDF file. Asynchronous because the HDF5 library behind NetCDF-4 is WebAssembly
 * that loads asynchronously on first use. Throws NetcdfDecodeError with a `code` for bad input.
 */
export async function decodeNetcdf(bytes: Uint8Array): Promise<NetcdfDataset> {
  const flavour = detectNetcdfFlavour(bytes);
  switch (flavour) {
    case "classic":
    case "64-bit-offset":
      return interpretCfDataset(readClassicNetcdf(bytes));
    case "hdf5":
      return withHdf5Netcdf(bytes, interpretCfDataset);
    case "cdf5":
      throw new NetcdfDecodeError("unsupported-format", "CDF-5 (64-bit data) files are not supported; write classic, 64-bit offset or NetCDF-4");
    default:
      throw new NetcdfDecodeError("not-netcdf", `no NetCDF signature: the file starts with ${describeStart(bytes)}, expected "CDF\\x01", "CDF\\x02" or the HDF5 signature`);
  }
}

function describeStart(bytes: Uint8Array): string {
  if (bytes.length === 0) return "nothing (0 bytes)";
  const head = Array.from(bytes.subarray(0, 8), (byte) => byte.toString(16).padStart(2, "0")).join(" ");
  return `bytes ${head} (${bytes.length} bytes long)`;
}
