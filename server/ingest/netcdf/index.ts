/** Public surface of the NetCDF decoder. */
export { decodeNetcdf } from "./decode-netcdf.ts";
export { preloadNetcdf4Support } from "./hdf5-reader.ts";
export { netcdfToRecords, type NetcdfFieldRecord } from "./netcdf-records.ts";
export { NetcdfDecodeError, type NetcdfErrorCode } from "./errors.ts";
export type { NetcdfDataset, NetcdfVariable, NetcdfLevelType, SkippedVariable } from "./netcdf-types.ts";
