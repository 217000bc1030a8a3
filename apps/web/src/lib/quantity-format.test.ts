import { describe, expect, it } from 'vitest';
import { formatFarads, formatSi } from './quantity-format';

describe('capacitance format', () => {
  // IEC 60062 check values (shared/reference/FACTS.md §2): 4n7 = 4.7 nF, 4p7 = 4.7 pF,
  // 2m2 = 2.2 mF; 4u7 = 4.7 µF is from memory there.
  it('reads the IEC 60062 check values in their own prefix', () => {
    expect(formatFarads(4.7e-9)).toBe('4.7 nF');
    expect(formatFarads(4.7e-12)).toBe('4.7 pF');
    expect(formatFarads(2.2e-3)).toBe('2.2 mF');
    expect(formatFarads(4.7e-6)).toBe('4.7 µF');
  });

  it('sums read as three significant digits without floating-point noise', () => {
    // 0.1 + 0.2 is 0.30000000000000004 in binary floating point (IEEE 754 double)
    expect(formatFarads((0.1 + 0.2) * 1e-6)).toBe('300 nF');
    expect(formatFarads(10e-6 + 22e-6 + 15 * 1e-6 + 0.3e-6)).toBe('47.3 µF');
    expect(formatFarads(165.00088e-6)).toBe('165 µF');
  });

  it('moves to the next prefix when rounding reaches a thousand', () => {
    expect(formatFarads(999.7e-9)).toBe('1 µF');
    expect(formatFarads(999.4e-9)).toBe('999 nF');
  });

  it('writes zero as 0 F and leaves a value that is not a number blank', () => {
    expect(formatFarads(0)).toBe('0 F');
    expect(formatFarads(Number.NaN)).toBe('');
  });
});

// Prefixes from the BIPM SI Brochure, 9th ed., table 7.
describe('SI quantity format', () => {
  it('writes each quantity in the largest prefix that keeps it at 1 or more', () => {
    expect(formatSi(0.5, 'A')).toBe('500 mA');
    expect(formatSi(2, 'A')).toBe('2 A');
    expect(formatSi(0.05, 'Ω')).toBe('50 mΩ');
    expect(formatSi(4700, 'Ω')).toBe('4.7 kΩ');
    expect(formatSi(2.2e6, 'Ω')).toBe('2.2 MΩ');
    expect(formatSi(0.45, 'W')).toBe('450 mW');
    expect(formatSi(4.95, 'W')).toBe('4.95 W');
  });

  it('keeps three significant digits and moves up a prefix when rounding reaches a thousand', () => {
    expect(formatSi(1 / 3, 'A')).toBe('333 mA');
    expect(formatSi(0.9996, 'W')).toBe('1 W');
    expect(formatSi(0.1 + 0.2, 'V')).toBe('300 mV');
  });

  it('writes zero without a prefix and a negative value with the minus sign', () => {
    expect(formatSi(0, 'W')).toBe('0 W');
    expect(formatSi(-1.8, 'V')).toBe('\u22121.8 V');
  });
});
