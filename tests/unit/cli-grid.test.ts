import { describe, expect, it } from "vitest";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { spawnSync } from "node:child_process";
import { inspectFields, readInspectable } from "../../server/cli/commands/inspect.command.ts";
import { fieldsAtPoint } from "../../server/cli/commands/fields.command.ts";
import { demoGribFile } from "../../server/demo/demo-run.ts";
import { diagnoseColumn } from "../../shared/meteo/index.ts";
import { decodeGridFile } from "../../server/ingest/decode-file.ts";
import { assembleFrames } from "../../server/ingest/assemble-frames.ts";
import { nearestGridPoint } from "../../shared/grid/grid-coordinates.ts";
import { parseRule } from "../../shared/rules/index.ts";

/** Parses a `grib_get_data` listing: one block per message, each line "lat lon value". */
function ecCodesListing(file: string): Array<Array<[number, number, number]>> {
  const blocks: Array<Array<[number, number, number]>> = [];
  for (const line of fs.readFileSync(file, "utf8").split("\n")) {
    if (line.startsWith("Latitude")) blocks.push([]);
    else if (line.trim()) blocks[blocks.length - 1]!.push(line.trim().split(/\s+/).map(Number) as [number, number, number]);
  }
  return blocks;
}

function runCli(args: string[]) {
  return spawnSync(process.execPath, ["--import", "tsx", "server/cli/main.ts", ...args], { encoding: "utf8" });
}

describe("inspect", () => {
  it("lists every message in file order with the decoded value at the nearest grid point", async () => {
    const file = "tests/fixtures/grib2/multi-message.grib2";
    const { format, fields } = await readInspectable(file);
    const entries = inspectFields(fields, { lat: 48.1, lon: -103.9 });
    const listing = ecCodesListing(`${file}.values.txt`);
    expect(format).toBe("grib2");
    expect(entries).toHaveLength(listing.length);
    entries.forEach((entry, m) => {
      // Source: ecCodes 2.28 grib_get_data for the same file (value at the same grid point).
      const expected = listing[m]!.find(([la, lo]) => Math.abs(la - entry.lat!) < 1e-4 && Math.abs(((lo - entry.lon! + 540) % 360) - 180) < 1e-4);
      expect(expected, `message ${m + 1}`).toBeDefined();
      expect(entry.value).toBeCloseTo(expected![2], 4);
    });
  });

  it("prints the documented JSON shape from the command line", () => {
    const out = runCli(["inspect", "tests/fixtures/grib2/lambert-40.grib2", "--at", "33,-103", "--json"]);
    expect(out.status).toBe(0);
    const json = JSON.parse(out.stdout);
    expect(Object.keys(json)).toEqual(["format", "messages"]);
    expect(Object.keys(json.messages[0]).sort()).toEqual(["i", "j", "lat", "level", "levelType", "lon", "missing", "nx", "ny", "parameter", "projection", "unit", "value"].sort());
    expect(json.messages[0].projection).toBe("lambert");
  });

  it("lists NetCDF variables one entry per variable and level", async () => {
    const { format, fields } = await readInspectable("tests/fixtures/netcdf/latlon-pressure-nc4.nc");
    expect(format).toBe("netcdf");
    const temperature = fields.filter((f) => f.parameter === "temperature");
    // Source: the fixture's CDL (tests/fixtures/netcdf/latlon-pressure.cdl) declares three pressure levels.
    expect(temperature.map((f) => f.level)).toEqual([85000, 70000, 50000]);
  });

  it("exits non-zero with the reason for a file that is not a grid", () => {
    const out = runCli(["inspect", "tests/fixtures/soundings/demo-warm-sector.csv", "--json"]);
    expect(out.status).toBe(1);
    expect(out.stderr).toContain("neither GRIB2 nor NetCDF");
  });
});

describe("fields", () => {
  const runTime = new Date("2026-05-14T12:00:00Z");
  const bytes = (() => {
    const a = demoGribFile({ runTime, forecastHours: [3, 4], nx: 24, ny: 20 }, 3);
    const b = demoGribFile({ runTime, forecastHours: [3, 4], nx: 24, ny: 20 }, 4);
    const both = new Uint8Array(a.length + b.length);
    both.set(a);
    both.set(b, a.length);
    return both;
  })();

  it("gives each frame's column fields equal to the column diagnostics of that grid point's sounding", async () => {
    const frames = await fieldsAtPoint(bytes, { lat: 36, lon: -98 }, null);
    expect(frames.map((f) => f.validTime)).toEqual(["2026-05-14T15:00:00.000Z", "2026-05-14T16:00:00.000Z"]);
    const [frame] = assembleFrames(await decodeGridFile(bytes, "grib2")).frames;
    const point = nearestGridPoint(frame!.geometry, 36, -98)!;
    const n = frame!.grid.pointCount;
    const g = frame!.grid;
    // The same column as a sounding: surface first, then the isobaric levels above ground.
    const profile = { pressure: [g.surface.pressure[point.index]!], height: [g.surface.height[point.index]!], temperature: [g.surface.temperature[point.index]!], dewpoint: [g.surface.humidity.values[point.index]!], u: [g.surface.u[point.index]!], v: [g.surface.v[point.index]!] };
    frame!.levels.forEach((p, k) => {
      if (p >= profile.pressure[0]!) return;
      profile.pressure.push(p);
      profile.height.push(g.height[k * n + point.index]!);
      profile.temperature.push(g.temperature[k * n + point.index]!);
      profile.dewpoint.push(g.humidity.values[k * n + point.index]!);
      profile.u.push(g.u[k * n + point.index]!);
      profile.v.push(g.v[k * n + point.index]!);
    });
    const expected = diagnoseColumn(profile, { pseudoAdiabat: "table" }).fields;
    for (const key of ["mlcape", "sbcin", "shear_0_6km", "srh_0_1km", "mllcl_hgt", "stp_eff"] as const) {
      const got = frames[0]!.fields[key];
      if (expected[key] === null) expect(got, key).toBeNull();
      else expect(got, key).toBeCloseTo(expected[key]!, 0);
    }
  });

  it("picks one frame with --time and refuses a time the file does not hold", async () => {
    const one = await fieldsAtPoint(bytes, { lat: 36, lon: -98 }, "2026-05-14T16:00:00Z");
    expect(one).toHaveLength(1);
    await expect(fieldsAtPoint(bytes, { lat: 36, lon: -98 }, "2026-05-14T20:00:00Z")).rejects.toThrow(/No frame is valid/);
  });

  it("prints {frames: [...]} with every catalogue key from the command line", () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-cli-"));
    const file = path.join(dir, "two-frames.grib2");
    fs.writeFileSync(file, bytes);
    const out = runCli(["fields", file, "--at", "36,-98", "--json"]);
    expect(out.status).toBe(0);
    const json = JSON.parse(out.stdout);
    expect(Object.keys(json.frames[0]).sort()).toEqual(["fields", "i", "j", "lat", "lon", "runTime", "validTime"]);
    expect(json.frames[0].fields).toHaveProperty("jet_quadrant");
    const outside = runCli(["fields", file, "--at", "10,10", "--json"]);
    expect(outside.status).toBe(1);
    expect(outside.stderr).toContain("outside the grid");
  });
});

describe("evaluate", () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-eval-"));
  const gridFile = path.join(dir, "demo.grib2");
  fs.writeFileSync(gridFile, demoGribFile({ runTime: new Date("2026-05-14T12:00:00Z"), forecastHours: [4], nx: 30, ny: 24 }, 4));
  const zonesFile = path.join(dir, "zones.geojson");
  fs.writeFileSync(
    zonesFile,
    JSON.stringify({
      type: "FeatureCollection",
      features: [{ type: "Feature", properties: { code: "ALL", name: "Everything" }, geometry: { type: "Polygon", coordinates: [[[-110, 25], [-85, 25], [-85, 45], [-110, 45], [-110, 25]]] } }],
    }),
  );

  it("reports matched points, coverage, field extremes and the spatial condition per zone", () => {
    const out = runCli(["evaluate", gridFile, "--expr", "shear_0_6km >= 0", "--zones", zonesFile, "--min-coverage", "100", "--json"]);
    expect(out.status).toBe(0);
    const json = JSON.parse(out.stdout);
    const zone = json.frames[0].zones[0];
    // Every column has a bulk shear value, so a threshold of 0 m/s is met at every grid point.
    expect(zone).toMatchObject({ code: "ALL", zonePoints: 720, matchedPoints: 720, coveragePercent: 100, conditionMet: true });
    expect(zone.extremes.shear_0_6km.max).toBeGreaterThan(zone.extremes.shear_0_6km.min);
  });

  it("exits non-zero with the editor's message for a bad expression", () => {
    const out = runCli(["evaluate", gridFile, "--expr", "mlcape >= 1000 and shaer_0_6km >= 20", "--json"]);
    expect(out.status).toBe(1);
    const editorMessage = parseRule("mlcape >= 1000 and shaer_0_6km >= 20");
    expect(editorMessage.ok).toBe(false);
    expect(out.stderr).toContain(!editorMessage.ok ? editorMessage.errors[0]!.message : "");
  });
});
