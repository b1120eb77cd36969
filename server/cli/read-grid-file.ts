import fs from "node:fs";
import { detectGridFormat, describeUnknownFormat, type GridFileFormat } from "../ingest/detect-format.ts";
import { CliUsageError } from "./command.ts";

/** A grid file's bytes and format, or a usage error naming what is wrong with it. */
export function readGridFile(file: string): { bytes: Uint8Array; format: GridFileFormat } {
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(fs.readFileSync(file));
  } catch (err) {
    throw new CliUsageError(`Cannot read ${file}: ${err instanceof Error ? err.message : String(err)}`);
  }
  const head = bytes.subarray(0, 16);
  const format = detectGridFormat(head);
  if (!format) throw new CliUsageError(`${file}: ${describeUnknownFormat(head)}`);
  return { bytes, format };
}
