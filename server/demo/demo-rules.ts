import type { CreateRuleInput } from "../../shared/api/rules.ts";

/**
 * The demo office's starter rules, built from common starting thresholds for severe-storm
 * ingredients (deep-layer shear ≥ 20 m/s, MLCAPE ≥ 1000 J/kg, low-level SRH ≥ 100 m²/s², low LCLs,
 * steep mid-level lapse rates). The office is invented; these are examples to tune, not guidance.
 */
export function demoRules(zoneIds: readonly number[], options: { partnerGroupId?: number } = {}): CreateRuleInput[] {
  // The invented partners hear about the two strongest signals, besides whoever is on shift.
  const withPartners = { onCall: true, contactIds: [], groupIds: options.partnerGroupId ? [options.partnerGroupId] : [] };
  const rule = (fields: Pick<CreateRuleInput, "name" | "description" | "expression" | "severity" | "spatialCondition"> & Partial<CreateRuleInput>): CreateRuleInput => ({
    zoneIds: [...zoneIds],
    validTimeWindow: { kind: "any-time" },
    persistenceFrames: 1,
    coolDownHours: 6,
    recipients: { onCall: true, contactIds: [], groupIds: [] },
    enabled: true,
    ...fields,
  });
  return [
    rule({
      name: "Supercell ingredients",
      description: "Deep-layer shear strong enough for rotating storms over moderate buoyancy with a weak cap.",
      expression: "mlcape >= 1000 and shear_0_6km >= 20 and mlcin > -50",
      severity: "serious",
      spatialCondition: { kind: "min-coverage", percent: 10 },
      recipients: withPartners,
    }),
    rule({
      name: "Tornado-favourable low levels",
      description: "Effective-layer STP of 1 or more with strong 0–1 km helicity and a low cloud base, for two straight forecast hours.",
      expression: "stp_eff >= 1 and srh_0_1km >= 100 and mllcl_hgt < 1500",
      severity: "urgent",
      spatialCondition: { kind: "min-points", points: 3 },
      persistenceFrames: 2,
      recipients: withPartners,
      // Urgent: escalate sooner than the office default.
      escalateAfterMinutes: 10,
    }),
    rule({
      name: "Steep lapse rates over rich moisture",
      description: "An elevated mixed layer over a moist boundary layer: large hail potential once storms form.",
      expression: "lapse_700_500 >= 7.5 and pwat >= 25",
      severity: "heads-up",
      spatialCondition: { kind: "min-coverage", percent: 25 },
    }),
    rule({
      name: "Jet streak lift over instability",
      description:
        "Where the upper jet streak favours divergence aloft (left exit or right entrance of a straight streak, adjusted for curvature) over buoyant, sheared air.",
      expression: "jet_div_favoured == 1 and mucape >= 1000 and shear_0_6km >= 18",
      severity: "serious",
      spatialCondition: { kind: "min-coverage", percent: 15 },
    }),
    rule({
      name: "Capped but loaded",
      description: "Large buoyancy held under a strong cap: quiet until the cap breaks.",
      expression: "mlcape >= 2500 and mlcin <= -100",
      severity: "heads-up",
      spatialCondition: { kind: "min-points", points: 5 },
    }),
  ];
}
