import type { TriggerDetailDto, TriggerFrameDto, TriggerSummaryDto } from "../../shared/api/triggers.ts";

/** A trigger summary for client tests; every field can be overridden. The values are placeholders, never check values. */
export function triggerSummary(overrides: Partial<TriggerSummaryDto> = {}): TriggerSummaryDto {
  return {
    id: 1,
    state: "open",
    severity: "serious",
    rule: { id: 10, name: "Deep shear with buoyancy", versionId: 100, version: 2 },
    zone: { id: 3, code: "Z3", name: "Test zone" },
    model: "test-model",
    runTime: "2026-05-14T13:00:00.000Z",
    firstValidTime: "2026-05-14T18:00:00.000Z",
    lastValidTime: "2026-05-14T21:00:00.000Z",
    openedAt: "2026-05-14T14:05:00.000Z",
    updatedAt: "2026-05-14T14:05:00.000Z",
    acknowledgedBy: null,
    acknowledgedAt: null,
    closedAt: null,
    closeReason: null,
    peak: { coveragePercent: 42, matchedPoints: 21, fields: [] },
    trend: null,
    ...overrides,
  };
}

/** One evaluated frame of a trigger for client tests. */
export function triggerFrame(overrides: Partial<TriggerFrameDto> = {}): TriggerFrameDto {
  return {
    evaluationId: 1,
    frameId: 1,
    runTime: "2026-05-14T13:00:00.000Z",
    validTime: "2026-05-14T18:00:00.000Z",
    met: true,
    reason: "met",
    matchedPoints: 10,
    zonePoints: 50,
    coveragePercent: 20,
    fields: [],
    ...overrides,
  };
}

export type { TriggerDetailDto };
