import { describe, expect, it } from "vitest";
import { readClassicNetcdf } from "../../../server/ingest/netcdf/classic-reader.ts";
import { withHdf5Netcdf } from "../../../server/ingest/netcdf/hdf5-reader.ts";
import { numberAttribute, type RawDataset } from "../../../server/ingest/netcdf/raw-dataset.ts";
import { ncdumpValues, readFixture } from "./ncdump-listing.ts";

/** Every numeric variable's raw values must equal ncdump's listing; "_" must be the fill value. */
function expectMatchesNcdump(dataset: RawDataset, listing: Map<string, Array<number | null>>): number {
  let compared = 0;
  for (const [name, expected] of listing) {
    const variable = dataset.variables.get(name);
    expect(variable, `variable ${name}`).toBeDefined();
    if (expected.every((value) => value === null)) continue; // a mapping variable with no data
    const actual = variable!.readNumeric();
    expect(actual.length, `length of ${name}`).toBe(expected.length);
    const fill = numberAttribute(variable!.attributes, "_FillValue");
    expected.forEach((value, k) => {
      if (value === null) {
        if (fill !== undefined) expect(actual[k], `${name}[${k}] is the fill value`).toBe(variable!.dataType === "float32" ? Math.fround(fill) : fill);
        else expect(Math.abs(actual[k]), `${name}[${k}] is the default fill`).toBeGreaterThan(9e36);
      } else {
        // ncdump prints float32 with 7 significant digits.
        expect(actual[k], `${name}[${k}]`).toBeCloseTo(value, Math.max(0, 6 - Math.floor(Math.log10(Math.abs(value) + 1))));
      }
      compared++;
    });
  }
  return compared;
}

describe("classic reader against ncdump", () => {
  it.each([
    ["latlon-pressure-nc3.nc", "latlon-pressure-nc3.ncdump.txt"],
    ["lambert-km-nc6.nc", "lambert-km-nc6.ncdump.txt"],
    ["single-record-short-nc3.nc", "single-record-short-nc3.ncdump.txt"],
  ])("%s: every value equals the ncdump listing", (file, listing) => {
    // Source: ncdump (Debian netcdf-bin 4.9.0) listing of the same file, written by make-fixtures.sh.
    const compared = expectMatchesNcdump(readClassicNetcdf(readFixture(file)), ncdumpValues(listing));
    expect(compared).toBeGreaterThan(10);
  });

  it("flattens record variables and keeps a lone short record variable unpadded", () => {
    const dataset = readClassicNetcdf(readFixture("single-record-short-nc3.nc"));
    const snow = dataset.variables.get("snow_depth")!;
    expect(snow.shape).toEqual([3, 1, 3]);
    // Source: CDL data of single-record-short.cdl (records 1,-2,3 / 4,5,-6 / 7,8,32000).
    expect(Array.from(snow.readNumeric())).toEqual([1, -2, 3, 4, 5, -6, 7, 8, 32000]);
    expect(dataset.dimensions.get("time")).toBe(3);
  });

  it("reads NetCDF bytes as signed, attributes included", () => {
    const dataset = readClassicNetcdf(readFixture("latlon-pressure-nc3.nc"));
    const cloud = dataset.variables.get("cloud_cover")!;
    // Source: CDL data of latlon-pressure.cdl (cloud_cover:_FillValue = -1b; first value -1).
    expect(cloud.dataType).toBe("int8");
    expect(cloud.attributes.get("_FillValue")).toEqual([-1]);
    expect(cloud.readNumeric()[0]).toBe(-1);
  });

  it("reports the 64-bit offset file as netcdf3 with its global attributes", () => {
    const dataset = readClassicNetcdf(readFixture("lambert-km-nc6.nc"));
    // Source: CDL global attribute :Conventions = "CF-1.8".
    expect(dataset.format).toBe("netcdf3");
    expect(dataset.attributes.get("Conventions")).toBe("CF-1.8");
  });
});

describe("NetCDF-4 reader against ncdump", () => {
  it.each([
    ["latlon-pressure-nc4.nc", "latlon-pressure-nc4.ncdump.txt"],
    ["polar-nc4.nc", "polar-nc4.ncdump.txt"],
  ])("%s: every value equals the ncdump listing", async (file, listing) => {
    // Source: ncdump (Debian netcdf-bin 4.9.0) listing of the same file, written by make-fixtures.sh.
    const compared = await withHdf5Netcdf(readFixture(file), (dataset) => expectMatchesNcdump(dataset, ncdumpValues(listing)));
    expect(compared).toBeGreaterThan(10);
  });

  it("gives dimension names from the attached dimension scales and hides library attributes", async () => {
    await withHdf5Netcdf(readFixture("polar-nc4.nc"), (dataset) => {
      const wind = dataset.variables.get("wind_speed")!;
      // Source: CDL declaration wind_speed(time, pressure, x, y).
      expect(wind.dimensions).toEqual(["time", "pressure", "x", "y"]);
      expect(wind.shape).toEqual([2, 2, 5, 4]);
      expect([...wind.attributes.keys()]).not.toContain("DIMENSION_LIST");
      // Source: CDL (ushort relative_humidity, _FillValue = 65535US; string :comment).
      expect(dataset.variables.get("relative_humidity")!.dataType).toBe("uint16");
      expect(dataset.variables.get("relative_humidity")!.attributes.get("_FillValue")).toEqual([65535]);
      expect(dataset.attributes.get("comment")).toBe("NetCDF-4 string attribute");
      expect(dataset.dimensions.get("time")).toBe(2);
    });
  });
});
