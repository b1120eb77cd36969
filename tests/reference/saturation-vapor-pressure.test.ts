import { createRequire } from "node:module";
import { describe, expect, it } from "vitest";
import { dewpointFromVaporPressure, saturationVaporPressure } from "../../shared/meteo/index.ts";

const require = createRequire(import.meta.url);
const psychrolib = require("psychrolib") as {
  SetUnitSystem(system: number): void;
  SI: number;
  GetSatVapPres(celsius: number): number;
};

const K = 273.15;

describe("saturation vapour pressure over liquid water (Bolton 1980, eq. 10)", () => {
  // [°C, reference es in Pa, source]; product tolerance 0.3 % from −30 to 40 °C.
  const published: Array<[number, number, string]> = [
    [0.01, 611.657, "Source: IAPWS triple-point pressure (Wagner and Pruss 2002)"],
    [10, 1228.1, "Source: IAPWS-95 saturation curve as tabulated in the CRC Handbook (Wagner and Pruss 1993)"],
    [20, 2339.2, "Source: IAPWS-95 saturation curve as tabulated in the CRC Handbook (Wagner and Pruss 1993)"],
    [25, 3169.8, "Source: IAPWS-95 saturation curve as tabulated in the CRC Handbook (Wagner and Pruss 1993)"],
    [30, 4246.9, "Source: IAPWS-95 saturation curve as tabulated in the CRC Handbook (Wagner and Pruss 1993)"],
    [40, 7385.1, "Source: IAPWS-95 saturation curve as tabulated in the CRC Handbook (Wagner and Pruss 1993)"],
    [-10, 286.45, "Source: Murphy and Koop (2005), eq. 10 (supercooled liquid)"],
    [-20, 125.5, "Source: Murphy and Koop (2005), eq. 10 (supercooled liquid)"],
    [-30, 50.94, "Source: Murphy and Koop (2005), eq. 10 (supercooled liquid)"],
  ];
  for (const [celsius, reference, source] of published) {
    it(`is within 0.3 % of ${reference} Pa at ${celsius} °C (${source})`, () => {
      expect(Math.abs(saturationVaporPressure(celsius + K) / reference - 1)).toBeLessThan(0.003);
    });
  }

  it("reproduces Bolton's own formula value at 20 °C", () => {
    // Source: Bolton (1980), eq. 10 evaluated by hand: 611.2 exp(17.67·20/263.5) = 2336.9 Pa
    expect(saturationVaporPressure(20 + K)).toBeCloseTo(2336.9, 0);
  });

  it("agrees with psychrolib (SI, Hyland-Wexler over liquid water) within 0.3 % from 1 to 40 °C", () => {
    // Source: psychrolib 1.1.1 GetSatVapPres (ASHRAE Handbook 2017, ch. 1, eq. 6) — an independent formulation.
    psychrolib.SetUnitSystem(psychrolib.SI);
    for (let celsius = 1; celsius <= 40; celsius += 0.5) {
      const reference = psychrolib.GetSatVapPres(celsius);
      expect(Math.abs(saturationVaporPressure(celsius + K) / reference - 1)).toBeLessThan(0.003);
    }
  });

  it("inverts exactly: dewpoint from es(T) returns T from −60 to 45 °C", () => {
    // Derived in closed form: Bolton's eq. 11 is the algebraic inverse of eq. 10.
    for (let celsius = -60; celsius <= 45; celsius += 0.25) {
      expect(dewpointFromVaporPressure(saturationVaporPressure(celsius + K)) - K).toBeCloseTo(celsius, 9);
    }
  });

  it("gives NaN dewpoint for non-positive vapour pressure", () => {
    // Derived in closed form: ln e is undefined for e ≤ 0.
    expect(dewpointFromVaporPressure(0)).toBeNaN();
    expect(dewpointFromVaporPressure(-5)).toBeNaN();
  });
});
