import { expandWithBitmap, readBitmap, type Bitmap } from "./bitmap.ts";
import { readDataRepresentation, type DataRepresentation } from "./data-representation.ts";
import { Grib2DecodeError, Grib2PayloadError } from "./errors.ts";
import type { Grib2FieldInfo, Grib2Message } from "./field-types.ts";
import { readGridDefinition, type GridDefinition } from "./grid-templates.ts";
import { isoFromMilliseconds, readIdentification } from "./identification.ts";
import { levelTypeName } from "./levels.ts";
import { parameterInfo } from "./parameters.ts";
import { readProductDefinition } from "./product-templates.ts";
import { toCanonicalOrder } from "./scan-order.ts";
import { splitIntoFields, type FieldSections } from "./sections.ts";
import { unpackCcsds } from "./unpack-ccsds.ts";
import { unpackComplex } from "./unpack-complex.ts";
import { unpackJpeg2000 } from "./unpack-jpeg2000.ts";
import { unpackPng } from "./unpack-png.ts";
import { unpackSimple } from "./unpack-simple.ts";

/** Everything about one field except its values. */
interface DescribedField {
  info: Grib2FieldInfo;
  sections: FieldSections;
  grid: GridDefinition;
  representation: DataRepresentation;
  bitmap: Bitmap | null;
}

/**
 * Lists every field of a GRIB2 file with its metadata, without unpacking values. Section lengths, templates and
 * counts are checked exactly as in decodeGrib2, so a file that lists cleanly fails only on a corrupt payload.
 */
export function scanGrib2(bytes: Uint8Array): Grib2FieldInfo[] {
  return splitIntoFields(bytes).map((sections, index) => describeField(bytes, sections, index).info);
}

export interface DecodeOptions {
  /**
   * Unpacks only the fields this returns true for (after every field's metadata has been checked). A model file
   * can hold hundreds of fields; unpacking only those needed keeps memory to what is used.
   */
  select?: (field: Grib2FieldInfo) => boolean;
}

/**
 * Decodes the fields of a GRIB2 file (all of them unless `options.select` says otherwise). Values come back in
 * Bellwether's canonical layout (index = j * nx + i, i eastward, j northward, (0, 0) south-west) with NaN where a
 * value is missing. Files using JPEG 2000 packing need `await loadGrib2Codecs()` once beforehand.
 * Throws Grib2DecodeError naming message, section and byte.
 */
export function decodeGrib2(bytes: Uint8Array, options: DecodeOptions = {}): Grib2Message[] {
  const described = splitIntoFields(bytes).map((sections, index) => describeField(bytes, sections, index));
  const wanted = options.select ? described.filter((field) => options.select!(field.info)) : described;
  return wanted.map((field) => decodeField(bytes, field));
}

function describeField(bytes: Uint8Array, sections: FieldSections, index: number): DescribedField {
  const messageNumber = sections.messageNumber;
  const identification = readIdentification(bytes, sections.identification, messageNumber);
  const grid = readGridDefinition(bytes, sections.grid, messageNumber);
  const product = readProductDefinition(bytes, sections.product, identification.refTimeMs, messageNumber);
  const representation = readDataRepresentation(bytes, sections.representation, messageNumber);
  const bitmap = readBitmap(bytes, sections, grid.pointCount);
  const expected = bitmap ? bitmap.presentCount : grid.pointCount;
  if (representation.scale.valueCount !== expected) {
    const why = bitmap ? `the bitmap marks ${expected} of ${grid.pointCount} points present` : `the grid has ${expected} points and there is no bitmap`;
    throw new Grib2DecodeError(
      { messageNumber, section: 5, byteOffset: sections.representation.offset + 5 },
      `section 5 declares ${representation.scale.valueCount} packed values but ${why}`,
    );
  }
  const first = product.firstSurface;
  const info: Grib2FieldInfo = {
    index,
    messageNumber,
    fieldInMessage: sections.fieldInMessage,
    byteOffset: sections.messageOffset,
    byteLength: sections.messageLength,
    discipline: sections.discipline,
    category: product.category,
    number: product.number,
    parameter: parameterInfo(sections.discipline, product.category, product.number, first),
    levelType: first ? first.levelType : levelTypeName(255),
    level: first ? first.level : Number.NaN,
    secondLevel: product.secondSurface ? { levelType: product.secondSurface.levelType, level: product.secondSurface.level } : null,
    refTime: isoFromMilliseconds(identification.refTimeMs),
    forecastSeconds: product.forecastSeconds,
    validTime: isoFromMilliseconds(product.validTimeMs),
    statistics: product.statistics,
    ensemble: product.ensemble,
    productTemplate: product.template,
    dataTemplate: representation.template,
    gridTemplate: grid.template,
    geometry: grid.geometry,
    earthShape: grid.earth,
    centre: identification.centre,
    subCentre: identification.subCentre,
    generatingProcessType: product.generatingProcessType,
    bitsPerValue: representation.scale.bitsPerValue,
    packedValueCount: representation.scale.valueCount,
    hasBitmap: bitmap !== null,
    scanningMode: grid.scan.flags,
  };
  return { info, sections, grid, representation, bitmap };
}

function decodeField(bytes: Uint8Array, field: DescribedField): Grib2Message {
  const { grid, representation, bitmap, sections } = field;
  const data = sections.data;
  const payload = bytes.subarray(data.offset + 5, data.offset + data.length);
  const packed = new Float32Array(representation.scale.valueCount);
  let packingMissing = 0;
  try {
    packingMissing = unpack(payload, representation, packed);
  } catch (error) {
    if (!(error instanceof Grib2PayloadError)) throw error;
    throw new Grib2DecodeError({ messageNumber: sections.messageNumber, section: 7, byteOffset: data.offset }, error.message);
  }
  let scanOrdered = packed;
  if (bitmap) {
    scanOrdered = new Float32Array(grid.pointCount);
    expandWithBitmap(packed, bitmap, scanOrdered);
  }
  const { nx, ny } = grid.geometry;
  const values = toCanonicalOrder(scanOrdered, nx, ny, grid.scan);
  const missingCount = grid.pointCount - representation.scale.valueCount + packingMissing;
  return { ...field.info, values, missingCount };
}

/** Dispatches on the data representation template; returns values the packing itself marks missing. */
function unpack(payload: Uint8Array, representation: DataRepresentation, out: Float32Array): number {
  switch (representation.template) {
    case 0:
      unpackSimple(payload, representation.scale, out);
      return 0;
    case 2:
    case 3:
      return unpackComplex(payload, representation.scale, representation.complex, out);
    case 40:
      unpackJpeg2000(payload, representation.scale, out);
      return 0;
    case 41:
      unpackPng(payload, representation.scale, out);
      return 0;
    case 42:
      unpackCcsds(payload, representation.scale, representation.ccsds, out);
      return 0;
  }
}
