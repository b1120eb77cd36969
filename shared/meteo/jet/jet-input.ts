/**
 * Building the jet input from the isobaric levels of a frame: the jet level (seasonal, office-fixed or
 * level of maximum wind) and the 850/700 hPa levels for frontogenesis.
 */
import type { ColumnGrid } from "../column/column-grid.ts";
import { coriolisParameter } from "../../grid/map-factor.ts";
import { projectionForGeometry } from "../../grid/projection.ts";
import type { JetGeometry } from "./horizontal-grid.ts";
import { chooseJetLevel, type Hemisphere, type JetLevelChoice } from "./jet-level.ts";
import { resolveJetSettings, type JetSettings } from "./jet-settings.ts";
import type { JetInput, ThermalWindLevel } from "./compute-jet-fields.ts";

/** Fields of one isobaric level; arrays in the canonical layout. */
export interface IsobaricLevelFields {
  readonly pressure: number;
  readonly u: Float32Array;
  readonly v: Float32Array;
  /** Geopotential height (gpm). */
  readonly height?: Float32Array;
  /** Temperature (K). */
  readonly temperature?: Float32Array;
}

/** Hemisphere of a grid from the sign of f at its centre point. */
export function gridHemisphere(geometry: JetGeometry): Hemisphere {
  if (geometry.kind === "fplane") return geometry.coriolis < 0 ? "south" : "north";
  const centre = projectionForGeometry(geometry).gridToLatLon((geometry.nx - 1) / 2, (geometry.ny - 1) / 2, { lat: 0, lon: 0 });
  return coriolisParameter(centre.lat) < 0 ? "south" : "north";
}

/** Views (no copies) of each level of a column grid's level-major 3-D arrays. */
export function isobaricLevelsFromColumnGrid(grid: ColumnGrid): IsobaricLevelFields[] {
  const n = grid.pointCount;
  return Array.from(grid.levelPressures, (pressure, level) => ({
    pressure,
    u: grid.u.subarray(level * n, (level + 1) * n),
    v: grid.v.subarray(level * n, (level + 1) * n),
    height: grid.height.subarray(level * n, (level + 1) * n),
    temperature: grid.temperature.subarray(level * n, (level + 1) * n),
  }));
}

export interface PreparedJetInput {
  readonly input: JetInput;
  readonly choice: JetLevelChoice;
  readonly warnings: string[];
}

/** Chooses the jet level per the settings and gathers the frontogenesis levels when present. */
export function jetInputFromLevels(
  geometry: JetGeometry,
  levels: readonly IsobaricLevelFields[],
  validTime: Date | string,
  overrides?: Partial<JetSettings>,
): PreparedJetInput {
  const settings = resolveJetSettings(overrides);
  const withHeight = levels.filter((level) => level.height !== undefined);
  const choice = chooseJetLevel(withHeight, settings, validTime, gridHemisphere(geometry));
  const jet = withHeight[choice.index];
  const warnings = choice.warning ? [choice.warning] : [];
  const input: JetInput = {
    geometry,
    u: jet.u,
    v: jet.v,
    height: jet.height!,
    jetLevelPressure: jet.pressure,
    p850: thermalLevel(levels, 85_000),
    p700: thermalLevel(levels, 70_000),
  };
  return { input, choice, warnings };
}

function thermalLevel(levels: readonly IsobaricLevelFields[], pressure: number): ThermalWindLevel | undefined {
  const level = levels.find((l) => Math.abs(l.pressure - pressure) < 1 && l.temperature !== undefined);
  return level ? { temperature: level.temperature!, u: level.u, v: level.v } : undefined;
}
