import { describe, expect, it } from "vitest";
import {
  canClose,
  drawingGeometry,
  drawingProblems,
  drawingReducer,
  EMPTY_DRAWING,
  type DrawingAction,
  type DrawingState,
} from "../../../../src/features/zones/drawing/polygon-drawing.ts";

const run = (actions: DrawingAction[], from: DrawingState = EMPTY_DRAWING) => actions.reduce(drawingReducer, from);
const add = (lon: number, lat: number): DrawingAction => ({ type: "add", lon, lat });

/** A 1° square on the plains, counter-clockwise. */
const square = [add(-100, 35), add(-99, 35), add(-99, 36), add(-100, 36)];

describe("drawing a zone polygon", () => {
  it("closes a simple ring into a GeoJSON polygon whose last position repeats the first", () => {
    const state = run([...square, { type: "close" }]);
    expect(state.closed).toBe(true);
    // Source: RFC 7946 §3.1.6, a linear ring's first and last positions are equivalent.
    expect(drawingGeometry(state)).toEqual({
      type: "Polygon",
      coordinates: [[[-100, 35], [-99, 35], [-99, 36], [-100, 36], [-100, 35]]],
    });
    expect(drawingProblems(state)).toEqual([]);
  });

  it("shows a crossing as soon as it is drawn and refuses to close it", () => {
    // A bow tie: the two diagonals, edges 1–2 and 3–4, cross.
    const bowTie = run([add(-100, 35), add(-99, 36), add(-99, 35), add(-100, 36)]);
    const problems = drawingProblems(bowTie);
    expect(problems).toHaveLength(1); // Derived in closed form: exactly one pair of edges crosses
    expect(problems[0]).toMatch(/crosses itself between vertices 1–2 and 3–4/);
    expect(canClose(bowTie)).toBe(false);
    expect(drawingReducer(bowTie, { type: "close" })).toBe(bowTie);
    // Undoing the last vertex leaves a triangle, which is fine again.
    expect(drawingProblems(run([{ type: "undo" }], bowTie))).toEqual([]);
  });

  it("needs three vertices before it can close", () => {
    const two = run([add(-100, 35), add(-99, 35)]);
    expect(canClose(two)).toBe(false); // Derived in closed form: two points enclose nothing
    expect(drawingProblems(two)).toEqual([]);
    expect(run([{ type: "close" }], two).closed).toBe(false);
  });

  it("keeps one vertex for the two clicks of a double-click, and rounds to 4 decimals", () => {
    const state = run([add(-100.123456, 35.98765), add(-100.12346, 35.987651)]);
    // Derived in closed form: both clicks round to the same 4-decimal position.
    expect(state.vertices).toEqual([[-100.1235, 35.9877]]);
  });

  it("takes no vertices once closed; undo reopens, then removes vertices; clear starts again", () => {
    const closed = run([...square, { type: "close" }]);
    expect(run([add(-98, 35)], closed)).toBe(closed);
    const reopened = run([{ type: "undo" }], closed);
    expect(reopened.closed).toBe(false);
    expect(reopened.vertices).toHaveLength(4);
    expect(drawingGeometry(reopened)).toBeNull();
    expect(run([{ type: "undo" }], reopened).vertices).toHaveLength(3);
    expect(run([{ type: "clear" }], closed)).toEqual(EMPTY_DRAWING);
  });
});
