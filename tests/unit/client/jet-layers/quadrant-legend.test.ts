import { describe, expect, it } from "vitest";
import { FIELDS } from "../../../../shared/fields.ts";
import { QUADRANT } from "../../../../shared/meteo/jet/labels.ts";
import { QUADRANT_STYLES, quadrantScale, quadrantWords } from "../../../../src/features/grids/jet-layers/quadrant-legend.ts";
import { coreLabel, curvatureWords, describeStreak, jetLevelWords } from "../../../../src/features/grids/jet-layers/streak-words.ts";

describe("quadrant legend", () => {
  it("spells out each quadrant code of jet_quadrant", () => {
    // Source: quadrant names of the four-quadrant jet-streak model (Uccellini and Kocin 1987), codes of the field catalogue.
    expect(quadrantWords(QUADRANT.leftEntrance)).toBe("left entrance");
    expect(quadrantWords(QUADRANT.rightEntrance)).toBe("right entrance");
    expect(quadrantWords(QUADRANT.leftExit)).toBe("left exit");
    expect(quadrantWords(QUADRANT.rightExit)).toBe("right exit");
    expect(quadrantWords(QUADRANT.core)).toBe("core");
    expect(quadrantWords(QUADRANT.none)).toBeNull();
    expect(quadrantWords(9)).toBeNull();
  });

  it("covers every category the catalogue stores for jet_quadrant, with the catalogue's meaning", () => {
    const categories = FIELDS.find((field) => field.key === "jet_quadrant")!.categories!;
    for (const category of categories) {
      if (category.label === "none") continue;
      expect(quadrantWords(category.code), category.label).toBe(category.label.replaceAll("_", " "));
    }
    expect(QUADRANT_STYLES).toHaveLength(categories.length - 1);
  });

  it("gives every quadrant its own colour and leaves 'none' clear", () => {
    const scale = quadrantScale();
    expect(new Set(QUADRANT_STYLES.map((style) => style.colour)).size).toBe(QUADRANT_STYLES.length);
    const alpha = (code: number) => scale.lut[(code - scale.minCode) * 4 + 3];
    expect(alpha(QUADRANT.none)).toBe(0);
    for (const style of QUADRANT_STYLES) {
      expect(alpha(style.code)).toBe(255);
      const [r, g, b] = Array.from(scale.lut.subarray((style.code - scale.minCode) * 4, (style.code - scale.minCode) * 4 + 3));
      expect(`#${[r, g, b].map((c) => c!.toString(16).padStart(2, "0")).join("")}`).toBe(style.colour);
    }
  });
});

describe("streak words", () => {
  it("names the curvature class in plain words, 'strongly' when flagged", () => {
    // Source: curvature classes of the field catalogue (jet_curv_class: −1 anticyclonic, 0 straight, 1 cyclonic).
    expect(curvatureWords(0, false)).toBe("straight");
    expect(curvatureWords(1, false)).toBe("cyclonic");
    expect(curvatureWords(1, true)).toBe("strongly cyclonic");
    expect(curvatureWords(-1, false)).toBe("anticyclonic");
    expect(curvatureWords(-1, true)).toBe("strongly anticyclonic");
  });

  const streak = {
    id: 0,
    core: { lat: 35.123, lon: -101.5, i: 31, j: 42, speed: 56.34 },
    hemisphere: "north" as const,
    axis: [],
    curvatureClass: -1 as const,
    curvatureStrong: true,
    turningAngleDegrees: -31.7,
    labelledPoints: 7000,
  };

  it("labels a core with its speed in knots and its curvature", () => {
    // 56.34 m/s = 109.5 kt → "110 kt" (Source: BIPM SI Brochure, 9th ed. (2019), Table 8).
    expect(coreLabel(streak)).toBe("110 kt · strongly anticyclonic");
  });

  it("describes a streak in one sentence", () => {
    expect(describeStreak(streak, 1)).toBe("Streak 1: core 110 kt at 35.12° N, 101.50° W, strongly anticyclonic, axis turning 32°");
    expect(describeStreak({ ...streak, turningAngleDegrees: null, curvatureClass: 0, curvatureStrong: false }, 2)).toBe(
      "Streak 2: core 110 kt at 35.12° N, 101.50° W, straight",
    );
  });

  it("writes the jet level in hectopascals", () => {
    // Derived in closed form: 25 000 Pa = 250 hPa.
    expect(jetLevelWords(25_000)).toBe("250 hPa");
    expect(jetLevelWords(null)).toBe("no jet level");
  });
});
