import { describe, expect, it } from "vitest";
import { decodeGrib2, scanGrib2, type Grib2Message } from "../../../server/ingest/grib2/index.ts";
import { expectMatchesListing } from "./helpers/compare.ts";
import { readFixture, readListing } from "./helpers/fixtures.ts";
import { gridPosition } from "./helpers/grid-position.ts";

/** ecCodes prints latitudes and longitudes to 1e-6 degree, a few centimetres on these grids. */
const PROJECTED_POSITION_TOLERANCE = 1e-4;

/**
 * For grids scanned northward (+j, mode 0x40, as models write Lambert and polar grids) ecCodes' listing is the
 * reference for every point. For southward scanning (mode 0x00) ecCodes 2.28 lists the grid as if the first grid
 * point were the south-west corner, i.e. (ny - 1) rows north of where WMO-No. 306 puts it (Flag Table 3.4 bit 2:
 * rows run in -j from the first point). Those fixtures are checked in two parts: relative positions and values
 * against ecCodes with the grid anchored where ecCodes anchors it, and the corner against the WMO definition.
 */
function anchoredAtFirstPoint(field: Grib2Message, lat1: number, lon1: number): Grib2Message {
  return { ...field, geometry: { ...field.geometry, lat0: lat1, lon0: lon1 } };
}

describe("Lambert conformal grids (template 3.30)", () => {
  it("lambert-40.grib2: every ecCodes point lands on its canonical cell", () => {
    const [field] = decodeGrib2(readFixture("lambert-40.grib2"));
    const geometry = field.geometry;
    if (geometry.kind !== "lambert") throw new Error("expected a Lambert grid");
    // Source: header values written by make-fixtures.sh through ecCodes (LoV 262.5, Latin 38.5, Dx = Dy = 40635 m)
    expect([geometry.nx, geometry.ny, geometry.dx, geometry.dy]).toEqual([12, 9, 40635, 40635]);
    expect([geometry.lonV, geometry.latin1, geometry.latin2]).toEqual([262.5, 38.5, 38.5]);
    // Source: WMO-No. 306 Code Table 3.2, shape 6 (sphere of radius 6 371 229 m)
    expect(geometry.earthRadius).toBe(6371229);
    // Source: make-fixtures.sh puts the first grid point at 32N 255E; with +j scanning it is the south-west point
    expect([geometry.lat0, geometry.lon0]).toEqual([32, 255]);
    // Source: ecCodes 2.28 grib_get_data (latitude and longitude of every point)
    expectMatchesListing(field, readListing("lambert-40.grib2")[0], PROJECTED_POSITION_TOLERANCE);
  });

  it("lambert-00.grib2: values and spacing agree with ecCodes, and the first point is the north-west corner", () => {
    const [field] = decodeGrib2(readFixture("lambert-00.grib2"));
    // Source: make-fixtures.sh puts the first grid point at 45N 250E
    const [lat1, lon1] = [45, 250];
    // Source: ecCodes 2.28 grib_get_data, with the grid anchored at the first point as ecCodes does
    expectMatchesListing(anchoredAtFirstPoint(field, lat1, lon1), readListing("lambert-00.grib2")[0], PROJECTED_POSITION_TOLERANCE);
    // Source: WMO-No. 306 Flag Table 3.4 bit 2 = 0: the first stored row is the northernmost, so the first point is
    // the west end of the top canonical row (i = 0, j = ny - 1)
    const { i, j } = gridPosition(field.geometry, lat1, lon1);
    expect(i).toBeCloseTo(0, 6);
    expect(j).toBeCloseTo(field.geometry.ny - 1, 6);
    expect(field.geometry.lat0).toBeLessThan(lat1);
  });

  it("reads the winds-relative-to-grid flag", () => {
    // Source: make-fixtures.sh sets uvRelativeToGrid = 1 on the Lambert fixtures; lat-lon fixtures keep 0
    expect(scanGrib2(readFixture("lambert-40.grib2"))[0].geometry.uvRelativeToGrid).toBe(true);
    expect(scanGrib2(readFixture("simple-16bit.grib2"))[0].geometry.uvRelativeToGrid).toBe(false);
  });
});

describe("polar stereographic grids (template 3.20)", () => {
  it("polar-40.grib2: every ecCodes point lands on its canonical cell", () => {
    const [field] = decodeGrib2(readFixture("polar-40.grib2"));
    const geometry = field.geometry;
    if (geometry.kind !== "polar") throw new Error("expected a polar stereographic grid");
    // Source: header values written by make-fixtures.sh through ecCodes (LaD 60N, LoV 255, 90 km, north pole)
    expect([geometry.dx, geometry.dy, geometry.latTrue, geometry.lonV, geometry.southPole]).toEqual([90000, 90000, 60, 255, false]);
    expect([geometry.lat0, geometry.lon0]).toEqual([40, 230]);
    // Source: ecCodes 2.28 grib_get_data (latitude and longitude of every point)
    expectMatchesListing(field, readListing("polar-40.grib2")[0], PROJECTED_POSITION_TOLERANCE);
  });

  it("polar-00.grib2: values and spacing agree with ecCodes, and the first point is the north-west corner", () => {
    const [field] = decodeGrib2(readFixture("polar-00.grib2"));
    // Source: make-fixtures.sh puts the first grid point at 60N 230E
    const [lat1, lon1] = [60, 230];
    // Source: ecCodes 2.28 grib_get_data, with the grid anchored at the first point as ecCodes does
    expectMatchesListing(anchoredAtFirstPoint(field, lat1, lon1), readListing("polar-00.grib2")[0], PROJECTED_POSITION_TOLERANCE);
    // Source: WMO-No. 306 Flag Table 3.4 bit 2 = 0 (first stored row is the top row)
    const { i, j } = gridPosition(field.geometry, lat1, lon1);
    expect(i).toBeCloseTo(0, 6);
    expect(j).toBeCloseTo(field.geometry.ny - 1, 6);
  });
});

describe("shape of the Earth (WMO-No. 306 Code Table 3.2)", () => {
  const fields = scanGrib2(readFixture("multi-message.grib2"));

  it("code 6 is a sphere of 6 371 229 m", () => {
    // Source: WMO-No. 306 Code Table 3.2, code figure 6
    expect(fields[0].earthShape).toMatchObject({ code: 6, semiMajorAxis: 6371229, semiMinorAxis: 6371229 });
  });

  it("code 1 takes the radius written in the message", () => {
    // Source: make-fixtures.sh writes radius 6371000 m, scale factor 0, through ecCodes
    expect(fields[11].earthShape).toMatchObject({ code: 1, sphereRadius: 6371000 });
  });

  it("code 5 is the WGS 84 spheroid, and grids use its mean radius (2a + b) / 3", () => {
    const shape = fields[12].earthShape;
    // Source: WMO-No. 306 Code Table 3.2 code 5; NIMA TR8350.2 (a = 6378137 m, 1/f = 298.257223563)
    expect(shape.code).toBe(5);
    expect(shape.semiMajorAxis).toBe(6378137);
    expect(shape.semiMinorAxis).toBeCloseTo(6356752.3142, 4);
    // Source: Moritz (1980), Geodetic Reference System 1980: mean radius R1 = 6371008.7714 m (GRS80, same to 0.1 mm)
    expect(shape.sphereRadius).toBeCloseTo(6371008.7714, 3);
    expect(fields[12].geometry.earthRadius).toBe(shape.sphereRadius);
  });

  it("code 0 is a sphere of 6 367 470 m", () => {
    // Source: WMO-No. 306 Code Table 3.2, code figure 0
    expect(fields[13].earthShape.sphereRadius).toBe(6367470);
  });
});
