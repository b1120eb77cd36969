/**
 * Every tunable of the jet-streak diagnostics in one typed object, SI units (m, m s⁻¹, Pa, s⁻¹) unless a
 * name says otherwise. Offices configure a partial object; `resolveJetSettings` fills the defaults and
 * `jetSettingsInput` validates one read from configuration.
 */
import { z } from "zod";

/**
 * How the jet level is chosen: "fixed" uses `jetLevel` (or the seasonal default); "max-wind" picks, per
 * frame, the isobaric level between `maxWindBottom` and `maxWindTop` where the strongest winds blow
 * (jet-level.ts explains why per frame and not per point).
 */
export type JetLevelMode = "fixed" | "max-wind";

export interface JetSettings {
  jetLevelMode: JetLevelMode;
  /** "seasonal": 250 hPa in the warm half-year, 300 hPa in the cold half-year; or a pressure (Pa). */
  jetLevel: "seasonal" | number;
  /** Pressure bounds (Pa) of the layer searched in "max-wind" mode (bottom > top). */
  maxWindBottom: number;
  maxWindTop: number;
  /** σ of the Gaussian smoother applied to u, v, Z and θ (m). */
  smoothingSigma: number;
  /** Minimum smoothed speed of a streak core (m s⁻¹); 50 ≈ 100 kt, common practice (no source). */
  coreSpeed: number;
  /** Axis tracing stops below this speed (m s⁻¹); 30 is the WMO lower limit of a jet stream. */
  axisSpeed: number;
  /** Two cores of one fast region are kept apart only when this far apart (m) … */
  coreSeparation: number;
  /** … and the lower one stands this much above the saddle between them (m s⁻¹). */
  coreProminence: number;
  /** Fast regions smaller than this many grid cells are ignored. */
  minCoreCells: number;
  /** Longest axis traced from a core in each direction (m). */
  axisMaxLength: number;
  /** Points farther than this from every axis vertex belong to no streak (m). */
  axisMaxDistance: number;
  /** Half-length of the core band around the core along the axis (m). */
  coreHalfLength: number;
  /** The curvature class measures the axis turning over |s| ≤ this (m). */
  curvatureWindow: number;
  /** Turning (degrees) from which the axis counts as curved, and as strongly curved. */
  turnCurvedDegrees: number;
  turnStrongDegrees: number;
  /** Axis predictor step as a fraction of the local grid length. */
  axisStepFraction: number;
  /** The axis corrector searches this far (m) either side of the predicted point for the speed maximum. */
  axisSearchDistance: number;
  /** Divergence (s⁻¹) above which a favoured point is marked as supporting ascent. */
  ascentDivergence: number;
  /** Share of labelled cells on which the local check may disagree before a data-quality warning. */
  fallbackDisagreementLimit: number;
}

export const DEFAULT_JET_SETTINGS: Readonly<JetSettings> = Object.freeze({
  jetLevelMode: "fixed",
  jetLevel: "seasonal",
  maxWindBottom: 40_000,
  maxWindTop: 15_000,
  smoothingSigma: 75_000,
  coreSpeed: 50,
  axisSpeed: 30,
  coreSeparation: 600_000,
  coreProminence: 5,
  minCoreCells: 3,
  axisMaxLength: 1_500_000,
  axisMaxDistance: 500_000,
  coreHalfLength: 100_000,
  curvatureWindow: 500_000,
  turnCurvedDegrees: 15,
  turnStrongDegrees: 30,
  axisStepFraction: 0.5,
  axisSearchDistance: 100_000,
  ascentDivergence: 1e-5,
  fallbackDisagreementLimit: 0.2,
});

const positive = (what: string) => z.number({ error: `${what} must be a number` }).positive(`${what} must be greater than 0`);
const pressure = (what: string) =>
  z.number({ error: `${what} must be a pressure in Pa` }).min(1_000, `${what} must be at least 1000 Pa (10 hPa)`).max(110_000, `${what} must be at most 110000 Pa`);

/** Validates an office's partial jet settings (unknown keys are rejected so typos do not pass silently). */
export const jetSettingsInput = z
  .strictObject({
    jetLevelMode: z.enum(["fixed", "max-wind"], { error: 'jetLevelMode must be "fixed" or "max-wind"' }),
    jetLevel: z.union([z.literal("seasonal"), pressure("jetLevel")], { error: 'jetLevel must be "seasonal" or a pressure in Pa' }),
    maxWindBottom: pressure("maxWindBottom"),
    maxWindTop: pressure("maxWindTop"),
    smoothingSigma: z.number({ error: "smoothingSigma must be a number (m)" }).min(0, "smoothingSigma must not be negative"),
    coreSpeed: positive("coreSpeed"),
    axisSpeed: positive("axisSpeed"),
    coreSeparation: z.number().min(0, "coreSeparation must not be negative"),
    coreProminence: z.number().min(0, "coreProminence must not be negative"),
    minCoreCells: z.number().int("minCoreCells must be a whole number").min(1, "minCoreCells must be at least 1"),
    axisMaxLength: positive("axisMaxLength"),
    axisMaxDistance: positive("axisMaxDistance"),
    coreHalfLength: z.number().min(0, "coreHalfLength must not be negative"),
    curvatureWindow: positive("curvatureWindow"),
    turnCurvedDegrees: z.number().min(0).max(180, "turnCurvedDegrees must be at most 180"),
    turnStrongDegrees: z.number().min(0).max(180, "turnStrongDegrees must be at most 180"),
    axisStepFraction: positive("axisStepFraction").max(2, "axisStepFraction must be at most 2 grid lengths"),
    axisSearchDistance: z.number().min(0, "axisSearchDistance must not be negative"),
    ascentDivergence: z.number(),
    fallbackDisagreementLimit: z.number().min(0).max(1, "fallbackDisagreementLimit is a fraction between 0 and 1"),
  })
  .partial()
  .superRefine((s, ctx) => {
    if (s.maxWindBottom !== undefined && s.maxWindTop !== undefined && s.maxWindBottom <= s.maxWindTop) {
      ctx.addIssue({ code: "custom", path: ["maxWindTop"], message: "maxWindTop must be a lower pressure than maxWindBottom" });
    }
    if (s.coreSpeed !== undefined && s.axisSpeed !== undefined && s.axisSpeed > s.coreSpeed) {
      ctx.addIssue({ code: "custom", path: ["axisSpeed"], message: "axisSpeed must not exceed coreSpeed" });
    }
    if (s.turnCurvedDegrees !== undefined && s.turnStrongDegrees !== undefined && s.turnStrongDegrees < s.turnCurvedDegrees) {
      ctx.addIssue({ code: "custom", path: ["turnStrongDegrees"], message: "turnStrongDegrees must not be below turnCurvedDegrees" });
    }
  });
export type JetSettingsInput = z.infer<typeof jetSettingsInput>;

/** Defaults overlaid with an office's choices; the result is checked as a whole. */
export function resolveJetSettings(overrides?: Partial<JetSettings>): JetSettings {
  const merged: JetSettings = { ...DEFAULT_JET_SETTINGS, ...overrides };
  const checked = jetSettingsInput.safeParse(merged);
  if (!checked.success) {
    const issues = checked.error.issues.map((issue) => `${issue.path.join(".") || "settings"}: ${issue.message}`);
    throw new RangeError(`Invalid jet settings: ${issues.join("; ")}`);
  }
  return merged;
}
