import pngjs from "pngjs";

export interface MatchMapInput {
  nx: number;
  ny: number;
  /** 1 inside the zone (canonical layout: index = j * nx + i, row j = 0 in the south). */
  zone: Uint8Array;
  /** 1 where the rule was met inside the zone; null when the frame could not be evaluated. */
  matched: Uint8Array | null;
  /** "#RRGGBB" for matched points: the trigger's severity colour. */
  matchColour: string;
  /** Longest side of the image in pixels. */
  size?: number;
}

type Rgb = readonly [number, number, number];

const BACKGROUND: Rgb = [242, 244, 247];
const ZONE_FILL: Rgb = [207, 218, 230];
const ZONE_EDGE: Rgb = [94, 110, 128];

function hexToRgb(hex: string): Rgb {
  const m = /^#?([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new RangeError(`"${hex}" is not a #RRGGBB colour`);
  return [parseInt(m[1]!, 16), parseInt(m[2]!, 16), parseInt(m[3]!, 16)];
}

/** The zone's bounding box in grid cells, widened by a margin so the zone sits in some context. */
export function zoneWindow(zone: Uint8Array, nx: number, ny: number): { i0: number; j0: number; cols: number; rows: number } {
  let i0 = nx;
  let i1 = -1;
  let j0 = ny;
  let j1 = -1;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      if (!zone[j * nx + i]) continue;
      if (i < i0) i0 = i;
      if (i > i1) i1 = i;
      if (j < j0) j0 = j;
      if (j > j1) j1 = j;
    }
  }
  if (i1 < 0) return { i0: 0, j0: 0, cols: nx, rows: ny };
  const margin = Math.max(3, Math.round(0.2 * Math.max(i1 - i0 + 1, j1 - j0 + 1)));
  i0 = Math.max(0, i0 - margin);
  j0 = Math.max(0, j0 - margin);
  i1 = Math.min(nx - 1, i1 + margin);
  j1 = Math.min(ny - 1, j1 + margin);
  return { i0, j0, cols: i1 - i0 + 1, rows: j1 - j0 + 1 };
}

/**
 * A small PNG of one trigger's area: the zone and its surroundings in pale grey, the zone filled and
 * outlined, the matched points in the severity colour. Nearest-neighbour sampling from grid to
 * pixels, north up (the grid's rows run south to north, the image's top to bottom). Zone edges are
 * the zone's own grid cells that touch a cell outside it, so the outline needs no geometry.
 */
export function renderMatchPng(input: MatchMapInput): Buffer {
  const { nx, ny, zone, matched } = input;
  if (zone.length !== nx * ny) throw new RangeError(`The zone mask has ${zone.length} points; the grid has ${nx} x ${ny}.`);
  if (matched && matched.length !== nx * ny) throw new RangeError(`The match mask has ${matched.length} points; the grid has ${nx} x ${ny}.`);
  const { i0, j0, cols, rows } = zoneWindow(zone, nx, ny);
  const size = input.size ?? 320;
  const scale = size / Math.max(cols, rows);
  const width = Math.max(1, Math.round(cols * scale));
  const height = Math.max(1, Math.round(rows * scale));
  const match = hexToRgb(input.matchColour);

  const png = new pngjs.PNG({ width, height });
  const data = png.data;
  for (let y = 0; y < height; y++) {
    // Image row 0 is the northern edge of the window.
    const j = j0 + rows - 1 - Math.min(rows - 1, Math.floor(y / scale));
    for (let x = 0; x < width; x++) {
      const i = i0 + Math.min(cols - 1, Math.floor(x / scale));
      const k = j * nx + i;
      let colour = BACKGROUND;
      if (zone[k]) {
        const edge = i === 0 || j === 0 || i === nx - 1 || j === ny - 1 || !zone[k - 1] || !zone[k + 1] || !zone[k - nx] || !zone[k + nx];
        colour = matched && matched[k] ? match : edge ? ZONE_EDGE : ZONE_FILL;
      }
      const o = (y * width + x) * 4;
      data[o] = colour[0];
      data[o + 1] = colour[1];
      data[o + 2] = colour[2];
      data[o + 3] = 255;
    }
  }
  return pngjs.PNG.sync.write(png);
}
