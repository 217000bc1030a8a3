import { describe, expect, it } from 'vitest';
import {
  formatDifference,
  formatReading,
  isMarkedDifference,
  readingDifference,
} from './reading-format';

describe('difference between a reading and the known-good board', () => {
  it('reads 0.400 V against a known-good 0.336 V as about 19 % high', () => {
    // shared/reference/FACTS.md §9 (common practice): "0.400 V where a good board reads 0.336 V,
    // about 19 % high"; (0.400 − 0.336) / 0.336 = 0.1905 by hand.
    const difference = readingDifference(0.4, 0.336);
    expect(difference).toBeCloseTo(0.1905, 4);
    expect(formatDifference(difference)).toBe('+19 %');
  });

  it('reads a low diode-mode value as a negative difference', () => {
    // (0.192 − 0.345) / 0.345 = −0.4435 by hand: "about 44 % low".
    expect(formatDifference(readingDifference(0.192, 0.345))).toBe('\u221244 %');
  });

  it('keeps one decimal for small differences', () => {
    // (1.3 − 1.2) / 1.2 = 0.0833 by hand
    expect(formatDifference(readingDifference(1.3, 1.2))).toBe('+8.3 %');
  });

  it('measures against the size of a negative known-good value', () => {
    // (−4.5 − (−5.0)) / 5.0 = +0.1 by hand: 4.5 V below ground is closer to zero than 5 V.
    expect(readingDifference(-4.5, -5)).toBeCloseTo(0.1, 10);
  });

  it('gives no percentage without a known-good value or against zero', () => {
    expect(readingDifference(0.3, null)).toBeNull();
    expect(readingDifference(0.3, 0)).toBeNull();
    expect(formatDifference(null)).toBe('');
  });

  it('writes an equal reading as 0 % without a sign', () => {
    expect(formatDifference(readingDifference(0.336, 0.336))).toBe('0 %');
  });

  it('tints a 19 % difference and leaves a 5 % one plain', () => {
    expect(isMarkedDifference(readingDifference(0.4, 0.336))).toBe(true);
    expect(isMarkedDifference(readingDifference(0.35, 0.336))).toBe(false);
  });
});

describe('reading values with units', () => {
  it('shows diode-mode readings to the millivolt', () => {
    expect(formatReading('diode_v', 0.336)).toBe('0.336 V');
    expect(formatReading('diode_v', 0.4)).toBe('0.400 V');
    expect(formatReading('diode_v', 0.0042)).toBe('0.004 V');
  });

  it('shows voltages with two or three decimals', () => {
    expect(formatReading('voltage_v', 3.3)).toBe('3.30 V');
    expect(formatReading('voltage_v', 0.805)).toBe('0.805 V');
    expect(formatReading('voltage_v', -5)).toBe('\u22125.00 V');
  });

  it('puts resistances in the SI prefix that keeps the value at one or more', () => {
    // SI prefixes: BIPM SI Brochure, 9th ed., table 7 (k = 10³, M = 10⁶, m = 10⁻³).
    expect(formatReading('resistance_ohm', 1.3)).toBe('1.3 Ω');
    expect(formatReading('resistance_ohm', 38)).toBe('38 Ω');
    expect(formatReading('resistance_ohm', 4700)).toBe('4.7 kΩ');
    expect(formatReading('resistance_ohm', 2.2e6)).toBe('2.2 MΩ');
    expect(formatReading('resistance_ohm', 0.05)).toBe('50 mΩ');
    expect(formatReading('resistance_ohm', 0)).toBe('0 Ω');
  });

  it('moves to the next prefix when rounding reaches a thousand', () => {
    expect(formatReading('resistance_ohm', 999.96)).toBe('1 kΩ');
    expect(formatReading('resistance_ohm', 1234.4)).toBe('1.234 kΩ');
  });

  it('leaves a missing value blank', () => {
    expect(formatReading('voltage_v', null)).toBe('');
    expect(formatReading('diode_v', Number.NaN)).toBe('');
  });
});
