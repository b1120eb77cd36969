import { describe, expect, it } from "vitest";
import { interpolateInferno, interpolateRdBu } from "d3-scale-chromatic";
import { chooseColourScale, parseColour, RAMP_STEPS, tickDecimals, unionRange, type RampScale } from "../../../../src/components/map/colour-scale.ts";
import { describeMapField } from "../../../../src/components/map/map-fields.ts";

const field = (key: string, unit = "1") => describeMapField({ key, unit });
const ramp = (key: string, min: number, max: number): RampScale => {
  const scale = chooseColourScale(field(key), { min, max });
  if (scale.kind === "categorical") throw new Error(`${key} got a categorical scale`);
  return scale;
};
/** One knot in m/s: 1852 m per 3600 s. Source: BIPM SI Brochure, 9th ed. (2019), Table 8 (nautical mile, knot). */
const MPS_PER_KNOT = 1852 / 3600;

describe("colour scale choice per field", () => {
  it("gives magnitudes a sequential ramp from zero-ish to a round top", () => {
    const scale = ramp("mlcape", 0, 4578);
    expect(scale.kind).toBe("sequential"); // Common practice (no source): magnitudes get a one-way ramp
    expect(scale.domain).toEqual([0, 5000]); // Derived in closed form: 4578 J/kg rounded up to the next 1000
    expect(scale.ticks.map((t) => t.display)).toEqual([0, 1000, 2000, 3000, 4000, 5000]); // Derived in closed form
  });

  it("gives signed fields a diverging ramp centred on zero", () => {
    for (const key of ["srh_0_1km", "jet_div", "jet_vort", "meanwind_0_6km_u", "fgen_850", "stp_eff"]) {
      // Common practice (no source): a field whose sign matters is coloured away from a neutral zero
      expect(ramp(key, -0.3, 1).kind, key).toBe("diverging");
    }
    const srh = ramp("srh_0_1km", -120, 340);
    expect(srh.domain).toEqual([-400, 400]); // Derived in closed form: the larger side (340) rounded up to the next 100, mirrored
    expect(srh.ticks.map((t) => t.display)).toEqual([-400, -300, -200, -100, 0, 100, 200, 300, 400]); // Derived in closed form: both ends on a tick
    expect(srh.ticks.find((t) => t.display === 0)?.at).toBeCloseTo(0.5, 12); // Derived in closed form: zero sits mid-ramp
  });

  it("uses only the negative half of the diverging ramp for inhibition, which is never positive", () => {
    const cin = ramp("sbcin", -312, 0);
    expect(cin.kind).toBe("diverging");
    expect(cin.domain).toEqual([-350, 0]); // Derived in closed form: 312 J/kg rounded up to the next 50; the catalogue caps CIN at 0
    // Zero keeps the diverging ramp's neutral middle colour. Source: d3-scale-chromatic interpolateRdBu(0.5)
    expect(cin.interpolator(1)).toBe(interpolateRdBu(0.5));
  });

  it("rounds wind fields in knots, the unit the legend shows", () => {
    const shear = ramp("shear_0_6km", 0, 20);
    // 20 m/s = 38.9 kt, rounded up to 40 kt on the legend. Derived in closed form with the BIPM knot.
    expect(shear.ticks.at(-1)!.display).toBe(40);
    expect(shear.domain[1]).toBeCloseTo(40 * MPS_PER_KNOT, 9);
  });

  it("gives flags and categories one colour per code, with 'off' and 'none' left clear", () => {
    const flag = chooseColourScale(field("jet_left_exit"), { min: 0, max: 1 });
    expect(flag.kind).toBe("categorical"); // Common practice (no source): categories are not a continuum
    if (flag.kind !== "categorical") return;
    expect(flag.entries.map((e) => [e.code, e.label, e.colour === null])).toEqual([
      [0, "no", true],
      [1, "yes", false],
    ]);
    const quadrant = chooseColourScale(field("jet_quadrant"), { min: 0, max: 5 });
    if (quadrant.kind !== "categorical") throw new Error("jet_quadrant should be categorical");
    expect(quadrant.entries.map((e) => e.label)).toEqual(["none", "left_entrance", "right_entrance", "left_exit", "right_exit", "core"]); // Source: shared/fields.ts catalogue
    expect(quadrant.entries[0]!.colour).toBeNull();
    expect(new Set(quadrant.entries.slice(1).map((e) => e.colour)).size).toBe(5);
    const curvature = chooseColourScale(field("jet_curv_class"), { min: -1, max: 1 });
    if (curvature.kind !== "categorical") throw new Error("jet_curv_class should be categorical");
    expect(curvature.minCode).toBe(-1); // Source: shared/fields.ts catalogue (anticyclonic = -1)
  });

  it("treats model surface fields by their own sign rule", () => {
    expect(ramp("t_2m", 285, 305).kind).toBe("sequential");
    expect(ramp("v_10m", -8, 12).kind).toBe("diverging");
    // 285–305 K is 11.85–31.85 °C, rounded outward to 10–35 °C. Derived in closed form (0 °C = 273.15 K).
    const t2m = ramp("t_2m", 285, 305);
    expect(t2m.ticks.map((t) => t.display)).toEqual([10, 15, 20, 25, 30, 35]);
    expect(t2m.domain[0]).toBeCloseTo(283.15, 9);
  });

  it("still draws a field with one value or none at all", () => {
    const flat = ramp("mlcape", 0, 0);
    expect(flat.domain[1]).toBeGreaterThan(flat.domain[0]);
    const empty = ramp("mlcape", Number.NaN, Number.NaN);
    expect(Number.isFinite(empty.domain[0]) && Number.isFinite(empty.domain[1])).toBe(true);
  });

  it("samples the ramp into a lookup table that starts and ends on the interpolator's ends", () => {
    const scale = ramp("mlcape", 0, 1000);
    expect(scale.lut.length).toBe(RAMP_STEPS * 4);
    // Source: d3-scale-chromatic interpolateInferno at 0 and 1 (buoyancy uses inferno).
    expect([...scale.lut.slice(0, 3)]).toEqual(parseColour(interpolateInferno(0)));
    expect([...scale.lut.slice(-4, -1)]).toEqual(parseColour(interpolateInferno(1)));
    expect(scale.lut[3]).toBe(255);
  });
});

describe("helpers", () => {
  it("reads both colour forms d3-scale-chromatic returns", () => {
    expect(parseColour("#0a10ff")).toEqual([10, 16, 255]); // Derived in closed form (hex digits)
    expect(parseColour("rgb(5, 48, 97)")).toEqual([5, 48, 97]);
    expect(() => parseColour("teal")).toThrow(/Unrecognised colour/);
  });

  it("joins the ranges of a run's frames, skipping frames without values", () => {
    expect(unionRange([{ min: 10, max: 200 }, { min: null, max: null }, { min: 0, max: 150 }])).toEqual({ min: 0, max: 200 });
    expect(unionRange([])).toEqual({ min: null, max: null });
  });
});

describe("tickDecimals", () => {
  it("shows as many decimals as the tick step needs", () => {
    const ticks = (...values: number[]) => values.map((display) => ({ display }));
    // Derived in closed form from the step between ticks.
    expect(tickDecimals(ticks(0, 1000, 2000))).toBe(0);
    expect(tickDecimals(ticks(26, 27, 28))).toBe(0);
    expect(tickDecimals(ticks(0, 0.5, 1))).toBe(1);
    expect(tickDecimals(ticks(-0.02, 0, 0.02))).toBe(2);
    expect(tickDecimals(ticks(5))).toBe(0);
  });
});
