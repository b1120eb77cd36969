import fs from "node:fs";
import path from "node:path";
import { concat, writeGrib2Message, type Grib2FieldSpec } from "./grib2-writer.ts";
import { demoGeometry } from "./demo-domain.ts";
import { DEMO_LEVELS_HPA, demoFrameFields } from "./demo-atmosphere.ts";

/** GRIB2 identity of the invented demo model: local centre 255, sub-centre 77 (see grib2-records.ts). */
const DEMO_CENTRE = 255;
const DEMO_SUBCENTRE = 77;
const DEMO_PROCESS = 77;

export interface DemoRunOptions {
  runTime: Date;
  /** Forecast hours to write, one file each. */
  forecastHours: readonly number[];
  /** Grid size; the defaults give the 12-km demo domain. */
  nx?: number;
  ny?: number;
}

/** The file name the demo uses for one forecast hour. */
export function demoFileName(runTime: Date, forecastHour: number): string {
  const stamp = runTime.toISOString().slice(0, 13).replace(/[-T]/g, "");
  return `bellwether-demo_${stamp}z_f${String(forecastHour).padStart(2, "0")}.grib2`;
}

/** One forecast hour of the demo run as a GRIB2 file's bytes. */
export function demoGribFile(options: DemoRunOptions, forecastHour: number): Uint8Array {
  const geometry = demoGeometry(options.nx, options.ny);
  const n = geometry.nx * geometry.ny;
  // The event's clock: hour 0 is the run's first forecast hour.
  const fields = demoFrameFields(geometry, forecastHour - (options.forecastHours[0] ?? 0));
  const messages: Uint8Array[] = [];
  const write = (field: Grib2FieldSpec) =>
    messages.push(
      writeGrib2Message({ centre: DEMO_CENTRE, subCentre: DEMO_SUBCENTRE, generatingProcess: DEMO_PROCESS, runTime: options.runTime, forecastHours: forecastHour, geometry, field }),
    );
  DEMO_LEVELS_HPA.forEach((hpa, level) => {
    const slice = (a: Float32Array) => a.subarray(level * n, (level + 1) * n);
    const isobaric = { discipline: 0, surfaceType: 100, surfaceValue: hpa * 100 };
    write({ ...isobaric, category: 0, number: 0, decimalScale: 2, values: slice(fields.temperature) });
    write({ ...isobaric, category: 0, number: 6, decimalScale: 2, values: slice(fields.dewpoint) });
    write({ ...isobaric, category: 2, number: 2, decimalScale: 2, values: slice(fields.u) });
    write({ ...isobaric, category: 2, number: 3, decimalScale: 2, values: slice(fields.v) });
    write({ ...isobaric, category: 3, number: 5, decimalScale: 1, values: slice(fields.height) });
  });
  write({ discipline: 0, category: 3, number: 0, surfaceType: 1, surfaceValue: 0, decimalScale: 0, values: fields.surfacePressure });
  write({ discipline: 0, category: 0, number: 0, surfaceType: 103, surfaceValue: 2, decimalScale: 2, values: fields.t2m });
  write({ discipline: 0, category: 0, number: 6, surfaceType: 103, surfaceValue: 2, decimalScale: 2, values: fields.td2m });
  write({ discipline: 0, category: 2, number: 2, surfaceType: 103, surfaceValue: 10, decimalScale: 2, values: fields.u10 });
  write({ discipline: 0, category: 2, number: 3, surfaceType: 103, surfaceValue: 10, decimalScale: 2, values: fields.v10 });
  write({ discipline: 0, category: 3, number: 5, surfaceType: 1, surfaceValue: 0, decimalScale: 1, values: fields.surfaceHeight });
  return concat(messages);
}

/**
 * Writes the demo run into a folder, one file per forecast hour. Each file is written under a
 * temporary name and renamed, so an inbox watcher never sees half a file.
 */
export function writeDemoRun(folder: string, options: DemoRunOptions): string[] {
  fs.mkdirSync(folder, { recursive: true });
  return options.forecastHours.map((hour) => {
    const name = demoFileName(options.runTime, hour);
    const target = path.join(folder, name);
    fs.writeFileSync(`${target}.part`, demoGribFile(options, hour));
    fs.renameSync(`${target}.part`, target);
    return target;
  });
}

/** The demo run a new database gets: the latest full hour's run, forecast hours 1 to 9. */
export function defaultDemoRun(now: Date): DemoRunOptions {
  const runTime = new Date(Math.floor(now.getTime() / 3_600_000) * 3_600_000 - 3_600_000);
  return { runTime, forecastHours: [1, 2, 3, 4, 5, 6, 7, 8, 9] };
}
