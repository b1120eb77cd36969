import { diagnoseColumnGrid } from "../../shared/meteo/index.ts";
import type { ColumnTask } from "./column-task.ts";

/**
 * Worker-thread entry for the column pool. The typed arrays in the task share memory with the main thread
 * (SharedArrayBuffer), so this writes results straight into the caller's outputs and returns only a count.
 */
export default function runColumnTask(task: ColumnTask): number {
  diagnoseColumnGrid(task.grid, task.output, task.options, { start: task.start, end: task.end });
  return task.end - task.start;
}
