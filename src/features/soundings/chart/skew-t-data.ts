import type { ParcelTraceDto, SoundingReportDto } from "@shared/api/soundings.ts";
import { PARCEL_IDS, type ParcelId } from "../parcels.ts";
import { buoyancyAreas, type BuoyancyArea } from "./buoyancy-areas.ts";
import { environmentBuoyancyTemperature, heightAtPressure, temperatureOnPath, type ProfileLevel } from "./profile-interpolation.ts";
import type { ThermoPoint } from "./skew-t-geometry.ts";

/** One parcel as drawn: the temperature it is compared with (virtual when the correction is on) along its path. */
export interface ParcelDrawing {
  id: ParcelId;
  points: ThermoPoint[];
  trace: ParcelTraceDto;
}

/** Everything the skew-T draws from one report, in physical units. */
export interface SkewTData {
  levels: ProfileLevel[];
  /** Whether parcel and environment are compared by virtual temperature (the library's default). */
  virtual: boolean;
  temperature: ThermoPoint[];
  dewpoint: ThermoPoint[];
  /** The environment curve the shading is measured against (Tv, or T when the correction is off). */
  compared: ThermoPoint[];
  parcels: ParcelDrawing[];
}

function drawnPath(trace: ParcelTraceDto, virtual: boolean): ThermoPoint[] {
  const values = virtual ? trace.virtualTemperature : trace.temperature;
  const points: ThermoPoint[] = [];
  trace.pressure.forEach((pressure, k) => {
    const temperature = values[k];
    if (pressure !== null && temperature !== null && Number.isFinite(temperature)) points.push({ pressure, temperature });
  });
  return points;
}

export function skewTData(report: SoundingReportDto): SkewTData {
  const levels = report.levels;
  const virtual = report.meta.options.virtualCorrection;
  const parcels: ParcelDrawing[] = [];
  for (const id of PARCEL_IDS) {
    const trace = report.parcels[id];
    if (trace) parcels.push({ id, trace, points: drawnPath(trace, virtual) });
  }
  return {
    levels,
    virtual,
    temperature: levels.map((l) => ({ pressure: l.pressure, temperature: l.temperature })),
    dewpoint: levels.map((l) => ({ pressure: l.pressure, temperature: l.dewpoint })),
    compared: levels.map((l) => ({ pressure: l.pressure, temperature: environmentBuoyancyTemperature(levels, l.pressure, virtual) })),
    parcels,
  };
}

/** The CAPE and CIN areas of one parcel (none when it has no LFC). */
export function shadedAreas(data: SkewTData, id: ParcelId): BuoyancyArea[] {
  const parcel = data.parcels.find((p) => p.id === id);
  if (!parcel) return [];
  return buoyancyAreas(
    { pressure: parcel.points.map((p) => p.pressure), value: parcel.points.map((p) => p.temperature), lfcPressure: parcel.trace.lfcPressure, elPressure: parcel.trace.elPressure },
    (pressure) => environmentBuoyancyTemperature(data.levels, pressure, data.virtual),
  );
}

export type LevelMarkerKind = "LCL" | "LFC" | "EL";

export interface LevelMarker {
  kind: LevelMarkerKind;
  pressure: number;
  /** Parcel temperature at the marker, where the tick is drawn. */
  temperature: number;
  /** m AGL, Z linear in ln p as in the library. */
  height: number | null;
}

/** LCL, LFC and EL of one parcel where defined. */
export function levelMarkers(data: SkewTData, id: ParcelId): LevelMarker[] {
  const parcel = data.parcels.find((p) => p.id === id);
  if (!parcel) return [];
  const { lclPressure, lfcPressure, elPressure } = parcel.trace;
  const markers: LevelMarker[] = [];
  for (const [kind, pressure] of [["LCL", lclPressure], ["LFC", lfcPressure], ["EL", elPressure]] as const) {
    if (pressure === null) continue;
    const temperature = temperatureOnPath(parcel.points, pressure);
    if (temperature === null) continue;
    markers.push({ kind, pressure, temperature, height: heightAtPressure(data.levels, pressure) });
  }
  return markers;
}
