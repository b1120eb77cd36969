import { describe, expect, it } from "vitest";
import { mapViewFromSearch, searchFromMapView } from "../../../../src/features/grids/map-view-params.ts";

const DEFAULTS = ["outlines"];
const KNOWN = ["contours", "outlines"];
const read = (query: string) => mapViewFromSearch(new URLSearchParams(query), DEFAULTS, KNOWN);

describe("map viewer settings in the URL", () => {
  it("reads the field and the shown overlays", () => {
    expect(read("field=mlcape&show=outlines,contours")).toEqual({ field: "mlcape", overlays: ["outlines", "contours"] });
  });

  it("uses the default overlays when the URL says nothing, and none for an empty list", () => {
    expect(read("field=mlcape").overlays).toEqual(DEFAULTS);
    expect(read("show=").overlays).toEqual([]);
  });

  it("ignores a malformed field key and unknown overlays", () => {
    expect(read("field=ML%20CAPE;drop").field).toBeNull();
    expect(read("show=contours,arrows").overlays).toEqual(["contours"]);
  });

  it("writes only what differs from the defaults, and reads back what it wrote", () => {
    expect(searchFromMapView({ field: "sbcin", overlays: ["outlines"] }, DEFAULTS).toString()).toBe("field=sbcin");
    for (const settings of [
      { field: "sbcin", overlays: [] },
      { field: "jet_speed", overlays: ["contours", "outlines"] },
      { field: null, overlays: ["outlines"] },
    ]) {
      expect(read(searchFromMapView(settings, DEFAULTS).toString())).toEqual(settings);
    }
  });
});
