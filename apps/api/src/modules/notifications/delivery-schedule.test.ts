import { describe, expect, it } from 'vitest';
import { digestDayStart, retryDelayMs } from './delivery-schedule';

const minute = 60_000;

describe('retryDelayMs', () => {
  // common practice: exponential backoff, the wait doubling per failure up to a cap
  // (RFC 6298 §5.5 doubles TCP's retransmission timer the same way, "back off the timer" — section from memory)
  it('doubles the wait after each failure, starting from the base', () => {
    const policy = { baseDelayMs: minute, maxDelayMs: 6 * 60 * minute };
    expect([1, 2, 3, 4, 5].map((n) => retryDelayMs(n, policy) / minute)).toEqual([1, 2, 4, 8, 16]);
  });

  it('never waits longer than the cap', () => {
    const policy = { baseDelayMs: minute, maxDelayMs: 6 * 60 * minute };
    // 2^9 = 512 minutes > 360: the 10th failure is capped, and so is an absurd count
    expect(retryDelayMs(10, policy)).toBe(360 * minute);
    expect(retryDelayMs(10_000, policy)).toBe(360 * minute);
  });

  it('refuses a failure count below one, saying which value it got', () => {
    expect(() => retryDelayMs(0)).toThrow(/failedAttempts must be a whole number from 1, got 0/);
  });
});

describe('digestDayStart', () => {
  // expected values worked out by hand on the UTC calendar [calc]
  it('starts the day at the digest hour when the clock is past it', () => {
    expect(digestDayStart(new Date('2026-03-10T09:15:00Z'), 7).toISOString()).toBe(
      '2026-03-10T07:00:00.000Z',
    );
  });

  it('belongs to the previous day before the digest hour', () => {
    expect(digestDayStart(new Date('2026-03-10T06:59:59Z'), 7).toISOString()).toBe(
      '2026-03-09T07:00:00.000Z',
    );
  });

  it('goes back across a month and a leap day', () => {
    expect(digestDayStart(new Date('2028-03-01T00:30:00Z'), 7).toISOString()).toBe(
      '2028-02-29T07:00:00.000Z',
    );
    expect(digestDayStart(new Date('2027-01-01T03:00:00Z'), 23).toISOString()).toBe(
      '2026-12-31T23:00:00.000Z',
    );
  });

  it('counts exactly the digest hour as the start of the new day', () => {
    expect(digestDayStart(new Date('2026-03-10T07:00:00Z'), 7).toISOString()).toBe(
      '2026-03-10T07:00:00.000Z',
    );
  });
});
