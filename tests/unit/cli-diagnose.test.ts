import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { COLUMN_FIELD_KEYS } from "../../shared/fields.ts";

const root = path.resolve(import.meta.dirname, "../..");
const tsx = path.join(root, "node_modules/.bin/tsx");

function cli(...args: string[]) {
  return spawnSync(tsx, ["server/cli/main.ts", ...args], { cwd: root, encoding: "utf8" });
}

describe("npm run cli -- diagnose", () => {
  it("prints one flat JSON object with every column field key (SI, null where undefined)", () => {
    const run = cli("diagnose", "tests/fixtures/soundings/demo-warm-sector.csv", "--json");
    expect(run.status).toBe(0);
    const lines = run.stdout.trim().split("\n");
    expect(lines).toHaveLength(1);
    const fields = JSON.parse(lines[0]) as Record<string, number | null>;
    expect(Object.keys(fields)).toEqual([...COLUMN_FIELD_KEYS]);
    expect(fields.scp_fixed).toBeNull();
    expect(fields.mu_src_pres).toBe(100000);
  });

  it("prints a table grouped by theme in display units without --json", () => {
    const run = cli("diagnose", "tests/fixtures/soundings/demo-capped-plains.csv");
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/^BUOYANCY/m);
    expect(run.stdout).toMatch(/shear_0_6km\s+\d+ kt/);
  });

  it("reports a malformed file on stderr with exit code 1", () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "bw-csv-"));
    const file = path.join(dir, "bad.csv");
    fs.writeFileSync(file, "pressure_hpa,height_m,temp_c,dewpoint_c,wind_dir_deg,wind_speed_kt\n1000,100,20,x,0,0\n");
    const run = cli("diagnose", file);
    expect(run.status).toBe(1);
    expect(run.stdout).toBe("");
    expect(run.stderr).toMatch(/line 2: dewpoint_c "x" is not a number/);
    fs.rmSync(dir, { recursive: true });
  });
});
