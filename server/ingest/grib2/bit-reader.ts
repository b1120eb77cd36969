import { Grib2PayloadError } from "./errors.ts";

/**
 * Reads unsigned integers of 0 to 32 bits, most significant bit first, from one payload (a subarray, so bit
 * positions stay well inside the range of 32-bit bitwise operators). GRIB2 packs data this
 * way (WMO-No. 306, regulation 92.1.3), and so does the CCSDS 121.0-B coded bit stream.
 * Reading past the end throws instead of inventing zero bits, so a short payload is reported, not decoded.
 */
export class BitReader {
  private readonly bytes: Uint8Array;
  private position: number;
  private readonly endBit: number;

  constructor(payload: Uint8Array, startByte = 0) {
    if (payload.length >= 0x10000000) throw new Grib2PayloadError(`payload of ${payload.length} bytes is too large`);
    this.bytes = payload;
    this.position = startByte * 8;
    this.endBit = payload.length * 8;
  }

  get bitPosition(): number {
    return this.position;
  }

  get bitsLeft(): number {
    return this.endBit - this.position;
  }

  read(bitCount: number): number {
    if (bitCount === 0) return 0;
    if (this.position + bitCount > this.endBit) this.exhausted(bitCount);
    const bytes = this.bytes;
    let pos = this.position;
    let remaining = bitCount;
    let result = 0;
    while (remaining > 0) {
      const used = pos & 7;
      const available = 8 - used;
      const take = remaining < available ? remaining : available;
      const chunk = (bytes[pos >>> 3] >>> (available - take)) & ((1 << take) - 1);
      // Multiplying keeps 32-bit results positive, where a shift would wrap to negative.
      result = result * (1 << take) + chunk;
      remaining -= take;
      pos += take;
    }
    this.position = pos;
    return result;
  }

  /** Counts zero bits up to the next one bit and consumes both (a fundamental-sequence codeword). */
  readUnary(): number {
    const bytes = this.bytes;
    let pos = this.position;
    let zeros = 0;
    // Finish the current partial byte, then skip whole zero bytes at once.
    while (pos < this.endBit) {
      const used = pos & 7;
      const window = (bytes[pos >>> 3] << used) & 0xff;
      if (window !== 0) {
        const leading = Math.clz32(window) - 24;
        zeros += leading;
        pos += leading + 1;
        if (pos > this.endBit) break;
        this.position = pos;
        return zeros;
      }
      zeros += 8 - used;
      pos += 8 - used;
    }
    this.position = this.endBit;
    throw new Grib2PayloadError(`bit stream ended inside a unary codeword after ${zeros} zero bits`);
  }

  /** Moves to the next byte boundary (GRIB2 pads each packed block to whole octets). */
  alignToByte(): void {
    this.position = (this.position + 7) & ~7;
    if (this.position > this.endBit) this.position = this.endBit;
  }

  skip(bitCount: number): void {
    if (this.position + bitCount > this.endBit) this.exhausted(bitCount);
    this.position += bitCount;
  }

  private exhausted(bitCount: number): never {
    throw new Grib2PayloadError(
      `payload too short: needed ${bitCount} more bits at bit ${this.position}, only ${this.endBit - this.position} remain`,
    );
  }
}
