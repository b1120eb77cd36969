import { describe, expect, it } from "vitest";
import { diagnoseColumn } from "../../shared/meteo/index.ts";
import { standardAtmosphereAt } from "./helpers/standard-atmosphere.ts";

// [p hPa, H gpm, T K]. Source: COESA (1976), U.S. Standard Atmosphere, from its defining lapse-rate layers.
const USSA: Array<[number, number, number]> = [
  [1000, 110.9, 287.43],
  [925, 762.0, 283.2],
  [850, 1457.3, 278.68],
  [700, 3012.2, 268.57],
  [500, 5574.4, 251.92],
  [400, 7185.4, 241.44],
  [300, 9164.0, 228.58],
  [250, 10362.9, 220.79],
  [200, 11784.0, 216.65],
  [100, 16179.7, 216.65],
];

describe("U.S. Standard Atmosphere 1976 column", () => {
  it("the helper reproduces the published heights and temperatures", () => {
    for (const [p, h, t] of USSA) {
      const state = standardAtmosphereAt(p * 100);
      expect(state.height).toBeCloseTo(h, 0);
      expect(state.temperature).toBeCloseTo(t, 1);
    }
  });

  it("gives lapse_700_500 = 6.5 K/km exactly and lapse_0_3km = 6.5 K/km", () => {
    // Source: COESA (1976): the tropospheric lapse rate is defined as 6.5 K/km.
    const pressure = USSA.map(([p]) => p * 100);
    const states = pressure.map(standardAtmosphereAt);
    const temperature = states.map((s) => s.temperature);
    const dewpoint = temperature.map((t) => t - 30);
    const calm = pressure.map(() => 0);
    const { fields } = diagnoseColumn({ pressure, height: states.map((s) => s.height), temperature, dewpoint, u: calm, v: calm });
    expect(fields.lapse_700_500).toBeCloseTo(6.5, 9);
    expect(fields.lapse_0_3km).toBeCloseTo(6.5, 9);
  });

  it("leaves lapse_700_500 undefined when the ground is above 700 hPa", () => {
    // Common practice (no source): the layer is underground there.
    const pressure = [65000, 60000, 50000, 40000, 30000, 20000];
    const states = pressure.map(standardAtmosphereAt);
    const temperature = states.map((s) => s.temperature);
    const calm = pressure.map(() => 0);
    const { fields } = diagnoseColumn({ pressure, height: states.map((s) => s.height), temperature, dewpoint: temperature.map((t) => t - 20), u: calm, v: calm });
    expect(fields.lapse_700_500).toBeNull();
  });
});
