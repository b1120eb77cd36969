import { describe, expect, it } from "vitest";
import { areaInLnPressure, buoyancyAreas } from "../../../../src/features/soundings/chart/buoyancy-areas.ts";

const RD = 287.04; // J/(kg K): the library's dry-air gas constant (From memory: the conventional meteorological value).
const P0 = 100000;
const ENV = 300;

/** A parcel path whose buoyancy Δ (K) is given at nodes X = ln(p0/p); the environment is a constant 300 K. */
function path(nodes: Array<[number, number]>, lfcX: number | null, elX: number | null) {
  return {
    pressure: nodes.map(([x]) => P0 * Math.exp(-x)),
    value: nodes.map(([, delta]) => ENV + delta),
    lfcPressure: lfcX === null ? null : P0 * Math.exp(-lfcX),
    elPressure: elX === null ? null : P0 * Math.exp(-elX),
  };
}

// Nodes of a two-bubble profile with a shallow buoyant layer under a cap, LCL inserted at X = 0.05.
const NODES: Array<[number, number]> = [
  [0, -2], [0.05, -0.5], [0.1, 1], [0.2, -4], [0.3, -4], [0.4, 5], [1.0, 5], [1.1, -1],
];
// Zero crossings of the piecewise-linear Δ: X = 0.0667, 0.12, 0.3444, 1.0833; LFC after the deepest deficit.
const LFC_X = 0.3 + 0.1 * (4 / 9);
const EL_X = 1.0 + 0.1 * (5 / 6);

describe("shaded CAPE and CIN areas", () => {
  const areas = buoyancyAreas(path(NODES, LFC_X, EL_X), () => ENV);
  const total = (kind: "positive" | "negative") => RD * areas.filter((a) => a.kind === kind).reduce((s, a) => s + areaInLnPressure(a), 0);

  it("shades exactly the CAPE between LFC and EL", () => {
    // Derived in closed form: Rd × (0.5·0.0556·5 + 0.6·5 + 0.5·0.0833·5) = 287.04 × 3.3472 = 960.79 J/kg.
    expect(total("positive")).toBeCloseTo(960.79, 1);
    expect(areas.filter((a) => a.kind === "positive")).toHaveLength(1);
  });

  it("shades the CIN below the LFC and leaves the shallow buoyant bubble out", () => {
    // Derived in closed form: −Rd × (0.0667 + 0.16 + 0.4 + 0.0889) = −205.39 J/kg; the bubble near X = 0.1 is not CIN.
    expect(total("negative")).toBeCloseTo(-205.39, 1);
    expect(areas.filter((a) => a.kind === "negative")).toHaveLength(2);
  });

  it("closes every area on the environment curve at its zero crossings", () => {
    for (const area of areas) {
      const first = area.parcel[0];
      const last = area.parcel[area.parcel.length - 1];
      expect(area.parcel).toHaveLength(area.environment.length);
      // The ends are either zero crossings (parcel = environment) or the LFC/origin bounds.
      expect([first.temperature - ENV, last.temperature - ENV].some((d) => Math.abs(d) < 1e-9)).toBe(true);
    }
  });

  it("shades nothing without an LFC", () => {
    expect(buoyancyAreas(path(NODES, null, null), () => ENV)).toEqual([]);
  });
});
