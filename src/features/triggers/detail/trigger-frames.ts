import type { TriggerDetailDto, TriggerFrameDto } from "@shared/api/triggers.ts";
import { fieldByKey } from "@shared/fields.ts";
import { parseRule } from "@shared/rules/index.ts";

/**
 * The frames a trigger was checked on, one entry per frame (a frame checked twice keeps its
 * latest result), ordered by valid time and then by run.
 */
export function framesOfTrigger(frames: readonly TriggerFrameDto[]): TriggerFrameDto[] {
  const byFrame = new Map<number, TriggerFrameDto>();
  for (const frame of frames) {
    const known = byFrame.get(frame.frameId);
    if (!known || frame.evaluationId > known.evaluationId) byFrame.set(frame.frameId, frame);
  }
  return [...byFrame.values()].sort((a, b) => a.validTime.localeCompare(b.validTime) || a.runTime.localeCompare(b.runTime));
}

/**
 * The frame the map opens on: in the newest run that matched, the frame with the widest matched
 * area (the earliest such valid time on a tie); the newest frame when nothing matched.
 */
export function defaultFrameId(frames: readonly TriggerFrameDto[]): number | null {
  const met = frames.filter((frame) => frame.met);
  if (met.length === 0) return frames.length ? [...frames].sort((a, b) => b.runTime.localeCompare(a.runTime) || b.validTime.localeCompare(a.validTime))[0]!.frameId : null;
  const newestRun = met.reduce((run, frame) => (frame.runTime > run ? frame.runTime : run), met[0]!.runTime);
  const candidates = met.filter((frame) => frame.runTime === newestRun).sort((a, b) => a.validTime.localeCompare(b.validTime));
  let best = candidates[0]!;
  for (const frame of candidates) if ((frame.coveragePercent ?? -1) > (best.coveragePercent ?? -1)) best = frame;
  return best.frameId;
}

/**
 * The fields an expression reads, in the order written, the ones holding numbers first: the map
 * opens on the first of them (a yes/no flag says nothing about where the signal is strongest).
 */
export function expressionFields(expression: string): string[] {
  const parsed = parseRule(expression);
  if (!parsed.ok) return [];
  const keys = [...parsed.rule.fieldKeys];
  const numeric = (key: string) => fieldByKey(key)?.kind === "number";
  return [...keys.filter(numeric), ...keys.filter((key) => !numeric(key))];
}

/** The rule's expression from the version's stored definition (read defensively: the definition travels as unknown JSON). */
export function expressionOf(trigger: Pick<TriggerDetailDto, "definition">): string {
  const definition = trigger.definition as { expression?: unknown } | null;
  return typeof definition?.expression === "string" ? definition.expression : "";
}
