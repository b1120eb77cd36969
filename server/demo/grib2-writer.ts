/**
 * A small GRIB2 writer for Bellwether's invented demo files: regular Lambert conformal grids
 * (template 3.30), product template 4.0, simple packing (template 5.0), no bitmap. Layout follows
 * the WMO Manual on Codes (WMO-No. 306), FM 92 GRIB edition 2, sections 0-8.
 */
import type { LambertGeometry } from "../../shared/grid/geometry-types.ts";

export interface Grib2FieldSpec {
  discipline: number;
  category: number;
  number: number;
  /** Code Table 4.5 type of the first fixed surface (1 ground, 100 isobaric, 103 height above ground). */
  surfaceType: number;
  /** In the surface's unit: Pa for isobaric, m for heights, 0 for the ground. */
  surfaceValue: number;
  /** Decimal scale factor D: values are kept to 10^-D. */
  decimalScale: number;
  values: Float32Array;
}

export interface Grib2MessageSpec {
  centre: number;
  subCentre: number;
  generatingProcess: number;
  runTime: Date;
  forecastHours: number;
  geometry: LambertGeometry;
  field: Grib2FieldSpec;
}

class ByteWriter {
  private readonly chunks: number[] = [];
  u8(v: number) {
    this.chunks.push(v & 0xff);
  }
  u16(v: number) {
    this.u8(v >>> 8);
    this.u8(v);
  }
  u32(v: number) {
    this.u16(Math.floor(v / 65536));
    this.u16(v % 65536);
  }
  /** Sign-and-magnitude integer, as GRIB2 stores signed values. */
  s32(v: number) {
    const magnitude = Math.abs(Math.round(v));
    this.u32(v < 0 ? magnitude + 0x80000000 : magnitude);
  }
  s16(v: number) {
    const magnitude = Math.abs(Math.round(v));
    this.u16(v < 0 ? magnitude + 0x8000 : magnitude);
  }
  f32(v: number) {
    const b = new DataView(new ArrayBuffer(4));
    b.setFloat32(0, v, false);
    for (let i = 0; i < 4; i++) this.u8(b.getUint8(i));
  }
  bytes(): Uint8Array {
    return Uint8Array.from(this.chunks);
  }
}

function section(number: number, body: (w: ByteWriter) => void): Uint8Array {
  const w = new ByteWriter();
  body(w);
  const content = w.bytes();
  const out = new Uint8Array(5 + content.length);
  new DataView(out.buffer).setUint32(0, out.length, false);
  out[4] = number;
  out.set(content, 5);
  return out;
}

const microDegrees = (deg: number) => Math.round(deg * 1e6);
const positiveLongitude = (deg: number) => microDegrees(((deg % 360) + 360) % 360);

/** Simple packing (template 5.0 / 7.0): Y × 10^D = R + X with R the integer minimum, E = 0. */
function packSimple(values: Float32Array, decimalScale: number): { reference: number; bits: number; data: Uint8Array } {
  const factor = 10 ** decimalScale;
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) throw new Error("The demo writer packs complete fields only (no missing values).");
    min = Math.min(min, v * factor);
    max = Math.max(max, v * factor);
  }
  const reference = Math.floor(min);
  const range = Math.round(max - reference);
  const bits = range === 0 ? 0 : Math.ceil(Math.log2(range + 1));
  if (bits > 24) throw new Error(`A field needs ${bits} bits at decimal scale ${decimalScale}; lower the scale.`);
  const data = new Uint8Array(Math.ceil((values.length * bits) / 8));
  if (bits > 0) {
    // Bits go out most significant first; `pending` never holds more than 7 + 24 bits.
    let pending = 0;
    let pendingBits = 0;
    let byte = 0;
    for (const v of values) {
      const x = Math.max(0, Math.round(v * factor - reference));
      pending = pending * 2 ** bits + x;
      pendingBits += bits;
      while (pendingBits >= 8) {
        pendingBits -= 8;
        const top = Math.floor(pending / 2 ** pendingBits);
        data[byte++] = top;
        pending -= top * 2 ** pendingBits;
      }
    }
    if (pendingBits > 0) data[byte] = pending * 2 ** (8 - pendingBits);
  }
  return { reference, bits, data };
}

/** One complete GRIB2 message holding one field. */
export function writeGrib2Message(spec: Grib2MessageSpec): Uint8Array {
  const g = spec.geometry;
  const f = spec.field;
  const n = g.nx * g.ny;
  if (f.values.length !== n) throw new Error(`Field has ${f.values.length} values; the grid has ${n}.`);
  const t = spec.runTime;

  const s1 = section(1, (w) => {
    w.u16(spec.centre);
    w.u16(spec.subCentre);
    w.u8(2); // master tables version
    w.u8(0); // no local tables
    w.u8(1); // reference time = start of forecast
    w.u16(t.getUTCFullYear());
    w.u8(t.getUTCMonth() + 1);
    w.u8(t.getUTCDate());
    w.u8(t.getUTCHours());
    w.u8(t.getUTCMinutes());
    w.u8(t.getUTCSeconds());
    w.u8(2); // production status: research (the demo is invented)
    w.u8(1); // type of data: forecast
  });
  const s3 = section(3, (w) => {
    w.u8(0);
    w.u32(n);
    w.u8(0);
    w.u8(0);
    w.u16(30); // Lambert conformal
    w.u8(1); // spherical Earth, radius given
    w.u8(0);
    w.u32(Math.round(g.earthRadius));
    for (let k = 0; k < 2; k++) {
      w.u8(0);
      w.u32(0);
    }
    w.u32(g.nx);
    w.u32(g.ny);
    w.s32(microDegrees(g.lat0));
    w.u32(positiveLongitude(g.lon0));
    w.u8(g.uvRelativeToGrid ? 0x38 : 0x30); // increments given; bit 5 (0x08): winds relative to the grid
    w.s32(microDegrees(g.latin1)); // LaD: where Dx, Dy are true
    w.u32(positiveLongitude(g.lonV));
    w.u32(Math.round(g.dx * 1000)); // mm
    w.u32(Math.round(g.dy * 1000));
    w.u8(0); // north pole in the projection plane
    w.u8(0x40); // +i eastward, +j northward, rows consecutive along i
    w.s32(microDegrees(g.latin1));
    w.s32(microDegrees(g.latin2));
    w.s32(microDegrees(-90));
    w.u32(0);
  });
  const s4 = section(4, (w) => {
    w.u16(0);
    w.u16(0); // template 4.0
    w.u8(f.category);
    w.u8(f.number);
    w.u8(2); // forecast
    w.u8(0);
    w.u8(spec.generatingProcess);
    w.u16(0);
    w.u8(0);
    w.u8(1); // forecast time in hours
    w.u32(spec.forecastHours);
    w.u8(f.surfaceType);
    w.u8(0);
    w.u32(Math.round(f.surfaceValue));
    w.u8(255);
    w.u8(0);
    w.u32(0);
  });
  const packed = packSimple(f.values, f.decimalScale);
  const s5 = section(5, (w) => {
    w.u32(n);
    w.u16(0); // simple packing
    w.f32(packed.reference);
    w.s16(0); // binary scale E
    w.s16(f.decimalScale);
    w.u8(packed.bits);
    w.u8(0); // floating-point original values
  });
  const s6 = section(6, (w) => w.u8(255)); // no bitmap
  const s7 = section(7, () => {});
  const body = [s1, s3, s4, s5, s6, concat([s7.subarray(0, 5), packed.data])];
  // Section 7's length must include its data.
  new DataView(body[5]!.buffer, body[5]!.byteOffset).setUint32(0, 5 + packed.data.length, false);
  const total = 16 + body.reduce((sum, b) => sum + b.length, 0) + 4;
  const s0 = new Uint8Array(16);
  s0.set([0x47, 0x52, 0x49, 0x42, 0, 0, f.discipline, 2]);
  new DataView(s0.buffer).setBigUint64(8, BigInt(total), false);
  return concat([s0, ...body, new Uint8Array([0x37, 0x37, 0x37, 0x37])]);
}

export function concat(parts: readonly Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((sum, p) => sum + p.length, 0));
  let offset = 0;
  for (const p of parts) {
    out.set(p, offset);
    offset += p.length;
  }
  return out;
}
