/**
 * U.S. Standard Atmosphere 1976 (COESA 1976) below 20 km, from its defining layers: geopotential height H (m)
 * and temperature (K) at a pressure (Pa). Troposphere: T = 288.15 − 0.0065 H; isothermal 216.65 K from 11 km.
 */
const R = 287.0531;
const G0 = 9.80665;
const T0 = 288.15;
const P0 = 101325;
const LAPSE = 0.0065;
const H_TROPOPAUSE = 11000;
const T_TROPOPAUSE = 216.65;
const P_TROPOPAUSE = 22632.06;

export function standardAtmosphereAt(pressure: number): { height: number; temperature: number } {
  if (pressure >= P_TROPOPAUSE) {
    const height = (T0 / LAPSE) * (1 - Math.pow(pressure / P0, (R * LAPSE) / G0));
    return { height, temperature: T0 - LAPSE * height };
  }
  const height = H_TROPOPAUSE + ((R * T_TROPOPAUSE) / G0) * Math.log(P_TROPOPAUSE / pressure);
  return { height, temperature: T_TROPOPAUSE };
}
