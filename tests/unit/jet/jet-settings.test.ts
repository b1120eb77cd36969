import { describe, expect, it } from "vitest";
import { DEFAULT_JET_SETTINGS, jetSettingsInput, resolveJetSettings } from "../../../shared/meteo/jet/jet-settings.ts";

describe("jet settings", () => {
  it("default to the documented values", () => {
    const s = resolveJetSettings();
    // Common practice (no source) for the speeds and level; the remaining lengths are the product's proposals.
    expect(s).toMatchObject({
      jetLevelMode: "fixed",
      jetLevel: "seasonal",
      smoothingSigma: 75_000,
      coreSpeed: 50,
      axisSpeed: 30,
      coreSeparation: 600_000,
      coreProminence: 5,
      axisMaxLength: 1_500_000,
      axisMaxDistance: 500_000,
      coreHalfLength: 100_000,
      curvatureWindow: 500_000,
      turnCurvedDegrees: 15,
      turnStrongDegrees: 30,
      ascentDivergence: 1e-5,
      fallbackDisagreementLimit: 0.2,
    });
  });

  it("take an office's overrides on top of the defaults", () => {
    const s = resolveJetSettings({ coreSpeed: 40, jetLevel: 20_000, jetLevelMode: "max-wind" });
    expect(s.coreSpeed).toBe(40);
    expect(s.jetLevel).toBe(20_000);
    expect(s.jetLevelMode).toBe("max-wind");
    expect(s.axisSpeed).toBe(DEFAULT_JET_SETTINGS.axisSpeed);
  });

  it("reject unknown keys and bad values with messages naming them", () => {
    const unknown = jetSettingsInput.safeParse({ coreSpeeed: 40 });
    expect(unknown.success).toBe(false);
    const badLayer = jetSettingsInput.safeParse({ maxWindBottom: 15_000, maxWindTop: 40_000 });
    expect(badLayer.success).toBe(false);
    expect(badLayer.error!.issues[0].message).toBe("maxWindTop must be a lower pressure than maxWindBottom");
    expect(() => resolveJetSettings({ axisSpeed: 60 })).toThrow("Invalid jet settings: axisSpeed: axisSpeed must not exceed coreSpeed");
    expect(() => resolveJetSettings({ jetLevel: 500 })).toThrow(/jetLevel/);
    expect(() => resolveJetSettings({ fallbackDisagreementLimit: 2 })).toThrow(/fraction between 0 and 1/);
  });
});
