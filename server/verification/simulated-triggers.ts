/**
 * Rebuilds the triggers a backtest would have opened, with the span of valid times each covered.
 * The backtest reports, per frame and zone, the decision the live engine would take (open,
 * extend, retract, …) and, in order, each opening's first valid time. A simulated trigger takes
 * every later frame of its zone whose decision was open or extend, until the zone opens another.
 */

export interface BacktestFrameView {
  frame: { id: number; runTime: string; validTime: string };
  zones: ReadonlyArray<{ zoneId: number; met: boolean; decision: string }>;
}

export interface BacktestView {
  frames: readonly BacktestFrameView[];
  opened: ReadonlyArray<{ zoneId: number; firstValidTime: string; runTime: string }>;
}

export interface SimulatedTrigger {
  zoneId: number;
  /** The frame whose evaluation opened it: the moment the live engine would have. */
  openingFrameId: number;
  firstValidTime: string;
  lastValidTime: string;
  /** Frames that opened or extended it (for its matched area). */
  frameIds: number[];
}

const later = (a: string, b: string) => (Date.parse(a) >= Date.parse(b) ? a : b);

export function simulatedTriggers(backtest: BacktestView): SimulatedTrigger[] {
  const out: SimulatedTrigger[] = [];
  const latestByZone = new Map<number, SimulatedTrigger>();
  let nextOpening = 0;
  for (const { frame, zones } of backtest.frames) {
    for (const zone of zones) {
      if (zone.decision === "open") {
        const opening = backtest.opened[nextOpening++];
        if (!opening || opening.zoneId !== zone.zoneId) throw new Error(`backtest openings out of step at frame ${frame.id}, zone ${zone.zoneId}`);
        const trigger = { zoneId: zone.zoneId, openingFrameId: frame.id, firstValidTime: opening.firstValidTime, lastValidTime: later(frame.validTime, opening.firstValidTime), frameIds: [frame.id] };
        out.push(trigger);
        latestByZone.set(zone.zoneId, trigger);
      } else if (zone.decision === "extend") {
        const trigger = latestByZone.get(zone.zoneId);
        if (!trigger) continue;
        trigger.lastValidTime = later(frame.validTime, trigger.lastValidTime);
        trigger.frameIds.push(frame.id);
      }
    }
  }
  return out;
}
