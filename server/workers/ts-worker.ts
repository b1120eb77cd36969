import { Worker, type WorkerOptions } from "node:worker_threads";

/**
 * A worker thread whose entry is a TypeScript module. Node 20 does not apply `--import tsx` to a
 * worker's first module, so a one-line bootstrap registers tsx's loader and then imports the entry.
 */
export function startTsWorker(entry: URL, options: Omit<WorkerOptions, "eval"> = {}): Worker {
  const bootstrap = `import("tsx/esm/api").then(({ register }) => { register(); return import(${JSON.stringify(entry.href)}); })`;
  return new Worker(bootstrap, { ...options, eval: true });
}
