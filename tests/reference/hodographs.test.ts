import { describe, expect, it } from "vitest";
import {
  bulkWindDifference,
  bunkersStormMotion,
  meanWind,
  stormRelativeHelicity,
  WindVector,
  type WindProfile,
} from "../../shared/meteo/index.ts";

function profileFrom(wind: (z: number) => [number, number], spacing: number, top = 12000): WindProfile {
  const height: number[] = [];
  const u: number[] = [];
  const v: number[] = [];
  for (let z = 0; z <= top + 1e-9; z += spacing) {
    const [uz, vz] = wind(z);
    height.push(z);
    u.push(uz);
    v.push(vz);
  }
  return { height, u, v, count: height.length };
}

const straight = profileFrom((z) => [z < 6000 ? (30 * z) / 6000 : 30, 0], 100);

describe("straight-line hodograph u = 30 z / 6 km", () => {
  // All values: Derived in closed form (SRH = −c_y U h / H for a straight hodograph along x).
  const mean = new WindVector();
  const rm = new WindVector();
  const lm = new WindVector();
  bunkersStormMotion(straight, mean, rm, lm);

  it("0-6 km mean wind (15, 0) and Bunkers motions (15, ∓7.5)", () => {
    expect(mean.u).toBeCloseTo(15, 9);
    expect(mean.v).toBeCloseTo(0, 9);
    expect([rm.u, rm.v]).toEqual([expect.closeTo(15, 9), expect.closeTo(-7.5, 9)]);
    expect([lm.u, lm.v]).toEqual([expect.closeTo(15, 9), expect.closeTo(7.5, 9)]);
  });

  it("bulk wind differences 5 / 15 / 30 m/s", () => {
    expect(bulkWindDifference(straight, 0, 1000)).toBeCloseTo(5, 9);
    expect(bulkWindDifference(straight, 0, 3000)).toBeCloseTo(15, 9);
    expect(bulkWindDifference(straight, 0, 6000)).toBeCloseTo(30, 9);
  });

  it("SRH 37.5 / 112.5 with the right mover and −37.5 / −112.5 with the left mover", () => {
    expect(stormRelativeHelicity(straight, 0, 1000, rm.u, rm.v)).toBeCloseTo(37.5, 9);
    expect(stormRelativeHelicity(straight, 0, 3000, rm.u, rm.v)).toBeCloseTo(112.5, 9);
    expect(stormRelativeHelicity(straight, 0, 1000, lm.u, lm.v)).toBeCloseTo(-37.5, 9);
    expect(stormRelativeHelicity(straight, 0, 3000, lm.u, lm.v)).toBeCloseTo(-112.5, 9);
  });
});

describe("half-circle hodograph V = C + R (cos φ, sin φ), φ = π (1 − z / 6 km), C = (10, 5)", () => {
  const centre: [number, number] = [10, 5];
  const halfCircle = (radius: number) => (z: number): [number, number] => {
    const phi = Math.PI * (1 - Math.min(z, 6000) / 6000);
    return [centre[0] + radius * Math.cos(phi), centre[1] + radius * Math.sin(phi)];
  };
  // [R, V_RM v-component, SRH 0-1 (RM), SRH 0-3 (RM), SRH 0-3 (centre), BWD 0-1, 0-3, 0-6]
  // Derived in closed form (arc integrals of the continuous hodograph); tolerance 0.1 % for 100-m levels.
  const cases: Array<[number, number, number, number, number, number, number, number]> = [
    [10, 3.8662, 53.879, 168.418, 157.08, 5.176, 14.142, 20],
    [15, 7.0493, 113.691, 322.69, 353.429, 7.765, 21.213, 30],
  ];
  const within = (actual: number, expected: number) => expect(Math.abs(actual / expected - 1)).toBeLessThan(0.001);
  for (const [radius, rmV, srh1, srh3, srh3Centre, bwd1, bwd3, bwd6] of cases) {
    it(`R = ${radius} m/s`, () => {
      const profile = profileFrom(halfCircle(radius), 100);
      const mean = new WindVector();
      const rm = new WindVector();
      const lm = new WindVector();
      bunkersStormMotion(profile, mean, rm, lm);
      within(mean.u, 10);
      within(mean.v, 5 + (2 * radius) / Math.PI);
      within(rm.u, 10);
      within(rm.v, rmV);
      within(stormRelativeHelicity(profile, 0, 1000, rm.u, rm.v), srh1);
      within(stormRelativeHelicity(profile, 0, 3000, rm.u, rm.v), srh3);
      within(stormRelativeHelicity(profile, 0, 3000, centre[0], centre[1]), srh3Centre);
      within(bulkWindDifference(profile, 0, 1000), bwd1);
      within(bulkWindDifference(profile, 0, 3000), bwd3);
      within(bulkWindDifference(profile, 0, 6000), bwd6);
    });
  }

  it("N chords about the centre give exactly N R² sin(π/N) (discrete Davies-Jones form)", () => {
    // Derived in closed form: each chord sweeps a triangle of area R² sin(π/N) / 2; SRH is twice the area.
    for (const [n, expected] of [
      [12, 310.583],
      [30, 313.585],
    ] as const) {
      const profile = profileFrom(halfCircle(10), 6000 / n, 6000);
      expect(stormRelativeHelicity(profile, 0, 6000, centre[0], centre[1])).toBeCloseTo(expected, 3);
      expect(stormRelativeHelicity(profile, 0, 6000, centre[0], centre[1])).toBeCloseTo(n * 100 * Math.sin(Math.PI / n), 9);
    }
  });
});

describe("mean wind", () => {
  it("of a wind linear in height is the mid-layer wind, whatever the level spacing", () => {
    // Derived in closed form: the average of a linear function over an interval is its midpoint value.
    const profile = profileFrom((z) => [2 + z / 1000, -z / 500], 370, 9000);
    const out = meanWind(profile, 250, 5750, new WindVector());
    expect(out.u).toBeCloseTo(2 + 3, 9);
    expect(out.v).toBeCloseTo(-6, 9);
  });
});
