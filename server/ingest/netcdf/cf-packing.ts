/**
 * CF/NUG packing and missing data (CF conventions, sections 2.5.1 and 8.1): values equal to
 * _FillValue or missing_value, or outside valid_min/valid_max/valid_range, become NaN; the rest
 * are unpacked (× scale_factor + add_offset) and converted to SI in a single affine step.
 */
import { numberAttribute, numbersAttribute, type RawDataType, type RawVariable } from "./raw-dataset.ts";
import type { UnitConversion } from "./cf-units.ts";

export interface ValueTransform {
  /** Raw (packed) values that mean "missing". */
  readonly fills: Float64Array;
  /** Raw values outside [validMin, validMax] are missing. */
  readonly validMin: number;
  readonly validMax: number;
  /** output = raw × scale + offset. */
  readonly scale: number;
  readonly offset: number;
}

// netCDF library default fill values (netcdf.h NC_FILL_*), used when a variable declares no
// _FillValue. Bytes have none here: the NetCDF User Guide advises against a default byte fill.
const DEFAULT_FILLS: Partial<Record<RawDataType, number>> = {
  int16: -32767,
  uint16: 65535,
  int32: -2147483647,
  uint32: 4294967295,
  float32: 9.969209968386869e36,
  float64: 9.969209968386869e36,
};

export function valueTransform(variable: RawVariable, conversion: UnitConversion): ValueTransform {
  const attributes = variable.attributes;
  const packedScale = numberAttribute(attributes, "scale_factor") ?? 1;
  const packedOffset = numberAttribute(attributes, "add_offset") ?? 0;
  // float32 data are compared with float32 fills; the attribute may be written as a double.
  const asStored = variable.dataType === "float32" ? Math.fround : (value: number) => value;

  const fills: number[] = [];
  const declaredFill = numberAttribute(attributes, "_FillValue");
  if (declaredFill !== undefined) fills.push(declaredFill);
  else if (DEFAULT_FILLS[variable.dataType] !== undefined) fills.push(DEFAULT_FILLS[variable.dataType]!);
  for (const value of numbersAttribute(attributes, "missing_value") ?? []) fills.push(value);

  const validRange = numbersAttribute(attributes, "valid_range");
  const validMin = validRange?.[0] ?? numberAttribute(attributes, "valid_min") ?? -Infinity;
  const validMax = validRange?.[1] ?? numberAttribute(attributes, "valid_max") ?? Infinity;

  return {
    fills: Float64Array.from(fills.map(asStored)),
    validMin,
    validMax,
    scale: packedScale * conversion.scale,
    offset: packedOffset * conversion.scale + conversion.offset,
  };
}
