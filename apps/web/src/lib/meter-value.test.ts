import { describe, expect, it } from 'vitest';
import { readMeterValue } from './meter-value';

function valueOf(text: string, mode: Parameters<typeof readMeterValue>[1]) {
  const read = readMeterValue(text, mode);
  if (!read.ok) throw new Error(`${text} was refused: ${read.error}`);
  return read.value;
}

describe('reading a typed meter value', () => {
  it('reads the IEC 60062 resistance check values', () => {
    // shared/reference/FACTS.md §2 [doc]: R47 = 0.47 Ω, 4R7 = 4.7 Ω, 1R0 = 1.0 Ω, 470R = 470 Ω,
    // 4K7 = 4.7 kΩ, 47K3 = 47.3 kΩ, 2M2 = 2.2 MΩ, 97R6 = 97.6 Ω, 9K76 = 9.76 kΩ, 1L5 = 1.5 mΩ.
    expect(valueOf('R47', 'resistance_ohm')).toBe(0.47);
    expect(valueOf('4R7', 'resistance_ohm')).toBe(4.7);
    expect(valueOf('1R0', 'resistance_ohm')).toBe(1);
    expect(valueOf('470R', 'resistance_ohm')).toBe(470);
    expect(valueOf('4K7', 'resistance_ohm')).toBe(4700);
    expect(valueOf('47K3', 'resistance_ohm')).toBe(47300);
    expect(valueOf('2M2', 'resistance_ohm')).toBe(2.2e6);
    expect(valueOf('97R6', 'resistance_ohm')).toBe(97.6);
    expect(valueOf('9K76', 'resistance_ohm')).toBe(9760);
    expect(valueOf('1L5', 'resistance_ohm')).toBeCloseTo(1.5e-3, 12);
  });

  it('reads SI prefixes after the number, where case tells milli from mega', () => {
    // BIPM SI Brochure, 9th ed., table 7: m = 10⁻³, k = 10³, M = 10⁶.
    expect(valueOf('4.7k', 'resistance_ohm')).toBe(4700);
    expect(valueOf('2.2M', 'resistance_ohm')).toBe(2.2e6);
    expect(valueOf('50m', 'resistance_ohm')).toBe(0.05);
    expect(valueOf('336 mV', 'diode_v')).toBe(0.336);
  });

  it('takes the unit as typed and a decimal comma', () => {
    expect(valueOf('0,336', 'diode_v')).toBe(0.336);
    expect(valueOf('3.31 V', 'voltage_v')).toBe(3.31);
    expect(valueOf('38 Ω', 'resistance_ohm')).toBe(38);
    expect(valueOf('1.3ohm', 'resistance_ohm')).toBe(1.3);
  });

  it('keeps the sign of a negative voltage, typed with either minus', () => {
    expect(valueOf('-5', 'voltage_v')).toBe(-5);
    expect(valueOf('\u22120.8', 'voltage_v')).toBe(-0.8);
  });

  it('reads a blank field as no value', () => {
    expect(valueOf('  ', 'diode_v')).toBeNull();
  });

  it('refuses text that is not a number, saying what would do', () => {
    const read = readMeterValue('OL', 'diode_v');
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.error).toMatch(/not a number.*0\.336/);
  });

  it('refuses the letter code outside resistance, where K7 would mean nothing', () => {
    expect(readMeterValue('4K7', 'voltage_v').ok).toBe(false);
  });

  it('refuses a value with two decimal separators instead of guessing', () => {
    expect(readMeterValue('1,234.5', 'resistance_ohm').ok).toBe(false);
  });

  it('refuses values beyond what the API accepts', () => {
    // packages/shared/src/casebook.ts: meter values lie within ±1e9
    expect(readMeterValue('2G', 'resistance_ohm').ok).toBe(false);
    expect(valueOf('1G', 'resistance_ohm')).toBe(1e9);
  });

  it('reads a supply current limit with its unit or an SI prefix (BIPM SI Brochure, table 7)', () => {
    expect(valueOf('1.5', 'current_a')).toBe(1.5);
    expect(valueOf('1.5 A', 'current_a')).toBe(1.5);
    expect(valueOf('500m', 'current_a')).toBe(0.5);
    expect(valueOf('500 mA', 'current_a')).toBe(0.5);
    expect(valueOf('0,25', 'current_a')).toBe(0.25);
    const read = readMeterValue('1R5', 'current_a');
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.error).toMatch(/500m/);
  });
});
