import { splitCsvRecords, CsvSyntaxError } from "../csv/csv-text.ts";
import { STORM_REPORT_KINDS, magnitudeUnitFor, MAGNITUDE_UNITS, type StormReportKind } from "./storm-report-kinds.ts";

/** Bellwether's storm-report CSV header, exactly (README, "Storm reports"). */
export const STORM_REPORT_CSV_HEADER = "time_utc,latitude,longitude,kind,magnitude,magnitude_unit,remarks";
const COLUMNS = STORM_REPORT_CSV_HEADER.split(",");
export const MAX_STORM_REPORT_ROWS = 5000;
export const MAX_REMARKS_LENGTH = 500;
/** Reports may not lie further ahead than this: a later time is a typo (wrong day or year). */
const FUTURE_LIMIT_HOURS = 24;
const EARLIEST_YEAR = 1950;

export interface StormReportRow {
  /** ISO instant, UTC. */
  time: string;
  latitude: number;
  longitude: number;
  kind: StormReportKind;
  magnitude: number | null;
  magnitudeUnit: string | null;
  /** Hail diameter in m, wind gust in m/s, tornado EF rating; null without a magnitude. */
  magnitudeSi: number | null;
  remarks: string;
}

export type ParsedRow = { line: number; ok: true; report: StormReportRow } | { line: number; ok: false; reason: string };

/** The whole file is unusable (no header, wrong header, too many rows, broken quoting). */
export class StormReportFileError extends Error {
  constructor(
    readonly line: number,
    problem: string,
  ) {
    super(`line ${line}: ${problem}`);
    this.name = "StormReportFileError";
  }
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;
const TIME = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,3})?)?(Z|[+-]\d{2}:?\d{2})?$/i;

function parseTime(cell: string, now: Date): string {
  const match = TIME.exec(cell.trim());
  if (!match) throw new Error(`time_utc "${cell}" is not a date and time like 2026-05-14T21:35Z`);
  const [, y, mo, d, h, mi, s, zone] = match;
  const utc = Date.UTC(Number(y), Number(mo) - 1, Number(d), Number(h), Number(mi), Number(s ?? "0"));
  const check = new Date(utc);
  if (check.getUTCMonth() !== Number(mo) - 1 || check.getUTCDate() !== Number(d) || Number(h) > 23 || Number(mi) > 59 || Number(s ?? "0") > 59) {
    throw new Error(`time_utc "${cell}" is not a real date and time`);
  }
  let offsetMinutes = 0;
  if (zone && zone.toUpperCase() !== "Z") {
    const digits = zone.replace(":", "");
    offsetMinutes = (digits[0] === "-" ? -1 : 1) * (Number(digits.slice(1, 3)) * 60 + Number(digits.slice(3, 5)));
  }
  const at = new Date(utc - offsetMinutes * 60_000);
  if (at.getUTCFullYear() < EARLIEST_YEAR) throw new Error(`time_utc "${cell}" is before ${EARLIEST_YEAR}`);
  if (at.getTime() > now.getTime() + FUTURE_LIMIT_HOURS * 3_600_000) throw new Error(`time_utc "${cell}" is more than ${FUTURE_LIMIT_HOURS} hours in the future`);
  return at.toISOString();
}

function parseCoordinate(cell: string, column: string, limit: number): number {
  const text = cell.trim();
  if (text === "") throw new Error(`${column} is empty`);
  if (!NUMBER.test(text)) throw new Error(`${column} "${cell}" is not a number in decimal degrees`);
  const value = Number(text);
  if (Math.abs(value) > limit) throw new Error(`${column} ${text} is outside −${limit} to ${limit} degrees`);
  return value;
}

function parseKind(cell: string): StormReportKind {
  const kind = cell.trim().toLowerCase();
  if (!(STORM_REPORT_KINDS as readonly string[]).includes(kind)) throw new Error(`kind "${cell}" is not one of ${STORM_REPORT_KINDS.join(", ")}`);
  return kind as StormReportKind;
}

function parseMagnitude(kind: StormReportKind, valueCell: string, unitCell: string): Pick<StormReportRow, "magnitude" | "magnitudeUnit" | "magnitudeSi"> {
  const value = valueCell.trim();
  const unitText = unitCell.trim();
  const allowed = MAGNITUDE_UNITS[kind].map((u) => u.unit).join(", ");
  if (value === "" && unitText === "") return { magnitude: null, magnitudeUnit: null, magnitudeSi: null };
  if (value === "") throw new Error(`magnitude_unit "${unitText}" is given without a magnitude`);
  if (unitText === "") throw new Error(`magnitude ${value} has no magnitude_unit (for ${kind}: ${allowed})`);
  const unit = magnitudeUnitFor(kind, unitText);
  if (!unit) throw new Error(`magnitude_unit "${unitText}" does not suit ${kind} (use ${allowed})`);
  if (!NUMBER.test(value)) throw new Error(`magnitude "${value}" is not a number`);
  const magnitude = Number(value);
  if (unit.integer && !Number.isInteger(magnitude)) throw new Error(`an ${unit.unit} rating is a whole number 0–${unit.max}, not ${value}`);
  if (magnitude < 0 || magnitude > unit.max || (!unit.integer && magnitude === 0)) {
    throw new Error(`magnitude ${value} ${unit.unit} is outside the plausible range (${unit.integer ? 0 : "above 0"} to ${unit.max} ${unit.unit})`);
  }
  return { magnitude, magnitudeUnit: unit.unit, magnitudeSi: unit.toSi(magnitude) };
}

function parseRemarks(cell: string | undefined): string {
  // Control characters would only garble exports and the screen.
  const text = (cell ?? "").replace(/[\u0000-\u001f\u007f]+/g, " ").trim();
  if (text.length > MAX_REMARKS_LENGTH) throw new Error(`remarks are ${text.length} characters long; at most ${MAX_REMARKS_LENGTH} are kept`);
  return text;
}

function parseRow(cells: string[], now: Date): StormReportRow {
  // remarks may be left off entirely; anything beyond it is a slip (an unquoted comma in the remarks).
  if (cells.length < COLUMNS.length - 1) throw new Error(`${cells.length} cells where ${COLUMNS.length} are expected (${STORM_REPORT_CSV_HEADER})`);
  if (cells.length > COLUMNS.length) throw new Error(`${cells.length} cells where ${COLUMNS.length} are expected; put remarks that contain commas in double quotes`);
  const [time, latitude, longitude, kind, magnitude, unit, remarks] = cells as [string, string, string, string, string, string, string | undefined];
  const parsedKind = parseKind(kind);
  return {
    time: parseTime(time, now),
    latitude: parseCoordinate(latitude, "latitude", 90),
    longitude: parseCoordinate(longitude, "longitude", 180),
    kind: parsedKind,
    ...parseMagnitude(parsedKind, magnitude, unit),
    remarks: parseRemarks(remarks),
  };
}

/**
 * Reads a storm-report CSV: the exact header, then one report per row. Each row is checked on its
 * own: a good row becomes a report, a bad one a refusal naming its line and the first problem.
 * Problems with the file as a whole throw StormReportFileError.
 */
export function parseStormReportCsv(text: string, now: Date): ParsedRow[] {
  let records;
  try {
    records = splitCsvRecords(text);
  } catch (error) {
    if (error instanceof CsvSyntaxError) throw new StormReportFileError(error.line, error.message.replace(/^line \d+: /, ""));
    throw error;
  }
  const [header, ...rows] = records;
  if (!header) throw new StormReportFileError(1, `the file is empty; the first line must be the header ${STORM_REPORT_CSV_HEADER}`);
  const found = header.cells.map((c) => c.trim().toLowerCase()).join(",");
  if (found !== STORM_REPORT_CSV_HEADER) throw new StormReportFileError(header.line, `the header must be exactly ${STORM_REPORT_CSV_HEADER} (found ${header.cells.join(",")})`);
  if (rows.length > MAX_STORM_REPORT_ROWS) throw new StormReportFileError(rows[MAX_STORM_REPORT_ROWS]!.line, `more than ${MAX_STORM_REPORT_ROWS} reports in one file; split it`);
  return rows.map((row) => {
    try {
      return { line: row.line, ok: true as const, report: parseRow(row.cells, now) };
    } catch (error) {
      return { line: row.line, ok: false as const, reason: error instanceof Error ? error.message : String(error) };
    }
  });
}
