import { afterAll, describe, expect, it } from "vitest";
import { COLUMN_FIELD_KEYS } from "../../shared/fields.ts";
import { diagnoseColumnGrid } from "../../shared/meteo/index.ts";
import { ColumnDiagnosticsPool } from "../../server/diagnostics/column-pool.ts";
import { emptyOutput, syntheticGrid } from "../helpers/synthetic-column-grid.ts";

describe("column diagnostics worker pool", () => {
  const pool = new ColumnDiagnosticsPool({ threads: 2, chunksPerThread: 3 });
  afterAll(() => pool.destroy());

  it("gives results bit-identical to one thread for every field", async () => {
    const grid = syntheticGrid({ pointCount: 257, levelCount: 25, seed: 9 });
    const single = emptyOutput(grid);
    diagnoseColumnGrid(grid, single, { hemisphere: "north" });
    const pooled = await pool.diagnose(grid, { hemisphere: "north" });
    for (const key of COLUMN_FIELD_KEYS) {
      expect(pooled[key].buffer).toBeInstanceOf(SharedArrayBuffer);
      expect(Buffer.from(pooled[key].buffer).equals(Buffer.from(single[key].buffer)), key).toBe(true);
    }
  });

  it("passes options through to the workers", async () => {
    const grid = syntheticGrid({ pointCount: 40, levelCount: 20, seed: 3 });
    const single = emptyOutput(grid);
    diagnoseColumnGrid(grid, single, { enableScpFixed: true, pseudoAdiabat: "reference" });
    const pooled = await pool.diagnose(grid, { enableScpFixed: true, pseudoAdiabat: "reference" });
    expect(Array.from(pooled.scp_fixed)).toEqual(Array.from(single.scp_fixed));
    expect(pooled.scp_fixed.some((x) => !Number.isNaN(x))).toBe(true);
  });
});
