import { describe, expect, it } from 'vitest';
import { formatFarads } from './quantity-format';

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
