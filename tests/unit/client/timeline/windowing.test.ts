import { describe, expect, it } from "vitest";
import { layoutRows, rowAt, rowCount, scrollTopToReveal, visibleRows } from "../../../../src/lib/windowing.ts";

// Rows of 30, 60, 30, 60, … pixels: every check below is derived in closed form from these prefix sums.
const heights = Array.from({ length: 10 }, (_, k) => (k % 2 === 0 ? 30 : 60));
const offsets = layoutRows(heights);

describe("layoutRows", () => {
  it("stacks rows: each top is the sum of the heights above it", () => {
    expect([...offsets.slice(0, 5)]).toEqual([0, 30, 90, 120, 180]); // Derived in closed form
    expect(offsets[10]).toBe(5 * 30 + 5 * 60); // Derived in closed form: 450
    expect(rowCount(offsets)).toBe(10);
  });

  it("treats a negative height as zero", () => {
    expect([...layoutRows([10, -5, 10])]).toEqual([0, 10, 10, 20]); // Derived in closed form
  });
});

describe("rowAt", () => {
  it("finds the row under a position, tops belonging to their own row", () => {
    expect(rowAt(offsets, 0)).toBe(0);
    expect(rowAt(offsets, 29.9)).toBe(0);
    expect(rowAt(offsets, 30)).toBe(1);
    expect(rowAt(offsets, 125)).toBe(3); // Derived in closed form: row 3 spans 120–180
  });

  it("clamps to the first and last row, and answers -1 for an empty list", () => {
    expect(rowAt(offsets, -50)).toBe(0);
    expect(rowAt(offsets, 10_000)).toBe(9);
    expect(rowAt(layoutRows([]), 0)).toBe(-1);
  });
});

describe("visibleRows", () => {
  it("renders the rows overlapping the viewport plus the overscan on each side", () => {
    // Derived in closed form: 100–200 px overlaps rows 2 (90–120), 3 (120–180) and 4 (180–210).
    expect(visibleRows(offsets, 100, 100, 0)).toEqual({ start: 2, end: 5 });
    expect(visibleRows(offsets, 100, 100, 2)).toEqual({ start: 0, end: 7 });
  });

  it("does not count a row that starts exactly at the bottom edge", () => {
    // Derived in closed form: 0–90 px ends where row 2 starts.
    expect(visibleRows(offsets, 0, 90, 0)).toEqual({ start: 0, end: 2 });
  });

  it("stays inside the list at the ends and for an empty list", () => {
    expect(visibleRows(offsets, 400, 500, 3)).toEqual({ start: 6, end: 10 }); // Derived in closed form: 400 px lies in row 9 (390–450)
    expect(visibleRows(layoutRows([]), 0, 500)).toEqual({ start: 0, end: 0 });
  });

  it("keeps the work bounded for a long list", () => {
    const many = layoutRows(new Array(100_000).fill(28));
    const range = visibleRows(many, 1_000_000, 700, 4);
    // Derived in closed form: 1,000,000 / 28 = row 35714; 700 px shows 26 rows; plus 4 on each side.
    expect(range).toEqual({ start: 35710, end: 35744 });
  });
});

describe("scrollTopToReveal", () => {
  it("leaves the scroll alone when the row is already in view", () => {
    expect(scrollTopToReveal(offsets, 3, 100, 200)).toBe(100);
  });

  it("scrolls down just enough to show a row below, and up to show one above", () => {
    // Derived in closed form: row 5 spans 210–270; a 200 px viewport must start at 70 to show its bottom.
    expect(scrollTopToReveal(offsets, 5, 0, 200)).toBe(70);
    expect(scrollTopToReveal(offsets, 1, 200, 200)).toBe(30);
    // With a 20 px margin around the row.
    expect(scrollTopToReveal(offsets, 5, 0, 200, 20)).toBe(90);
  });

  it("never scrolls past either end of the list", () => {
    expect(scrollTopToReveal(offsets, 0, 50, 200, 48)).toBe(0);
    // Derived in closed form: the list is 450 px; with a 200 px viewport the largest scroll is 250.
    expect(scrollTopToReveal(offsets, 9, 0, 200, 48)).toBe(250);
    expect(scrollTopToReveal(offsets, 42, 77, 200)).toBe(77);
  });
});
