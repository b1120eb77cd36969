/**
 * Independent oracle for LCL checks: the exact lifting condensation level of Romps (2017), J. Atmos. Sci. 74,
 * 3891-3900, eqs. 22a-f, with the constants of that paper (its Rankine-Kirchhoff vapour pressure). Test code only.
 */
const T_TRIP = 273.16;
const P_TRIP = 611.65;
const E0V = 2.374e6;
const R_AIR = 287.04;
const R_VAP = 461;
const CV_AIR = 719;
const CV_VAP = 1418;
const CV_LIQ = 4119;
const CP_AIR = CV_AIR + R_AIR;
const CP_VAP = CV_VAP + R_VAP;

/** Saturation vapour pressure over liquid in Romps' formulation (Pa). */
export function rompsSaturationVaporPressure(temperature: number): number {
  return (
    P_TRIP *
    Math.pow(temperature / T_TRIP, (CP_VAP - CV_LIQ) / R_VAP) *
    Math.exp(((E0V - (CV_VAP - CV_LIQ) * T_TRIP) / R_VAP) * (1 / T_TRIP - 1 / temperature))
  );
}

/** Lambert W, lower branch k = −1, for x in [−1/e, 0): Halley iteration from a branch-point or log start. */
export function lambertWLowerBranch(x: number): number {
  if (!(x >= -1 / Math.E && x < 0)) return Number.NaN;
  let w = x < -0.25 ? -1 - Math.sqrt(2 * (1 + Math.E * x)) : Math.log(-x) - Math.log(-Math.log(-x));
  for (let i = 0; i < 100; i++) {
    const ew = Math.exp(w);
    const f = w * ew - x;
    const step = f / (ew * (w + 1) - ((w + 2) * f) / (2 * w + 2));
    w -= step;
    if (Math.abs(step) < 1e-15 * Math.abs(w)) break;
  }
  return w;
}

/** T_LCL (K) and p_LCL (Pa) for air at pressure (Pa), temperature (K) and relative humidity over liquid (0-1). */
export function rompsLcl(pressure: number, temperature: number, relativeHumidity: number): { temperature: number; pressure: number } {
  const pv = relativeHumidity * rompsSaturationVaporPressure(temperature);
  const qv = (R_AIR * pv) / (R_VAP * pressure + (R_AIR - R_VAP) * pv);
  const rMix = (1 - qv) * R_AIR + qv * R_VAP;
  const cpMix = (1 - qv) * CP_AIR + qv * CP_VAP;
  const a = cpMix / rMix + (CV_LIQ - CP_VAP) / R_VAP;
  const b = -(E0V - (CV_VAP - CV_LIQ) * T_TRIP) / (R_VAP * temperature);
  const c = b / a;
  const tLcl = (c / lambertWLowerBranch(Math.pow(relativeHumidity, 1 / a) * c * Math.exp(c))) * temperature;
  return { temperature: tLcl, pressure: pressure * Math.pow(tLcl / temperature, cpMix / rMix) };
}
