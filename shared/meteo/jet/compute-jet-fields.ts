/**
 * The one entry point of the upper-level diagnostics: every jet field of the catalogue, plus fgen_850 and
 * fgen_700, and the frame's jet streaks, from the jet-level wind and height (and optionally temperature and
 * wind at 850 and 700 hPa).
 */
import { JET_FIELD_KEYS, fieldByKey, type JetFieldKey } from "../../fields.ts";
import { horizontalGridFor, expectGridLength, type HorizontalGrid, type JetGeometry } from "./horizontal-grid.ts";
import { resolveJetSettings, type JetSettings } from "./jet-settings.ts";
import { windOnGridAxes, rotateToEarthInPlace } from "./wind-basis.ts";
import { gaussianSmooth } from "./smoothing.ts";
import { divergence, relativeVorticity, velocityGradient, type VelocityGradient } from "./operators.ts";
import { GridScratch } from "./grid-scratch.ts";
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

export interface JetComputeOptions {
  /** Scratch arrays reused from call to call (keep one per worker and grid size); a fresh one by default. */
  readonly scratch?: GridScratch;
}

export function computeJetFields(input: JetInput, overrides?: Partial<JetSettings>, options: JetComputeOptions = {}): JetFieldsResult {
  const settings = resolveJetSettings(overrides);
  validateInput(input);
  const grid = horizontalGridFor(input.geometry);
  const scratch = options.scratch ?? new GridScratch();
  const n = grid.nx * grid.ny;
  const fields = allocateJetFields(n);
  const warnings: string[] = [];

  // Smoothed wind in grid axes (rotated first, so smoothing and differencing share one basis).
  const raw = windOnGridAxes(grid, input.u, input.v, input.geometry.uvRelativeToGrid, scratch.float32("u", n), scratch.float32("v", n));
  const u = gaussianSmooth(grid, raw.u, settings.smoothingSigma, raw.u, scratch);
  const v = gaussianSmooth(grid, raw.v, settings.smoothingSigma, raw.v, scratch);
  const height = gaussianSmooth(grid, input.height, settings.smoothingSigma, scratch.float32("height", n), scratch);

  const tensor = velocityGradient(grid, u, v, scratchTensor(scratch, n));
  const natural = naturalCoordinates(
    grid,
    u,
    v,
    {
      speed: fields.jet_speed,
      alongSpeedChange: scratch.float32("alongSpeedChange", n),
      alongAcceleration: fields.jet_along_accel,
      crossSpeedGradient: scratch.float32("crossSpeedGradient", n),
      curvature: fields.jet_curv,
    },
    tensor,
    scratch,
  );
  divergence(grid, u, v, fields.jet_div);
  relativeVorticity(grid, u, v, fields.jet_vort);
  cyclonicCurvature(grid, fields.jet_curv);

  geostrophicWind(grid, height, fields.jet_ug, fields.jet_vg);
  ageostrophicWind(u, v, fields.jet_ug, fields.jet_vg, fields.jet_uag, fields.jet_vag);
  rotateToEarthInPlace(grid, fields.jet_ug, fields.jet_vg);
  rotateToEarthInPlace(grid, fields.jet_uag, fields.jet_vag);

  const labelling = labelJetStreaks(grid, { u, v, speed: fields.jet_speed, divergence: fields.jet_div }, settings, scratch, {
    along: fields.jet_along_dist,
    across: fields.jet_axis_dist,
    labels: {
      quadrant: fields.jet_quadrant,
      leftExit: fields.jet_left_exit,
      rightEntrance: fields.jet_right_entrance,
      exit: fields.jet_exit,
      entrance: fields.jet_entrance,
      curvatureClass: fields.jet_curv_class,
      curvatureStrong: fields.jet_curv_strong,
      divergenceFavoured: fields.jet_div_favoured,
      divergenceAmbiguous: fields.jet_div_ambiguous,
      ascentSupport: fields.jet_ascent_support,
      coreSpeed: fields.jet_core_speed,
    },
  });

  const check = compareWithLocalQuadrants(fields.jet_quadrant, fields.jet_speed, natural.alongSpeedChange, natural.crossSpeedGradient, settings.axisSpeed);
  if (check.disagreementFraction > settings.fallbackDisagreementLimit) {
    warnings.push(
      `Jet quadrants: the local speed-gradient check disagrees with the axis labels on ${(100 * check.disagreementFraction).toFixed(0)} % ` +
        `of ${check.compared} labelled cells (limit ${(100 * settings.fallbackDisagreementLimit).toFixed(0)} %); treat the quadrant fields with care.`,
    );
  }

  lowerLevelFrontogenesis(grid, input, input.p850, 85_000, settings, scratch, fields.fgen_850);
  lowerLevelFrontogenesis(grid, input, input.p700, 70_000, settings, scratch, fields.fgen_700);

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

/** One new array per catalogue key: these are handed to the caller. */
function allocateJetFields(pointCount: number): Record<JetFieldKey, Float32Array> {
  const fields = {} as Record<JetFieldKey, Float32Array>;
  for (const key of JET_FIELD_KEYS) fields[key] = new Float32Array(pointCount);
  return fields;
}

function scratchTensor(scratch: GridScratch, n: number): VelocityGradient {
  return { ux: scratch.float32("ux", n), uy: scratch.float32("uy", n), vx: scratch.float32("vx", n), vy: scratch.float32("vy", n) };
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

/** K_s · sign(f), in place: positive where the flow curves cyclonically; NaN where f = 0. */
function cyclonicCurvature(grid: HorizontalGrid, curvature: Float32Array): void {
  const f = grid.coriolis;
  for (let k = 0; k < curvature.length; k++) curvature[k] = f[k] > 0 ? curvature[k] : f[k] < 0 ? -curvature[k] : Number.NaN;
}

/** Frontogenesis of the smoothed wind acting on smoothed θ at one lower level into `out`; NaN when the level is absent. */
function lowerLevelFrontogenesis(
  grid: HorizontalGrid,
  input: JetInput,
  level: ThermalWindLevel | undefined,
  pressure: number,
  settings: JetSettings,
  scratch: GridScratch,
  out: Float32Array,
): void {
  if (!level) {
    out.fill(Number.NaN);
    return;
  }
  const n = grid.nx * grid.ny;
  const wind = windOnGridAxes(grid, level.u, level.v, input.geometry.uvRelativeToGrid, scratch.float32("lowerU", n), scratch.float32("lowerV", n));
  const u = gaussianSmooth(grid, wind.u, settings.smoothingSigma, wind.u, scratch);
  const v = gaussianSmooth(grid, wind.v, settings.smoothingSigma, wind.v, scratch);
  const theta = potentialTemperatureOnLevel(level.temperature, pressure, scratch.float32("theta", n));
  gaussianSmooth(grid, theta, settings.smoothingSigma, theta, scratch);
  // The jet-level tensor is finished with by now, so its scratch arrays are reused.
  petterssenFrontogenesis(grid, theta, u, v, out, velocityGradient(grid, u, v, scratchTensor(scratch, n)), scratch);
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
