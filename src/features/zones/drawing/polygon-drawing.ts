/**
 * The state of a zone polygon being drawn on the map: vertices in longitude/latitude as they were
 * clicked, and whether the ring has been closed. Live checks reuse the server's own geometry rules
 * (`zoneGeometryProblems`) on the ring as it would be if closed now, so a crossing shows the moment
 * it is drawn and a ring the server would refuse can never be closed.
 */
import { zoneGeometryProblems, type ZoneGeometry } from "@shared/zones/zone-geometry.ts";

export type LonLat = readonly [number, number];

export interface DrawingState {
  vertices: readonly LonLat[];
  closed: boolean;
}

export type DrawingAction =
  | { type: "add"; lon: number; lat: number }
  | { type: "undo" }
  | { type: "close" }
  | { type: "clear" };

export const EMPTY_DRAWING: DrawingState = { vertices: [], closed: false };

/** A ring needs three corners before it can enclose anything. */
export const MIN_VERTICES = 3;

/** 4 decimals of a degree is about 10 m: far finer than any model grid, and keeps the GeoJSON tidy. */
const round = (degrees: number) => Math.round(degrees * 1e4) / 1e4;

/** The ring as it would be stored if closed now (first vertex repeated), or null with too few vertices. */
export function drawingRing(state: DrawingState): Array<[number, number]> | null {
  if (state.vertices.length < MIN_VERTICES) return null;
  return [...state.vertices.map(([lon, lat]): [number, number] => [lon, lat]), [state.vertices[0]![0], state.vertices[0]![1]]];
}

/** What is wrong with the ring as drawn, closed back to its first vertex (empty when it is fine). */
export function drawingProblems(state: DrawingState): string[] {
  const ring = drawingRing(state);
  return ring ? zoneGeometryProblems({ type: "Polygon", coordinates: [ring] }) : [];
}

export function canClose(state: DrawingState): boolean {
  return !state.closed && state.vertices.length >= MIN_VERTICES && drawingProblems(state).length === 0;
}

/** The finished polygon, once closed. */
export function drawingGeometry(state: DrawingState): ZoneGeometry | null {
  const ring = drawingRing(state);
  return state.closed && ring ? { type: "Polygon", coordinates: [ring] } : null;
}

export function drawingReducer(state: DrawingState, action: DrawingAction): DrawingState {
  switch (action.type) {
    case "add": {
      if (state.closed || !Number.isFinite(action.lon) || !Number.isFinite(action.lat)) return state;
      const vertex: LonLat = [round(action.lon), round(action.lat)];
      const last = state.vertices[state.vertices.length - 1];
      // The second click of a double-click lands on the same spot: one vertex, not two.
      if (last && last[0] === vertex[0] && last[1] === vertex[1]) return state;
      return { vertices: [...state.vertices, vertex], closed: false };
    }
    case "undo":
      if (state.closed) return { ...state, closed: false };
      return state.vertices.length ? { vertices: state.vertices.slice(0, -1), closed: false } : state;
    case "close":
      return canClose(state) ? { ...state, closed: true } : state;
    case "clear":
      return EMPTY_DRAWING;
  }
}
