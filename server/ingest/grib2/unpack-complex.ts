import { BitReader } from "./bit-reader.ts";
import { readSignedIntN } from "./bytes.ts";
import type { ComplexPacking, PackingScale } from "./data-representation.ts";
import { Grib2PayloadError } from "./errors.ts";
import { fillConstant, linearScale } from "./packing-scale.ts";

/**
 * Templates 5.2 and 5.3 (data templates 7.2 and 7.3): values are split into groups, each with a reference, a bit
 * width and a length; template 5.3 first replaces the values by their first or second order differences
 * (WMO-No. 306, GRIB2 regulation 92.9.4 and the notes to templates 5.2, 5.3, 7.2 and 7.3).
 * Section 7 layout: [spatial-differencing descriptors] group references | widths | lengths | packed values, each
 * of the three group lists padded to a whole octet. Returns the number of values the packing itself marks
 * missing (missing value management 1 or 2); those come out as NaN.
 */
export function unpackComplex(payload: Uint8Array, scale: PackingScale, complex: ComplexPacking, out: Float32Array): number {
  const n = scale.valueCount;
  // No groups at all can only mean a constant field; with groups, zero-bit references are read like any other.
  if (complex.groupCount === 0) {
    fillConstant(scale, out);
    return 0;
  }
  const descriptorBytes = complex.spatialOrder > 0 ? (complex.spatialOrder + 1) * complex.descriptorOctets : 0;
  if (payload.length < descriptorBytes) {
    throw new Grib2PayloadError(`section 7 holds ${payload.length} bytes, fewer than the ${descriptorBytes} bytes of spatial-differencing descriptors`);
  }
  const groups = readGroups(payload, descriptorBytes, scale, complex, n);
  const integers = new Float64Array(n);
  const missing = unpackGroups(groups, scale.bitsPerValue, complex.missingManagement, integers);
  if (complex.spatialOrder > 0) undoSpatialDifferencing(payload, complex, integers);
  const { offset, factor } = linearScale(scale);
  for (let k = 0; k < n; k++) out[k] = offset + integers[k] * factor;
  return missing;
}

interface Groups {
  references: Uint32Array;
  widths: Uint8Array;
  lengths: Uint32Array;
  reader: BitReader;
}

function readGroups(payload: Uint8Array, start: number, scale: PackingScale, complex: ComplexPacking, n: number): Groups {
  const ng = complex.groupCount;
  if (ng > n && n > 0) throw new Grib2PayloadError(`${ng} groups for only ${n} values`);
  const reader = new BitReader(payload, start);
  const references = new Uint32Array(ng);
  const widths = new Uint8Array(ng);
  const lengths = new Uint32Array(ng);
  for (let g = 0; g < ng; g++) references[g] = reader.read(scale.bitsPerValue);
  reader.alignToByte();
  for (let g = 0; g < ng; g++) {
    const width = complex.groupWidthReference + reader.read(complex.groupWidthBits);
    if (width > 32) throw new Grib2PayloadError(`group ${g + 1} declares ${width} bits per value; at most 32 are supported`);
    widths[g] = width;
  }
  reader.alignToByte();
  let total = 0;
  for (let g = 0; g < ng; g++) {
    const scaled = reader.read(complex.groupLengthBits);
    lengths[g] = g === ng - 1 ? complex.lastGroupLength : complex.groupLengthReference + scaled * complex.groupLengthIncrement;
    total += lengths[g];
  }
  reader.alignToByte();
  if (total !== n) throw new Grib2PayloadError(`group lengths add up to ${total} values but section 5 declares ${n}`);
  return { references, widths, lengths, reader };
}

/** Group reference + packed increment; the all-ones (and all-ones minus one) codes mark missing values. */
function unpackGroups(groups: Groups, referenceBits: number, management: number, integers: Float64Array): number {
  const { references, widths, lengths, reader } = groups;
  const referenceMissing1 = 2 ** referenceBits - 1;
  const referenceMissing2 = management === 2 ? referenceMissing1 - 1 : -1;
  let k = 0;
  let missing = 0;
  for (let g = 0; g < references.length; g++) {
    const reference = references[g];
    const width = widths[g];
    const length = lengths[g];
    if (width === 0) {
      const groupMissing = management > 0 && (reference === referenceMissing1 || reference === referenceMissing2);
      integers.fill(groupMissing ? Number.NaN : reference, k, k + length);
      if (groupMissing) missing += length;
      k += length;
      continue;
    }
    const code1 = management > 0 ? 2 ** width - 1 : -1;
    const code2 = management === 2 ? code1 - 1 : -1;
    for (let e = 0; e < length; e++, k++) {
      const x = reader.read(width);
      if (x === code1 || x === code2) {
        integers[k] = Number.NaN;
        missing++;
      } else {
        integers[k] = reference + x;
      }
    }
  }
  return missing;
}

/**
 * Template 7.3: the first one or two present values are stored as descriptors, then the overall minimum of the
 * differences; the packed entries in those first positions are placeholders. Missing values are skipped, because
 * the differences are taken over present values only (notes to template 5.3).
 */
function undoSpatialDifferencing(payload: Uint8Array, complex: ComplexPacking, integers: Float64Array): void {
  const octets = complex.descriptorOctets;
  const order = complex.spatialOrder;
  const first = readSignedIntN(payload, 0, octets);
  const second = order === 2 ? readSignedIntN(payload, octets, octets) : 0;
  const minimum = readSignedIntN(payload, order * octets, octets);
  let seen = 0;
  let previous = 0;
  let beforePrevious = 0;
  for (let k = 0; k < integers.length; k++) {
    const x = integers[k];
    if (Number.isNaN(x)) continue;
    let y: number;
    if (seen === 0) y = first;
    else if (seen === 1 && order === 2) y = second;
    else if (order === 1) y = x + minimum + previous;
    else y = x + minimum + 2 * previous - beforePrevious;
    integers[k] = y;
    beforePrevious = previous;
    previous = y;
    seen++;
  }
}
