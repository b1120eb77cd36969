import { decodeGrib2 } from "./decode.ts";

/**
 * Hook for the ingest benchmark: decodes every field of a buffer and returns counts (and a checksum of the
 * values, so the work cannot be skipped). Time it from the caller; JPEG 2000 files need loadGrib2Codecs() first.
 */
export function decodeGrib2ForBenchmark(bytes: Uint8Array): { fields: number; points: number; checksum: number } {
  const fields = decodeGrib2(bytes);
  let points = 0;
  let checksum = 0;
  for (const field of fields) {
    points += field.values.length;
    for (let k = 0; k < field.values.length; k++) {
      const v = field.values[k];
      if (v === v) checksum += v;
    }
  }
  return { fields: fields.length, points, checksum };
}
