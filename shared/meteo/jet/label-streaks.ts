/**
 * Jet streaks as objects, start to finish on the smoothed jet-level wind: cores, axes (cut where two cores
 * share one), curvature class, point assignment, quadrant labels and favoured-divergence flags.
 */
import { projectionForGeometry, type GeoPoint } from "../../grid/projection.ts";
import type { HorizontalGrid } from "./horizontal-grid.ts";
import type { JetSettings } from "./jet-settings.ts";
import type { JetAxis, JetAxisVertex, JetCore, JetStreak } from "./jet-types.ts";
import { findJetCores } from "./cores.ts";
import { traceJetAxis } from "./axis-trace.ts";
import { splitSharedAxes } from "./axis-split.ts";
import { axisTurningAngle, classifyCurvature, type CurvatureVerdict } from "./curvature.ts";
import { assignPointsToAxes, type PointAssignment } from "./assign-points.ts";
import { labelPoints, type LabelFields, type StreakSummary } from "./labels.ts";
import { GridScratch } from "./grid-scratch.ts";

export interface StreakInputs {
  /** Smoothed wind in grid axes, its speed and divergence. */
  readonly u: Float32Array;
  readonly v: Float32Array;
  readonly speed: Float32Array;
  readonly divergence: Float32Array;
}

export interface StreakLabelling {
  readonly streaks: JetStreak[];
  readonly labels: LabelFields;
  readonly assignment: PointAssignment;
  readonly axes: readonly JetAxis[];
}

/**
 * `along`/`across` distances and the label fields are new arrays (or `out`); working arrays come from `scratch`.
 */
export function labelJetStreaks(
  grid: HorizontalGrid,
  inputs: StreakInputs,
  settings: JetSettings,
  scratch: GridScratch = new GridScratch(),
  out?: { along: Float32Array; across: Float32Array; labels: LabelFields },
): StreakLabelling {
  const cores = findJetCores(grid, inputs.speed, settings, scratch);
  const traced = cores.map((core) => traceJetAxis(grid, inputs, core, settings));
  const axes = splitSharedAxes(grid, traced, cores, inputs.speed, settings.axisSearchDistance);
  const verdicts = axes.map((axis, index) =>
    classifyCurvature(axisTurningAngle(grid, axis, settings.curvatureWindow), coriolisSignAt(grid, cores[index]), settings),
  );
  const summaries: StreakSummary[] = cores.map((core, index) => ({
    curvatureClass: verdicts[index].curvatureClass,
    curvatureStrong: verdicts[index].strong,
    northern: coriolisSignAt(grid, core) >= 0,
    coreSpeed: core.speed,
  }));
  const assignment = assignPointsToAxes(grid, axes, settings.axisMaxDistance, scratch, out);
  const labels = labelPoints(assignment.owner, assignment.along, assignment.across, summaries, inputs.divergence, settings, out?.labels);
  const labelled = new Int32Array(cores.length);
  for (let p = 0; p < assignment.owner.length; p++) if (assignment.owner[p] >= 0) labelled[assignment.owner[p]]++;
  const streaks = cores.map((core, index) => describeStreak(grid, index, core, axes[index], verdicts[index], summaries[index].northern, labelled[index]));
  return { streaks, labels, assignment, axes };
}

/** Sign of f at the core (+1 on an f-plane with f ≥ 0 or in the Northern Hemisphere). */
function coriolisSignAt(grid: HorizontalGrid, core: JetCore): number {
  return grid.coriolis[core.index] < 0 ? -1 : 1;
}

function describeStreak(
  grid: HorizontalGrid,
  id: number,
  core: JetCore,
  axis: JetAxis,
  verdict: CurvatureVerdict,
  northern: boolean,
  labelledPoints: number,
): JetStreak {
  const locate = locator(grid);
  const here: GeoPoint = { lat: Number.NaN, lon: Number.NaN };
  locate(core.i, core.j, here);
  const vertices: JetAxisVertex[] = [];
  for (let k = 0; k < axis.count; k++) {
    const at: GeoPoint = { lat: Number.NaN, lon: Number.NaN };
    locate(axis.i[k], axis.j[k], at);
    vertices.push({ lat: at.lat, lon: at.lon, i: axis.i[k], j: axis.j[k], s: axis.s[k] });
  }
  return {
    id,
    core: { lat: here.lat, lon: here.lon, i: core.i, j: core.j, speed: core.speed },
    hemisphere: northern ? "north" : "south",
    axis: vertices,
    curvatureClass: verdict.curvatureClass,
    curvatureStrong: verdict.strong,
    turningAngleDegrees: verdict.cyclonicTurningDegrees,
    labelledPoints,
  };
}

/** Fractional grid indices → latitude/longitude; an f-plane has none, so it leaves NaN. */
function locator(grid: HorizontalGrid): (i: number, j: number, out: GeoPoint) => GeoPoint {
  const geometry = grid.geometry;
  if (geometry.kind === "fplane") return (_i, _j, out) => out;
  const projection = projectionForGeometry(geometry);
  return (i, j, out) => projection.gridToLatLon(i, j, out);
}

