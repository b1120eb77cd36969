/**
 * Big-endian readers for GRIB2 octets. GRIB2 stores signed integers as sign and magnitude (the top bit is the
 * sign), not two's complement (WMO Manual on Codes, WMO-No. 306, Vol. I.2, regulation 92.1.5).
 */

export function readUint8(bytes: Uint8Array, offset: number): number {
  return bytes[offset];
}

export function readUint16(bytes: Uint8Array, offset: number): number {
  return (bytes[offset] << 8) | bytes[offset + 1];
}

export function readUint32(bytes: Uint8Array, offset: number): number {
  // Multiply instead of shifting so the top bit does not turn the result negative.
  return bytes[offset] * 0x1000000 + ((bytes[offset + 1] << 16) | (bytes[offset + 2] << 8) | bytes[offset + 3]);
}

/** Eight-octet length of section 0; exact up to 2^53, far beyond any file we could hold in memory. */
export function readUint64(bytes: Uint8Array, offset: number): number {
  return readUint32(bytes, offset) * 0x100000000 + readUint32(bytes, offset + 4);
}

export function readSignedInt8(bytes: Uint8Array, offset: number): number {
  const raw = bytes[offset];
  return raw & 0x80 ? -(raw & 0x7f) : raw;
}

export function readSignedInt16(bytes: Uint8Array, offset: number): number {
  const raw = readUint16(bytes, offset);
  return raw & 0x8000 ? -(raw & 0x7fff) : raw;
}

export function readSignedInt32(bytes: Uint8Array, offset: number): number {
  const magnitude = (bytes[offset] & 0x7f) * 0x1000000 + ((bytes[offset + 1] << 16) | (bytes[offset + 2] << 8) | bytes[offset + 3]);
  return bytes[offset] & 0x80 ? -magnitude : magnitude;
}

/** Sign-and-magnitude integer of any width up to 6 octets (spatial-differencing descriptors use 1 to 4). */
export function readSignedIntN(bytes: Uint8Array, offset: number, octets: number): number {
  let magnitude = bytes[offset] & 0x7f;
  for (let k = 1; k < octets; k++) magnitude = magnitude * 256 + bytes[offset + k];
  return bytes[offset] & 0x80 ? -magnitude : magnitude;
}

/** IEEE 754 single precision, big-endian (the reference value of data representation templates). */
export function readFloat32(bytes: Uint8Array, offset: number): number {
  return new DataView(bytes.buffer, bytes.byteOffset + offset, 4).getFloat32(0, false);
}

/** GRIB2 marks a missing value by setting every bit of the field. */
export function isAllOnes(bytes: Uint8Array, offset: number, octets: number): boolean {
  for (let k = 0; k < octets; k++) if (bytes[offset + k] !== 0xff) return false;
  return true;
}
