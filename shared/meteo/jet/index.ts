/**
 * Public surface of the upper-level (jet-streak) diagnostics. Everything else in this folder is private.
 */
export { computeJetFields, type JetInput, type JetFieldsResult, type ThermalWindLevel, type JetComputeOptions } from "./compute-jet-fields.ts";
export { GridScratch } from "./grid-scratch.ts";
export { jetInputFromLevels, isobaricLevelsFromColumnGrid, gridHemisphere, type IsobaricLevelFields, type PreparedJetInput } from "./jet-input.ts";
export { DEFAULT_JET_SETTINGS, jetSettingsInput, resolveJetSettings, type JetSettings, type JetSettingsInput, type JetLevelMode } from "./jet-settings.ts";
export { defaultJetLevel, chooseJetLevel, type Hemisphere, type JetLevelChoice, type LevelWinds } from "./jet-level.ts";
export { horizontalGridFor, type HorizontalGrid, type JetGeometry, type FPlaneGeometry } from "./horizontal-grid.ts";
export { windOnGridAxes, rotateToEarthInPlace } from "./wind-basis.ts";
export { gradient, divergence, relativeVorticity, velocityGradient, type VelocityGradient } from "./operators.ts";
export { gaussianSmooth } from "./smoothing.ts";
export { geostrophicWind, ageostrophicWind } from "./geostrophic.ts";
export { petterssenFrontogenesis, potentialTemperatureOnLevel, FRONTOGENESIS_DISPLAY_FACTOR } from "./frontogenesis.ts";
export { naturalCoordinates, windSpeed, type NaturalCoordinateFields } from "./natural-coordinates.ts";
export { labelJetStreaks, type StreakLabelling } from "./label-streaks.ts";
export { QUADRANT, quadrantOf, divergenceVerdict, DIVERGENCE_VERDICT, type QuadrantCode } from "./labels.ts";
export { localQuadrant, compareWithLocalQuadrants } from "./fallback-check.ts";
export type { JetStreak, JetAxisVertex, CurvatureClass, JetCore, JetAxis } from "./jet-types.ts";
