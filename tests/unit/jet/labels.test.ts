import { describe, expect, it } from "vitest";
import { DIVERGENCE_VERDICT as V, QUADRANT as Q, divergenceVerdict, quadrantOf } from "../../../shared/meteo/jet/labels.ts";
import { compareWithLocalQuadrants, localQuadrant } from "../../../shared/meteo/jet/fallback-check.ts";

describe("quadrant from along/across coordinates", () => {
  it.each([
    [600e3, 150e3, Q.leftExit],
    [600e3, -150e3, Q.rightExit],
    [-600e3, 150e3, Q.leftEntrance],
    [-600e3, -150e3, Q.rightEntrance],
    [100e3, -400e3, Q.core],
    [-100e3, 10e3, Q.core],
    [Number.NaN, 10e3, Q.none],
  ])("σ = %s, ν = %s → %s", (along, across, expected) => {
    expect(quadrantOf(along, across, 100e3)).toBe(expected);
  });
});

describe("favoured divergence by curvature class and hemisphere", () => {
  // Each row: quadrant, σ, class, northern → verdict. The straight rows follow the four-quadrant model
  // (Uccellini and Kocin 1987; Bluestein 1993, Vol. II); the curved rows are the product's documented rule.
  it.each([
    [Q.leftExit, 600e3, 0, true, V.favoured],
    [Q.rightEntrance, -600e3, 0, true, V.favoured],
    [Q.rightExit, 600e3, 0, true, V.neither],
    [Q.leftEntrance, -600e3, 0, true, V.neither],
    [Q.core, 50e3, 0, true, V.neither],
    [Q.rightExit, 600e3, 0, false, V.favoured],
    [Q.leftEntrance, -600e3, 0, false, V.favoured],
    [Q.leftExit, 600e3, 0, false, V.neither],
    [Q.rightExit, 600e3, 1, true, V.favoured],
    [Q.leftExit, 600e3, 1, true, V.favoured],
    [Q.core, 50e3, 1, true, V.favoured],
    [Q.core, -50e3, 1, true, V.neither],
    [Q.rightEntrance, -600e3, 1, true, V.ambiguous],
    [Q.leftEntrance, -600e3, 1, true, V.neither],
    [Q.leftEntrance, -600e3, 1, false, V.ambiguous],
    [Q.leftEntrance, -600e3, -1, true, V.favoured],
    [Q.rightEntrance, -600e3, -1, true, V.favoured],
    [Q.core, -50e3, -1, true, V.favoured],
    [Q.core, 50e3, -1, true, V.neither],
    [Q.leftExit, 600e3, -1, true, V.ambiguous],
    [Q.rightExit, 600e3, -1, true, V.neither],
    [Q.rightExit, 600e3, -1, false, V.ambiguous],
    [Q.none, 0, 1, true, V.neither],
  ] as const)("quadrant %i, σ %s, class %i, north %s → %i", (quadrant, along, curvature, northern, expected) => {
    expect(divergenceVerdict(quadrant, along, curvature, northern)).toBe(expected);
  });
});

describe("local fallback check", () => {
  it("reads exit from slowing air and left from speed falling to the left", () => {
    expect(localQuadrant(40, -1e-6, -1e-6, 30)).toBe(Q.leftExit);
    expect(localQuadrant(40, 1e-6, 1e-6, 30)).toBe(Q.rightEntrance);
    expect(localQuadrant(20, 1e-6, 1e-6, 30)).toBe(Q.none);
  });

  it("counts disagreement only over labelled entrance and exit cells", () => {
    const quadrant = Float32Array.from([Q.leftExit, Q.leftExit, Q.core, Q.none, Q.rightEntrance]);
    const speed = Float32Array.from([40, 40, 40, 40, 40]);
    const along = Float32Array.from([-1, 1, -1, -1, 1]);
    const cross = Float32Array.from([-1, -1, -1, -1, 1]);
    const result = compareWithLocalQuadrants(quadrant, speed, along, cross, 30);
    expect(result).toEqual({ compared: 3, disagreeing: 1, disagreementFraction: 1 / 3 });
  });
});
