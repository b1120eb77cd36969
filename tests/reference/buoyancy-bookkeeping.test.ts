import { describe, expect, it } from "vitest";
import { analyzeBuoyancy, BuoyancyResult, runningBuoyancyIntegral } from "../../shared/meteo/index.ts";
import { GAS_CONSTANT_DRY_AIR, POISSON_EXPONENT } from "../../shared/meteo/constants.ts";
import { loadProfile, liftSettingsFor } from "../../shared/meteo/column/diagnose-column.ts";
import { resolveColumnOptions } from "../../shared/meteo/column/column-options.ts";
import { liftLevelParcel } from "../../shared/meteo/parcel/parcel-sources.ts";

/** Nodes of the pure-arithmetic check in X = ln(p_origin / p), with the LCL (X = 0.05) inserted as a node. */
function bookkeepingNodes(): { lnP: Float64Array; delta: Float64Array; lclNode: number } {
  const x = [0, 0.05, 0.1, 0.2, 0.3, 0.4, 1.0, 1.1];
  const d = [-2, -0.5, 1, -4, -4, 5, 5, -1]; // Δ at the LCL node interpolated linearly: −2 + 0.5 × 3 = −0.5
  return { lnP: Float64Array.from(x, (v) => -v), delta: Float64Array.from(d), lclNode: 1 };
}

describe("CAPE/CIN/LFC/EL bookkeeping", () => {
  it("chooses the LFC after the deepest energy deficit (pure arithmetic check)", () => {
    // Derived in closed form: crossings at X = 0.0667, 0.12, 0.3444, 1.0833; LFC 0.3444, EL 1.0833,
    // CAPE = 960.79 J/kg, CIN = −205.39 J/kg (a lowest-LFC rule would give 968.44 and −19.14).
    const { lnP, delta, lclNode } = bookkeepingNodes();
    const out = new BuoyancyResult();
    analyzeBuoyancy(lnP, delta, lnP.length, lclNode, out);
    const xAt = (position: number) => {
      const k = Math.floor(position);
      return -(lnP[k] + (position - k) * (lnP[k + 1] - lnP[k]));
    };
    expect(xAt(out.lfcPosition)).toBeCloseTo(0.3444, 4);
    expect(xAt(out.elPosition)).toBeCloseTo(1.0833, 4);
    expect(out.cape).toBeCloseTo(960.79, 1);
    expect(out.cin).toBeCloseTo(-205.39, 1);
    expect(out.elCapped).toBe(false);
  });

  it("reports no LFC (CAPE 0, CIN undefined) when Δ never turns positive above the LCL", () => {
    // Derived in closed form: no candidate crossing exists.
    const out = new BuoyancyResult();
    analyzeBuoyancy(Float64Array.from([0, -0.1, -0.2, -0.3]), Float64Array.from([1, 0.5, -1, -2]), 4, 2, out);
    expect(out.cape).toBe(0);
    expect(out.cin).toBeNaN();
    expect(out.lfcPosition).toBeNaN();
    expect(out.elPosition).toBeNaN();
  });

  it("caps the EL at the top node when the parcel is still buoyant there", () => {
    // Derived in closed form: Δ = +1 K over 0.5 in ln p above the LCL: CAPE = Rd × 0.5 = 143.52 J/kg, CIN 0.
    const out = new BuoyancyResult();
    analyzeBuoyancy(Float64Array.from([0, -0.25, -0.5]), Float64Array.from([1, 1, 1]), 3, 0, out);
    expect(out.elCapped).toBe(true);
    expect(out.elPosition).toBe(2);
    expect(out.cape).toBeCloseTo(GAS_CONSTANT_DRY_AIR * 0.5, 9);
    expect(out.cin).toBe(0);
  });

  it("integrates a dry parcel in an isothermal 300 K column to the closed-form values", () => {
    // Derived in closed form: ∫B dz = Rd T (1 − x^κ)/κ + Rd T ln x, x = p/1000 hPa:
    // −319.61 J/kg to 850 hPa, −1511.61 to 700 hPa, −5533.34 to 500 hPa.
    const pressure: number[] = [];
    const height: number[] = [];
    for (let p = 100000, z = 0; p >= 49999; p -= 100, z += 30) {
      pressure.push(p);
      height.push(z);
    }
    const dry = pressure.map(() => 150); // Td = 150 K: r ~ 1e-8, the parcel never saturates below 100 hPa
    const options = resolveColumnOptions(undefined, "reference");
    const ws = loadProfile({ pressure, height, temperature: pressure.map(() => 300), dewpoint: dry, u: dry, v: dry }, false);
    liftLevelParcel(ws, { ...liftSettingsFor(options), virtualCorrection: false }, 0, ws.scratchParcel);
    const energy = new Float64Array(ws.nodeCount);
    runningBuoyancyIntegral(ws.nodeLnPressure, ws.nodeDelta, ws.nodeCount, energy);
    const at = (p: number) => energy[pressure.indexOf(p)];
    const exact = (p: number) => {
      const x = p / 100000;
      return (GAS_CONSTANT_DRY_AIR * 300 * (1 - Math.pow(x, POISSON_EXPONENT))) / POISSON_EXPONENT + GAS_CONSTANT_DRY_AIR * 300 * Math.log(x);
    };
    expect(exact(85000)).toBeCloseTo(-319.61, 1);
    expect(exact(70000)).toBeCloseTo(-1511.61, 1);
    expect(exact(50000)).toBeCloseTo(-5533.34, 1);
    // Trapezoids on 1-hPa levels: the remaining error is the curvature of T_parcel in ln p (< 0.01 %).
    for (const p of [85000, 70000, 50000]) expect(Math.abs(at(p) / exact(p) - 1)).toBeLessThan(1e-4);
  });
});
