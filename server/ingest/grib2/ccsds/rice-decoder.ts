import { BitReader } from "../bit-reader.ts";
import { Grib2PayloadError } from "../errors.ts";
import type { CcsdsSettings } from "./options.ts";
import { unmapResidual } from "./predictor.ts";

/** Zero-block count codeword meaning "to the end of the segment" (CCSDS 121.0-B-2, zero-block option). */
const REMAINDER_OF_SEGMENT = 5;
/** Blocks per segment for the zero-block option. */
const SEGMENT_BLOCKS = 64;

/**
 * Decodes a CCSDS 121.0-B adaptive entropy coded (Rice) bit stream into `out` (one integer per sample).
 * The stream is a series of coded data sets, one per block of J samples, each starting with an option id:
 *   all zeros + bit 0  zero-block: a run of blocks of zero residuals, its length as a unary codeword
 *   all zeros + bit 1  second extension: pairs of residuals coded together as one unary codeword
 *   1 .. 2^id - 2      split sample with k = id - 1: unary codewords of the high parts, then k low bits each
 *   all ones           no compression: the samples verbatim
 * With preprocessing, the first block of every reference sample interval starts with a raw reference sample
 * and the other values are mapped prediction residuals (see predictor.ts).
 */
export function decodeRice(payload: Uint8Array, settings: CcsdsSettings, out: Float64Array): void {
  const state = new DecoderState(payload, settings, out);
  while (state.produced < out.length) {
    state.decodeInterval();
    if (settings.padIntervals) state.reader.alignToByte();
  }
}

class DecoderState {
  readonly reader: BitReader;
  produced = 0;
  private readonly s: CcsdsSettings;
  private readonly out: Float64Array;
  private readonly minimum: number;
  private readonly maximum: number;
  private readonly uncompressedId: number;
  private readonly highParts: Float64Array;
  /** Last reconstructed sample: the prediction for the next one. */
  private previous = 0;

  constructor(payload: Uint8Array, settings: CcsdsSettings, out: Float64Array) {
    this.reader = new BitReader(payload);
    this.s = settings;
    this.out = out;
    const n = settings.bitsPerSample;
    this.minimum = settings.signed ? -(2 ** (n - 1)) : 0;
    this.maximum = settings.signed ? 2 ** (n - 1) - 1 : 2 ** n - 1;
    this.uncompressedId = 2 ** settings.idLength - 1;
    this.highParts = new Float64Array(settings.blockSize);
  }

  decodeInterval(): void {
    const { blocksPerInterval } = this.s;
    let block = 0;
    while (block < blocksPerInterval && this.produced < this.out.length) {
      const withReference = this.s.preprocess && block === 0;
      block += this.decodeCodedDataSet(withReference, block);
    }
  }

  /** Decodes one coded data set and returns how many blocks it covered. */
  private decodeCodedDataSet(withReference: boolean, blockInInterval: number): number {
    const r = this.reader;
    const id = r.read(this.s.idLength);
    if (id === 0) {
      const secondExtension = r.read(1) === 1;
      if (withReference) this.emitReference(r.read(this.s.bitsPerSample));
      if (secondExtension) {
        this.decodeSecondExtension(withReference);
        return 1;
      }
      return this.decodeZeroBlocks(withReference, blockInInterval);
    }
    if (id === this.uncompressedId) {
      const J = this.s.blockSize;
      if (withReference) this.emitReference(r.read(this.s.bitsPerSample));
      for (let i = withReference ? 1 : 0; i < J; i++) this.emitCoded(r.read(this.s.bitsPerSample));
      return 1;
    }
    if (withReference) this.emitReference(r.read(this.s.bitsPerSample));
    this.decodeSplit(id - 1, withReference);
    return 1;
  }

  /** Split-sample option: all unary high parts first, then the k low bits of each sample. */
  private decodeSplit(k: number, withReference: boolean): void {
    const r = this.reader;
    const count = this.s.blockSize - (withReference ? 1 : 0);
    const high = this.highParts;
    for (let i = 0; i < count; i++) high[i] = r.readUnary();
    const scale = 2 ** k;
    for (let i = 0; i < count; i++) this.emitCoded(high[i] * scale + r.read(k));
  }

  /** Pairs (a, b) sent as gamma = (a + b)(a + b + 1) / 2 + b; with a reference the first pair's a is unused. */
  private decodeSecondExtension(withReference: boolean): void {
    const J = this.s.blockSize;
    for (let i = 0; i < J; i += 2) {
      const gamma = this.reader.readUnary();
      let sum = Math.floor((Math.sqrt(8 * gamma + 1) - 1) / 2);
      // Guard against floating-point error in the square root for large codewords.
      while ((sum * (sum + 1)) / 2 > gamma) sum--;
      while (((sum + 1) * (sum + 2)) / 2 <= gamma) sum++;
      const second = gamma - (sum * (sum + 1)) / 2;
      const first = sum - second;
      if (!(withReference && i === 0)) this.emitCoded(first);
      this.emitCoded(second);
    }
  }

  /**
   * Zero-block option: unary m gives m + 1 blocks for m < 4, "rest of the segment" for m = 4 and m blocks
   * beyond; a segment is 64 blocks counted from the start of the reference sample interval.
   */
  private decodeZeroBlocks(withReference: boolean, blockInInterval: number): number {
    let blocks = this.reader.readUnary() + 1;
    if (blocks === REMAINDER_OF_SEGMENT) {
      const toSegmentEnd = SEGMENT_BLOCKS - (blockInInterval % SEGMENT_BLOCKS);
      blocks = Math.min(this.s.blocksPerInterval - blockInInterval, toSegmentEnd);
    } else if (blocks > REMAINDER_OF_SEGMENT) {
      blocks--;
    }
    if (blockInInterval + blocks > this.s.blocksPerInterval) {
      throw new Grib2PayloadError(`CCSDS zero-block run of ${blocks} blocks crosses the end of a reference sample interval`);
    }
    const zeros = blocks * this.s.blockSize - (withReference ? 1 : 0);
    for (let i = 0; i < zeros && this.produced < this.out.length; i++) this.emitCoded(0);
    return blocks;
  }

  private emitReference(raw: number): void {
    const value = this.s.signed && raw > this.maximum ? raw - 2 ** this.s.bitsPerSample : raw;
    this.previous = value;
    this.put(value);
  }

  /** A coded value is a mapped residual with preprocessing, else the sample itself. */
  private emitCoded(coded: number): void {
    if (this.s.preprocess) {
      if (coded > this.maximum - this.minimum) throw new Grib2PayloadError(`CCSDS residual ${coded} is out of range for ${this.s.bitsPerSample}-bit samples`);
      this.previous = unmapResidual(coded, this.previous, this.minimum, this.maximum);
      this.put(this.previous);
    } else {
      this.put(this.s.signed && coded > this.maximum ? coded - 2 ** this.s.bitsPerSample : coded);
    }
  }

  /** Samples past the declared count pad the last block and are dropped. */
  private put(value: number): void {
    if (this.produced < this.out.length) this.out[this.produced] = value;
    this.produced++;
  }
}
