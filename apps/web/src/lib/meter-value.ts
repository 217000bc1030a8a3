// Reads a value as technicians write it down from a meter: "0.336", "0,336", "336 mV", "4.7k",
// and for resistances also the IEC 60062 letter-and-digit code ("4K7", "R47", "1L5"), where the
// letter stands in for the decimal point. Case matters, as in IEC 60062 and the SI: m is milli, M mega.
import type { ReadingMode } from '@railyard/shared';

/** What the value measures: a reading mode of a case, or a bench supply's current limit (amps). */
export type MeterQuantity = ReadingMode | 'current_a';

export type MeterValue = { ok: true; value: number | null } | { ok: false; error: string };

// Far inside what any bench meter shows; the API refuses anything beyond (packages/shared casebook.ts).
const largest = 1e9;

// SI prefixes as exponents (BIPM SI Brochure, 9th ed., table 7); K is the common slip for k.
const prefixExponent: Record<string, number> = { m: -3, k: 3, K: 3, M: 6, G: 9 };
// IEC 60062 resistance letters: L 10⁻³, R 1, K 10³, M 10⁶, G 10⁹ (k and m as people also write them).
const rkmExponent: Record<string, number> = { L: -3, m: -3, R: 0, r: 0, K: 3, k: 3, M: 6, G: 9 };

const plainNumber = /^(\d+(?:\.\d*)?|\.\d+)(?:e([+-]?\d+))?([mkKMG]?)$/;
const letterCode = /^(\d*)([LmRrKkMG])(\d*)$/;

function hint(mode: MeterQuantity): string {
  if (mode === 'current_a') return 'e.g. 0.5 or 500m';
  return mode === 'resistance_ohm' ? 'e.g. 38, 1.2k or 4K7' : 'e.g. 0.336';
}

/** Drops the unit a technician may have typed after the number. */
function withoutUnit(text: string, mode: MeterQuantity): string {
  if (mode === 'resistance_ohm') return text.replace(/(?:Ω|ohms?)$/i, '');
  if (mode === 'current_a') return text.replace(/A$/, '');
  return text.replace(/[Vv]$/, '');
}

/** Blank reads as "no value" (null); whether one is required is for the caller to say. */
export function readMeterValue(raw: string, mode: MeterQuantity): MeterValue {
  let text = raw.trim().replace(/\s+/g, '');
  if (text === '') return { ok: true, value: null };
  let negative = false;
  if (/^[-\u2212+]/.test(text)) {
    negative = text[0] !== '+';
    text = text.slice(1);
  }
  text = withoutUnit(text, mode);
  // A decimal comma, as many meters and notebooks in Europe write it; with a point as well it is
  // a thousands separator or a typo, and guessing which would be worse than asking.
  if (text.includes(',')) {
    if (text.includes('.') || text.split(',').length > 2) {
      return { ok: false, error: `write one decimal separator, ${hint(mode)}` };
    }
    text = text.replace(',', '.');
  }

  let mantissa: string | null = null;
  let exponent = 0;
  const plain = plainNumber.exec(text);
  if (plain) {
    const [, digits = '', power, prefix = ''] = plain;
    if (power !== undefined && prefix !== '') {
      return { ok: false, error: `write an exponent or a prefix, not both, ${hint(mode)}` };
    }
    mantissa = digits;
    exponent = power !== undefined ? Number(power) : (prefixExponent[prefix] ?? 0);
  } else if (mode === 'resistance_ohm') {
    const code = letterCode.exec(text);
    if (code && `${code[1]}${code[3]}` !== '') {
      const [, whole = '', letter = 'R', fraction = ''] = code;
      mantissa = `${whole || '0'}.${fraction || '0'}`;
      exponent = rkmExponent[letter] ?? 0;
    }
  }
  if (mantissa === null) return { ok: false, error: `not a number: ${hint(mode)}` };

  // Joined as text so 336 mV is exactly 0.336, not 336 × 0.001 with a binary rounding tail.
  const value = Number(`${negative ? '-' : ''}${mantissa}e${exponent}`);
  if (!Number.isFinite(value) || Math.abs(value) > largest) {
    return { ok: false, error: 'too large for a meter reading' };
  }
  return { ok: true, value: value === 0 ? 0 : value };
}
