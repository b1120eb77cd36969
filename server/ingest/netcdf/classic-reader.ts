/**
 * Reader for classic (CDF-1) and 64-bit offset (CDF-2) NetCDF files. netcdfjs parses the header;
 * values are read here straight into typed arrays, because netcdfjs returns boxed JS arrays
 * (nested per record), reads `byte` as unsigned, and sizes a record from its padded `vsize`,
 * which is wrong for a lone record variable of byte/char/short data (Unidata, "NetCDF file
 * format specifications": one record variable is stored without padding).
 */
import { NetCDFReader } from "netcdfjs";
import { NetcdfDecodeError } from "./errors.ts";
import { elementCount, type AttributeValue, type NumericArray, type RawDataType, type RawDataset, type RawVariable } from "./raw-dataset.ts";

interface ClassicAttribute {
  name: string;
  type: string;
  value: number | string | number[];
}

interface ClassicVariableHeader {
  name: string;
  dimensions: number[];
  attributes: ClassicAttribute[];
  type: string;
  size: number;
  offset: number;
  record: boolean;
}

// The format's own "streaming" marker for an unknown record count (numrecs = 2^32 − 1).
const STREAMING_RECORD_COUNT = 0xffffffff;

const ELEMENT_BYTES: Record<string, number> = { byte: 1, char: 1, short: 2, int: 4, float: 4, double: 8 };

export function readClassicNetcdf(bytes: Uint8Array): RawDataset {
  const reader = parseHeader(bytes);
  const header = reader.header;
  const dimensionList = header.dimensions ?? [];
  const variableHeaders = (header.variables ?? []) as unknown as ClassicVariableHeader[];
  const recordDimensionId = header.recordDimension.id;
  const recordVariables = variableHeaders.filter((variable) => variable.record);
  const firstRecordOffset = recordVariables.length > 0 ? Math.min(...recordVariables.map((variable) => variable.offset)) : 0;
  const recordStep =
    recordVariables.length === 1
      ? ELEMENT_BYTES[recordVariables[0].type] * elementCount(shapeOf(recordVariables[0], dimensionList, recordDimensionId, 1).slice(1))
      : (header.recordDimension.recordStep ?? 0);
  const recordCount = countRecords(header.recordDimension.length, bytes.length, firstRecordOffset, recordStep);

  const dimensions = new Map<string, number>();
  dimensionList.forEach((dimension, index) => dimensions.set(dimension.name, index === recordDimensionId ? recordCount : dimension.size));

  const variables = new Map<string, RawVariable>();
  for (const variableHeader of variableHeaders) {
    variables.set(variableHeader.name, classicVariable(bytes, variableHeader, dimensionList, recordDimensionId, recordCount, recordStep));
  }
  return {
    format: "netcdf3",
    dimensions,
    attributes: attributeMap((header.globalAttributes ?? []) as ClassicAttribute[], false),
    variables,
  };
}

function parseHeader(bytes: Uint8Array): NetCDFReader {
  try {
    return new NetCDFReader(bytes);
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    // IOBuffer raises a RangeError when the header runs past the end of the bytes.
    if (error instanceof RangeError || /out of range|outside the bounds|offset/i.test(reason)) {
      throw new NetcdfDecodeError("truncated", `file ends inside its header (${bytes.length} bytes): ${reason}`);
    }
    throw new NetcdfDecodeError("not-netcdf", `header cannot be read: ${reason}`);
  }
}

function countRecords(declared: number, fileLength: number, firstRecordOffset: number, recordStep: number): number {
  if (declared !== STREAMING_RECORD_COUNT) return declared;
  return recordStep > 0 ? Math.floor((fileLength - firstRecordOffset) / recordStep) : 0;
}

function shapeOf(
  variable: ClassicVariableHeader,
  dimensionList: ReadonlyArray<{ name: string; size: number }>,
  recordDimensionId: number | undefined,
  recordCount: number,
): number[] {
  return variable.dimensions.map((id) => (id === recordDimensionId ? recordCount : dimensionList[id].size));
}

function dataTypeOf(type: string, unsigned: boolean): RawDataType {
  switch (type) {
    case "byte":
      return unsigned ? "uint8" : "int8";
    case "short":
      return unsigned ? "uint16" : "int16";
    case "int":
      return unsigned ? "uint32" : "int32";
    case "float":
      return "float32";
    case "double":
      return "float64";
    case "char":
      return "char";
    default:
      return "other";
  }
}

function classicVariable(
  bytes: Uint8Array,
  header: ClassicVariableHeader,
  dimensionList: ReadonlyArray<{ name: string; size: number }>,
  recordDimensionId: number | undefined,
  recordCount: number,
  recordStep: number,
): RawVariable {
  const unsignedFlag = header.attributes.find((attribute) => attribute.name === "_Unsigned");
  const unsigned = typeof unsignedFlag?.value === "string" && unsignedFlag.value.toLowerCase() === "true";
  const shape = shapeOf(header, dimensionList, recordDimensionId, recordCount);
  const dataType = dataTypeOf(header.type, unsigned);
  return {
    name: header.name,
    dimensions: header.dimensions.map((id) => dimensionList[id].name),
    shape,
    dataType,
    attributes: attributeMap(header.attributes, unsigned),
    readNumeric: () => readValues(bytes, header, shape, dataType, recordStep),
  };
}

function readValues(bytes: Uint8Array, header: ClassicVariableHeader, shape: number[], dataType: RawDataType, recordStep: number): NumericArray {
  if (dataType === "char" || dataType === "other") {
    throw new NetcdfDecodeError("bad-attribute", `is of type ${header.type}, not numeric`, header.name);
  }
  const elementBytes = ELEMENT_BYTES[header.type];
  const total = elementCount(shape);
  const out = allocate(dataType, total);
  if (total === 0) return out;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  if (!header.record) {
    checkInside(bytes, header.name, header.offset, total * elementBytes);
    copyBigEndian(view, header.offset, out, 0, total, dataType);
    return out;
  }
  // A record variable is stored one record at a time, records `recordStep` bytes apart.
  const perRecord = total / shape[0];
  for (let record = 0; record < shape[0]; record++) {
    const start = header.offset + record * recordStep;
    checkInside(bytes, header.name, start, perRecord * elementBytes);
    copyBigEndian(view, start, out, record * perRecord, perRecord, dataType);
  }
  return out;
}

function checkInside(bytes: Uint8Array, name: string, start: number, length: number): void {
  if (start + length > bytes.length) {
    throw new NetcdfDecodeError("truncated", `data at bytes ${start}..${start + length} lie past the end of the file (${bytes.length} bytes)`, name);
  }
}

function allocate(dataType: RawDataType, length: number): NumericArray {
  switch (dataType) {
    case "int8":
      return new Int8Array(length);
    case "uint8":
      return new Uint8Array(length);
    case "int16":
      return new Int16Array(length);
    case "uint16":
      return new Uint16Array(length);
    case "int32":
      return new Int32Array(length);
    case "uint32":
      return new Uint32Array(length);
    case "float32":
      return new Float32Array(length);
    default:
      return new Float64Array(length);
  }
}

function copyBigEndian(view: DataView, start: number, out: NumericArray, outStart: number, count: number, dataType: RawDataType): void {
  switch (dataType) {
    case "int8":
      for (let k = 0; k < count; k++) out[outStart + k] = view.getInt8(start + k);
      return;
    case "uint8":
      for (let k = 0; k < count; k++) out[outStart + k] = view.getUint8(start + k);
      return;
    case "int16":
      for (let k = 0; k < count; k++) out[outStart + k] = view.getInt16(start + 2 * k, false);
      return;
    case "uint16":
      for (let k = 0; k < count; k++) out[outStart + k] = view.getUint16(start + 2 * k, false);
      return;
    case "int32":
      for (let k = 0; k < count; k++) out[outStart + k] = view.getInt32(start + 4 * k, false);
      return;
    case "uint32":
      for (let k = 0; k < count; k++) out[outStart + k] = view.getUint32(start + 4 * k, false);
      return;
    case "float32":
      for (let k = 0; k < count; k++) out[outStart + k] = view.getFloat32(start + 4 * k, false);
      return;
    default:
      for (let k = 0; k < count; k++) out[outStart + k] = view.getFloat64(start + 8 * k, false);
  }
}

const INTEGER_BITS: Record<string, number> = { byte: 8, short: 16, int: 32 };

function attributeMap(attributes: readonly ClassicAttribute[], unsigned: boolean): Map<string, AttributeValue> {
  const map = new Map<string, AttributeValue>();
  for (const attribute of attributes) {
    if (typeof attribute.value === "string") {
      map.set(attribute.name, attribute.value);
      continue;
    }
    let values = Array.isArray(attribute.value) ? attribute.value : [attribute.value];
    const bits = INTEGER_BITS[attribute.type];
    // netcdfjs hands bytes back unsigned; the format's byte is signed unless _Unsigned says otherwise.
    if (attribute.type === "byte" && !unsigned) values = values.map((v) => (v > 127 ? v - 256 : v));
    else if (bits !== undefined && unsigned) values = values.map((v) => (v < 0 ? v + 2 ** bits : v));
    map.set(attribute.name, values);
  }
  return map;
}
