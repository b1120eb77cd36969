/** Why a NetCDF file could not be decoded; stable strings that callers and tests can switch on. */
export type NetcdfErrorCode =
  | "not-netcdf"
  | "unsupported-format"
  | "truncated"
  | "missing-coordinates"
  | "unknown-grid-mapping"
  | "shape-mismatch"
  | "irregular-grid"
  | "geometry-mismatch"
  | "bad-time"
  | "bad-attribute";

/**
 * Raised for any NetCDF input the decoder cannot honour. The message names the variable (when
 * one is involved) and says what was expected and what was found.
 */
export class NetcdfDecodeError extends Error {
  readonly code: NetcdfErrorCode;
  readonly variable: string | undefined;

  constructor(code: NetcdfErrorCode, message: string, variable?: string) {
    super(variable === undefined ? `NetCDF: ${message}` : `NetCDF variable "${variable}": ${message}`);
    this.name = "NetcdfDecodeError";
    this.code = code;
    this.variable = variable;
  }
}
