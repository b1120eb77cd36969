import { beforeAll, describe, expect, it } from "vitest";
import { decodeNetcdf, netcdfToRecords, type NetcdfDataset, type NetcdfVariable } from "../../../server/ingest/netcdf/index.ts";
import { gridCoordinates } from "../../../shared/grid/grid-coordinates.ts";
import { ncdumpValues, readFixture } from "./ncdump-listing.ts";

const KNOT = 1852 / 3600;

function variable(dataset: NetcdfDataset, name: string): NetcdfVariable {
  const found = dataset.variables.find((candidate) => candidate.name === name);
  if (!found) throw new Error(`no variable ${name}`);
  return found;
}

/** Value at canonical (i, j) of slice (t, z). */
function at(v: NetcdfVariable, t: number, z: number, i: number, j: number): number {
  return v.values[t][z][j * v.geometry.nx + i];
}

describe("regular latitude–longitude file (classic)", () => {
  let dataset: NetcdfDataset;
  beforeAll(async () => {
    dataset = await decodeNetcdf(readFixture("latlon-pressure-nc3.nc"));
  });

  it("finds the gridded variables and no others", () => {
    // Source: CDL variable list of latlon-pressure.cdl.
    expect(dataset.format).toBe("netcdf3");
    expect(dataset.variables.map((v) => v.name)).toEqual(["temperature", "wind_u", "geopotential_height", "dewpoint_2m", "mslp", "cloud_cover"]);
    expect(dataset.skipped).toEqual([]);
  });

  it("builds the geometry with latitudes flipped to south-first and longitudes wrapped", () => {
    // Source: CDL data lat = 40, 39, 38, 37 and lon = 260 ... 264 (degrees east).
    expect(variable(dataset, "temperature").geometry).toEqual({
      kind: "latlon",
      nx: 5,
      ny: 4,
      earthRadius: 6_371_229,
      uvRelativeToGrid: false,
      lat0: 37,
      lon0: -100,
      dlat: 1,
      dlon: 1,
    });
  });

  it("shares one geometry object between variables on the same grid", () => {
    // Common practice (no source): equal grids are one object, so frame assembly can compare by reference.
    expect(variable(dataset, "mslp").geometry).toBe(variable(dataset, "temperature").geometry);
  });

  it("reads times, model run and pressure levels in SI", () => {
    const temperature = variable(dataset, "temperature");
    // Source: CDL time = 0, 6 "hours since 2024-05-20 12:00:00"; reference_time = 0; isobaric = 850, 700, 500 hPa.
    expect(temperature.times).toEqual(["2024-05-20T12:00:00.000Z", "2024-05-20T18:00:00.000Z"]);
    expect(temperature.runTime).toBe("2024-05-20T12:00:00.000Z");
    expect(temperature.levelType).toBe("isobaric");
    expect(temperature.levels).toEqual([85_000, 70_000, 50_000]);
  });

  it("unpacks scale_factor/add_offset and turns _FillValue into NaN", () => {
    const temperature = variable(dataset, "temperature");
    // Source: CDL data (raw 640 at lat 37, lon 260, 850 hPa, t = 0; raw 1028 at lat 40, lon 264) × 0.01 + 273.15.
    expect(at(temperature, 0, 0, 0, 0)).toBeCloseTo(279.55, 4);
    expect(at(temperature, 0, 0, 4, 3)).toBeCloseTo(283.43, 4);
    // Source: CDL data, "_" at t = 1, 500 hPa, lat 40, lon 264.
    expect(at(temperature, 1, 2, 4, 3)).toBeNaN();
    expect(temperature.missingCount).toBe(1);
    expect(temperature.units).toBe("K");
  });

  it("converts knots to m/s and honours missing_value", () => {
    const wind = variable(dataset, "wind_u");
    // Source: CDL data, 7.5 kt at lat 37, lon 261, 850 hPa; 1 kt = 1852/3600 m/s by definition.
    expect(at(wind, 0, 0, 1, 0)).toBeCloseTo(7.5 * KNOT, 5);
    // Source: CDL data, missing_value -999 at lat 37, lon 260.
    expect(at(wind, 0, 0, 0, 0)).toBeNaN();
    expect(wind.units).toBe("m s-1");
    expect(wind.sourceUnits).toBe("knots");
  });

  it("reads a scalar height coordinate as a level above ground and converts degC to K", () => {
    const dewpoint = variable(dataset, "dewpoint_2m");
    // Source: CDL scalar coordinate height = 2 m; dewpoint 14 degC at t = 1, lat 38, lon 262.
    expect(dewpoint.levelType).toBe("heightAboveGround");
    expect(dewpoint.levels).toEqual([2]);
    expect(at(dewpoint, 1, 0, 2, 1)).toBeCloseTo(287.15, 4);
  });

  it("treats the library default fill as missing when no _FillValue is declared, and converts hPa", () => {
    const mslp = variable(dataset, "mslp");
    // Source: CDL data, "_" (default float fill) at t = 1, lat 38, lon 261; 1003 hPa at t = 0, lat 37, lon 260.
    expect(at(mslp, 1, 0, 1, 1)).toBeNaN();
    expect(at(mslp, 0, 0, 0, 0)).toBeCloseTo(100_300, 1);
    expect(mslp.levelType).toBe("surface");
    expect(mslp.levels).toBeNull();
  });

  it("reads signed bytes with a negative _FillValue", () => {
    const cloud = variable(dataset, "cloud_cover");
    // Source: CDL data, -1b fill at t = 0, lat 40, lon 260; 60 % at lat 37, lon 260.
    expect(at(cloud, 0, 0, 0, 3)).toBeNaN();
    expect(at(cloud, 0, 0, 0, 0)).toBe(60);
    expect(cloud.missingCount).toBe(1);
  });

  it("every temperature value matches ncdump after unpacking and flipping", () => {
    const listing = ncdumpValues("latlon-pressure-nc3.ncdump.txt").get("temperature")!;
    const temperature = variable(dataset, "temperature");
    // Source: ncdump listing (file order t, level, lat north→south, lon), raw × 0.01 + 273.15.
    listing.forEach((raw, k) => {
      const x = k % 5;
      const fileRow = Math.floor(k / 5) % 4;
      const z = Math.floor(k / 20) % 3;
      const t = Math.floor(k / 60);
      const decoded = at(temperature, t, z, x, 3 - fileRow);
      if (raw === null) expect(decoded).toBeNaN();
      else expect(decoded).toBeCloseTo(raw * 0.01 + 273.15, 3);
    });
  });
});

describe("the same CDL written as 64-bit offset and NetCDF-4 decodes identically", () => {
  let classic: NetcdfDataset;
  beforeAll(async () => {
    classic = await decodeNetcdf(readFixture("latlon-pressure-nc3.nc"));
  });
  it.each(["latlon-pressure-nc6.nc", "latlon-pressure-nc4.nc"])("%s", async (file) => {
    const other = await decodeNetcdf(readFixture(file));
    // Source: one CDL source (latlon-pressure.cdl) given to ncgen -k nc3 / nc6 / nc4.
    expect(other.format).toBe(file.endsWith("nc4.nc") ? "netcdf4" : "netcdf3");
    expect(other.variables).toEqual(classic.variables);
  });
});

describe("Lambert conformal file with x/y in km", () => {
  let dataset: NetcdfDataset;
  beforeAll(async () => {
    dataset = await decodeNetcdf(readFixture("lambert-km-nc6.nc"));
  });
  const listing = ncdumpValues("lambert-km-nc6.ncdump.txt");

  it("builds a Lambert geometry from the grid mapping", () => {
    const geometry = variable(dataset, "cape").geometry;
    // Source: CDL grid mapping (standard_parallel 25, central meridian 265, R 6371229) and x/y spacing 40 km.
    expect(geometry).toMatchObject({ kind: "lambert", nx: 6, ny: 4, dx: 40_000, dy: 40_000, lonV: -95, latin1: 25, latin2: 25, earthRadius: 6_371_229 });
  });

  it("reproduces the file's 2-D latitude/longitude at every point", () => {
    const { lat, lon } = gridCoordinates(variable(dataset, "cape").geometry);
    const fileLat = listing.get("lat")!;
    const fileLon = listing.get("lon")!;
    for (let fileRow = 0; fileRow < 4; fileRow++) {
      for (let i = 0; i < 6; i++) {
        const k = (3 - fileRow) * 6 + i; // y runs north to south in the file
        // Source: proj4 2.22.0 inverse (sphere R = 6371229 m) written into lambert-km.cdl at 5 decimals.
        expect(lat[k]).toBeCloseTo(fileLat[fileRow * 6 + i]!, 4);
        expect(lon[k]).toBeCloseTo(fileLon[fileRow * 6 + i]!, 4);
      }
    }
  });

  it("marks the grid as carrying grid-relative winds, on one geometry shared by all its variables", () => {
    // Source: CF standard names x_wind/y_wind are along the grid axes (CF standard name table).
    expect(variable(dataset, "x_wind").geometry.uvRelativeToGrid).toBe(true);
    expect(variable(dataset, "cape").geometry).toBe(variable(dataset, "x_wind").geometry);
  });

  it("keeps the flag off on a projected grid without grid-relative winds", async () => {
    const polar = await decodeNetcdf(readFixture("polar-nc4.nc"));
    // Source: polar-nc4.cdl holds wind_speed only, no x_wind/y_wind.
    expect(polar.variables[0].geometry.uvRelativeToGrid).toBe(false);
  });

  it("exposes the global attributes", () => {
    // Source: CDL global attribute :Conventions = "CF-1.8".
    expect(dataset.globalAttributes.Conventions).toBe("CF-1.8");
  });

  it("flips y, reads minutes since an ISO date and seconds since 1970", () => {
    const wind = variable(dataset, "x_wind");
    // Source: CDL data x_wind = 10 at the north-east corner (first row of the file, last column).
    expect(at(wind, 0, 0, 5, 3)).toBe(10);
    // Source: CDL data, 3.5 at the south-west corner (last file row).
    expect(at(wind, 0, 0, 0, 0)).toBe(3.5);
    // Source: CDL time = 180 minutes since 2024-05-20T12:00:00Z; forecast_reference_time = 1716206400 s since 1970.
    expect(wind.times).toEqual(["2024-05-20T15:00:00.000Z"]);
    expect(wind.runTime).toBe("2024-05-20T12:00:00.000Z");
  });

  it("converts g/kg to kg/kg at 2 m above ground", () => {
    const q = variable(dataset, "specific_humidity_2m");
    // Source: CDL data, 11 g/kg at the south-west corner; scalar height = 2 m.
    expect(at(q, 0, 0, 0, 0)).toBeCloseTo(0.011, 7);
    expect(q.units).toBe("kg kg-1");
    expect(q.levelType).toBe("heightAboveGround");
  });

  it("NetCDF-4 copy decodes to the same variables", async () => {
    const nc4 = await decodeNetcdf(readFixture("lambert-km-nc4.nc"));
    // Source: one CDL source (lambert-km.cdl) given to ncgen -k nc6 and -k nc4.
    expect(nc4.variables).toEqual(dataset.variables);
  });
});

describe("polar stereographic NetCDF-4 file (deflate, shuffle, chunks)", () => {
  let dataset: NetcdfDataset;
  beforeAll(async () => {
    dataset = await decodeNetcdf(readFixture("polar-nc4.nc"));
  });

  it("builds the polar geometry; its first point matches proj4", () => {
    const geometry = variable(dataset, "temperature").geometry;
    expect(dataset.format).toBe("netcdf4");
    expect(geometry).toMatchObject({ kind: "polar", nx: 5, ny: 4, dx: 100_000, dy: 100_000, lonV: -105, latTrue: 60, southPole: false });
    // Source: proj4 2.22.0 inverse of (x, y) = (-2000 km, -3000 km), +proj=stere +lat_0=90 +lat_ts=60 +lon_0=-105 +R=6371229.
    expect(geometry.lat0).toBeCloseTo(56.257940168398875, 8);
    expect(geometry.lon0).toBeCloseTo(-138.69006752597977, 8);
  });

  it("transposes a variable stored x before y", () => {
    const wind = variable(dataset, "wind_speed");
    // Source: CDL data wind_speed(time, pressure, x, y) = 20 + 10 p + t + x + 0.1 y, here t = 1, p = 1, x = 3, y = 2.
    expect(at(wind, 1, 1, 3, 2)).toBeCloseTo(34.2, 5);
    expect(at(wind, 0, 0, 1, 0)).toBeCloseTo(21, 5);
    expect(at(wind, 0, 0, 0, 1)).toBeCloseTo(20.1, 5);
  });

  it("reads pressure in Pa, times and the run from the reftime coordinate", () => {
    const wind = variable(dataset, "wind_speed");
    // Source: CDL pressure = 50000, 25000 Pa; time = 12, 18 hours since 2024-05-20 00:00; reftime = 0.
    expect(wind.levels).toEqual([50_000, 25_000]);
    expect(wind.times).toEqual(["2024-05-20T12:00:00.000Z", "2024-05-20T18:00:00.000Z"]);
    expect(wind.runTime).toBe("2024-05-20T00:00:00.000Z");
    // Common practice (no source): a variable without its own reference coordinate takes the file's only one.
    expect(variable(dataset, "temperature").runTime).toBe("2024-05-20T00:00:00.000Z");
  });

  it("unpacks an unsigned short with its fill value, and converts degC", () => {
    const rh = variable(dataset, "relative_humidity");
    // Source: CDL data, raw 5210 × 0.01 at t = 0, 500 hPa, x = 1, y = 2; 65535 fill at t = 1, 250 hPa, x = 4, y = 3.
    expect(at(rh, 0, 0, 1, 2)).toBeCloseTo(52.1, 4);
    expect(at(rh, 1, 1, 4, 3)).toBeNaN();
    expect(rh.missingCount).toBe(1);
    const temperature = variable(dataset, "temperature");
    // Source: CDL data, -15 degC at t = 0, 500 hPa, x = 4, y = 3.
    expect(at(temperature, 0, 0, 4, 3)).toBeCloseTo(258.15, 4);
  });
});

describe("netcdfToRecords", () => {
  let dataset: NetcdfDataset;
  let records: ReturnType<typeof netcdfToRecords>;
  beforeAll(async () => {
    dataset = await decodeNetcdf(readFixture("latlon-pressure-nc3.nc"));
    records = netcdfToRecords(dataset);
  });

  it("gives one record per variable, time and level", () => {
    // Derived in closed form: 3 variables × 2 times × 3 levels + 3 variables × 2 times × 1 level.
    expect(records).toHaveLength(24);
  });

  it("carries parameter key, level, times and the same values array", () => {
    const record = records.find((r) => r.parameterKey === "air_temperature" && r.level === 70_000 && r.validTime === "2024-05-20T18:00:00.000Z");
    // Source: CDL (air_temperature at 700 hPa, second time).
    expect(record).toMatchObject({ variableName: "temperature", levelType: "isobaric", unit: "K", refTime: "2024-05-20T12:00:00.000Z" });
    expect(record!.values).toBe(variable(dataset, "temperature").values[1][1]);
    const surface = records.find((r) => r.variableName === "mslp")!;
    expect(surface.levelType).toBe("surface");
    expect(surface.level).toBeNull();
  });
});

describe("variables Bellwether cannot place are skipped with a reason", () => {
  it("a record dimension without a time coordinate", async () => {
    const dataset = await decodeNetcdf(readFixture("single-record-short-nc3.nc"));
    // Source: single-record-short.cdl declares no coordinate variable for its time dimension.
    expect(dataset.variables).toEqual([]);
    expect(dataset.skipped).toEqual([{ name: "snow_depth", reason: expect.stringContaining('"time"') }]);
  });
});
