// When to try a notification again, and which day a digest belongs to. Pure time arithmetic, so the
// worker can be driven by an injected clock in tests.

export interface RetryPolicy {
  /** wait after the first failed attempt */
  baseDelayMs: number;
  /** no wait grows beyond this */
  maxDelayMs: number;
}

export const defaultRetryPolicy: RetryPolicy = { baseDelayMs: 60_000, maxDelayMs: 6 * 60 * 60_000 };

/**
 * Wait before the next attempt after `failedAttempts` failures (1 or more): the base doubled per
 * failure, capped (common practice: exponential backoff). No jitter: one worker per process sends
 * few mails, and a predictable schedule is easier to read in the outbox.
 */
export function retryDelayMs(
  failedAttempts: number,
  policy: RetryPolicy = defaultRetryPolicy,
): number {
  if (!Number.isInteger(failedAttempts) || failedAttempts < 1) {
    throw new RangeError(`failedAttempts must be a whole number from 1, got ${failedAttempts}`);
  }
  // 2 ** 40 already overflows any sensible cap; keeps the arithmetic finite for absurd inputs
  return Math.min(policy.maxDelayMs, policy.baseDelayMs * 2 ** Math.min(failedAttempts - 1, 40));
}

/** The start of the digest day `now` falls in: the latest `hourUtc`:00 UTC at or before `now`. */
export function digestDayStart(now: Date, hourUtc: number): Date {
  if (!Number.isInteger(hourUtc) || hourUtc < 0 || hourUtc > 23) {
    throw new RangeError(`hourUtc must be a whole hour from 0 to 23, got ${hourUtc}`);
  }
  const start = new Date(
    Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate(), hourUtc),
  );
  if (start.getTime() > now.getTime()) start.setUTCDate(start.getUTCDate() - 1);
  return start;
}
