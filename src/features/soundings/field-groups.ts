import { COLUMN_FIELD_KEYS, fieldByKey, type FieldDefinition, type FieldTheme } from "@shared/fields.ts";
import { formatFieldValue } from "@/lib/format-units.ts";

/** The themes of the column table, in the order a forecaster reads a sounding: energy, moisture, lapse, wind. */
export const COLUMN_THEMES = ["buoyancy", "moisture", "lapse", "shear", "helicity", "composite"] as const satisfies readonly FieldTheme[];
export type ColumnTheme = (typeof COLUMN_THEMES)[number];

export const THEME_LABELS: Record<ColumnTheme, string> = {
  buoyancy: "Buoyancy",
  moisture: "Moisture",
  lapse: "Lapse rates",
  shear: "Wind and shear",
  helicity: "Helicity",
  composite: "Composite indices",
};

export interface FieldRow {
  key: string;
  meaning: string;
  /** Display unit ("" for indices and flags). */
  unit: string;
  /** Value in display units, "—" where undefined. */
  text: string;
}

export interface FieldGroup {
  theme: ColumnTheme;
  label: string;
  rows: FieldRow[];
}

function rowOf(field: FieldDefinition, value: number | null | undefined): FieldRow {
  return { key: field.key, meaning: field.meaning, unit: field.display.unit, text: formatFieldValue(field, value) };
}

/** Every column field of the catalogue, grouped by theme in catalogue order; a theme with no field is left out. */
export function fieldGroups(values: Readonly<Record<string, number | null>>): FieldGroup[] {
  const definitions = COLUMN_FIELD_KEYS.map((key) => fieldByKey(key)!);
  return COLUMN_THEMES.map((theme) => ({
    theme,
    label: THEME_LABELS[theme],
    rows: definitions.filter((field) => field.theme === theme).map((field) => rowOf(field, values[field.key])),
  })).filter((group) => group.rows.length > 0);
}

/** One field's display text and unit, for summaries ("2,450 J/kg", "—"). */
export function fieldText(key: string, values: Readonly<Record<string, number | null>>): string {
  const field = fieldByKey(key);
  if (!field) throw new Error(`Unknown field "${key}"`);
  const text = formatFieldValue(field, values[key]);
  return text === "—" || !field.display.unit ? text : `${text} ${field.display.unit}`;
}
