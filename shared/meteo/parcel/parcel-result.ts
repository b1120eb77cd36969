/** Outcome of one parcel ascent. Heights are metres above ground, pressures Pa; NaN = undefined. */
export class ParcelResult {
  /** Index of the column level the parcel starts from. */
  originLevel = 0;
  originPressure = Number.NaN;
  originHeight = Number.NaN;
  originTemperature = Number.NaN;
  originMixingRatio = Number.NaN;
  cape = 0;
  cin = Number.NaN;
  lclHeight = Number.NaN;
  lclPressure = Number.NaN;
  lclTemperature = Number.NaN;
  lfcHeight = Number.NaN;
  lfcPressure = Number.NaN;
  elHeight = Number.NaN;
  elPressure = Number.NaN;
  elCapped = false;
}
