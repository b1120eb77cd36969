import { describe, expect, it } from "vitest";
import {
  equivalentPotentialTemperature,
  lclTemperature,
  mixingRatioFromVaporPressure,
  saturationVaporPressure,
  potentialTemperature,
} from "../../shared/meteo/index.ts";

const K = 273.15;

describe("θe and its ingredients at 850 hPa, T = 20 °C, Td = 18 °C", () => {
  const p = 85000;
  const e = saturationVaporPressure(18 + K);
  const r = mixingRatioFromVaporPressure(e, p);

  it("vapour pressure, mixing ratio and LCL temperature", () => {
    // Source: Bolton (1980), eqs. 10 and 15, evaluated independently in double precision (team reference procedure)
    expect(e).toBeCloseTo(2062.58, 1);
    expect(r * 1000).toBeCloseTo(15.468, 2);
    expect(lclTemperature(20 + K, 18 + K)).toBeCloseTo(290.678, 2);
  });

  it("θe (Bolton 1980, eq. 39) = 353.92 K within 0.05 K", () => {
    // Source: Bolton (1980), eq. 39, evaluated independently in double precision (team reference procedure)
    expect(Math.abs(equivalentPotentialTemperature(20 + K, p, r) - 353.92)).toBeLessThan(0.05);
  });

  it("θe of perfectly dry air is θ", () => {
    // Derived in closed form: with r = 0 both correction factors of eq. 39 are 1 (e = 0, exponent 0).
    const t = 290;
    const dryE = equivalentPotentialTemperature(t, 70000, 1e-12);
    expect(dryE).toBeCloseTo(potentialTemperature(t, 70000), 6);
  });
});
