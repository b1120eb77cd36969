import type { FieldInfoDto } from "@shared/api/grids.ts";
import { FIELD_KEYS, fieldByKey, type DisplayUnit, type FieldCategory, type FieldKind, type FieldTheme } from "@shared/fields.ts";
import { STORED_INPUTS_2D, storedInputByKey } from "@shared/stored-inputs.ts";
import { formatNumber } from "@/lib/format-units.ts";

/** Map groups: the catalogue's themes plus the model's own surface fields. */
export type MapFieldGroup = FieldTheme | "model" | "other";

/** What the map needs to know about any stored field, whether a diagnostic or a model input. */
export interface MapField {
  key: string;
  /** Short name for the picker and the legend. */
  label: string;
  meaning: string;
  group: MapFieldGroup;
  kind: FieldKind;
  display: DisplayUnit;
  /** Negative values mean something of their own (inhibition, convergence, a westward component). */
  signed: boolean;
  /** Signed, but never above zero (inhibition): only the negative half of a diverging ramp is needed. */
  neverPositive: boolean;
  categories: readonly FieldCategory[];
}

export const GROUP_LABELS: Record<MapFieldGroup, string> = {
  buoyancy: "Buoyancy",
  shear: "Shear and storm motion",
  helicity: "Helicity and inflow",
  moisture: "Moisture",
  lapse: "Lapse rates",
  composite: "Composite indices",
  jet: "Jet streak",
  frontogenesis: "Frontogenesis",
  model: "Model surface fields",
  other: "Other stored fields",
};

const GROUP_ORDER: readonly MapFieldGroup[] = ["buoyancy", "shear", "helicity", "moisture", "lapse", "composite", "jet", "frontogenesis", "model", "other"];

const AS_STORED = (unit: string): DisplayUnit => ({ unit: unit === "1" ? "" : unit, scale: 1, offset: 0, decimals: 2 });

/** Describes a stored field from the catalogue, the stored-input list, or (unknown key) its own metadata. */
export function describeMapField(info: Pick<FieldInfoDto, "key" | "unit">): MapField {
  const catalogued = fieldByKey(info.key);
  if (catalogued) {
    return {
      key: catalogued.key,
      label: catalogued.key,
      meaning: catalogued.meaning,
      group: catalogued.theme,
      kind: catalogued.kind,
      display: catalogued.display,
      // The catalogue's QC range says whether a field can go below zero.
      signed: catalogued.kind === "number" && catalogued.range[0] < 0,
      neverPositive: catalogued.kind === "number" && catalogued.range[0] < 0 && catalogued.range[1] <= 0,
      categories: catalogued.categories ?? [],
    };
  }
  const input = storedInputByKey(info.key);
  if (input) {
    return { key: input.key, label: `${input.key} · ${input.label}`, meaning: `Model ${input.label}, as read from the file.`, group: "model", kind: "number", display: input.display, signed: input.signed, neverPositive: false, categories: [] };
  }
  return { key: info.key, label: info.key, meaning: "A stored field without a catalogue entry; shown in its stored unit.", group: "other", kind: "number", display: AS_STORED(info.unit), signed: false, neverPositive: false, categories: [] };
}

export interface MapFieldGroupList {
  group: MapFieldGroup;
  label: string;
  fields: MapField[];
}

const CATALOGUE_ORDER = new Map<string, number>([...FIELD_KEYS, ...STORED_INPUTS_2D.map((input) => input.key)].map((key, index) => [key, index]));
const orderOf = (key: string) => CATALOGUE_ORDER.get(key) ?? CATALOGUE_ORDER.size;

/** The frame's fields grouped for the picker, groups in a fixed order and fields in catalogue order within each. */
export function groupMapFields(infos: readonly Pick<FieldInfoDto, "key" | "unit">[]): MapFieldGroupList[] {
  const fields = infos.map(describeMapField).sort((a, b) => orderOf(a.key) - orderOf(b.key) || a.key.localeCompare(b.key));
  return GROUP_ORDER.map((group) => ({ group, label: GROUP_LABELS[group], fields: fields.filter((field) => field.group === group) })).filter(
    (entry) => entry.fields.length > 0,
  );
}

/** Stored (SI) value → display value. */
export function toDisplayValue(field: Pick<MapField, "display">, value: number): number {
  return value * field.display.scale + field.display.offset;
}

/** A stored value as staff read it, with its unit: "1,850 J/kg", "42 kt", "left_exit", "yes", "no value". */
export function formatMapValue(field: MapField, value: number): string {
  if (!Number.isFinite(value)) return "no value";
  if (field.kind === "bool") return value >= 0.5 ? "yes" : "no";
  if (field.kind === "category") return field.categories.find((category) => category.code === value)?.label ?? `code ${formatNumber(value)}`;
  const shown = formatNumber(toDisplayValue(field, value), field.display.decimals);
  return field.display.unit ? `${shown} ${field.display.unit}` : shown;
}

/** The field the map opens with: MLCAPE when the frame has it (the usual first look), else the first listed. */
export function defaultFieldKey(infos: readonly Pick<FieldInfoDto, "key">[]): string | null {
  if (infos.some((info) => info.key === "mlcape")) return "mlcape";
  const groups = groupMapFields(infos.map((info) => ({ key: info.key, unit: "1" })));
  return groups[0]?.fields[0]?.key ?? null;
}
