/**
 * The one entry point of the upper-level diagnostics: every jet field of the catalogue, plus fgen_850 and
 * fgen_700, and the frame's jet streaks, from the jet-level wind and height (and optionally temperature and
 * wind at 850 and 700 hPa).
 */
import { JET_FIELD_KEYS, fieldByKey, type JetFieldKey } from "../../fields.ts";
import { horizontalGridFor, expectGridLength, type HorizontalGrid, type JetGeometry } from "./horizontal-grid.ts";
import { resolveJetSettings, type JetSettings } from "./jet-settings.ts";
import { windOnGridAxes, rotateToEarthInPlace } from "./wind-basis.ts";
import { createSmoothingWorkspace, gaussianSmooth, type SmoothingWorkspace } from "./smoothing.ts";
import { divergence, relativeVorticity, velocityGradient } from "./operators.ts";
import { naturalCoordinates } from "./natural-coordinates.ts";
import { ageostrophicWind, geostrophicWind } from "./geostrophic.ts";
import { petterssenFrontogenesis, potentialTemperatureOnLevel } from "./frontogenesis.ts";
import { labelJetStreaks } from "./label-streaks.ts";
import { compareWithLocalQuadrants } from "./fallback-check.ts";
import type { JetStreak } from "./jet-types.ts";

/** Temperature (K) and wind on one lower isobaric level, for frontogenesis. */
export interface ThermalWindLevel {
  readonly temperature: Float32Array;
  readonly u: Float32Array;
  readonly v: Float32Array;
}

export interface JetInput {
  readonly geometry: JetGeometry;
  /** Jet-level wind (m s⁻¹), in the basis `geometry.uvRelativeToGrid` names. */
  readonly u: Float32Array;
  readonly v: Float32Array;
  /** Jet-level geopotential height (gpm). */
  readonly height: Float32Array;
  /** Pressure of the jet level (Pa), reported back; see jet-level.ts for choosing it. */
  readonly jetLevelPressure?: number;
  /** 850 and 700 hPa temperature and wind; the matching fgen field is NaN when a level is absent. */
  readonly p850?: ThermalWindLevel;
  readonly p700?: ThermalWindLevel;
}

export interface JetFieldsResult {
  /** Every jet field of the catalogue; booleans 0/1, categories as codes, NaN where undefined or outside QC range. */
  readonly fields: Record<JetFieldKey, Float32Array>;
  readonly streaks: JetStreak[];
  /** Data-quality notes for the frame, in plain words. */
  readonly warnings: string[];
  readonly jetLevelPressure: number | null;
  /** Share of entrance/exit cells where the local check disagrees with the axis labels. */
  readonly fallbackDisagreement: number;
  /** Values set to NaN because they fell outside the field's QC range, by field (only fields with any). */
  readonly qcRejected: Partial<Record<JetFieldKey, number>>;
}

export function computeJetFields(input: JetInput, overrides?: Partial<JetSettings>): JetFieldsResult {
  const settings = resolveJetSettings(overrides);
  validateInput(input);
  const grid = horizontalGridFor(input.geometry);
  const workspace = createSmoothingWorkspace();
  const n = grid.nx * grid.ny;
  const fields = {} as Record<JetFieldKey, Float32Array>;
  const warnings: string[] = [];

  // Smoothed wind in grid axes (rotated first, so smoothing and differencing share one basis).
  const raw = windOnGridAxes(grid, input.u, input.v, input.geometry.uvRelativeToGrid);
  const u = gaussianSmooth(grid, raw.u, settings.smoothingSigma, raw.u, workspace);
  const v = gaussianSmooth(grid, raw.v, settings.smoothingSigma, raw.v, workspace);
  const height = gaussianSmooth(grid, input.height, settings.smoothingSigma, new Float32Array(n), workspace);

  const tensor = velocityGradient(grid, u, v);
  const natural = naturalCoordinates(grid, u, v, undefined, tensor);
  fields.jet_speed = natural.speed;
  fields.jet_div = divergence(grid, u, v);
  fields.jet_vort = relativeVorticity(grid, u, v);
  fields.jet_along_accel = natural.alongAcceleration;
  fields.jet_curv = cyclonicCurvature(grid, natural.curvature);

  const geostrophic = geostrophicWind(grid, height);
  const ageostrophic = ageostrophicWind(u, v, geostrophic.u, geostrophic.v);
  rotateToEarthInPlace(grid, geostrophic.u, geostrophic.v);
  rotateToEarthInPlace(grid, ageostrophic.u, ageostrophic.v);
  fields.jet_ug = geostrophic.u;
  fields.jet_vg = geostrophic.v;
  fields.jet_uag = ageostrophic.u;
  fields.jet_vag = ageostrophic.v;

  const labelling = labelJetStreaks(grid, { u, v, speed: natural.speed, divergence: fields.jet_div }, settings);
  const labels = labelling.labels;
  fields.jet_quadrant = labels.quadrant;
  fields.jet_left_exit = labels.leftExit;
  fields.jet_right_entrance = labels.rightEntrance;
  fields.jet_exit = labels.exit;
  fields.jet_entrance = labels.entrance;
  fields.jet_curv_class = labels.curvatureClass;
  fields.jet_curv_strong = labels.curvatureStrong;
  fields.jet_div_favoured = labels.divergenceFavoured;
  fields.jet_div_ambiguous = labels.divergenceAmbiguous;
  fields.jet_ascent_support = labels.ascentSupport;
  fields.jet_along_dist = labelling.assignment.along;
  fields.jet_axis_dist = labelling.assignment.across;
  fields.jet_core_speed = labels.coreSpeed;

  const check = compareWithLocalQuadrants(labels.quadrant, natural.speed, natural.alongSpeedChange, natural.crossSpeedGradient, settings.axisSpeed);
  if (check.disagreementFraction > settings.fallbackDisagreementLimit) {
    warnings.push(
      `Jet quadrants: the local speed-gradient check disagrees with the axis labels on ${(100 * check.disagreementFraction).toFixed(0)} % ` +
        `of ${check.compared} labelled cells (limit ${(100 * settings.fallbackDisagreementLimit).toFixed(0)} %); treat the quadrant fields with care.`,
    );
  }

  fields.fgen_850 = lowerLevelFrontogenesis(grid, input, input.p850, 85_000, settings, workspace);
  fields.fgen_700 = lowerLevelFrontogenesis(grid, input, input.p700, 70_000, settings, workspace);

  const qcRejected = applyQualityRanges(fields);
  return {
    fields,
    streaks: labelling.streaks,
    warnings,
    jetLevelPressure: input.jetLevelPressure ?? null,
    fallbackDisagreement: check.disagreementFraction,
    qcRejected,
  };
}

function validateInput(input: JetInput): void {
  const shape = input.geometry;
  expectGridLength("u", input.u, shape);
  expectGridLength("v", input.v, shape);
  expectGridLength("height", input.height, shape);
  for (const [name, level] of [["p850", input.p850], ["p700", input.p700]] as const) {
    if (!level) continue;
    expectGridLength(`${name}.temperature`, level.temperature, shape);
    expectGridLength(`${name}.u`, level.u, shape);
    expectGridLength(`${name}.v`, level.v, shape);
  }
}

/** K_s · sign(f): positive where the flow curves cyclonically; NaN where f = 0. */
function cyclonicCurvature(grid: HorizontalGrid, curvature: Float32Array): Float32Array {
  const f = grid.coriolis;
  for (let k = 0; k < curvature.length; k++) curvature[k] = f[k] > 0 ? curvature[k] : f[k] < 0 ? -curvature[k] : Number.NaN;
  return curvature;
}

/** Frontogenesis of the smoothed wind acting on smoothed θ at one lower level; NaN when the level is absent. */
function lowerLevelFrontogenesis(
  grid: HorizontalGrid,
  input: JetInput,
  level: ThermalWindLevel | undefined,
  pressure: number,
  settings: JetSettings,
  workspace: SmoothingWorkspace,
): Float32Array {
  const n = grid.nx * grid.ny;
  if (!level) return new Float32Array(n).fill(Number.NaN);
  const wind = windOnGridAxes(grid, level.u, level.v, input.geometry.uvRelativeToGrid);
  const u = gaussianSmooth(grid, wind.u, settings.smoothingSigma, wind.u, workspace);
  const v = gaussianSmooth(grid, wind.v, settings.smoothingSigma, wind.v, workspace);
  const theta = potentialTemperatureOnLevel(level.temperature, pressure);
  gaussianSmooth(grid, theta, settings.smoothingSigma, theta, workspace);
  return petterssenFrontogenesis(grid, theta, u, v);
}

/** Catalogue QC: numeric values outside a field's range become NaN; returns how many per field. */
function applyQualityRanges(fields: Record<JetFieldKey, Float32Array>): Partial<Record<JetFieldKey, number>> {
  const rejected: Partial<Record<JetFieldKey, number>> = {};
  for (const key of JET_FIELD_KEYS) {
    const definition = fieldByKey(key);
    if (!definition || definition.kind !== "number") continue;
    const [low, high] = definition.range;
    const values = fields[key];
    let count = 0;
    for (let k = 0; k < values.length; k++) {
      const x = values[k];
      if (x === x && (x < low || x > high)) {
        values[k] = Number.NaN;
        count++;
      }
    }
    if (count > 0) rejected[key] = count;
  }
  return rejected;
}
