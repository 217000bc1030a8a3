import { describe, expect, it } from 'vitest';
import { kindHint, parseComponentValue } from './value-code';

/** Compares in the value's own decade so 4.7e-12 and 4.7e6 get the same relative precision. */
function expectValue(
  text: string,
  expected: number,
  unit: string,
  kind?: Parameters<typeof parseComponentValue>[1],
) {
  const parsed = parseComponentValue(text, kind);
  expect(parsed.unit).toBe(unit);
  expect(parsed.magnitude).not.toBeNull();
  if (expected === 0) {
    expect(parsed.magnitude).toBe(0);
    return;
  }
  const scale = 10 ** Math.floor(Math.log10(Math.abs(expected)));
  expect((parsed.magnitude ?? Number.NaN) / scale).toBeCloseTo(expected / scale, 10);
}

describe('IEC 60062 letter-and-digit code', () => {
  // IEC 60062:2016 check values as reproduced in resistor and capacitor datasheets
  it.each([
    ['R47', 0.47, 'ohm'],
    ['4R7', 4.7, 'ohm'],
    ['1R0', 1.0, 'ohm'],
    ['470R', 470, 'ohm'],
    ['4K7', 4.7e3, 'ohm'],
    ['47K3', 47.3e3, 'ohm'],
    ['2M2', 2.2e6, 'ohm'],
    ['97R6', 97.6, 'ohm'],
    ['9K76', 9.76e3, 'ohm'],
    ['4n7', 4.7e-9, 'F'],
    ['1L5', 1.5e-3, 'ohm'],
    ['4p7', 4.7e-12, 'F'],
    ['p68', 0.68e-12, 'F'],
  ])('reads %s as %f %s', (text, value, unit) => {
    expectValue(text, value, unit);
  });

  it('reads 4u7 as 4.7 µF (IEC 60062 capacitance letter µ written u; check value from memory)', () => {
    expectValue('4u7', 4.7e-6, 'F');
  });

  it('tells 2M2 (2.2 MΩ) from 2m2 (2.2 mF) because case matters', () => {
    // IEC 60062: M is the resistance multiplier 10⁶, m the capacitance multiplier 10⁻³
    expectValue('2M2', 2.2e6, 'ohm');
    expectValue('2m2', 2.2e-3, 'F');
  });

  it('reads 0R and "0 ohm" as a zero-ohm link', () => {
    // IEC 60062 / chip resistor datasheets: 0R is a jumper specified under 50 mΩ
    expectValue('0R', 0, 'ohm');
    expectValue('0 ohm', 0, 'ohm');
    expectValue('0R', 0, 'ohm', 'inductor');
  });

  it('reads 4K7J as 4.7 kΩ ±5 % (IEC 60062 example)', () => {
    const parsed = parseComponentValue('4K7J');
    expect(parsed.magnitude).toBeCloseTo(4700, 9);
    expect(parsed.unit).toBe('ohm');
    expect(parsed.tolerance).toBeCloseTo(0.05, 12);
    expect(parsed.toleranceMinus).toBeCloseTo(0.05, 12);
  });

  // IEC 60062 tolerance letters
  it.each([
    ['B', 0.001],
    ['C', 0.0025],
    ['D', 0.005],
    ['F', 0.01],
    ['G', 0.02],
    ['J', 0.05],
    ['K', 0.1],
    ['M', 0.2],
    ['N', 0.3],
  ])('reads tolerance letter %s after a resistance code as ±%f', (letter, fraction) => {
    const parsed = parseComponentValue(`10K${letter}`);
    expect(parsed.magnitude).toBeCloseTo(10_000, 9);
    expect(parsed.tolerance).toBeCloseTo(fraction, 12);
  });

  it('reads tolerance letter H as ±3 % (IEC 60062, from memory)', () => {
    expect(parseComponentValue('4K7H').tolerance).toBeCloseTo(0.03, 12);
  });

  it('reads tolerance letter Z as +80/−20 % on a capacitor', () => {
    // IEC 60062: Z = +80 / −20 %
    const parsed = parseComponentValue('100nZ');
    expectValue('100nZ', 100e-9, 'F');
    expect(parsed.tolerance).toBeCloseTo(0.8, 12);
    expect(parsed.toleranceMinus).toBeCloseTo(0.2, 12);
  });

  it('reads B, C, D after a capacitance below 10 pF as picofarads, kept absolute and as a fraction', () => {
    // IEC 60062: for small capacitors B, C, D are ±0.1, ±0.25, ±0.5 pF
    const c = parseComponentValue('4p7C');
    expect((c.toleranceAbsolute ?? 0) * 1e12).toBeCloseTo(0.25, 10);
    expect(c.tolerance).toBeCloseTo(0.25 / 4.7, 10);
    expect((parseComponentValue('1p0B').toleranceAbsolute ?? 0) * 1e12).toBeCloseTo(0.1, 10);
    expect((parseComponentValue('2p2D').toleranceAbsolute ?? 0) * 1e12).toBeCloseTo(0.5, 10);
  });

  it('reads F after a capacitance below 10 pF as ±1 pF (IEC 60062, from memory)', () => {
    // 4p7F: F directly after the code would be the unit; the tolerance letter follows the unit
    expect((parseComponentValue('4p7FF').toleranceAbsolute ?? 0) * 1e12).toBeCloseTo(1, 10);
  });

  it('keeps C as a percentage on a capacitance of 10 pF and more', () => {
    // IEC 60062: the picofarad tolerances apply below 10 pF only
    const parsed = parseComponentValue('47pC');
    expect(parsed.toleranceAbsolute).toBeNull();
    expect(parsed.tolerance).toBeCloseTo(0.0025, 12);
  });

  it('reads F after a resistance code as the ±1 % letter and after a capacitance code as the unit', () => {
    // IEC 60062 letter F = ±1 %; "47KF" cannot be kilofarads
    const resistor = parseComponentValue('47KF');
    expect(resistor.unit).toBe('ohm');
    expect(resistor.tolerance).toBeCloseTo(0.01, 12);
    const capacitor = parseComponentValue('4n7F');
    expectValue('4n7F', 4.7e-9, 'F');
    expect(capacitor.tolerance).toBeNull();
  });
});

describe('SI-prefixed values', () => {
  // SI prefixes (BIPM SI Brochure, 9th edition): p 10⁻¹², n 10⁻⁹, µ 10⁻⁶, m 10⁻³, k 10³, M 10⁶
  it.each([
    ['100nF', 100e-9, 'F'],
    ['22uF', 22e-6, 'F'],
    ['22µF', 22e-6, 'F'],
    ['22μF', 22e-6, 'F'],
    ['10k', 10e3, 'ohm'],
    ['4.7kΩ', 4.7e3, 'ohm'], // Greek capital omega U+03A9
    ['4.7k\u2126', 4.7e3, 'ohm'], // ohm sign U+2126
    ['10 kohm', 10e3, 'ohm'],
    ['10KOHM', 10e3, 'ohm'],
    ['1uH', 1e-6, 'H'],
    ['32.768kHz', 32.768e3, 'Hz'],
    ['24MHz', 24e6, 'Hz'],
    ['2A', 2, 'A'],
    ['500mA', 0.5, 'A'],
    ['100NF', 100e-9, 'F'],
    ['4.7UH', 4.7e-6, 'H'],
    ['4,7k', 4.7e3, 'ohm'],
    ['0.47R', 0.47, 'ohm'],
  ])('reads %s as %f %s', (text, value, unit) => {
    expectValue(text, value, unit);
  });

  it('reads a tolerance written after the value, with or without ±', () => {
    expect(parseComponentValue('10k 1%').tolerance).toBeCloseTo(0.01, 12);
    expect(parseComponentValue('10k ±1%').tolerance).toBeCloseTo(0.01, 12);
    expect(parseComponentValue('10k +/-5%').tolerance).toBeCloseTo(0.05, 12);
    expect(parseComponentValue('100nF ±0.25pF').toleranceAbsolute).not.toBeNull();
  });

  it('reads an asymmetric band +80/−20 % and reports both sides', () => {
    const parsed = parseComponentValue('100n +80/-20%');
    expect(parsed.tolerance).toBeCloseTo(0.8, 12);
    expect(parsed.toleranceMinus).toBeCloseTo(0.2, 12);
  });

  it('reads the voltage rating after a capacitance', () => {
    const slash = parseComponentValue('22uF/6.3V');
    expectValue('22uF/6.3V', 22e-6, 'F');
    expect(slash.ratedVoltage).toBeCloseTo(6.3, 12);
    const spaced = parseComponentValue('100nF 16V X5R');
    expectValue('100nF 16V X5R', 100e-9, 'F');
    expect(spaced.ratedVoltage).toBe(16);
    const full = parseComponentValue('10uF 10% 25V 0805');
    expect(full.tolerance).toBeCloseTo(0.1, 12);
    expect(full.ratedVoltage).toBe(25);
    // common practice: the letter-as-decimal-point habit in voltage ratings, 6V3 = 6.3 V
    expect(parseComponentValue('10uF 6V3').ratedVoltage).toBeCloseTo(6.3, 12);
  });

  it('reads a zener-style voltage code 5V1 as 5.1 V without a rating', () => {
    // common practice on zener and clamp diodes, same idea as IEC 60062
    const parsed = parseComponentValue('5V1');
    expect(parsed.unit).toBe('V');
    expect(parsed.magnitude).toBeCloseTo(5.1, 12);
    expect(parsed.ratedVoltage).toBeNull();
  });
});

describe('plain numbers and unreadable text', () => {
  it('gives a bare number without a kind a magnitude but no unit', () => {
    const parsed = parseComponentValue('470');
    expect(parsed.magnitude).toBe(470);
    expect(parsed.unit).toBeNull();
  });

  it('gives a bare number on a resistor the unit ohm, and none on a capacitor', () => {
    // common practice: "470" in a resistor's value field means 470 Ω; on a capacitor it is ambiguous
    expect(parseComponentValue('470', 'resistor').unit).toBe('ohm');
    expect(parseComponentValue('0', 'resistor').unit).toBe('ohm');
    expect(parseComponentValue('100', 'capacitor').unit).toBeNull();
  });

  it.each([
    'DNP',
    'NC',
    '2N7002',
    '1N4148',
    '74HC04',
    'LDO 3.3',
    '',
    '   ',
    '±1%',
    '4N7',
    'R',
    'k',
    '10kk',
  ])('keeps %j as written with nulls', (text) => {
    const parsed = parseComponentValue(text);
    expect(parsed.text).toBe(text.trim());
    expect(parsed.magnitude).toBeNull();
    expect(parsed.unit).toBeNull();
    expect(parsed.tolerance).toBeNull();
    expect(parsed.ratedVoltage).toBeNull();
  });

  it('trims the text it keeps', () => {
    expect(parseComponentValue('  4K7 ').text).toBe('4K7');
  });
});

describe('the kind decides the quantity of a code without a unit', () => {
  it('reads 4u7 and 470n on an inductor as henry', () => {
    // common practice: inductor values written with the capacitance letters
    expectValue('4u7', 4.7e-6, 'H', 'inductor');
    expectValue('470n', 470e-9, 'H', 'inductor');
  });

  it('reads R as the decimal point in microhenries on an inductor', () => {
    // common practice in inductor marking: 4R7 = 4.7 µH, R47 = 0.47 µH
    expectValue('4R7', 4.7e-6, 'H', 'inductor');
    expectValue('R47', 0.47e-6, 'H', 'inductor');
  });

  it('reads a ferrite bead rated in ohms as ohm', () => {
    // common practice: beads are specified by impedance at 100 MHz, "600R@100MHz"
    expectValue('600R@100MHz', 600, 'ohm', 'ferrite');
  });

  it('reads k and M on a crystal as hertz', () => {
    expectValue('32k768', 32.768e3, 'Hz', 'crystal');
    expectValue('24M', 24e6, 'Hz', 'crystal');
  });

  it('reads m on a resistor as milliohm, m on a fuse as milliampere', () => {
    // common practice for current-sense shunts and fuse ratings
    expectValue('2m2', 2.2e-3, 'ohm', 'resistor');
    expectValue('500m', 0.5, 'A', 'fuse');
  });

  it('keeps a resistance letter on a capacitor as a resistance', () => {
    // IEC 60062: K is a resistance multiplier whatever part carries it
    expectValue('4K7', 4.7e3, 'ohm', 'capacitor');
    expect(kindHint(parseComponentValue('4K7', 'capacitor'))).toBe('resistor');
  });

  it('names the kind each unit points at', () => {
    expect(kindHint({ unit: 'F' })).toBe('capacitor');
    expect(kindHint({ unit: 'H' })).toBe('inductor');
    expect(kindHint({ unit: 'Hz' })).toBe('crystal');
    expect(kindHint({ unit: 'V' })).toBeNull();
    expect(kindHint({ unit: null })).toBeNull();
  });
});

describe('IEC 60063 preferred numbers written as codes', () => {
  // IEC 60063 tables
  const e12 = ['1.0', '1.2', '1.5', '1.8', '2.2', '2.7', '3.3', '3.9', '4.7', '5.6', '6.8', '8.2'];
  const e24 = [
    '1.0',
    '1.1',
    '1.2',
    '1.3',
    '1.5',
    '1.6',
    '1.8',
    '2.0',
    '2.2',
    '2.4',
    '2.7',
    '3.0',
    '3.3',
    '3.6',
    '3.9',
    '4.3',
    '4.7',
    '5.1',
    '5.6',
    '6.2',
    '6.8',
    '7.5',
    '8.2',
    '9.1',
  ];

  /**
   * Writes v × 10^decade as an IEC 60062 code by moving the decimal point of v's digits: the letter
   * with the largest multiplier that leaves at least one digit before it (2.7, 0 → 2R7; 1 → 27R;
   * 3 → 2K7; 4 → 27K).
   */
  function codeFor(value: string, decade: number, letters: [number, string][]): string {
    const digits = value.replace('.', '');
    const pointAt = 1 + decade; // digits before the decimal point in the plain number
    const [exponent, letter] = letters.filter(([e]) => pointAt - e >= 1).at(-1) ?? letters[0]!;
    const shift = pointAt - exponent;
    const padded = digits.padEnd(shift, '0');
    const fraction = padded.slice(shift).replace(/0+$/, '');
    return `${padded.slice(0, shift)}${letter}${fraction}`;
  }

  const resistanceLetters: [number, string][] = [
    [-3, 'L'],
    [0, 'R'],
    [3, 'K'],
    [6, 'M'],
    [9, 'G'],
  ];
  const capacitanceLetters: [number, string][] = [
    [-12, 'p'],
    [-9, 'n'],
    [-6, 'u'],
    [-3, 'm'],
  ];

  it('writes the codes the way datasheets do', () => {
    // the code writer of this test against IEC 60062 examples
    expect(codeFor('2.7', 0, resistanceLetters)).toBe('2R7');
    expect(codeFor('2.7', 1, resistanceLetters)).toBe('27R');
    expect(codeFor('2.7', 3, resistanceLetters)).toBe('2K7');
    expect(codeFor('2.7', 4, resistanceLetters)).toBe('27K');
    expect(codeFor('4.7', -9, capacitanceLetters)).toBe('4n7');
    expect(codeFor('6.8', -13, capacitanceLetters)).toBe('p68');
  });

  for (const [seriesName, series] of [
    ['E12', e12],
    ['E24', e24],
  ] as const) {
    it(`parses every ${seriesName} resistance code from 1 mΩ to 9.1 GΩ back to its value`, () => {
      for (const value of series) {
        for (let decade = -3; decade <= 9; decade++) {
          const code = codeFor(value, decade, resistanceLetters);
          const parsed = parseComponentValue(code);
          expect(parsed.unit, code).toBe('ohm');
          expect((parsed.magnitude ?? Number.NaN) / 10 ** decade, code).toBeCloseTo(
            Number(value),
            10,
          );
        }
      }
    });

    it(`parses every ${seriesName} resistance code below 1 Ω written with a leading R`, () => {
      for (const value of series) {
        const code = `R${value.replace('.', '')}`; // 0.27 Ω → R27
        const parsed = parseComponentValue(code);
        expect((parsed.magnitude ?? Number.NaN) * 10, code).toBeCloseTo(Number(value), 10);
      }
    });

    it(`parses every ${seriesName} capacitance code from 0.1 pF to 91 mF back to its value`, () => {
      for (const value of series) {
        for (let decade = -13; decade <= -2; decade++) {
          const code = codeFor(value, decade, capacitanceLetters);
          const parsed = parseComponentValue(code);
          expect(parsed.unit, code).toBe('F');
          expect((parsed.magnitude ?? Number.NaN) / 10 ** decade, code).toBeCloseTo(
            Number(value),
            10,
          );
        }
      }
    });
  }
});
