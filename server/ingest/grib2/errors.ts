/** Where in a file a decoding problem was found; every field is optional because framing errors precede sections. */
export interface Grib2ErrorLocation {
  /** 1-based number of the GRIB message in the file. */
  messageNumber?: number;
  /** GRIB2 section number (0-8). */
  section?: number;
  /** Byte offset from the start of the file. */
  byteOffset?: number;
}

/**
 * Raised for any input the decoder cannot honour: not GRIB2, truncated, inconsistent lengths or an unsupported
 * template. The message names the message number, section and byte offset so a bad file can be inspected by hand.
 */
export class Grib2DecodeError extends Error {
  readonly messageNumber: number | undefined;
  readonly section: number | undefined;
  readonly byteOffset: number | undefined;
  readonly reason: string;

  constructor(location: Grib2ErrorLocation, reason: string) {
    super(`${describeLocation(location)}: ${reason}`);
    this.name = "Grib2DecodeError";
    this.messageNumber = location.messageNumber;
    this.section = location.section;
    this.byteOffset = location.byteOffset;
    this.reason = reason;
  }
}

function describeLocation(location: Grib2ErrorLocation): string {
  const parts = ["GRIB2"];
  if (location.messageNumber !== undefined) parts.push(`message ${location.messageNumber}`);
  if (location.section !== undefined) parts.push(`section ${location.section}`);
  if (location.byteOffset !== undefined) parts.push(`at byte ${location.byteOffset}`);
  return parts.join(", ");
}

/**
 * Raised by the unpackers, which see only a payload and not its place in the file; the decoder catches it and
 * re-raises a {@link Grib2DecodeError} that carries the location.
 */
export class Grib2PayloadError extends Error {
  constructor(reason: string) {
    super(reason);
    this.name = "Grib2PayloadError";
  }
}
