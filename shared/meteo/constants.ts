/**
 * Physical constants used by the column diagnostics, in SI units.
 * Each entry names its symbol, unit and where the value comes from.
 */

/** Rd, gas constant of dry air (J kg⁻¹ K⁻¹); the conventional meteorological value (From memory: universal gas constant over the molar mass of dry air gives 287.05). */
export const GAS_CONSTANT_DRY_AIR = 287.04;

/** Rv, gas constant of water vapour (J kg⁻¹ K⁻¹); universal gas constant over M_w = 18.015 g mol⁻¹ (From memory). */
export const GAS_CONSTANT_WATER_VAPOR = 461.5;

/** cpd, specific heat of dry air at constant pressure (J kg⁻¹ K⁻¹); chosen so that κ ≈ 0.2854 as in Bolton (1980). */
export const SPECIFIC_HEAT_DRY_AIR = 1005.7;

/** κ = Rd/cpd (dimensionless); Bolton (1980), eq. 43 uses 0.2854. */
export const POISSON_EXPONENT = GAS_CONSTANT_DRY_AIR / SPECIFIC_HEAT_DRY_AIR;

/** ε = Rd/Rv (dimensionless), ratio of molar masses of water and dry air. */
export const MOLAR_MASS_RATIO = GAS_CONSTANT_DRY_AIR / GAS_CONSTANT_WATER_VAPOR;

/** g, standard gravity (m s⁻²); 3rd CGPM (1901), also used by the U.S. Standard Atmosphere (COESA 1976). */
export const STANDARD_GRAVITY = 9.80665;

/** Latent heat of vaporisation at 0 °C (J kg⁻¹); Bolton (1980), eq. 2. */
export const LATENT_HEAT_AT_ICE_POINT = 2.501e6;

/** Temperature slope of the latent heat (J kg⁻¹ K⁻¹); Bolton (1980), eq. 2. */
export const LATENT_HEAT_SLOPE = 2370;

/** Ice point (K). */
export const ICE_POINT = 273.15;

/** p00, reference pressure for potential temperature (Pa). */
export const REFERENCE_PRESSURE = 100000;

/** Metres per second in one knot (exact: 1852 m per 3600 s). */
export const METERS_PER_SECOND_PER_KNOT = 1852 / 3600;

/** ln(p00), cached because ln-p arithmetic is everywhere in the parcel code. */
export const LN_REFERENCE_PRESSURE = Math.log(REFERENCE_PRESSURE);
