import fs from "node:fs";
import { COLUMN_FIELD_KEYS, fieldByKey, toDisplayUnit, type ColumnFieldKey, type FieldTheme } from "../../../shared/fields.ts";
import { diagnoseColumn } from "../../../shared/meteo/index.ts";
import { parseSoundingCsv, SoundingFormatError } from "../../../shared/sounding/csv.ts";
import { CliUsageError, parseCliArgs, type CliCommand } from "../command.ts";

const THEME_ORDER: readonly FieldTheme[] = ["buoyancy", "moisture", "lapse", "shear", "helicity", "composite"];

/** Readable table grouped by theme, in display units ("—" where undefined). */
export function formatFieldTable(fields: Record<ColumnFieldKey, number | null>): string {
  const lines: string[] = [];
  for (const theme of THEME_ORDER) {
    const keys = COLUMN_FIELD_KEYS.filter((key) => fieldByKey(key)!.theme === theme);
    if (keys.length === 0) continue;
    lines.push(theme.toUpperCase());
    for (const key of keys) {
      const field = fieldByKey(key)!;
      const value = fields[key];
      const shown = value === null ? "—" : toDisplayUnit(field, value).toFixed(field.display.decimals);
      lines.push(`  ${key.padEnd(18)} ${shown.padStart(10)} ${field.display.unit}`);
    }
  }
  return lines.join("\n");
}

/** `diagnose <sounding.csv> [--json]`: every column field of one sounding. Malformed file: stderr, exit 1. */
export const diagnoseCommand: CliCommand = {
  name: "diagnose",
  summary: "Column diagnostics of a sounding CSV (flat JSON in SI units with --json)",
  usage: "diagnose <sounding.csv> [--json]",
  async run(args) {
    const { positional, flags } = parseCliArgs(args);
    const file = positional[0];
    if (!file || positional.length > 1) throw new CliUsageError(`Usage: npm run cli -- ${this.usage}`);
    let text: string;
    try {
      text = fs.readFileSync(file, "utf8");
    } catch (err) {
      throw new CliUsageError(`Cannot read ${file}: ${err instanceof Error ? err.message : String(err)}`);
    }
    let profile;
    try {
      profile = parseSoundingCsv(text);
    } catch (err) {
      if (err instanceof SoundingFormatError) throw new CliUsageError(`${file}: ${err.message}`);
      throw err;
    }
    const { fields, meta } = diagnoseColumn(profile);
    if (flags.has("json")) {
      process.stdout.write(`${JSON.stringify(fields)}\n`);
    } else {
      process.stdout.write(`${formatFieldTable(fields)}\n`);
      const mu = meta.muSource;
      const capped = Object.entries(meta.elCapped).filter(([, v]) => v).map(([k]) => k);
      process.stdout.write(`\nMU parcel source: ${mu.pressure === null ? "—" : `${(mu.pressure / 100).toFixed(0)} hPa`}, ${mu.height === null ? "—" : `${mu.height.toFixed(0)} m AGL`}`);
      process.stdout.write(capped.length ? `; EL capped at the column top for ${capped.join(", ")}\n` : "\n");
    }
    return 0;
  },
};
