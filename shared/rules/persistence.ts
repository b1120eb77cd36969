/**
 * Persistence: a rule counts only when it held in at least K consecutive frames of one model run
 * ("two straight forecast hours"). Frames come in valid-time order; a frame that is missing from the
 * run (a gap longer than `maxGapHours`) breaks a streak just like a frame where the rule failed.
 */

export interface FrameOutcome {
  /** ISO 8601 UTC valid time of the frame. */
  readonly validTime: string;
  /** Whether the rule (expression and spatial condition) held in this frame. */
  readonly met: boolean;
}

export interface PersistenceOptions {
  /** Largest step between neighbouring valid times that still counts as consecutive; no limit when left out. */
  readonly maxGapHours?: number;
}

export interface PersistenceResult<T extends FrameOutcome> {
  /** True when some streak of met frames is at least K long. */
  readonly held: boolean;
  /** Every streak of at least K met frames, each whole (not cut to K), earliest first. */
  readonly runs: readonly (readonly T[])[];
  /** Length of the longest streak of met frames, qualifying or not (0 when no frame was met). */
  readonly longestStreak: number;
}

const HOUR_MS = 3_600_000;

export function findPersistentRuns<T extends FrameOutcome>(frames: readonly T[], k: number, options: PersistenceOptions = {}): PersistenceResult<T> {
  if (!Number.isInteger(k) || k < 1) throw new RangeError(`K (frames in a row) must be a whole number >= 1, got ${k}.`);
  const maxGap = options.maxGapHours;
  if (maxGap !== undefined && !(maxGap > 0)) throw new RangeError(`maxGapHours must be > 0, got ${maxGap}.`);
  const times = frames.map((f, i) => validTimeMs(f, i));
  for (let i = 1; i < times.length; i++) {
    if (times[i] <= times[i - 1]) {
      throw new RangeError(`Frames must be in increasing valid-time order; frame ${i} (${frames[i].validTime}) does not come after frame ${i - 1} (${frames[i - 1].validTime}).`);
    }
  }

  const runs: T[][] = [];
  let longestStreak = 0;
  let streak: T[] = [];
  const close = (): void => {
    longestStreak = Math.max(longestStreak, streak.length);
    if (streak.length >= k) runs.push(streak);
    streak = [];
  };
  for (let i = 0; i < frames.length; i++) {
    const gapBreaks = maxGap !== undefined && i > 0 && times[i] - times[i - 1] > maxGap * HOUR_MS;
    if (gapBreaks || !frames[i].met) close();
    if (frames[i].met) streak.push(frames[i]);
  }
  close();
  return { held: runs.length > 0, runs, longestStreak };
}

function validTimeMs(frame: FrameOutcome, index: number): number {
  const ms = Date.parse(frame.validTime);
  if (Number.isNaN(ms)) throw new RangeError(`Frame ${index} has a valid time that is not an ISO date: "${frame.validTime}".`);
  return ms;
}
