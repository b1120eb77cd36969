import { describe, expect, it } from "vitest";
import { diagnoseColumn, stormRelativeHelicity, type ColumnProfile } from "../../shared/meteo/index.ts";
import { GAS_CONSTANT_DRY_AIR, STANDARD_GRAVITY } from "../../shared/meteo/constants.ts";
import { seededRandom, uniform } from "./helpers/seeded-random.ts";

/**
 * Seeded random soundings with inversions, dry slots and saturated layers (invented shapes; the checks below
 * are properties that hold for any column, not values).
 */
function randomProfile(random: () => number): ColumnProfile {
  const levels = 8 + Math.floor(random() * 50);
  const pressure: number[] = [uniform(random, 70000, 105000)];
  const temperature: number[] = [uniform(random, 255, 310)];
  const dewpoint: number[] = [temperature[0] - (random() < 0.15 ? 0 : uniform(random, 0, 25))];
  const height: number[] = [uniform(random, 0, 2500)];
  const u: number[] = [uniform(random, -10, 10)];
  const v: number[] = [uniform(random, -10, 10)];
  const step = Math.log(pressure[0] / 10000) / (levels - 1);
  for (let k = 1; k < levels; k++) {
    const p = pressure[k - 1] * Math.exp(-step * uniform(random, 0.6, 1.4));
    if (p < 10000) break;
    const dz = (GAS_CONSTANT_DRY_AIR * temperature[k - 1] * Math.log(pressure[k - 1] / p)) / STANDARD_GRAVITY;
    const lapse = random() < 0.15 ? uniform(random, -10, 0) : uniform(random, 3, 9.8); // K/km, with inversions
    const t = Math.max(180, temperature[k - 1] - (lapse * dz) / 1000);
    const depression = random() < 0.1 ? 0 : uniform(random, 0, 35);
    pressure.push(p);
    height.push(height[k - 1] + dz);
    temperature.push(t);
    dewpoint.push(t - depression);
    u.push(u[k - 1] + uniform(random, -4, 6));
    v.push(v[k - 1] + uniform(random, -4, 4));
  }
  return { pressure, height, temperature, dewpoint, u, v };
}

function mirrored(profile: ColumnProfile): ColumnProfile {
  return { ...profile, v: Array.from(profile.v, (x) => -x) };
}

describe("properties of random columns (seeded)", () => {
  const random = seededRandom(1990);
  const profiles = Array.from({ length: 300 }, () => randomProfile(random));

  it("CAPE ≥ 0, CIN ≤ 0 and LCL ≤ LFC ≤ EL wherever defined, for SB, ML and MU parcels", () => {
    // Derived in closed form: CAPE sums positive areas, CIN negative ones; the LFC is chosen at or above the LCL
    // and below the EL.
    let withLfc = 0;
    for (const profile of profiles) {
      for (const method of ["reference", "table"] as const) {
        const { fields: f } = diagnoseColumn(profile, { pseudoAdiabat: method });
        for (const cape of [f.sbcape, f.mlcape, f.mucape]) if (cape !== null) expect(cape).toBeGreaterThanOrEqual(0);
        for (const cin of [f.sbcin, f.mlcin, f.mucin]) if (cin !== null) expect(cin).toBeLessThanOrEqual(0);
        for (const [lcl, lfc, el] of [
          [f.sblcl_hgt, f.sblfc_hgt, f.sbel_hgt],
          [f.mllcl_hgt, f.mllfc_hgt, f.mlel_hgt],
        ]) {
          if (lcl !== null && lfc !== null) expect(lfc).toBeGreaterThanOrEqual(lcl - 1e-6);
          if (lfc !== null && el !== null) {
            expect(el).toBeGreaterThanOrEqual(lfc);
            withLfc++;
          }
        }
        // No LFC: CAPE is 0 (a null CIN alone can also mean CIN below the QC range).
        if (f.sblfc_hgt === null && f.sbcin === null && f.sbcape !== null) expect(f.sbcape).toBe(0);
      }
    }
    expect(withLfc).toBeGreaterThan(50);
  });

  it("SRH changes sign when the hodograph and the storm motion are mirrored", () => {
    // Derived in closed form: mirroring v reverses the sense of turning, so every cross product changes sign.
    const r = seededRandom(5);
    for (const profile of profiles.slice(0, 100)) {
      const z = Array.from(profile.height, (h) => h - profile.height[0]);
      const original = { height: z, u: profile.u, v: profile.v, count: z.length };
      const mirror = { ...original, v: Array.from(profile.v, (x) => -x) };
      const cx = uniform(r, -20, 20);
      const cy = uniform(r, -20, 20);
      const top = Math.min(3000, z[z.length - 1]);
      const a = stormRelativeHelicity(original, 0, top, cx, cy);
      expect(stormRelativeHelicity(mirror, 0, top, cx, -cy)).toBeCloseTo(-a, 8);
    }
  });

  it("the mirrored column's right-mover SRH is minus the original's left-mover SRH (hemisphere option)", () => {
    // Derived in closed form: mirroring maps the left mover onto the right mover.
    for (const profile of profiles.slice(0, 60)) {
      const north = diagnoseColumn(mirrored(profile)).fields;
      const south = diagnoseColumn(profile, { hemisphere: "south" }).fields;
      if (north.srh_0_1km === null || south.srh_0_1km === null) continue;
      expect(north.srh_0_1km).toBeCloseTo(-south.srh_0_1km, 6);
      expect(north.srh_0_3km!).toBeCloseTo(-south.srh_0_3km!, 6);
      expect(north.scp_eff!).toBeCloseTo(south.scp_eff!, 6);
    }
  });
});
