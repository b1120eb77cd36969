/** How the dispatcher paces and retries sends. */
export interface RetryPolicy {
  maxAttempts: number;
  baseDelayMs: number;
  maxDelayMs: number;
}

/**
 * Delay before the next try after `attempts` failed ones: base × 2^(attempts − 1), capped
 * (exponential back-off; common practice, no single source). No jitter: one office sends few
 * messages, and a predictable schedule is easier to read on the delivery screen.
 */
export function retryDelayMs(policy: RetryPolicy, attempts: number): number {
  return Math.min(policy.maxDelayMs, policy.baseDelayMs * 2 ** Math.max(0, attempts - 1));
}
