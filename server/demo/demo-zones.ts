import type { CreateZoneInput } from "../../shared/api/zones.ts";

/**
 * The invented demo office's eight forecast zones: a gently warped 4 × 2 tiling of the plains
 * between about 101° W and 95° W, 34° N and 38° N. Names and codes are made up.
 */
const NAMES: ReadonlyArray<[string, string]> = [
  ["CWB", "Cottonwood Breaks"],
  ["RMS", "Red Mesa"],
  ["WCV", "Wolf Creek Valley"],
  ["SFB", "Salt Fork Basin"],
  ["SHF", "Sandhill Flats"],
  ["CDB", "Cedar Bluffs"],
  ["PLK", "Prairie Lakes"],
  ["IRR", "Iron Ridge"],
];

const COLUMNS = 4;
const ROWS = 2;
const STEPS = 4;

/** Lattice (u, v) → [lon, lat]: the same lattice point always maps to the same vertex, so tiles share edges. */
function warp(u: number, v: number): [number, number] {
  const lon = -101 + 1.5 * u + 0.15 * Math.sin(2.1 * v + 1.3 * u);
  const lat = 34 + 2 * v + 0.12 * Math.sin(1.7 * u + 0.9 * v);
  return [Number(lon.toFixed(4)), Number(lat.toFixed(4))];
}

function tile(column: number, row: number): Array<[number, number]> {
  const ring: Array<[number, number]> = [];
  for (let k = 0; k < STEPS; k++) ring.push(warp(column + k / STEPS, row));
  for (let k = 0; k < STEPS; k++) ring.push(warp(column + 1, row + k / STEPS));
  for (let k = 0; k < STEPS; k++) ring.push(warp(column + 1 - k / STEPS, row + 1));
  for (let k = 0; k < STEPS; k++) ring.push(warp(column, row + 1 - k / STEPS));
  ring.push(ring[0]!);
  return ring;
}

export function demoZones(): CreateZoneInput[] {
  const zones: CreateZoneInput[] = [];
  for (let row = 0; row < ROWS; row++) {
    for (let column = 0; column < COLUMNS; column++) {
      const [code, name] = NAMES[row * COLUMNS + column]!;
      zones.push({ code, name: `${name} (demo)`, geometry: { type: "Polygon", coordinates: [tile(column, row)] } });
    }
  }
  return zones;
}
