import { describe, expect, it } from "vitest";
import { columnLinkQuery } from "../../../../shared/api/soundings.ts";
import { soundingLinkForPoint } from "../../../../src/config/paths.ts";

describe("soundingLinkForPoint", () => {
  it("builds the Soundings URL with frame, lat and lon", () => {
    expect(soundingLinkForPoint(12, 35.25, -97.5)).toBe("/soundings?frame=12&lat=35.2500&lon=-97.5000");
  });

  it("round-trips through the page's query schema", () => {
    const url = new URL(soundingLinkForPoint(7, 36.123456, -98.654321), "http://bellwether.test");
    const parsed = columnLinkQuery.parse(Object.fromEntries(url.searchParams));
    expect(parsed).toEqual({ frame: 7, lat: 36.1235, lon: -98.6543 });
  });

  it("rejects a link whose coordinates are out of range, naming the parameter", () => {
    const result = columnLinkQuery.safeParse({ frame: "3", lat: "95", lon: "10" });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(["lat"]);
  });
});
