import { describe, it } from "vitest";
import { decodeGrib2 } from "../../../server/ingest/grib2/index.ts";
import { projectionForGeometry } from "../../../shared/grid/projection.ts";
import { expectMatchesListing } from "./helpers/compare.ts";
import { readFixture, readListing } from "./helpers/fixtures.ts";

/**
 * The decoder only describes a grid; shared/grid turns that description into positions. Placing ecCodes' listed
 * latitude/longitude of every point with shared/grid's projection must land each value on the canonical cell the
 * decoder put it in, so the two modules agree on what (lat0, lon0) and the spacing mean.
 */
describe("decoded geometries read the same through shared/grid projections", () => {
  it.each([
    ["simple-16bit.grib2", 1e-6],
    ["scan-c0.grib2", 1e-6],
    ["scan-e0.grib2", 1e-6],
    // ecCodes prints positions to 1e-6 degree, a few centimetres on 40-90 km grids.
    ["lambert-40.grib2", 1e-4],
    ["polar-40.grib2", 1e-4],
  ])("%s", (name, tolerance) => {
    const [field] = decodeGrib2(readFixture(name));
    const projection = projectionForGeometry(field.geometry);
    const out = { i: 0, j: 0 };
    // Source: ecCodes 2.28 grib_get_data (latitude, longitude and value of every point)
    expectMatchesListing(field, readListing(name)[0], tolerance, (lat, lon) => {
      projection.latLonToGrid(lat, lon, out);
      return { i: out.i, j: out.j };
    });
  });
});
