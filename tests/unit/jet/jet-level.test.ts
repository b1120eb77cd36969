import { describe, expect, it } from "vitest";
import { chooseJetLevel, defaultJetLevel } from "../../../shared/meteo/jet/jet-level.ts";
import { resolveJetSettings } from "../../../shared/meteo/jet/jet-settings.ts";

describe("seasonal jet level", () => {
  it.each([
    // Common practice (no source): 250 hPa in the warm half-year, 300 hPa in the cold one.
    ["2026-07-15T00:00:00Z", "north", 25_000],
    ["2026-05-01T00:00:00Z", "north", 25_000],
    ["2026-10-31T23:00:00Z", "north", 25_000],
    ["2026-11-01T00:00:00Z", "north", 30_000],
    ["2026-01-15T12:00:00Z", "north", 30_000],
    ["2026-07-15T00:00:00Z", "south", 30_000],
    ["2026-01-15T12:00:00Z", "south", 25_000],
  ] as const)("%s in the %s: %i Pa", (time, hemisphere, expected) => {
    expect(defaultJetLevel(time, hemisphere)).toBe(expected);
  });

  it("rejects a time that is not a date", () => {
    expect(() => defaultJetLevel("yesterday", "north")).toThrow(/validTime/);
  });
});

function level(pressure: number, speed: number) {
  const u = new Float32Array(400).fill(speed * 0.5);
  u[17] = speed; // one fast point is not enough to win on its own
  return { pressure, u, v: new Float32Array(400) };
}

describe("choosing the jet level from a frame's levels", () => {
  const levels = [level(50_000, 30), level(30_000, 40), level(25_000, 50), level(20_000, 44)];

  it("takes the seasonal level when the frame has it", () => {
    const choice = chooseJetLevel(levels, resolveJetSettings(), "2026-06-01T00:00:00Z", "north");
    expect(choice.pressure).toBe(25_000);
    expect(choice.warning).toBeNull();
  });

  it("falls back to the nearest level with a warning when the wanted one is missing", () => {
    const choice = chooseJetLevel(levels, resolveJetSettings({ jetLevel: 27_000 }), "2026-06-01T00:00:00Z", "north");
    expect(choice.pressure).toBe(25_000);
    expect(choice.warning).toBe("Jet level 270 hPa is not in this frame; used 250 hPa instead.");
  });

  it("picks the level of maximum wind between 400 and 150 hPa, ignoring levels outside it", () => {
    const withFastLow = [...levels, level(70_000, 80)];
    const choice = chooseJetLevel(withFastLow, resolveJetSettings({ jetLevelMode: "max-wind" }), "2026-06-01T00:00:00Z", "north");
    expect(choice.pressure).toBe(25_000);
    expect(choice.reason).toMatch(/level of maximum wind/);
  });

  it("ranks by a high percentile, so one spike does not decide", () => {
    const spiky = [level(30_000, 40), { pressure: 20_000, u: new Float32Array(400).fill(10).fill(120, 0, 1), v: new Float32Array(400) }];
    const choice = chooseJetLevel(spiky, resolveJetSettings({ jetLevelMode: "max-wind" }), "2026-06-01T00:00:00Z", "north");
    expect(choice.pressure).toBe(30_000);
  });

  it("says which levels exist when none lies in the searched layer", () => {
    expect(() => chooseJetLevel([level(50_000, 30)], resolveJetSettings({ jetLevelMode: "max-wind" }), "2026-06-01T00:00:00Z", "north")).toThrow(
      "No isobaric level between 400 hPa and 150 hPa to search for the maximum wind (frame holds 500 hPa)",
    );
  });
});
