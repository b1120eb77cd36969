import { readFloat32, readSignedInt16, readUint16, readUint32 } from "./bytes.ts";
import { Grib2DecodeError, type Grib2ErrorLocation } from "./errors.ts";
import type { SectionSpan } from "./sections.ts";

/** Octets 12-21, shared by every grid-point template: Y = (R + X * 2^E) / 10^D (WMO-No. 306, 92.9.4). */
export interface PackingScale {
  /** Number of packed values (grid points minus those a bitmap marks missing). */
  valueCount: number;
  reference: number;
  binaryScale: number;
  decimalScale: number;
  bitsPerValue: number;
  /** Code Table 5.1: 0 floating point, 1 integer. */
  originalType: number;
}

export interface ComplexPacking {
  groupSplitting: number;
  /** Code Table 5.5: 0 none, 1 primary missing values, 2 primary and secondary. */
  missingManagement: number;
  groupCount: number;
  groupWidthReference: number;
  groupWidthBits: number;
  groupLengthReference: number;
  groupLengthIncrement: number;
  lastGroupLength: number;
  groupLengthBits: number;
  /** 0 for template 5.2; 1 or 2 for template 5.3. */
  spatialOrder: number;
  /** Octets of each extra descriptor (first values, minimum) at the start of section 7, template 5.3. */
  descriptorOctets: number;
}

export interface CcsdsPacking {
  /** Option mask as used by the CCSDS coder (signed, 3-byte, MSB, preprocess, restricted, pad RSI bits). */
  flags: number;
  blockSize: number;
  /** Reference sample interval, in blocks. */
  referenceSampleInterval: number;
}

export type DataRepresentation =
  | { template: 0; scale: PackingScale }
  | { template: 2 | 3; scale: PackingScale; complex: ComplexPacking }
  | { template: 40; scale: PackingScale }
  | { template: 41; scale: PackingScale }
  | { template: 42; scale: PackingScale; ccsds: CcsdsPacking };

const TEMPLATE_LENGTH: Record<number, number> = { 0: 21, 2: 47, 3: 49, 40: 23, 41: 21, 42: 25 };

export function readDataRepresentation(bytes: Uint8Array, span: SectionSpan, messageNumber: number): DataRepresentation {
  const o = span.offset;
  const where: Grib2ErrorLocation = { messageNumber, section: 5, byteOffset: o };
  const template = readUint16(bytes, o + 9);
  const required = TEMPLATE_LENGTH[template];
  if (required === undefined) {
    throw new Grib2DecodeError(
      { ...where, byteOffset: o + 9 },
      `data representation template 5.${template} is not supported (supported: 5.0, 5.2, 5.3, 5.40, 5.41, 5.42)`,
    );
  }
  if (span.length < required) {
    throw new Grib2DecodeError(where, `template 5.${template} needs ${required} octets but the section declares ${span.length}`);
  }
  const scale: PackingScale = {
    valueCount: readUint32(bytes, o + 5),
    reference: readFloat32(bytes, o + 11),
    binaryScale: readSignedInt16(bytes, o + 15),
    decimalScale: readSignedInt16(bytes, o + 17),
    bitsPerValue: bytes[o + 19],
    originalType: bytes[o + 20],
  };
  if (scale.bitsPerValue > 32) {
    throw new Grib2DecodeError({ ...where, byteOffset: o + 19 }, `${scale.bitsPerValue} bits per value is more than the 32 this decoder unpacks`);
  }
  if (template === 2 || template === 3) return { template, scale, complex: readComplex(bytes, o, template, where) };
  if (template === 42) {
    return { template, scale, ccsds: { flags: bytes[o + 21], blockSize: bytes[o + 22], referenceSampleInterval: readUint16(bytes, o + 23) } };
  }
  return { template: template as 0 | 40 | 41, scale };
}

/** Templates 5.2 and 5.3, octets 22-47 (and 48-49 for spatial differencing). */
function readComplex(bytes: Uint8Array, o: number, template: 2 | 3, where: Grib2ErrorLocation): ComplexPacking {
  const complex: ComplexPacking = {
    groupSplitting: bytes[o + 21],
    missingManagement: bytes[o + 22],
    groupCount: readUint32(bytes, o + 31),
    groupWidthReference: bytes[o + 35],
    groupWidthBits: bytes[o + 36],
    groupLengthReference: readUint32(bytes, o + 37),
    groupLengthIncrement: bytes[o + 41],
    lastGroupLength: readUint32(bytes, o + 42),
    groupLengthBits: bytes[o + 46],
    spatialOrder: template === 3 ? bytes[o + 47] : 0,
    descriptorOctets: template === 3 ? bytes[o + 48] : 0,
  };
  if (complex.missingManagement > 2) {
    throw new Grib2DecodeError({ ...where, byteOffset: o + 22 }, `missing value management ${complex.missingManagement} (Code Table 5.5) is not supported`);
  }
  if (template === 3 && complex.spatialOrder > 2) {
    throw new Grib2DecodeError({ ...where, byteOffset: o + 47 }, `order of spatial differencing ${complex.spatialOrder} is not 0, 1 or 2`);
  }
  if (template === 3 && complex.spatialOrder > 0 && (complex.descriptorOctets < 1 || complex.descriptorOctets > 4)) {
    throw new Grib2DecodeError({ ...where, byteOffset: o + 48 }, `${complex.descriptorOctets} octets per spatial-differencing descriptor; expected 1 to 4`);
  }
  return complex;
}
