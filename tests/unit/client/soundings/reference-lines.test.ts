import { describe, expect, it } from "vitest";
import { saturationMixingRatio } from "../../../../shared/meteo/index.ts";
import { dryAdiabats, mixingRatioLines, moistAdiabats, pressureLadder } from "../../../../src/features/soundings/chart/reference-lines.ts";

const K = 273.15;

describe("skew-T background lines", () => {
  it("lays pressures from the bottom to the top, both included", () => {
    expect(pressureLadder(105000, 95000, 2500)).toEqual([105000, 102500, 100000, 97500, 95000]);
  });

  it("draws dry adiabats through θ at 1000 hPa and by Poisson's equation elsewhere", () => {
    const [line] = dryAdiabats([300], [100000, 50000]);
    expect(line.points[0].temperature).toBeCloseTo(300, 9);
    // Source: Poisson's equation with κ = 0.2854 (Bolton 1980, eq. 43): 300 × 0.5^0.2854 = 246.16 K.
    expect(line.points[1].temperature).toBeCloseTo(246.16, 1);
  });

  it("draws the θw = 20 °C pseudo-adiabat through the check values", () => {
    const [line] = moistAdiabats([20 + K], [105000, 100000, 85000, 70000, 50000]);
    const at = (p: number) => line.points.find((pt) => pt.pressure === p)!.temperature - K;
    expect(at(100000)).toBeCloseTo(20, 9);
    // Source: the canonical pseudo-adiabat ODE integrated by the team's independent reference procedure (RK4, |Δ ln p| ≤ 0.05).
    expect(Math.abs(at(85000) - 13.877)).toBeLessThan(0.01);
    expect(Math.abs(at(70000) - 6.17)).toBeLessThan(0.01);
    expect(Math.abs(at(50000) - -8.728)).toBeLessThan(0.01);
    // Below 1000 hPa the line continues warmer (descending air warms).
    expect(at(105000)).toBeGreaterThan(20);
    expect(line.points.map((p) => p.pressure)).toEqual([105000, 100000, 85000, 70000, 50000]);
  });

  it("draws each mixing-ratio line where saturation holds exactly that mixing ratio", () => {
    // Derived in closed form: the line inverts rs(T, p); applying rs again must give r back.
    const [line] = mixingRatioLines([0.012], [100000, 85000, 70000]);
    for (const { pressure, temperature } of line.points) expect(saturationMixingRatio(temperature, pressure)).toBeCloseTo(0.012, 9);
  });
});
