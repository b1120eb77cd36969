/**
 * Named scratch arrays kept between calls. Allocating a fresh million-point array costs milliseconds (the
 * memory must be mapped and zeroed), so a worker that diagnoses frame after frame on one grid passes the
 * same scratch every time. Arrays come back with undefined contents; callers initialise what they read.
 */
export class GridScratch {
  private readonly float32s = new Map<string, Float32Array>();
  private readonly float64s = new Map<string, Float64Array>();
  private readonly int32s = new Map<string, Int32Array>();

  float32(name: string, length: number): Float32Array {
    return reuse(this.float32s, name, length, (n) => new Float32Array(n));
  }

  float64(name: string, length: number): Float64Array {
    return reuse(this.float64s, name, length, (n) => new Float64Array(n));
  }

  int32(name: string, length: number): Int32Array {
    return reuse(this.int32s, name, length, (n) => new Int32Array(n));
  }
}

/** The stored array of `name` when it is long enough (a view of exactly `length` values), else a new one. */
function reuse<T extends Float32Array | Float64Array | Int32Array>(store: Map<string, T>, name: string, length: number, create: (n: number) => T): T {
  const existing = store.get(name);
  if (existing && existing.length >= length) return (existing.length === length ? existing : existing.subarray(0, length)) as T;
  const created = create(length);
  store.set(name, created);
  return created;
}
