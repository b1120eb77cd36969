import { describe, expect, it } from "vitest";
import { maskCount, paintMask } from "../../../../src/components/map/paint-mask.ts";
import { decodeMaskBits, encodeMaskBits } from "../../../../shared/grid/mask-bits.ts";

const rgbaAt = (pixels: Uint8ClampedArray, row: number, column: number, width: number) => [...pixels.slice((row * width + column) * 4, (row * width + column) * 4 + 4)];

describe("paintMask", () => {
  it("colours the cells in the mask, leaves the rest clear, and puts the southern row at the bottom", () => {
    // A 3 × 2 grid, index = j * nx + i: cells (1, 0) and (2, 1) are in.
    const mask = Uint8Array.from([0, 1, 0, 0, 0, 1]);
    const pixels = new Uint8ClampedArray(3 * 2 * 4);
    paintMask(mask, 3, 2, [10, 20, 30, 255], pixels);
    // Derived in closed form: grid row j = 0 is image row 1; j = 1 is image row 0.
    expect(rgbaAt(pixels, 1, 1, 3)).toEqual([10, 20, 30, 255]);
    expect(rgbaAt(pixels, 0, 2, 3)).toEqual([10, 20, 30, 255]);
    expect(rgbaAt(pixels, 1, 0, 3)).toEqual([0, 0, 0, 0]);
    expect(rgbaAt(pixels, 0, 1, 3)).toEqual([0, 0, 0, 0]);
    expect(maskCount(mask)).toBe(2);
  });

  it("refuses a mask or a buffer of the wrong size", () => {
    expect(() => paintMask(new Uint8Array(5), 3, 2, [0, 0, 0, 255], new Uint8ClampedArray(24))).toThrow(/5 mask values for a 3 × 2 grid/);
    expect(() => paintMask(new Uint8Array(6), 3, 2, [0, 0, 0, 255], new Uint8ClampedArray(20))).toThrow(/holds 5 pixels/);
  });

  it("paints what the API's bit mask carries, bit for bit", () => {
    // 13 points: more than one byte, and a partial last byte.
    const original = Uint8Array.from([1, 0, 0, 1, 1, 0, 1, 0, 0, 0, 1, 1, 0]);
    const mask = decodeMaskBits(encodeMaskBits(original), original.length);
    expect([...mask]).toEqual([...original]);
    const pixels = new Uint8ClampedArray(13 * 4);
    paintMask(mask, 13, 1, [255, 255, 255, 255], pixels);
    for (let i = 0; i < 13; i++) expect(pixels[i * 4 + 3]).toBe(original[i] ? 255 : 0);
  });
});
