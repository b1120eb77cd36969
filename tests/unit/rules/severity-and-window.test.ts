import { describe, expect, it } from "vitest";
import { compareSeverity, isSeverityRise, SEVERITY_KEYS, SEVERITY_LEVELS, severityLevel, type Severity } from "../../../shared/rules/severity.ts";
import { isWithinValidTimeWindow } from "../../../shared/rules/valid-time-window.ts";

/** WCAG 2.1 relative luminance and contrast ratio of two sRGB hex colours. */
function contrastRatio(a: string, b: string): number {
  const luminance = (hex: string) => {
    const [r, g, bl] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
    return 0.2126 * r + 0.7152 * g + 0.0722 * bl;
  };
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

describe("severity scale", () => {
  it("has three ordered levels", () => {
    expect(SEVERITY_LEVELS.map((s) => [s.key, s.rank])).toEqual([["heads-up", 1], ["serious", 2], ["urgent", 3]]);
    expect(SEVERITY_KEYS).toEqual(SEVERITY_LEVELS.map((s) => s.key));
  });

  it("every badge colour is readable with its text colour", () => {
    for (const level of SEVERITY_LEVELS) {
      expect(contrastRatio(level.colour, level.textColour)).toBeGreaterThanOrEqual(4.5); // Source: W3C WCAG 2.1, success criterion 1.4.3 (contrast minimum 4.5:1)
    }
  });

  it("the WCAG contrast helper itself gives the known extremes", () => {
    expect(contrastRatio("#000000", "#FFFFFF")).toBeCloseTo(21, 10); // Source: W3C WCAG 2.1, definition of contrast ratio (range 1 to 21)
    expect(contrastRatio("#777777", "#777777")).toBe(1); // Source: W3C WCAG 2.1, definition of contrast ratio
  });

  it("compares levels and recognises a rise (which lets a trigger through a cool-down)", () => {
    expect(compareSeverity("heads-up", "urgent")).toBeLessThan(0);
    expect(compareSeverity("serious", "serious")).toBe(0);
    expect(isSeverityRise("heads-up", "serious")).toBe(true);
    expect(isSeverityRise("urgent", "serious")).toBe(false);
    expect(isSeverityRise("serious", "serious")).toBe(false);
    expect(() => severityLevel("extreme" as Severity)).toThrow(/Unknown severity "extreme"/);
  });
});

describe("valid-time windows", () => {
  const runTime = "2025-05-20T12:00:00Z";
  const at = (iso: string) => ({ runTime, validTime: iso });

  it("forecast hours: lead time from the run's start, both ends included", () => {
    const window = { kind: "forecast-hours", fromHour: 6, toHour: 12 } as const;
    expect(isWithinValidTimeWindow(window, at("2025-05-20T17:00:00Z"))).toBe(false); // Derived in closed form: lead 5 h
    expect(isWithinValidTimeWindow(window, at("2025-05-20T18:00:00Z"))).toBe(true); // lead 6 h
    expect(isWithinValidTimeWindow(window, at("2025-05-21T00:00:00Z"))).toBe(true); // lead 12 h
    expect(isWithinValidTimeWindow(window, at("2025-05-21T01:00:00Z"))).toBe(false); // lead 13 h
  });

  it("clock hours UTC, including a window that wraps past midnight", () => {
    const evening = { kind: "clock-hours-utc", fromHour: 18, toHour: 3 } as const;
    expect(isWithinValidTimeWindow(evening, at("2025-05-20T17:59:00Z"))).toBe(false);
    expect(isWithinValidTimeWindow(evening, at("2025-05-20T18:00:00Z"))).toBe(true);
    expect(isWithinValidTimeWindow(evening, at("2025-05-21T03:59:00Z"))).toBe(true);
    expect(isWithinValidTimeWindow(evening, at("2025-05-21T04:00:00Z"))).toBe(false);
    const afternoon = { kind: "clock-hours-utc", fromHour: 15, toHour: 21 } as const;
    expect(isWithinValidTimeWindow(afternoon, at("2025-05-20T14:00:00Z"))).toBe(false);
    expect(isWithinValidTimeWindow(afternoon, at("2025-05-20T21:30:00Z"))).toBe(true);
  });

  it("any time accepts every frame; bad times are refused", () => {
    expect(isWithinValidTimeWindow({ kind: "any-time" }, at("2025-05-20T05:00:00Z"))).toBe(true);
    expect(() => isWithinValidTimeWindow({ kind: "any-time" }, at("noon"))).toThrow(/validTime is not an ISO date/);
  });
});
