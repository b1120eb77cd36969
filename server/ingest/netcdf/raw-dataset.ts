/**
 * The format-neutral view both readers produce: names, shapes, attributes and lazily read raw
 * values, before any CF interpretation (no scaling, no fill handling, no unit conversion).
 */

export type NumericArray =
  | Int8Array
  | Uint8Array
  | Int16Array
  | Uint16Array
  | Int32Array
  | Uint32Array
  | Float32Array
  | Float64Array;

/** Text attributes stay strings; numeric attributes are always arrays, even of length 1. */
export type AttributeValue = string | readonly number[];

export type RawDataType = "int8" | "uint8" | "int16" | "uint16" | "int32" | "uint32" | "int64" | "uint64" | "float32" | "float64" | "char" | "string" | "other";

export interface RawVariable {
  readonly name: string;
  /** Dimension names, slowest varying first. */
  readonly dimensions: readonly string[];
  readonly shape: readonly number[];
  readonly dataType: RawDataType;
  readonly attributes: ReadonlyMap<string, AttributeValue>;
  /** All values in file order (row-major over `shape`); throws for text variables. */
  readNumeric(): NumericArray;
}

export interface RawDataset {
  readonly format: "netcdf3" | "netcdf4";
  readonly dimensions: ReadonlyMap<string, number>;
  readonly attributes: ReadonlyMap<string, AttributeValue>;
  readonly variables: ReadonlyMap<string, RawVariable>;
}

export function textAttribute(attributes: ReadonlyMap<string, AttributeValue>, name: string): string | undefined {
  const value = attributes.get(name);
  return typeof value === "string" ? value : undefined;
}

export function numberAttribute(attributes: ReadonlyMap<string, AttributeValue>, name: string): number | undefined {
  const value = attributes.get(name);
  return typeof value === "string" || value === undefined || value.length === 0 ? undefined : value[0];
}

export function numbersAttribute(attributes: ReadonlyMap<string, AttributeValue>, name: string): readonly number[] | undefined {
  const value = attributes.get(name);
  return typeof value === "string" ? undefined : value;
}

export function elementCount(shape: readonly number[]): number {
  let count = 1;
  for (const size of shape) count *= size;
  return count;
}
