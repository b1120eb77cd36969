import { describe, expect, it } from "vitest";
import { COLUMN_FIELD_KEYS } from "../../shared/fields.ts";
import { diagnoseColumn, diagnoseColumnGrid } from "../../shared/meteo/index.ts";
import { columnProfileAt, emptyOutput, syntheticGrid } from "../helpers/synthetic-column-grid.ts";

// Invented grids: these tests compare two code paths with each other, not with outside values.
const grid = syntheticGrid({ pointCount: 60, levelCount: 30, seed: 42 });

describe("batch grid entry point", () => {
  it("equals the per-column entry point for every field at every point (float32 storage)", () => {
    // Derived in closed form: both paths run the same core on the same inputs; only float32 storage differs.
    const out = emptyOutput(grid);
    diagnoseColumnGrid(grid, out, { pseudoAdiabat: "table", enableScpFixed: true });
    let compared = 0;
    for (let point = 0; point < grid.pointCount; point++) {
      const { fields } = diagnoseColumn(columnProfileAt(grid, point), { pseudoAdiabat: "table", enableScpFixed: true });
      for (const key of COLUMN_FIELD_KEYS) {
        const expected = fields[key];
        if (expected === null) expect(out[key][point], `${key} at ${point}`).toBeNaN();
        else expect(out[key][point], `${key} at ${point}`).toBe(Math.fround(expected));
        compared++;
      }
    }
    expect(compared).toBe(grid.pointCount * COLUMN_FIELD_KEYS.length);
  });

  it("covers columns with buoyancy, an effective layer and ground above the lowest levels", () => {
    // Common practice (no source): a test grid should exercise the interesting branches.
    const out = emptyOutput(grid);
    diagnoseColumnGrid(grid, out);
    const count = (predicate: (i: number) => boolean) => Array.from({ length: grid.pointCount }, (_, i) => i).filter(predicate).length;
    expect(count((i) => out.mucape[i] > 500)).toBeGreaterThan(5);
    expect(count((i) => out.eff_present[i] === 1)).toBeGreaterThan(5);
    expect(count((i) => grid.surface.pressure[i] < 95000)).toBeGreaterThan(2);
  });

  it("writes only inside the requested point range", () => {
    // Derived in closed form: points outside [start, end) are never touched.
    const out = emptyOutput(grid);
    out.sbcape.fill(-1);
    diagnoseColumnGrid(grid, out, undefined, { start: 10, end: 20 });
    expect(out.sbcape[9]).toBe(-1);
    expect(out.sbcape[20]).toBe(-1);
    expect(out.sbcape[10]).not.toBe(-1);
  });

  it("table path stays within the pseudo-adiabat error budget of the reference integrator", () => {
    // Source: requirement of the team's error budget: 1 % or 10 J/kg CAPE, 1 J/kg + 2 % CIN.
    const fast = emptyOutput(grid);
    const exact = emptyOutput(grid);
    diagnoseColumnGrid(grid, fast, { pseudoAdiabat: "table" });
    diagnoseColumnGrid(grid, exact, { pseudoAdiabat: "reference" });
    let worstCape = 0;
    for (let point = 0; point < grid.pointCount; point++) {
      for (const [cape, cin] of [
        ["sbcape", "sbcin"],
        ["mlcape", "mlcin"],
        ["mucape", "mucin"],
      ] as const) {
        const a = fast[cape][point];
        const b = exact[cape][point];
        if (Number.isNaN(a) && Number.isNaN(b)) continue; // both outside the QC range or undefined
        worstCape = Math.max(worstCape, Math.abs(a - b));
        expect(Math.abs(a - b), `${cape} at ${point}`).toBeLessThanOrEqual(Math.max(10, 0.01 * b));
        if (!Number.isNaN(b) && !Number.isNaN(fast[cin][point])) {
          expect(Math.abs(fast[cin][point] - exact[cin][point]), `${cin} at ${point}`).toBeLessThanOrEqual(1 + 0.02 * Math.abs(exact[cin][point]));
        }
      }
    }
    console.info(`table vs reference on the synthetic grid: worst CAPE difference ${worstCape.toFixed(2)} J/kg`);
  });
});
