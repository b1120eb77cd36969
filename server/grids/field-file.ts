import fs from "node:fs";
import os from "node:os";
import path from "node:path";

// Field files are raw little-endian Float32 values in the canonical grid order, the layout typed
// arrays already have on every machine Bellwether targets.
if (os.endianness() !== "LE") throw new Error("Bellwether's field files assume a little-endian machine.");

/** Writes a field atomically: a temporary file renamed into place, so a crash leaves no half file. */
export function writeFieldFile(file: string, values: Float32Array): void {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const tmp = `${file}.tmp-${process.pid}`;
  fs.writeFileSync(tmp, new Uint8Array(values.buffer, values.byteOffset, values.byteLength));
  fs.renameSync(tmp, file);
}

/** Reads a whole field; refuses a file whose size does not match the expected point count. */
export function readFieldFile(file: string, expectedLength?: number): Float32Array {
  const bytes = fs.readFileSync(file);
  if (bytes.byteLength % 4 !== 0 || (expectedLength !== undefined && bytes.byteLength !== expectedLength * 4)) {
    throw new Error(`Field file ${path.basename(file)} has ${bytes.byteLength} bytes, expected ${expectedLength ?? "a multiple of"} × 4.`);
  }
  const out = new Float32Array(bytes.byteLength / 4);
  new Uint8Array(out.buffer).set(bytes);
  return out;
}

/** Reads `count` values spaced `stride` apart starting at `offset` (one column of a level-major 3-D field). */
export function readStrided(file: string, offset: number, stride: number, count: number): Float32Array {
  const out = new Float32Array(count);
  const cell = Buffer.alloc(4);
  const fd = fs.openSync(file, "r");
  try {
    for (let k = 0; k < count; k++) {
      fs.readSync(fd, cell, 0, 4, (offset + k * stride) * 4);
      out[k] = cell.readFloatLE(0);
    }
  } finally {
    fs.closeSync(fd);
  }
  return out;
}

export interface FieldStats {
  min: number | null;
  max: number | null;
  nanCount: number;
}

export function fieldStats(values: Float32Array): FieldStats {
  let min = Infinity;
  let max = -Infinity;
  let nanCount = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i]!;
    if (v !== v) nanCount++;
    else {
      if (v < min) min = v;
      if (v > max) max = v;
    }
  }
  return nanCount === values.length ? { min: null, max: null, nanCount } : { min, max, nanCount };
}
