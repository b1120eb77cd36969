/**
 * Jet streaks bent round a circle (Δx = 25 km): turning angle and curvature class of the traced axis, and the
 * curvature-aware favoured-divergence flag. The test wind blows along circles with no cross-stream part, so its
 * divergence is the along-stream speed change only (convergence where the air slows, in both exit quadrants).
 */
import { describe, expect, it } from "vitest";
import { computeJetFields } from "../../shared/meteo/jet/compute-jet-fields.ts";
import { QUADRANT } from "../../shared/meteo/jet/labels.ts";
import { curvedJetStreak, indexNearest } from "../helpers/jet-test-fields.ts";

function runCurved(radius: number, mirror: boolean, f = 1e-4) {
  const jet = curvedJetStreak({ radius, mirror, f });
  const result = computeJetFields({ geometry: jet.grid.geometry, u: jet.u, v: jet.v, height: new Float32Array(jet.u.length) });
  /** Grid index at `arc` metres along the bend and `side` metres to the left of the flow. */
  const at = (arc: number, side: number) => {
    // For the cyclonic bend the left of the flow is toward the centre; for the mirrored ridge, away from it.
    const p = jet.place(arc, mirror ? -side : side);
    return indexNearest(jet.grid, p.x, p.y);
  };
  return { jet, result, fields: result.fields, at };
}

describe.each([
  // Source: computed by the team's science reference scripts: Δα ≈ 2 s_curv / Rc (≈ 38° and 19°), within 3°
  { radius: 1_500_000, turning: 38, strong: true },
  { radius: 3_000_000, turning: 19, strong: false },
])("cyclonic bend, Rc = $radius m (Northern Hemisphere)", ({ radius, turning, strong }) => {
  const { result, fields, at } = runCurved(radius, false);
  const streak = result.streaks[0];

  it(`turns the axis by about +${turning}° and classes it cyclonic`, () => {
    expect(result.streaks).toHaveLength(1);
    expect(Math.abs(streak.turningAngleDegrees - turning)).toBeLessThan(3);
    expect(streak.curvatureClass).toBe(1);
    // Common practice (no source): the product's 30° threshold for a strongly curved streak.
    expect(streak.curvatureStrong).toBe(strong);
  });

  it("labels the quadrants along the bend", () => {
    // Derived in closed form: probes 600 km along the axis either way and 150 km to either side of it.
    expect(fields.jet_quadrant[at(600_000, 150_000)]).toBe(QUADRANT.leftExit);
    expect(fields.jet_quadrant[at(600_000, -150_000)]).toBe(QUADRANT.rightExit);
    expect(fields.jet_quadrant[at(-600_000, 150_000)]).toBe(QUADRANT.leftEntrance);
    expect(fields.jet_quadrant[at(-600_000, -150_000)]).toBe(QUADRANT.rightEntrance);
    expect(fields.jet_quadrant[at(50_000, 0)]).toBe(QUADRANT.core);
    // Source: computed by the team's science reference scripts (cyclonic class for both radii)
    expect(fields.jet_curv_class[at(600_000, 150_000)]).toBe(1);
  });

  it("extends favoured divergence into both exits and the downstream half of the core", () => {
    // Source: Beebe and Bates (1955); Keyser and Shapiro (1986): cyclonic curvature favours the exit side and core.
    // From memory: the exact extent; the rule itself is the product's documented choice.
    expect(fields.jet_div_favoured[at(600_000, 150_000)]).toBe(1);
    expect(fields.jet_div_favoured[at(600_000, -150_000)]).toBe(1);
    expect(fields.jet_div_favoured[at(50_000, 0)]).toBe(1);
    expect(fields.jet_div_favoured[at(-50_000, 0)]).toBe(0);
    expect(fields.jet_div_favoured[at(-600_000, 150_000)]).toBe(0);
    // The straight model's right entrance (anticyclonic side in the NH) becomes ambiguous, keeping its label
    // (geometric flags never change with curvature; the product's documented rule).
    expect(fields.jet_div_favoured[at(-600_000, -150_000)]).toBe(0);
    expect(fields.jet_div_ambiguous[at(-600_000, -150_000)]).toBe(1);
    expect(fields.jet_div_ambiguous[at(-600_000, 150_000)]).toBe(0);
    expect(fields.jet_right_entrance[at(-600_000, -150_000)]).toBe(1);
  });

  it("converges where the air slows (exits) and diverges where it speeds up (entrances)", () => {
    // Source: Derived in closed form (flow along circles: δ = ∂S/∂s)
    expect(fields.jet_div[at(600_000, 150_000)]).toBeLessThan(0);
    expect(fields.jet_div[at(600_000, -150_000)]).toBeLessThan(0);
    expect(fields.jet_div[at(-600_000, 150_000)]).toBeGreaterThan(0);
    expect(fields.jet_div[at(-600_000, -150_000)]).toBeGreaterThan(0);
  });

  it("gives positive (cyclonic) streamline curvature near the axis, about 1/Rc", () => {
    // Source: Derived in closed form (streamlines are circles of radius Rc on the axis), 5 %
    expect(fields.jet_curv[at(0, 0)] * radius).toBeGreaterThan(0.95);
    expect(fields.jet_curv[at(0, 0)] * radius).toBeLessThan(1.05);
  });
});

describe.each([
  // Source: computed by the team's science reference scripts: mirror images turn by ≈ −38° and −19°, within 3°
  { radius: 1_500_000, turning: -38, strong: true },
  { radius: 3_000_000, turning: -19, strong: false },
])("anticyclonic bend (mirrored ridge), Rc = $radius m", ({ radius, turning, strong }) => {
  const { result, fields, at } = runCurved(radius, true);
  const streak = result.streaks[0];

  it(`turns the axis by about ${turning}° and classes it anticyclonic`, () => {
    // Source: computed by the team's science reference scripts (see the table above); 30° strong threshold is common practice (no source)
    expect(Math.abs(streak.turningAngleDegrees - turning)).toBeLessThan(3);
    expect(streak.curvatureClass).toBe(-1);
    expect(streak.curvatureStrong).toBe(strong);
  });

  it("favours both entrances and the upstream half of the core; the left exit becomes ambiguous", () => {
    // Source: Beebe and Bates (1955); Keyser and Shapiro (1986): anticyclonic curvature favours the entrance side.
    // From memory: the exact extent; the rule itself is the product's documented choice.
    // Labels: derived in closed form from the probe positions (mirror image of the cyclonic case).
    expect(fields.jet_quadrant[at(-600_000, 150_000)]).toBe(QUADRANT.leftEntrance);
    expect(fields.jet_div_favoured[at(-600_000, 150_000)]).toBe(1);
    expect(fields.jet_div_favoured[at(-600_000, -150_000)]).toBe(1);
    expect(fields.jet_div_favoured[at(-50_000, 0)]).toBe(1);
    expect(fields.jet_div_favoured[at(50_000, 0)]).toBe(0);
    expect(fields.jet_quadrant[at(600_000, 150_000)]).toBe(QUADRANT.leftExit);
    expect(fields.jet_div_favoured[at(600_000, 150_000)]).toBe(0);
    expect(fields.jet_div_ambiguous[at(600_000, 150_000)]).toBe(1);
    expect(fields.jet_div_favoured[at(600_000, -150_000)]).toBe(0);
    expect(fields.jet_div_ambiguous[at(600_000, -150_000)]).toBe(0);
  });
});

describe("the same counter-clockwise bend in the Southern Hemisphere", () => {
  const { result, fields, at } = runCurved(1_500_000, false, -1e-4);

  it("is anticyclonic there (f < 0), with the sign of the turning reversed", () => {
    // Source: Derived in closed form (cyclonic means clockwise where f < 0), ≈ −38° within 3°
    expect(Math.abs(result.streaks[0].turningAngleDegrees + 38)).toBeLessThan(3);
    expect(result.streaks[0].curvatureClass).toBe(-1);
    expect(result.streaks[0].hemisphere).toBe("south");
    expect(fields.jet_curv[at(0, 0)]).toBeLessThan(0);
    // Source: Beebe and Bates (1955); Keyser and Shapiro (1986), as above; anticyclonic in the SH: the
    // cyclonic-side exit is the right exit, now ambiguous, and both entrances are favoured.
    expect(fields.jet_div_ambiguous[at(600_000, -150_000)]).toBe(1);
    expect(fields.jet_div_favoured[at(-600_000, 150_000)]).toBe(1);
  });
});
