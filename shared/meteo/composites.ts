/**
 * Composite severe-weather indices. Inputs in SI units; negative helicity gives a negative index (kept, so
 * rules compare with positive thresholds). Each interior formula applies on closed intervals, so the terms
 * are continuous at their breakpoints. NaN inputs give NaN.
 */

/** Formula version strings reported with the results. */
export const COMPOSITE_FORMULA_VERSIONS = {
  scp_eff: "scp_eff@T04",
  scp_fixed: "scp_fixed@T03",
  stp_fixed: "stp_fixed@T04",
  stp_eff: "stp_eff@T12",
} as const;

/** Effective-shear term of the supercell composite: 0 below 10 m s⁻¹, EBWD/20 up to 20, then 1 (Thompson et al. 2004). */
export function supercellShearTerm(effectiveShear: number): number {
  if (Number.isNaN(effectiveShear)) return Number.NaN;
  if (effectiveShear < 10) return 0;
  if (effectiveShear > 20) return 1;
  return effectiveShear / 20;
}

/** Supercell composite, effective layer: (MUCAPE/1000)(ESRH/50) f(EBWD) (Thompson et al. 2004; 2007). */
export function supercellCompositeEffective(muCape: number, effectiveSrh: number, effectiveShear: number): number {
  return (muCape / 1000) * (effectiveSrh / 50) * supercellShearTerm(effectiveShear);
}

/**
 * Supercell composite, fixed layer, original form (Thompson et al. 2003):
 * (MUCAPE/1000)(SRH 0-3 km/100)(BRN shear/40 m² s⁻²). The SRH normaliser is from memory, hence the feature flag.
 */
export function supercellCompositeFixed(muCape: number, srh0To3Km: number, brnShear: number): number {
  return (muCape / 1000) * (srh0To3Km / 100) * (brnShear / 40);
}

/** LCL term of STP: 1 below 1000 m, (2000 − LCL)/1000 up to 2000 m, then 0 (Thompson et al. 2004). */
export function tornadoLclTerm(lclHeight: number): number {
  if (Number.isNaN(lclHeight)) return Number.NaN;
  if (lclHeight < 1000) return 1;
  if (lclHeight > 2000) return 0;
  return (2000 - lclHeight) / 1000;
}

/** Shear term of STP: 0 below 12.5 m s⁻¹, BWD/20 up to 30, then 1.5 (Thompson et al. 2004). */
export function tornadoShearTerm(bulkShear: number): number {
  if (Number.isNaN(bulkShear)) return Number.NaN;
  if (bulkShear < 12.5) return 0;
  if (bulkShear > 30) return 1.5;
  return bulkShear / 20;
}

/** CIN term of effective STP: 1 above −50 J kg⁻¹, (200 + CIN)/150 down to −200, then 0 (Thompson et al. 2012; from memory). */
export function tornadoCinTerm(mixedLayerCin: number): number {
  if (Number.isNaN(mixedLayerCin)) return Number.NaN;
  if (mixedLayerCin > -50) return 1;
  if (mixedLayerCin < -200) return 0;
  return (200 + mixedLayerCin) / 150;
}

/** Significant tornado parameter, fixed layer: (SBCAPE/1500) f_LCL (SRH 0-1 km/150) f_BWD(0-6 km) (Thompson et al. 2004). */
export function significantTornadoFixed(sbCape: number, sbLclHeight: number, srh0To1Km: number, shear0To6Km: number): number {
  return (sbCape / 1500) * tornadoLclTerm(sbLclHeight) * (srh0To1Km / 150) * tornadoShearTerm(shear0To6Km);
}

/**
 * Significant tornado parameter, effective layer (Thompson et al. 2012):
 * (MLCAPE/1500) f_LCL(MLLCL) (ESRH/150) f_BWD(EBWD) f_CIN(MLCIN); 0 when the effective base is above the
 * ground, and 0 when MLCIN is undefined (no LFC, so MLCAPE = 0).
 */
export function significantTornadoEffective(
  mlCape: number,
  mlLclHeight: number,
  effectiveSrh: number,
  effectiveShear: number,
  mlCin: number,
  effectiveBaseHeight: number,
): number {
  if (effectiveBaseHeight > 0) return 0;
  if (Number.isNaN(mlCin) && mlCape === 0) return 0;
  return (mlCape / 1500) * tornadoLclTerm(mlLclHeight) * (effectiveSrh / 150) * tornadoShearTerm(effectiveShear) * tornadoCinTerm(mlCin);
}
