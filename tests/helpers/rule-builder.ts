/** A complete rule definition for tests (shear over 10 m/s anywhere in the zones), with overrides. */
export function testRule(zoneIds: number[], over: Record<string, unknown> = {}) {
  return {
    name: "Strong deep shear",
    description: "Test rule",
    expression: "shear_0_6km >= 10",
    zoneIds,
    severity: "serious",
    spatialCondition: { kind: "any-point" },
    validTimeWindow: { kind: "any-time" },
    persistenceFrames: 1,
    coolDownHours: 6,
    recipients: { onCall: true, contactIds: [], groupIds: [] },
    enabled: true,
    ...over,
  };
}
