import { describe, expect, it } from "vitest";
import { JET_FIELD_KEYS, fieldByKey } from "../../../shared/fields.ts";
import { computeJetFields, type JetInput } from "../../../shared/meteo/jet/compute-jet-fields.ts";
import { GridScratch } from "../../../shared/meteo/jet/grid-scratch.ts";
import { GridShapeError } from "../../../shared/meteo/errors.ts";
import { curvedJetStreak, gaussianJetStreak } from "../../helpers/jet-test-fields.ts";

const jet = gaussianJetStreak({ f: 1e-4 });
const n = jet.u.length;
const base: JetInput = { geometry: jet.grid.geometry, u: jet.u, v: jet.v, height: jet.height };

describe("computeJetFields output", () => {
  const result = computeJetFields(base);

  it("holds every jet field of the catalogue, one value per grid point", () => {
    expect(Object.keys(result.fields).sort()).toEqual([...JET_FIELD_KEYS].sort());
    for (const key of JET_FIELD_KEYS) expect(result.fields[key]).toHaveLength(n);
  });

  it("writes booleans as 0/1 and categories as their codes", () => {
    for (const key of JET_FIELD_KEYS) {
      const definition = fieldByKey(key)!;
      if (definition.kind === "number") continue;
      const allowed = definition.kind === "bool" ? [0, 1] : definition.categories!.map((c) => c.code);
      const values = new Set(result.fields[key]);
      for (const value of values) {
        if (key === "jet_curv_class" && Number.isNaN(value)) continue; // away from streaks
        expect(allowed).toContain(value);
      }
    }
  });

  it("leaves streak-only fields undefined away from streaks and booleans false", () => {
    const corner = 5 * jet.grid.geometry.nx + 5;
    expect(result.fields.jet_quadrant[corner]).toBe(0);
    expect(Number.isNaN(result.fields.jet_curv_class[corner])).toBe(true);
    expect(Number.isNaN(result.fields.jet_core_speed[corner])).toBe(true);
    expect(Number.isNaN(result.fields.jet_along_dist[corner])).toBe(true);
    expect(result.fields.jet_div_favoured[corner]).toBe(0);
  });

  it("fills fgen_850 and fgen_700 with NaN when the lower levels are not given", () => {
    expect(result.fields.fgen_850.every(Number.isNaN)).toBe(true);
    expect(result.fields.fgen_700.every(Number.isNaN)).toBe(true);
  });

  it("describes each streak with its core position, axis and curvature", () => {
    const streak = result.streaks[0];
    expect(streak.axis.length).toBeGreaterThan(100);
    const s = streak.axis.map((vertex) => vertex.s);
    expect(s).toEqual([...s].sort((a, b) => a - b));
    expect(s).toContain(0);
    expect(streak.hemisphere).toBe("north");
    expect(streak.labelledPoints).toBeGreaterThan(0);
    // An f-plane has no latitude or longitude.
    expect(Number.isNaN(streak.core.lat)).toBe(true);
  });
});

describe("computeJetFields with lower levels", () => {
  it("computes frontogenesis where temperature and wind are given at 850 hPa", () => {
    const nx = jet.grid.geometry.nx;
    const temperature = new Float32Array(n);
    const u = new Float32Array(n);
    const v = new Float32Array(n);
    for (let k = 0; k < n; k++) {
      const x = jet.grid.x[k % nx];
      const y = jet.grid.y[Math.floor(k / nx)];
      temperature[k] = 285 + 1e-5 * y; // warmer to the north
      u[k] = 1e-5 * x; // confluent deformation squeezing the isotherms together
      v[k] = -1e-5 * y;
    }
    const result = computeJetFields({ ...base, p850: { temperature, u, v } });
    const centre = Math.floor(jet.grid.geometry.ny / 2) * nx + Math.floor(nx / 2);
    // Source: Derived in closed form (Petterssen 1936): αΓ with Γ = 1e-5 (p00/p)^κ K/m, α = 1e-5 s⁻¹
    expect(result.fields.fgen_850[centre]).toBeCloseTo(0.108 * Math.pow(1000 / 850, 0.2854), 3);
    expect(result.fields.fgen_700.every(Number.isNaN)).toBe(true);
  });
});

describe("computeJetFields input checks", () => {
  it("names a wrongly sized array", () => {
    expect(() => computeJetFields({ ...base, v: new Float32Array(10) })).toThrow(GridShapeError);
    expect(() => computeJetFields({ ...base, v: new Float32Array(10) })).toThrow(/^v: expected 38801 values \(241 × 161\), received 10$/);
    const level = { temperature: new Float32Array(3), u: jet.u, v: jet.v };
    expect(() => computeJetFields({ ...base, p700: level })).toThrow(/p700\.temperature/);
  });

  it("rejects invalid settings with the setting's name", () => {
    expect(() => computeJetFields(base, { smoothingSigma: -1 })).toThrow(/smoothingSigma/);
  });
});

describe("computeJetFields QC and scratch reuse", () => {
  it("sets values outside the catalogue range to NaN and counts them", () => {
    const fast = computeJetFields({ ...base, u: jet.u.map((x) => 4 * x) });
    // Common practice (no source): the catalogue's QC range for jet_speed tops out at 150 m/s.
    expect(fast.qcRejected.jet_speed).toBeGreaterThan(0);
    expect(fast.fields.jet_speed.some((x) => x > 150)).toBe(false);
  });

  it("gives the same fields with a scratch reused from another frame as with a fresh one", () => {
    const scratch = new GridScratch();
    const bent = curvedJetStreak({ radius: 3_000_000, mirror: true, f: 1e-4 });
    computeJetFields({ geometry: bent.grid.geometry, u: bent.u, v: bent.v, height: new Float32Array(bent.u.length) }, undefined, { scratch });
    const reused = computeJetFields(base, undefined, { scratch });
    const fresh = computeJetFields(base);
    for (const key of JET_FIELD_KEYS) expect(reused.fields[key]).toEqual(fresh.fields[key]);
    expect(reused.streaks).toEqual(fresh.streaks);
  });

  it("warns when the local speed-gradient check disagrees more than the office allows", () => {
    const bent = curvedJetStreak({ radius: 1_500_000, mirror: false, f: 1e-4 });
    const input = { geometry: bent.grid.geometry, u: bent.u, v: bent.v, height: new Float32Array(bent.u.length) };
    const strict = computeJetFields(input, { fallbackDisagreementLimit: 0 });
    expect(strict.fallbackDisagreement).toBeGreaterThan(0);
    expect(strict.warnings.join(" ")).toMatch(/local speed-gradient check disagrees/);
    expect(computeJetFields(input).warnings).toEqual([]);
  });
});
