import { describe, expect, it } from "vitest";
import { decodeNetcdf, NetcdfDecodeError, type NetcdfErrorCode } from "../../../server/ingest/netcdf/index.ts";
import { readFixture } from "./ncdump-listing.ts";

async function expectDecodeError(bytes: Uint8Array, code: NetcdfErrorCode, message: RegExp): Promise<void> {
  const failure = await decodeNetcdf(bytes).then(
    () => undefined,
    (error: unknown) => error,
  );
  expect(failure).toBeInstanceOf(NetcdfDecodeError);
  expect((failure as NetcdfDecodeError).code).toBe(code);
  expect((failure as NetcdfDecodeError).message).toMatch(message);
}

describe("NetcdfDecodeError cases", () => {
  it("rejects bytes that are not NetCDF, naming what they start with", async () => {
    // Common practice (no source): a GRIB2 file begins with "GRIB", not a NetCDF signature.
    await expectDecodeError(new TextEncoder().encode("GRIB\u0000\u0000\u0000\u0002"), "not-netcdf", /47 52 49 42/);
    await expectDecodeError(new Uint8Array(0), "not-netcdf", /0 bytes/);
    // Source: Unidata NetCDF format specification; only versions 1, 2 (and 5) follow "CDF".
    await expectDecodeError(new Uint8Array([0x43, 0x44, 0x46, 0x03, 0, 0, 0, 0]), "not-netcdf", /CDF/);
  });

  it("refuses CDF-5 with a clear message", async () => {
    // Source: ncgen -k nc5 output (magic "CDF\x05").
    await expectDecodeError(readFixture("irregular-latitudes-cdf5.nc"), "unsupported-format", /CDF-5/);
  });

  it("reports a classic file cut inside its header as truncated", async () => {
    await expectDecodeError(readFixture("latlon-pressure-nc3.nc").subarray(0, 200), "truncated", /header/);
  });

  it("reports a classic file cut inside its data as truncated, naming the variable", async () => {
    const bytes = readFixture("latlon-pressure-nc3.nc");
    await expectDecodeError(bytes.subarray(0, bytes.length - 100), "truncated", /variable "\w+".*past the end/);
  });

  it("reports a cut NetCDF-4 file as truncated", async () => {
    const bytes = readFixture("polar-nc4.nc");
    // Source: HDF5 library error stack ("truncated file: eof = ...").
    await expectDecodeError(bytes.subarray(0, bytes.length >> 1), "truncated", /truncated file: eof = 16835/);
  });

  it("missing coordinates", async () => {
    // Source: missing-coordinates.cdl, temperature(y, x) with no coordinate variables.
    await expectDecodeError(readFixture("missing-coordinates-nc3.nc"), "missing-coordinates", /temperature.*x and y/);
  });

  it("unknown grid_mapping", async () => {
    // Source: unknown-grid-mapping.cdl, rotated_latitude_longitude.
    await expectDecodeError(readFixture("unknown-grid-mapping-nc3.nc"), "unknown-grid-mapping", /rotated_latitude_longitude/);
  });

  it("mismatched shapes between a variable and its 2-D coordinates", async () => {
    // Source: mismatched-shapes.cdl, lat(y_other, x) for temperature(y, x).
    await expectDecodeError(readFixture("mismatched-shapes-nc3.nc"), "shape-mismatch", /y_other.*\(y, x\)/);
  });

  it("unevenly spaced latitudes", async () => {
    // Source: irregular-latitudes.cdl, lat = 10, 20, 35.
    await expectDecodeError(readFixture("irregular-latitudes-nc3.nc"), "irregular-grid", /latitude is not evenly spaced/);
  });
});
