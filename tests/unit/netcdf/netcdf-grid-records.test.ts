import { describe, expect, it } from "vitest";
import { decodeNetcdf } from "../../../server/ingest/netcdf/index.ts";
import { netcdfToGridRecords } from "../../../server/ingest/netcdf-grid-records.ts";
import { decodeGridFile } from "../../../server/ingest/decode-file.ts";
import { assembleFrames } from "../../../server/ingest/assemble-frames.ts";
import { interpretCfDataset } from "../../../server/ingest/netcdf/cf-dataset.ts";
import { memoryDataset, memoryVariable } from "./memory-dataset.ts";
import { readFixture } from "./ncdump-listing.ts";

describe("NetCDF variables as format-neutral grid records", () => {
  it("maps CF standard names to frame parameters with level kinds", async () => {
    const records = netcdfToGridRecords(await decodeNetcdf(readFixture("latlon-pressure-nc3.nc")));
    // Source: CF standard name table (air_temperature, eastward_wind, geopotential_height, dew_point_temperature).
    const temperature = records.find((r) => r.parameter === "temperature" && r.level === 50_000 && r.validTime === "2024-05-20T12:00:00.000Z");
    expect(temperature).toMatchObject({ levelKind: "isobaric", runTime: "2024-05-20T12:00:00.000Z", model: "Bellwether test fixture: regular latitude-longitude grid" });
    expect(records.filter((r) => r.parameter === "u_wind")).toHaveLength(6);
    expect(records.find((r) => r.parameter === "dewpoint")).toMatchObject({ levelKind: "height_above_ground", level: 2 });
    // Common practice (no source): fields frame assembly does not use (mean sea level pressure, cloud cover) are listed with no parameter.
    expect(records.filter((r) => r.parameter === null).map((r) => r.sourceName)).toContain("mslp (air_pressure_at_mean_sea_level, Pa)");
  });

  it("hands relative humidity over as a fraction and grid-relative winds with their flag", async () => {
    const polar = netcdfToGridRecords(await decodeNetcdf(readFixture("polar-nc4.nc")));
    const rh = polar.find((r) => r.parameter === "relative_humidity" && r.level === 50_000)!;
    // Source: polar-nc4.cdl, RH raw 5210 × 0.01 = 52.1 % at x = 1, y = 2 → 0.521.
    expect(rh.values[2 * 5 + 1]).toBeCloseTo(0.521, 5);
    const lambert = netcdfToGridRecords(await decodeNetcdf(readFixture("lambert-km-nc6.nc")));
    // Source: lambert-km.cdl, x_wind/y_wind (grid-relative by their CF standard names).
    expect(lambert.find((r) => r.parameter === "u_wind")!.geometry.uvRelativeToGrid).toBe(true);
  });

  it("takes the earliest valid time as the run of a file without a reference time", () => {
    const dataset = interpretCfDataset(
      memoryDataset([
        memoryVariable("time", { time: 2 }, [6, 0], { units: "hours since 2024-05-20 00:00" }),
        memoryVariable("lat", { lat: 2 }, [0, 1], { units: "degrees_north" }),
        memoryVariable("lon", { lon: 2 }, [0, 1], { units: "degrees_east" }),
        memoryVariable("t", { time: 2, lat: 2, lon: 2 }, [1, 2, 3, 4, 5, 6, 7, 8], { units: "K", standard_name: "air_temperature" }),
      ]),
    );
    // Common practice (no source): an analysis file's run is its earliest valid time (here 00 UTC).
    expect(netcdfToGridRecords(dataset).map((r) => r.runTime)).toEqual(["2024-05-20T00:00:00.000Z", "2024-05-20T00:00:00.000Z"]);
  });

  it("does not map a temperature whose units were not understood", () => {
    const dataset = interpretCfDataset(
      memoryDataset([
        memoryVariable("lat", { lat: 2 }, [0, 1], { units: "degrees_north" }),
        memoryVariable("lon", { lon: 2 }, [0, 1], { units: "degrees_east" }),
        memoryVariable("reference_time", {}, [0], { units: "hours since 2024-05-20 00:00" }),
        memoryVariable("t", { lat: 2, lon: 2 }, [1, 2, 3, 4], { units: "degrees Rankine", standard_name: "air_temperature" }),
      ]),
    );
    // Common practice (no source): a value in a unit the decoder cannot convert is never used as if it were SI.
    expect(netcdfToGridRecords(dataset)[0].parameter).toBeNull();
  });
});

describe("decodeGridFile", () => {
  it("routes NetCDF files through the NetCDF decoder", async () => {
    const records = await decodeGridFile(readFixture("lambert-km-nc4.nc"), "netcdf");
    // Source: lambert-km.cdl holds 4 single-level variables at one time.
    expect(records).toHaveLength(4);
    expect(records.map((r) => r.parameter)).toEqual(["u_wind", "v_wind", null, "specific_humidity"]);
  });
});

describe("a complete NetCDF file assembles into a frame", () => {
  it("every field lands where frame assembly expects it", async () => {
    const { frames, ignored } = assembleFrames(await decodeGridFile(readFixture("frame-latlon-nc4.nc"), "netcdf"));
    // Source: frame-latlon.cdl (run 12 UTC, valid 18 UTC; levels 1000/850/500 hPa; uniform values per level).
    expect(frames).toHaveLength(1);
    expect(ignored).toEqual([]);
    const [frame] = frames;
    expect(frame).toMatchObject({ model: "Bellwether fixture model", runTime: "2024-05-20T12:00:00.000Z", validTime: "2024-05-20T18:00:00.000Z", forecastHour: 6 });
    expect(frame.levels).toEqual([100_000, 85_000, 50_000]);
    expect(frame.grid.temperature[9 * 2]).toBe(262);
    expect(frame.grid.humidity.kind).toBe("relativeHumidity");
    // Derived in closed form: 60 % at 850 hPa handed over as the fraction 0.6.
    expect(frame.grid.humidity.values[9]).toBeCloseTo(0.6, 6);
    expect(frame.grid.surface.pressure[4]).toBe(98_500);
    expect(frame.grid.surface.humidity).toMatchObject({ kind: "dewpoint" });
    expect(frame.grid.surface.u[0]).toBe(4);
    // Source: frame-latlon.cdl has no surface height, so frame assembly derives it from the isobaric heights.
    expect(frame.surfaceHeightDerived).toBe(true);
  });
});
