import { describe, expect, it } from 'vitest';
import { formatMinutes, readMinutes } from './time-spent';

describe('time a repair took', () => {
  it('reads every common way of writing one hour and 35 minutes as 95 minutes', () => {
    // 1 h = 60 min, so 1 h 35 min = 95 min
    for (const text of ['95', '1:35', '1 h 35 min', '1h35m', '1 hour 35 minutes', ' 1h 35 ']) {
      expect(readMinutes(text), text).toEqual({ ok: true, minutes: 95 });
    }
  });

  it('reads hours alone and minutes alone', () => {
    expect(readMinutes('2h')).toEqual({ ok: true, minutes: 120 });
    expect(readMinutes('40 min')).toEqual({ ok: true, minutes: 40 });
  });

  it('reads a blank field as not recorded', () => {
    expect(readMinutes('')).toEqual({ ok: true, minutes: null });
  });

  it('refuses fractions and clock times with 60 or more minutes', () => {
    expect(readMinutes('1.5').ok).toBe(false);
    expect(readMinutes('1:75').ok).toBe(false);
    expect(readMinutes('soon').ok).toBe(false);
  });

  it('writes minutes back in hours and minutes', () => {
    expect(formatMinutes(95)).toBe('1 h 35 min');
    expect(formatMinutes(30)).toBe('30 min');
    expect(formatMinutes(120)).toBe('2 h');
    expect(formatMinutes(0)).toBe('0 min');
    expect(formatMinutes(null)).toBe('');
  });
});
