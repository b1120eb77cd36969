import type { FakeBehaviour } from "../../shared/api/notifications.ts";

export const WELL_BEHAVED: FakeBehaviour = { failureRate: 0, failAfterStoring: false, delayMs: 0 };

export type FakeVerdict = "accept" | "refuse" | "store-then-refuse";

/**
 * How a fake answers the next request: on time or late, accepted or refused. The share of refusals
 * comes from a seeded xorshift32 generator (Marsaglia 2003, "Xorshift RNGs"), so a test run that
 * sends requests in the same order sees the same failures.
 */
export class Misbehaviour {
  private behaviour: FakeBehaviour = { ...WELL_BEHAVED };
  private state: number;

  constructor(seed = 0x9e3779b9) {
    this.state = seed >>> 0 || 1;
  }

  get current(): FakeBehaviour {
    return { ...this.behaviour };
  }

  set(next: Partial<FakeBehaviour>): FakeBehaviour {
    this.behaviour = { ...this.behaviour, ...next };
    return this.current;
  }

  private nextUnit(): number {
    // Marsaglia (2003), xorshift32 with shifts 13, 17, 5.
    let x = this.state;
    x ^= x << 13;
    x ^= x >>> 17;
    x ^= x << 5;
    this.state = x >>> 0;
    return this.state / 4294967296;
  }

  verdict(): FakeVerdict {
    const { failureRate, failAfterStoring } = this.behaviour;
    if (failureRate <= 0 || this.nextUnit() >= failureRate) return "accept";
    return failAfterStoring ? "store-then-refuse" : "refuse";
  }

  /** Waits the configured delay (a slow provider). */
  async delay(): Promise<void> {
    if (this.behaviour.delayMs > 0) await new Promise((resolve) => setTimeout(resolve, this.behaviour.delayMs));
  }
}

/** Trigger ids a message names in its Bellwether header ("12" or "12,13"). */
export function triggerIdsFromHeader(value: string | string[] | undefined | null): number[] {
  const text = Array.isArray(value) ? value.join(",") : (value ?? "");
  return text
    .split(",")
    .map((part) => Number(part.trim()))
    .filter((n) => Number.isInteger(n) && n > 0);
}

export const TRIGGER_HEADER = "x-bellwether-trigger";
export const IDEMPOTENCY_HEADER = "idempotency-key";
