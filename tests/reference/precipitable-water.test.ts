import { describe, expect, it } from "vitest";
import { diagnoseColumn, dewpointFromVaporPressure, vaporPressureFromSpecificHumidity } from "../../shared/meteo/index.ts";

describe("precipitable water", () => {
  it("q = 0.010 kg/kg from 1000 to 300 hPa gives 71.38 mm", () => {
    // Derived in closed form: PW = q Δp / g = 0.010 × 70000 / 9.80665 = 71.38 kg m⁻²
    const pressure: number[] = [];
    const height: number[] = [];
    const temperature: number[] = [];
    const dewpoint: number[] = [];
    for (let p = 100000, k = 0; p >= 25000; p -= 2500, k++) {
      pressure.push(p);
      height.push(k * 300);
      temperature.push(320);
      dewpoint.push(dewpointFromVaporPressure(vaporPressureFromSpecificHumidity(0.01, p)));
    }
    const zeros = pressure.map(() => 0);
    const { fields } = diagnoseColumn({ pressure, height, temperature, dewpoint, u: zeros, v: zeros });
    expect(fields.pwat).toBeCloseTo(71.38, 2);
  });
});
