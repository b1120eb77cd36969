/** Test helper: small in-memory raw datasets, for CF cases that need no file on disk. */
import type { AttributeValue, NumericArray, RawDataType, RawDataset, RawVariable } from "../../../server/ingest/netcdf/raw-dataset.ts";

export type AttributeInput = Record<string, string | number | number[]>;

export function memoryVariable(
  name: string,
  dimensions: Record<string, number> | Array<[string, number]>,
  values: ArrayLike<number>,
  attributes: AttributeInput = {},
  dataType: RawDataType = "float64",
): RawVariable {
  const entries = Array.isArray(dimensions) ? dimensions : Object.entries(dimensions);
  const stored: NumericArray = dataType === "float32" ? Float32Array.from(values) : Float64Array.from(values);
  return {
    name,
    dimensions: entries.map(([dimension]) => dimension),
    shape: entries.map(([, size]) => size),
    dataType,
    attributes: new Map<string, AttributeValue>(
      Object.entries(attributes).map(([key, value]) => [key, typeof value === "string" ? value : Array.isArray(value) ? value : [value]]),
    ),
    readNumeric: () => stored,
  };
}

export function memoryDataset(variables: RawVariable[], attributes: AttributeInput = {}): RawDataset {
  const dimensions = new Map<string, number>();
  for (const variable of variables) variable.dimensions.forEach((dimension, axis) => dimensions.set(dimension, variable.shape[axis]));
  return {
    format: "netcdf3",
    dimensions,
    attributes: new Map(Object.entries(attributes).map(([key, value]) => [key, typeof value === "string" ? value : Array.isArray(value) ? value : [value]])),
    variables: new Map(variables.map((variable) => [variable.name, variable])),
  };
}

/** Replaces some attributes of one variable, leaving the rest of the dataset as it was. */
export function withAttributes(dataset: RawDataset, name: string, changes: AttributeInput): RawDataset {
  const original = dataset.variables.get(name)!;
  const attributes = new Map(original.attributes);
  for (const [key, value] of Object.entries(changes)) attributes.set(key, typeof value === "string" ? value : Array.isArray(value) ? value : [value]);
  const variables = new Map(dataset.variables);
  variables.set(name, { ...original, attributes, readNumeric: () => original.readNumeric() });
  return { ...dataset, variables };
}

export function range(first: number, step: number, count: number): number[] {
  return Array.from({ length: count }, (_, k) => first + k * step);
}
