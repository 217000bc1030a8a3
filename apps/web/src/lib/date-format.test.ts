import { describe, expect, it } from 'vitest';
import { formatDateTime } from './date-format';

describe('date and time format', () => {
  it('writes a UTC moment in ISO 8601 order with a 24-hour clock', () => {
    expect(formatDateTime('2025-03-01T22:05:00.000Z', 'UTC')).toBe('2025-03-01 22:05');
  });

  it('moves the moment into the given time zone, across midnight', () => {
    // IANA tz database: Asia/Kolkata is UTC+05:30 all year (no daylight saving); from memory.
    expect(formatDateTime('2025-03-01T22:05:00.000Z', 'Asia/Kolkata')).toBe('2025-03-02 03:35');
  });

  it('leaves a missing or unreadable time blank', () => {
    expect(formatDateTime(null)).toBe('');
    expect(formatDateTime('not a date')).toBe('');
  });
});
