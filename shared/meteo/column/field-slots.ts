import { COLUMN_FIELD_KEYS, type ColumnFieldKey } from "../../fields.ts";

/** Position of each column field in the library's output vector (the catalogue's order). */
export const FIELD_SLOT = Object.fromEntries(COLUMN_FIELD_KEYS.map((key, i) => [key, i])) as Record<ColumnFieldKey, number>;
export const COLUMN_FIELD_COUNT = COLUMN_FIELD_KEYS.length;
