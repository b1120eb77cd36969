import { parentPort, workerData } from "node:worker_threads";
import { writeDemoRun } from "./demo-run.ts";

/** Writes the demo run off the main thread (it takes a few seconds of CPU). */
const { folder, runTime, forecastHours } = workerData as { folder: string; runTime: string; forecastHours: number[] };
const files = writeDemoRun(folder, { runTime: new Date(runTime), forecastHours });
parentPort?.postMessage(files);
