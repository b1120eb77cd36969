import { describe, expect, it } from "vitest";
import proj4 from "proj4";
import { interpretCfDataset } from "../../../server/ingest/netcdf/cf-dataset.ts";
import { readClassicNetcdf } from "../../../server/ingest/netcdf/classic-reader.ts";
import { NetcdfDecodeError } from "../../../server/ingest/netcdf/errors.ts";
import { gridCoordinates } from "../../../shared/grid/grid-coordinates.ts";
import { memoryDataset, memoryVariable, range, withAttributes, type AttributeInput } from "./memory-dataset.ts";
import { readFixture } from "./ncdump-listing.ts";

const RADIUS = 6_371_229;
const sphere = `+proj=longlat +R=${RADIUS} +no_defs`;

function projectedDataset(mapping: AttributeInput, xs: number[], ys: number[], extra: AttributeInput = {}) {
  const dims = { y: ys.length, x: xs.length };
  return memoryDataset([
    memoryVariable("crs", {}, [0], mapping, "int32"),
    memoryVariable("x", { x: xs.length }, xs, { standard_name: "projection_x_coordinate", units: "m" }),
    memoryVariable("y", { y: ys.length }, ys, { standard_name: "projection_y_coordinate", units: "m" }),
    memoryVariable("field", dims, range(0, 1, xs.length * ys.length), { units: "K", grid_mapping: "crs", ...extra }),
  ]);
}

function expectError(run: () => unknown, code: string, message: RegExp): void {
  let caught: unknown;
  try {
    run();
  } catch (error) {
    caught = error;
  }
  expect(caught).toBeInstanceOf(NetcdfDecodeError);
  expect((caught as NetcdfDecodeError).code).toBe(code);
  expect((caught as NetcdfDecodeError).message).toMatch(message);
}

describe("CF lambert_conformal_conic with false easting/northing", () => {
  const xs = range(200_000, 12_000, 5);
  const ys = range(100_000, 12_000, 4);
  const mapping = {
    grid_mapping_name: "lambert_conformal_conic",
    standard_parallel: [33, 45],
    longitude_of_central_meridian: -97,
    latitude_of_projection_origin: 40,
    false_easting: 500_000,
    false_northing: -200_000,
    earth_radius: RADIUS,
  };
  const definition = `+proj=lcc +lat_1=33 +lat_2=45 +lat_0=40 +lon_0=-97 +x_0=500000 +y_0=-200000 +R=${RADIUS} +units=m +no_defs`;

  it("every point's latitude/longitude matches proj4", () => {
    const decoded = interpretCfDataset(projectedDataset(mapping, xs, ys)).variables[0];
    const { lat, lon } = gridCoordinates(decoded.geometry);
    for (let j = 0; j < ys.length; j++) {
      for (let i = 0; i < xs.length; i++) {
        const [expectedLon, expectedLat] = proj4(definition, sphere, [xs[i], ys[j]]);
        // Source: proj4 library (2.22.0), same projection definition; float32 storage limits agreement to ~1e-5°.
        expect(lat[j * xs.length + i]).toBeCloseTo(expectedLat, 4);
        expect(lon[j * xs.length + i]).toBeCloseTo(expectedLon, 4);
      }
    }
  });

  it("accepts the extended grid_mapping form \"crs: x y\"", () => {
    const decoded = interpretCfDataset(projectedDataset(mapping, xs, ys, { grid_mapping: "crs: x y" })).variables[0];
    // Source: CF conventions 1.7+, section 5.6 (extended grid_mapping syntax).
    expect(decoded.geometry.kind).toBe("lambert");
  });

  it("refuses an ellipsoidal Earth for a projected grid", () => {
    // Source: WGS 84 semi-major axis 6378137 m, inverse flattening 298.257223563 (NIMA TR8350.2).
    const { earth_radius: _sphere, ...withoutRadius } = mapping;
    const ellipsoid = { ...withoutRadius, semi_major_axis: 6_378_137, inverse_flattening: 298.257223563 };
    expectError(() => interpretCfDataset(projectedDataset(ellipsoid, xs, ys)), "bad-attribute", /ellipsoid/);
  });

  it("names a missing grid mapping variable", () => {
    const dataset = projectedDataset(mapping, xs, ys, { grid_mapping: "lambert_projection" });
    expectError(() => interpretCfDataset(dataset), "unknown-grid-mapping", /lambert_projection/);
  });
});

describe("CF polar_stereographic, southern, with scale_factor_at_projection_origin", () => {
  const xs = range(-1_000_000, 50_000, 6);
  const ys = range(500_000, 50_000, 5);
  const k0 = (1 + Math.sin((71 * Math.PI) / 180)) / 2;
  const mapping = {
    grid_mapping_name: "polar_stereographic",
    straight_vertical_longitude_from_pole: 0,
    latitude_of_projection_origin: -90,
    scale_factor_at_projection_origin: k0,
    earth_radius: RADIUS,
  };

  it("recovers the true-scale latitude and matches proj4 everywhere", () => {
    const decoded = interpretCfDataset(projectedDataset(mapping, xs, ys)).variables[0];
    // Derived in closed form: k0 = (1 + sin 71°)/2 ⇔ true scale at 71° S.
    expect(decoded.geometry).toMatchObject({ kind: "polar", southPole: true });
    expect((decoded.geometry as { latTrue: number }).latTrue).toBeCloseTo(-71, 9);
    const definition = `+proj=stere +lat_0=-90 +lat_ts=-71 +lon_0=0 +R=${RADIUS} +units=m +no_defs`;
    const { lat, lon } = gridCoordinates(decoded.geometry);
    for (const [i, j] of [[0, 0], [5, 0], [0, 4], [5, 4], [2, 3]]) {
      const [expectedLon, expectedLat] = proj4(definition, sphere, [xs[i], ys[j]]);
      // Source: proj4 library (2.22.0), same projection definition.
      expect(lat[j * xs.length + i]).toBeCloseTo(expectedLat, 4);
      expect(lon[j * xs.length + i]).toBeCloseTo(expectedLon, 4);
    }
  });
});

describe("geometry checked against the file's own 2-D latitude/longitude", () => {
  it("a wrong false_easting is caught", () => {
    const raw = withAttributes(readClassicNetcdf(readFixture("lambert-km-nc6.nc")), "lambert", { false_easting: 50_000 });
    // Source: lambert-km.cdl (proj4 lat/lon); a 50 km shift is 1.25 grid lengths.
    expectError(() => interpretCfDataset(raw), "geometry-mismatch", /grid lengths away/);
  });
});

describe("latitude–longitude variants", () => {
  it("decreasing longitudes across the antimeridian are flipped and wrapped", () => {
    const lons = [-178, 180, 178, 176];
    const dataset = memoryDataset([
      memoryVariable("lat", { lat: 2 }, [10, 11], { units: "degrees_north" }),
      memoryVariable("lon", { lon: 4 }, lons, { units: "degrees_east" }),
      memoryVariable("field", { lat: 2, lon: 4 }, [0, 1, 2, 3, 4, 5, 6, 7], { units: "K" }),
    ]);
    const decoded = interpretCfDataset(dataset).variables[0];
    // Derived in closed form: eastward order is 176, 178, 180, 182 (= −178); the first column came last in the file.
    expect(decoded.geometry).toMatchObject({ kind: "latlon", lat0: 10, lon0: 176, dlon: 2, dlat: 1 });
    expect(Array.from(decoded.values[0][0])).toEqual([3, 2, 1, 0, 7, 6, 5, 4]);
  });

  it("2-D latitude/longitude without a grid mapping: regular is accepted, irregular refused", () => {
    const build = (lat: number[]) =>
      memoryDataset([
        memoryVariable("nav_lat", { y: 2, x: 2 }, lat, { units: "degrees_north" }),
        memoryVariable("nav_lon", { y: 2, x: 2 }, [5, 6, 5, 6], { units: "degrees_east" }),
        memoryVariable("field", { y: 2, x: 2 }, [1, 2, 3, 4], { units: "K", coordinates: "nav_lat nav_lon" }),
      ]);
    // Derived in closed form: rows at 50° and 51°, columns at 5° and 6° form a 1° grid.
    expect(interpretCfDataset(build([50, 50, 51, 51])).variables[0].geometry).toMatchObject({ kind: "latlon", lat0: 50, lon0: 5 });
    expectError(() => interpretCfDataset(build([50, 50.5, 51, 51])), "missing-coordinates", /do not form a regular/);
  });
});

describe("values and levels", () => {
  const base = (fieldAttributes: AttributeInput, levelAttributes: AttributeInput) =>
    memoryDataset([
      memoryVariable("lat", { lat: 2 }, [0, 1], { units: "degrees_north" }),
      memoryVariable("lon", { lon: 2 }, [0, 1], { units: "degrees_east" }),
      memoryVariable("lev", { lev: 2 }, [1, 2], levelAttributes),
      memoryVariable("field", { lev: 2, lat: 2, lon: 2 }, [1, 2, 3, 4, 5, 6, 7, 8], { units: "K", ...fieldAttributes }),
    ]);

  it("values outside valid_range are missing", () => {
    const decoded = interpretCfDataset(base({ valid_range: [2, 7] }, { units: "hPa" })).variables[0];
    // Source: CF conventions, section 2.5.1 (valid_range); 1 and 8 fall outside [2, 7].
    expect(decoded.values[0][0][0]).toBeNaN();
    expect(decoded.values[0][1][3]).toBeNaN();
    expect(decoded.missingCount).toBe(2);
  });

  it("a model-level vertical coordinate is skipped with a reason", () => {
    const decoded = interpretCfDataset(base({}, { standard_name: "model_level_number", axis: "Z" }));
    // Common practice (no source): only pressure and height-above-ground levels feed the diagnostics.
    expect(decoded.variables).toEqual([]);
    expect(decoded.skipped[0].reason).toMatch(/model_level_number/);
  });

  it("a time coordinate on an unsupported calendar is an error", () => {
    const dataset = memoryDataset([
      memoryVariable("time", { time: 1 }, [0], { units: "days since 2024-01-01", calendar: "360_day" }),
      memoryVariable("lat", { lat: 2 }, [0, 1], { units: "degrees_north" }),
      memoryVariable("lon", { lon: 2 }, [0, 1], { units: "degrees_east" }),
      memoryVariable("field", { time: 1, lat: 2, lon: 2 }, [1, 2, 3, 4], { units: "K" }),
    ]);
    // Source: CF conventions, section 4.4.1 (360_day calendar).
    expectError(() => interpretCfDataset(dataset), "bad-time", /360_day/);
  });
});

describe("variables without horizontal coordinates", () => {
  it("are skipped when other variables can be placed", () => {
    const dataset = memoryDataset([
      memoryVariable("lat", { lat: 2 }, [0, 1], { units: "degrees_north" }),
      memoryVariable("lon", { lon: 2 }, [0, 1], { units: "degrees_east" }),
      memoryVariable("field", { lat: 2, lon: 2 }, [1, 2, 3, 4], { units: "K" }),
      memoryVariable("station_series", { station: 3, sample: 2 }, [1, 2, 3, 4, 5, 6], { units: "K" }),
    ]);
    const decoded = interpretCfDataset(dataset);
    // Common practice (no source): one unplaceable side variable does not reject a usable file.
    expect(decoded.variables.map((v) => v.name)).toEqual(["field"]);
    expect(decoded.skipped).toEqual([{ name: "station_series", reason: expect.stringMatching(/x and y/) }]);
  });
});
