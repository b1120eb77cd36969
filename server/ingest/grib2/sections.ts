import { readUint32, readUint64 } from "./bytes.ts";
import { Grib2DecodeError } from "./errors.ts";

/** One section of a message: absolute byte offset in the file and declared length (octets 1-4). */
export interface SectionSpan {
  number: number;
  offset: number;
  length: number;
}

/** The sections that describe one field. Sections 2-7 may repeat inside a message (WMO-No. 306, 92.2.2). */
export interface FieldSections {
  messageNumber: number;
  messageOffset: number;
  messageLength: number;
  fieldInMessage: number;
  discipline: number;
  identification: SectionSpan;
  localUse: SectionSpan | null;
  grid: SectionSpan;
  product: SectionSpan;
  representation: SectionSpan;
  bitmap: SectionSpan;
  data: SectionSpan;
  /** Last bitmap section in this message that carried a bitmap itself, for indicator 254 ("use previous"). */
  previousBitmap: SectionSpan | null;
}

const SECTION0_LENGTH = 16;
const END_MARKER_LENGTH = 4;
/** Smallest declared lengths that still hold each section's fixed octets (WMO-No. 306, sections 1-7). */
const MINIMUM_SECTION_LENGTH: Record<number, number> = { 1: 21, 2: 5, 3: 14, 4: 9, 5: 11, 6: 6, 7: 5 };
/** Which section may follow which inside a message; 8 stands for the end marker. */
const ALLOWED_NEXT: Record<number, readonly number[]> = {
  0: [1],
  1: [2, 3],
  2: [3],
  3: [4],
  4: [5],
  5: [6],
  6: [7],
  7: [2, 3, 4, 8],
};

function isMarker(bytes: Uint8Array, offset: number, marker: string): boolean {
  if (offset + marker.length > bytes.length) return false;
  for (let k = 0; k < marker.length; k++) if (bytes[offset + k] !== marker.charCodeAt(k)) return false;
  return true;
}

/** Zero bytes and ASCII white space are tolerated between and after messages (some writers pad records). */
function isPadding(byte: number): boolean {
  return byte === 0 || byte === 0x20 || byte === 0x0a || byte === 0x0d || byte === 0x09;
}

function describeBytes(bytes: Uint8Array, offset: number): string {
  const head = Array.from(bytes.subarray(offset, offset + 4), (b) => b.toString(16).padStart(2, "0"));
  return head.length > 0 ? `0x${head.join("")}` : "end of file";
}

/** Splits a file into messages and each message into the section spans of its fields, checking every length. */
export function splitIntoFields(bytes: Uint8Array): FieldSections[] {
  const fields: FieldSections[] = [];
  let offset = 0;
  let messageNumber = 0;
  while (offset < bytes.length) {
    if (isPadding(bytes[offset])) {
      offset++;
      continue;
    }
    messageNumber++;
    if (!isMarker(bytes, offset, "GRIB")) {
      const reason =
        messageNumber === 1
          ? `not a GRIB file: expected the marker "GRIB", found ${describeBytes(bytes, offset)}`
          : `unexpected bytes ${describeBytes(bytes, offset)} where the next message should start with "GRIB"`;
      throw new Grib2DecodeError({ messageNumber, section: 0, byteOffset: offset }, reason);
    }
    const messageLength = readMessageLength(bytes, offset, messageNumber);
    splitMessage(bytes, offset, messageLength, messageNumber, fields);
    offset += messageLength;
  }
  if (messageNumber === 0) {
    throw new Grib2DecodeError({ byteOffset: 0 }, `not a GRIB file: ${bytes.length === 0 ? "it is empty" : "it holds only padding"}`);
  }
  return fields;
}

function readMessageLength(bytes: Uint8Array, offset: number, messageNumber: number): number {
  const where = { messageNumber, section: 0, byteOffset: offset };
  if (offset + SECTION0_LENGTH > bytes.length) {
    throw new Grib2DecodeError(where, `truncated: section 0 needs 16 bytes, only ${bytes.length - offset} remain`);
  }
  const edition = bytes[offset + 7];
  if (edition !== 2) {
    throw new Grib2DecodeError(where, `GRIB edition ${edition} is not supported; only edition 2 is decoded`);
  }
  const length = readUint64(bytes, offset + 8);
  const minimum = SECTION0_LENGTH + MINIMUM_SECTION_LENGTH[1] + END_MARKER_LENGTH;
  if (length < minimum) {
    throw new Grib2DecodeError(where, `declared message length ${length} is below the minimum of ${minimum} bytes`);
  }
  if (offset + length > bytes.length) {
    throw new Grib2DecodeError(
      where,
      `truncated: the message declares ${length} bytes but only ${bytes.length - offset} remain in the file`,
    );
  }
  if (!isMarker(bytes, offset + length - END_MARKER_LENGTH, "7777")) {
    throw new Grib2DecodeError(
      { messageNumber, section: 8, byteOffset: offset + length - END_MARKER_LENGTH },
      `end marker "7777" missing where the declared message length (${length}) puts it; found ${describeBytes(bytes, offset + length - END_MARKER_LENGTH)}`,
    );
  }
  return length;
}

interface OpenSections {
  identification: SectionSpan | null;
  localUse: SectionSpan | null;
  grid: SectionSpan | null;
  product: SectionSpan | null;
  representation: SectionSpan | null;
  bitmap: SectionSpan | null;
  previousBitmap: SectionSpan | null;
}

function splitMessage(
  bytes: Uint8Array,
  messageOffset: number,
  messageLength: number,
  messageNumber: number,
  out: FieldSections[],
): void {
  const endOfSections = messageOffset + messageLength - END_MARKER_LENGTH;
  const open: OpenSections = {
    identification: null,
    localUse: null,
    grid: null,
    product: null,
    representation: null,
    bitmap: null,
    previousBitmap: null,
  };
  let previous = 0;
  let fieldInMessage = 0;
  let pos = messageOffset + SECTION0_LENGTH;
  while (pos < endOfSections) {
    const span = readSectionSpan(bytes, pos, endOfSections, previous, messageNumber);
    if (span.number === 2) open.localUse = span;
    else if (span.number === 1) open.identification = span;
    else if (span.number === 3) open.grid = span;
    else if (span.number === 4) open.product = span;
    else if (span.number === 5) open.representation = span;
    else if (span.number === 6) {
      open.bitmap = span;
      if (bytes[span.offset + 5] === 0) open.previousBitmap = span;
    } else {
      out.push({
        messageNumber,
        messageOffset,
        messageLength,
        fieldInMessage,
        discipline: bytes[messageOffset + 6],
        identification: open.identification!,
        localUse: open.localUse,
        grid: open.grid!,
        product: open.product!,
        representation: open.representation!,
        bitmap: open.bitmap!,
        data: span,
        previousBitmap: open.previousBitmap,
      });
      fieldInMessage++;
    }
    previous = span.number;
    pos += span.length;
  }
  if (previous !== 7) {
    throw new Grib2DecodeError(
      { messageNumber, section: previous, byteOffset: pos },
      `message ends after section ${previous}; a field needs sections 3 to 7 before the end marker`,
    );
  }
}

function readSectionSpan(
  bytes: Uint8Array,
  pos: number,
  endOfSections: number,
  previous: number,
  messageNumber: number,
): SectionSpan {
  if (pos + 5 > endOfSections) {
    throw new Grib2DecodeError(
      { messageNumber, section: previous, byteOffset: pos },
      `${endOfSections - pos} stray bytes before the end marker; the length of section ${previous} looks wrong`,
    );
  }
  const length = readUint32(bytes, pos);
  const number = bytes[pos + 4];
  const allowed = ALLOWED_NEXT[previous];
  if (!allowed.includes(number)) {
    throw new Grib2DecodeError(
      { messageNumber, section: previous, byteOffset: pos },
      `expected section ${allowed.filter((n) => n !== 8).join(" or ")} after section ${previous}, found section number ${number}` +
        (previous > 0 ? ` (is the declared length of section ${previous} wrong?)` : ""),
    );
  }
  const where = { messageNumber, section: number, byteOffset: pos };
  if (length < MINIMUM_SECTION_LENGTH[number]) {
    throw new Grib2DecodeError(where, `declared length ${length} is shorter than the ${MINIMUM_SECTION_LENGTH[number]} octets this section needs`);
  }
  if (pos + length > endOfSections) {
    throw new Grib2DecodeError(
      where,
      `declared length ${length} runs past the end of the message (${endOfSections - pos} bytes remain before "7777")`,
    );
  }
  return { number, offset: pos, length };
}
