/**
 * Ingest benchmark: decode + assemble + diagnose + store one 400 × 400 × 25-level GRIB2 file of
 * the invented demo atmosphere. Prints seconds per stage and peak memory.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { demoGribFile } from "../../server/demo/demo-run.ts";
import { decodeGridFile } from "../../server/ingest/decode-file.ts";
import { assembleFrames } from "../../server/ingest/assemble-frames.ts";
import { ColumnDiagnosticsPool } from "../../server/diagnostics/column-pool.ts";
import { frameExtraDiagnosers } from "../../server/ingest/frame-diagnostics.ts";
import { writeFieldFile } from "../../server/grids/field-file.ts";

const NX = 400;
const NY = 400;

function peakTracker() {
  let peak = process.memoryUsage().rss;
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
  return { stop: () => (clearInterval(timer), Math.max(peak, process.memoryUsage().rss)) };
}

async function timed<T>(label: string, work: () => Promise<T> | T): Promise<T> {
  const t0 = performance.now();
  const result = await work();
  process.stdout.write(`  ${label.padEnd(34)} ${((performance.now() - t0) / 1000).toFixed(2)} s\n`);
  return result;
}

export async function run(): Promise<void> {
  const cache = path.join(os.tmpdir(), `bellwether-bench-${NX}x${NY}.grib2`);
  if (!fs.existsSync(cache)) {
    process.stdout.write("  writing the benchmark file once (cached in the temp folder)…\n");
    fs.writeFileSync(cache, demoGribFileSized());
  }
  const bytes = new Uint8Array(fs.readFileSync(cache));
  process.stdout.write(`  file: ${(bytes.length / 1e6).toFixed(1)} MB, ${NX} × ${NY} points, 25 isobaric levels\n`);
  const memory = peakTracker();
  const total0 = performance.now();
  const records = await timed("decode (GRIB2 → records)", () => decodeGridFile(bytes, "grib2"));
  const { frames } = await timed("assemble frame", () => assembleFrames(records));
  const frame = frames[0]!;
  const pool = new ColumnDiagnosticsPool({ threads: os.availableParallelism() });
  const columns = await timed(`column diagnostics (${pool.threads} threads)`, () => pool.diagnose(frame.grid));
  await pool.destroy();
  const extras: Record<string, Float32Array> = {};
  await timed("jet-level diagnostics", async () => {
    for (const extra of frameExtraDiagnosers()) Object.assign(extras, (await extra(frame)).fields);
  });
  const out = fs.mkdtempSync(path.join(os.tmpdir(), "bellwether-bench-store-"));
  await timed("store fields (Float32 files)", () => {
    for (const [key, values] of Object.entries({ ...columns, ...extras })) writeFieldFile(path.join(out, `${key}.f32`), values);
  });
  fs.rmSync(out, { recursive: true, force: true });
  const seconds = (performance.now() - total0) / 1000;
  process.stdout.write(`  total                              ${seconds.toFixed(2)} s\n`);
  process.stdout.write(`  peak RSS                           ${(memory.stop() / 1e6).toFixed(0)} MB\n`);
}

function demoGribFileSized(): Uint8Array {
  return demoGribFile({ runTime: new Date("2026-05-14T12:00:00Z"), forecastHours: [6], nx: NX, ny: NY }, 6);
}
