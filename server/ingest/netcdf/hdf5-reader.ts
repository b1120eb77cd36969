/**
 * Reader for NetCDF-4 files (HDF5 underneath) through h5wasm. h5wasm's Node build opens files
 * by path, so the bytes go to a private temporary file for the duration of `consume`.
 * Only the root group is read; netCDF-4's bookkeeping attributes are hidden from the result.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { NetcdfDecodeError } from "./errors.ts";
import type { AttributeValue, NumericArray, RawDataType, RawDataset, RawVariable } from "./raw-dataset.ts";

type H5Module = typeof import("h5wasm/node");
type H5Dataset = InstanceType<H5Module["Dataset"]>;
type H5Attribute = InstanceType<H5Module["Attribute"]>;

let h5Loading: Promise<H5Module> | undefined;

async function loadH5(): Promise<H5Module> {
  h5Loading ??= import("h5wasm/node").then(async (module) => {
    const runtime = await module.ready;
    // HDF5 errors become JS exceptions instead of diagnostics printed on stderr.
    runtime.activate_throwing_error_handler();
    return module;
  });
  return h5Loading;
}

// Attributes the netCDF-4 library writes for its own use (dimension scales, ids, provenance).
const LIBRARY_ATTRIBUTES = new Set([
  "CLASS",
  "NAME",
  "REFERENCE_LIST",
  "DIMENSION_LIST",
  "_Netcdf4Dimid",
  "_Netcdf4Coordinates",
  "_nc3_strict",
  "_NCProperties",
  "_IsNetcdf4",
  "_SuperblockVersion",
]);

const PURE_DIMENSION_MARK = "This is a netCDF dimension but not a netCDF variable";

// H5T class codes as reported in h5wasm metadata.type.
const H5T_INTEGER = 0;
const H5T_FLOAT = 1;
const H5T_STRING = 3;

/**
 * Loads the HDF5 WebAssembly ahead of the first NetCDF-4 file. Worth calling at server start:
 * under tsx the 4 MB module takes several seconds to load (about 0.4 s under plain node).
 */
export async function preloadNetcdf4Support(): Promise<void> {
  await loadH5();
}

/** Opens NetCDF-4 bytes, hands the raw view to `consume`, then closes and removes the temporary file. */
export async function withHdf5Netcdf<T>(bytes: Uint8Array, consume: (dataset: RawDataset) => T): Promise<T> {
  const h5 = await loadH5();
  const directory = mkdtempSync(join(tmpdir(), "bellwether-netcdf4-"));
  const path = join(directory, "input.nc");
  try {
    writeFileSync(path, bytes);
    const file = openHdf5(h5, path, bytes.length);
    try {
      return consume(rawDatasetFromFile(h5, file));
    } finally {
      file.close();
    }
  } finally {
    rmSync(directory, { recursive: true, force: true });
  }
}

function openHdf5(h5: H5Module, path: string, length: number): InstanceType<H5Module["File"]> {
  let file;
  try {
    file = new h5.File(path, "r");
  } catch (error) {
    const reason = hdf5Reason(error);
    const code = /truncat/i.test(reason) ? "truncated" : "not-netcdf";
    throw new NetcdfDecodeError(code, `HDF5 signature found but the file (${length} bytes) cannot be opened: ${reason}`);
  }
  // With HDF5's default handler h5wasm does not throw on a bad file but returns a negative id.
  if (file.file_id < 0n) throw new NetcdfDecodeError("truncated", `HDF5 signature found but the file (${length} bytes) cannot be opened`);
  return file;
}

/** The innermost entry of an HDF5 error stack ("truncated file: eof = ..."), which names the cause. */
function hdf5Reason(error: unknown): string {
  const text = error instanceof Error ? error.message : String(error);
  const causes = [...text.matchAll(/#\d+:.*?\(\): (.*)$/gm)].map((match) => match[1].trim());
  return causes.at(-1) ?? text.trim().split("\n")[0];
}

function rawDatasetFromFile(h5: H5Module, file: InstanceType<H5Module["File"]>): RawDataset {
  const dimensions = new Map<string, number>();
  const variables = new Map<string, RawVariable>();
  const datasets: Array<[string, H5Dataset]> = [];
  for (const name of file.keys()) {
    const entity = file.get(name);
    if (entity instanceof h5.Dataset) datasets.push([name, entity]);
  }
  for (const [name, dataset] of datasets) {
    if (readAttribute(dataset.attrs["CLASS"]) === "DIMENSION_SCALE") dimensions.set(name, (dataset.shape ?? [0])[0]);
  }
  for (const [name, dataset] of datasets) {
    const label = readAttribute(dataset.attrs["NAME"]);
    if (typeof label === "string" && label.startsWith(PURE_DIMENSION_MARK)) continue;
    variables.set(name, hdf5Variable(name, dataset, dimensions));
  }
  return { format: "netcdf4", dimensions, attributes: visibleAttributes(file.attrs), variables };
}

function hdf5Variable(name: string, dataset: H5Dataset, dimensions: Map<string, number>): RawVariable {
  const shape = dataset.shape ?? [];
  const isScale = readAttribute(dataset.attrs["CLASS"]) === "DIMENSION_SCALE";
  const dimensionNames = shape.map((size, axis) => {
    if (isScale && shape.length === 1) return name;
    const scales = dataset.get_attached_scales(axis);
    if (scales.length === 0) return `phony_dim_${axis}_${size}`;
    return scales[0].replace(/^.*\//, "");
  });
  dimensionNames.forEach((dimension, axis) => {
    if (!dimensions.has(dimension)) dimensions.set(dimension, shape[axis]);
  });
  const dataType = dataTypeOf(dataset.metadata);
  return {
    name,
    dimensions: dimensionNames,
    shape,
    dataType,
    attributes: visibleAttributes(dataset.attrs),
    readNumeric: () => readNumericValues(name, dataset, dataType),
  };
}

function dataTypeOf(metadata: { type: number; size: number; signed: boolean }): RawDataType {
  if (metadata.type === H5T_FLOAT) return metadata.size === 4 ? "float32" : metadata.size === 8 ? "float64" : "other";
  if (metadata.type === H5T_STRING) return "string";
  if (metadata.type !== H5T_INTEGER) return "other";
  const signed = metadata.signed;
  switch (metadata.size) {
    case 1:
      return signed ? "int8" : "uint8";
    case 2:
      return signed ? "int16" : "uint16";
    case 4:
      return signed ? "int32" : "uint32";
    case 8:
      return signed ? "int64" : "uint64";
    default:
      return "other";
  }
}

function readNumericValues(name: string, dataset: H5Dataset, dataType: RawDataType): NumericArray {
  if (dataType === "string" || dataType === "char" || dataType === "other") {
    throw new NetcdfDecodeError("bad-attribute", `is of type ${dataType}, not numeric`, name);
  }
  let value;
  try {
    value = dataset.value;
  } catch (error) {
    throw new NetcdfDecodeError("truncated", `values cannot be read: ${hdf5Reason(error)}`, name);
  }
  if (typeof value === "number") return Float64Array.of(value);
  if (typeof value === "bigint") return Float64Array.of(Number(value));
  // 64-bit integers arrive as BigInt arrays; float64 holds them exactly up to 2^53.
  if (value instanceof BigInt64Array || value instanceof BigUint64Array) return Float64Array.from(value, (v) => Number(v));
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) return value as NumericArray;
  throw new NetcdfDecodeError("bad-attribute", `values came back in an unexpected form (${typeof value})`, name);
}

function visibleAttributes(attributes: Record<string, H5Attribute>): Map<string, AttributeValue> {
  const map = new Map<string, AttributeValue>();
  for (const [name, attribute] of Object.entries(attributes)) {
    if (LIBRARY_ATTRIBUTES.has(name)) continue;
    const value = readAttribute(attribute);
    if (value !== undefined) map.set(name, value);
  }
  return map;
}

function readAttribute(attribute: H5Attribute | undefined): AttributeValue | undefined {
  if (attribute === undefined) return undefined;
  let value;
  try {
    value = attribute.value;
  } catch {
    return undefined;
  }
  if (typeof value === "string") return value;
  if (typeof value === "number") return [value];
  if (typeof value === "bigint") return [Number(value)];
  if (typeof value === "boolean") return [value ? 1 : 0];
  if (Array.isArray(value)) {
    // NC_STRING attributes come back as string arrays; a single string is the common case.
    if (value.every((item) => typeof item === "string")) return (value as string[]).join("\n");
    if (value.every((item) => typeof item === "number" || typeof item === "bigint")) return value.map((item) => Number(item));
    return undefined;
  }
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    return Array.from(value as ArrayLike<number | bigint>, (item) => Number(item));
  }
  return undefined;
}
