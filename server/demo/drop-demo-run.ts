import type { DemoRunOptions } from "./demo-run.ts";
import { startTsWorker } from "../workers/ts-worker.ts";

/** Writes the demo run's GRIB2 files into `folder` (the inbox) on a worker thread. */
export function dropDemoRun(folder: string, options: DemoRunOptions): Promise<string[]> {
  return new Promise((resolve, reject) => {
    const worker = startTsWorker(new URL("./demo-run-worker.ts", import.meta.url), {
      workerData: { folder, runTime: options.runTime.toISOString(), forecastHours: [...options.forecastHours] },
    });
    worker.once("message", resolve);
    worker.once("error", reject);
    worker.once("exit", (code) => code !== 0 && reject(new Error(`demo writer exited with code ${code}`)));
  });
}
