import type { ColumnGrid, ColumnGridOutput, ColumnOptions } from "../../shared/meteo/index.ts";

/** One unit of pool work: a point range of a grid whose arrays all live on SharedArrayBuffers. */
export interface ColumnTask {
  grid: ColumnGrid;
  output: ColumnGridOutput;
  options: ColumnOptions;
  start: number;
  end: number;
}
