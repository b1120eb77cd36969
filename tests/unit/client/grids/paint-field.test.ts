import { describe, expect, it } from "vitest";
import { chooseColourScale, type ColourScale } from "../../../../src/components/map/colour-scale.ts";
import { describeMapField } from "../../../../src/components/map/map-fields.ts";
import { paintField } from "../../../../src/components/map/paint-field.ts";

const rgbaAt = (pixels: Uint8ClampedArray, row: number, column: number, width: number) => [...pixels.slice((row * width + column) * 4, (row * width + column) * 4 + 4)];
const lutEntry = (scale: ColourScale, entry: number) => [...scale.lut.slice(entry * 4, entry * 4 + 4)];

describe("paintField", () => {
  // A 3 × 2 grid; values are laid out index = j * nx + i with j = 0 the southern row.
  const nx = 3;
  const ny = 2;
  const scale = chooseColourScale(describeMapField({ key: "mlcape", unit: "J kg-1" }), { min: 0, max: 1000 });

  it("puts the southern grid row at the bottom of the image and maps the domain onto the table", () => {
    const values = Float32Array.from([0, 500, 1000, 2000, -5, Number.NaN]);
    const pixels = new Uint8ClampedArray(nx * ny * 4);
    paintField(values, nx, ny, scale, pixels);
    // Derived in closed form: j = 0 is image row ny − 1 = 1; 0 → entry 0, 1000 → entry 255, 500 → round(0.5 × 255) = 128.
    expect(rgbaAt(pixels, 1, 0, nx)).toEqual(lutEntry(scale, 0));
    expect(rgbaAt(pixels, 1, 1, nx)).toEqual(lutEntry(scale, 128));
    expect(rgbaAt(pixels, 1, 2, nx)).toEqual(lutEntry(scale, 255));
    // Beyond the ends the end colours hold; no value stays fully transparent.
    expect(rgbaAt(pixels, 0, 0, nx)).toEqual(lutEntry(scale, 255));
    expect(rgbaAt(pixels, 0, 1, nx)).toEqual(lutEntry(scale, 0));
    expect(rgbaAt(pixels, 0, 2, nx)).toEqual([0, 0, 0, 0]);
  });

  it("looks categories up by code and leaves unknown codes clear", () => {
    const quadrant = chooseColourScale(describeMapField({ key: "jet_quadrant", unit: "1" }), { min: 0, max: 5 });
    if (quadrant.kind !== "categorical") throw new Error("expected categories");
    const values = Float32Array.from([0, 3, 5, 9, -1, Number.NaN]);
    const pixels = new Uint8ClampedArray(nx * ny * 4);
    paintField(values, nx, ny, quadrant, pixels);
    expect(rgbaAt(pixels, 1, 0, nx)[3]).toBe(0); // "none" is clear (project convention)
    expect(rgbaAt(pixels, 1, 1, nx)).toEqual(lutEntry(quadrant, 3)); // code 3 = left_exit, Source: shared/fields.ts
    expect(rgbaAt(pixels, 1, 2, nx)).toEqual(lutEntry(quadrant, 5));
    for (const column of [0, 1, 2]) expect(rgbaAt(pixels, 0, column, nx)[3]).toBe(0);
  });

  it("refuses buffers that do not match the grid", () => {
    expect(() => paintField(new Float32Array(5), nx, ny, scale, new Uint8ClampedArray(24))).toThrow(/5 values for a 3 × 2 grid/);
    expect(() => paintField(new Float32Array(6), nx, ny, scale, new Uint8ClampedArray(20))).toThrow(/holds 5 pixels/);
  });
});
