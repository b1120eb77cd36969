import { describe, expect, it } from "vitest";
import {
  significantTornadoEffective,
  significantTornadoFixed,
  supercellCompositeEffective,
  supercellCompositeFixed,
} from "../../shared/meteo/index.ts";

// All cases: Derived in closed form from the published formulas (Thompson et al. 2004; 2007; 2012), worked by hand.
describe("supercell composite, effective layer (Thompson et al. 2004; 2007)", () => {
  const cases: Array<[string, number, number, number, number]> = [
    ["SCP-1", 3000, 200, 15, 9.0],
    ["SCP-2", 2500, 125, 25, 6.25],
    ["SCP-3", 1500, 100, 8, 0],
    ["SCP-4", 2000, -60, 30, -2.4],
    ["SCP-5 (boundary 10 m/s inclusive)", 1200, 75, 10, 0.9],
  ];
  for (const [id, cape, esrh, ebwd, expected] of cases) {
    it(id, () => expect(supercellCompositeEffective(cape, esrh, ebwd)).toBeCloseTo(expected, 9));
  }
});

describe("significant tornado parameter, fixed layer (Thompson et al. 2004)", () => {
  const cases: Array<[string, number, number, number, number, number]> = [
    ["STPF-1", 3000, 750, 150, 25, 2.5],
    ["STPF-2", 1500, 1500, 300, 35, 1.5],
    ["STPF-3", 2000, 900, 200, 12, 0],
    ["STPF-4", 2500, 2100, 250, 30, 0],
    ["STPF-5", 1800, 1250, 120, 18, 0.648],
  ];
  for (const [id, cape, lcl, srh, bwd, expected] of cases) {
    it(id, () => expect(significantTornadoFixed(cape, lcl, srh, bwd)).toBeCloseTo(expected, 9));
  }
});

describe("significant tornado parameter, effective layer (Thompson et al. 2012)", () => {
  const cases: Array<[string, number, number, number, number, number, number, number]> = [
    ["STPE-1", 2250, 1200, 225, 24, -80, 0, 1.728],
    ["STPE-2", 1000, 800, 300, 40, -20, 0, 2.0],
    ["STPE-3 (elevated base)", 3000, 600, 400, 35, -10, 500, 0],
    ["STPE-4 (CIN term 0)", 2000, 900, 200, 25, -250, 0, 0],
    ["STPE-5 (all boundaries)", 1500, 1000, 150, 20, -50, 0, 1.0],
  ];
  for (const [id, cape, lcl, esrh, ebwd, cin, base, expected] of cases) {
    it(id, () => expect(significantTornadoEffective(cape, lcl, esrh, ebwd, cin, base)).toBeCloseTo(expected, 4));
  }

  it("is 0 when MLCIN is undefined because there is no LFC (MLCAPE = 0)", () => {
    expect(significantTornadoEffective(0, 800, 300, 30, Number.NaN, 0)).toBe(0);
  });
});

describe("supercell composite, fixed layer (Thompson et al. 2003, normaliser from memory)", () => {
  it("multiplies the three normalised terms", () => {
    // From memory: SRH normaliser 100 m²/s² and BRN shear normaliser 40 m²/s² (unconfirmed, field ships disabled).
    expect(supercellCompositeFixed(2000, 150, 60)).toBeCloseTo(2 * 1.5 * 1.5, 9);
  });
});
