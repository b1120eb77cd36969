import { ICE_POINT, METERS_PER_SECOND_PER_KNOT } from "../meteo/constants.ts";
import type { ColumnProfile } from "../meteo/column/column-profile.ts";

/** Bellwether's sounding CSV header, exactly. */
export const SOUNDING_CSV_HEADER = "pressure_hpa,height_m,temp_c,dewpoint_c,wind_dir_deg,wind_speed_kt";
export const MIN_SOUNDING_LEVELS = 5;

/** A malformed sounding file; `line` is the 1-based line of the file the problem was found on. */
export class SoundingFormatError extends Error {
  readonly line: number;
  constructor(line: number, problem: string) {
    super(`line ${line}: ${problem}`);
    this.name = "SoundingFormatError";
    this.line = line;
  }
}

/** A parsed sounding in SI units (Pa, m, K, m s⁻¹ with NaN for missing wind), surface first. */
export interface SoundingProfile extends ColumnProfile {
  readonly pressure: Float64Array;
  readonly height: Float64Array;
  readonly temperature: Float64Array;
  readonly dewpoint: Float64Array;
  readonly u: Float64Array;
  readonly v: Float64Array;
  /** File line of each level, for messages further on. */
  readonly lines: readonly number[];
}

interface Limits {
  readonly min: number;
  readonly max: number;
}
// Physically possible ranges for a tropospheric/stratospheric sounding; anything outside is a typo or a unit slip.
const PRESSURE_HPA: Limits = { min: 1, max: 1100 };
const HEIGHT_M: Limits = { min: -500, max: 60000 };
const TEMP_C: Limits = { min: -120, max: 60 };
const DEWPOINT_C: Limits = { min: -150, max: 60 };
const DIRECTION_DEG: Limits = { min: 0, max: 360 };
const SPEED_KT: Limits = { min: 0, max: 400 };

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const COLUMNS = SOUNDING_CSV_HEADER.split(",");

function parseNumber(cell: string, column: string, limits: Limits, line: number): number {
  if (cell === "") throw new SoundingFormatError(line, `${column} is empty`);
  if (!NUMBER.test(cell)) throw new SoundingFormatError(line, `${column} "${cell}" is not a number`);
  const value = Number(cell);
  if (value < limits.min || value > limits.max) {
    throw new SoundingFormatError(line, `${column} ${cell} is outside the possible range ${limits.min} to ${limits.max}`);
  }
  return value;
}

/**
 * Reads a sounding CSV: the exact header, then one row per level from the surface upward. Blank lines are
 * skipped and a row may leave both wind cells empty; everything else is strict. Throws SoundingFormatError
 * naming the file line and the problem.
 */
export function parseSoundingCsv(text: string): SoundingProfile {
  const rows = text.replace(/^\uFEFF/, "").split(/\r?\n/);
  let index = 0;
  while (index < rows.length && rows[index].trim() === "") index++;
  if (index >= rows.length) throw new SoundingFormatError(1, `the file is empty; expected the header "${SOUNDING_CSV_HEADER}"`);
  const header = rows[index].trim();
  const headerLine = index + 1;
  if (header !== SOUNDING_CSV_HEADER) {
    throw new SoundingFormatError(index + 1, `header must be exactly "${SOUNDING_CSV_HEADER}", found "${header}"`);
  }
  const pressure: number[] = [];
  const height: number[] = [];
  const temperature: number[] = [];
  const dewpoint: number[] = [];
  const u: number[] = [];
  const v: number[] = [];
  const lines: number[] = [];
  for (index++; index < rows.length; index++) {
    const raw = rows[index].trim();
    if (raw === "") continue;
    const line = index + 1;
    const cells = raw.split(",").map((c) => c.trim());
    if (cells.length < COLUMNS.length) {
      throw new SoundingFormatError(line, `truncated row: expected ${COLUMNS.length} cells (${SOUNDING_CSV_HEADER}), found ${cells.length}`);
    }
    if (cells.length > COLUMNS.length) throw new SoundingFormatError(line, `expected ${COLUMNS.length} cells, found ${cells.length}`);
    const p = parseNumber(cells[0], COLUMNS[0], PRESSURE_HPA, line);
    const z = parseNumber(cells[1], COLUMNS[1], HEIGHT_M, line);
    const t = parseNumber(cells[2], COLUMNS[2], TEMP_C, line);
    const td = parseNumber(cells[3], COLUMNS[3], DEWPOINT_C, line);
    if (td > t) throw new SoundingFormatError(line, `dewpoint_c ${cells[3]} is above temp_c ${cells[2]}`);
    const previous = pressure.length - 1;
    if (previous >= 0 && !(p * 100 < pressure[previous])) {
      throw new SoundingFormatError(line, `pressure_hpa ${cells[0]} does not decrease from ${pressure[previous] / 100} on line ${lines[previous]} (rows must go upward from the surface)`);
    }
    if (previous >= 0 && !(z > height[previous])) {
      throw new SoundingFormatError(line, `height_m ${cells[1]} does not increase from ${height[previous]} on line ${lines[previous]}`);
    }
    const dirEmpty = cells[4] === "";
    const speedEmpty = cells[5] === "";
    if (dirEmpty !== speedEmpty) {
      throw new SoundingFormatError(line, `${dirEmpty ? "wind_dir_deg" : "wind_speed_kt"} is empty but ${dirEmpty ? "wind_speed_kt" : "wind_dir_deg"} is not; leave both empty for a level without wind`);
    }
    if (dirEmpty) {
      u.push(Number.NaN);
      v.push(Number.NaN);
    } else {
      const direction = parseNumber(cells[4], COLUMNS[4], DIRECTION_DEG, line);
      const speed = parseNumber(cells[5], COLUMNS[5], SPEED_KT, line) * METERS_PER_SECOND_PER_KNOT;
      // Meteorological convention: the direction the wind blows from, clockwise from north.
      const radians = (direction * Math.PI) / 180;
      u.push(-speed * Math.sin(radians));
      v.push(-speed * Math.cos(radians));
    }
    pressure.push(p * 100);
    height.push(z);
    temperature.push(t + ICE_POINT);
    dewpoint.push(td + ICE_POINT);
    lines.push(line);
  }
  if (pressure.length < MIN_SOUNDING_LEVELS) {
    const lastLine = lines.length > 0 ? lines[lines.length - 1] : headerLine;
    throw new SoundingFormatError(lastLine, `the sounding has ${pressure.length} level${pressure.length === 1 ? "" : "s"}; at least ${MIN_SOUNDING_LEVELS} are needed`);
  }
  return {
    pressure: Float64Array.from(pressure),
    height: Float64Array.from(height),
    temperature: Float64Array.from(temperature),
    dewpoint: Float64Array.from(dewpoint),
    u: Float64Array.from(u),
    v: Float64Array.from(v),
    lines,
  };
}
