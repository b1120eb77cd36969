import type { PackingScale } from "./data-representation.ts";

/**
 * Y = (R + X * 2^E) / 10^D (WMO-No. 306, regulation 92.9.4) folded into Y = offset + X * factor, so each value
 * costs one multiply and one add.
 */
export interface LinearScale {
  offset: number;
  factor: number;
}

export function linearScale(scale: PackingScale): LinearScale {
  const decimal = 10 ** scale.decimalScale;
  return { offset: scale.reference / decimal, factor: 2 ** scale.binaryScale / decimal };
}

/** A field with zero bits per value holds the reference value everywhere (WMO-No. 306, template 5.0 note 3). */
export function fillConstant(scale: PackingScale, out: Float32Array): void {
  out.fill(scale.reference / 10 ** scale.decimalScale);
}
