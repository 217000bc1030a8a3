// How a case's meter readings read on screen, and how far a reading sits from the known-good board.
// Common practice (shared/reference/FACTS.md §9): a reading means something only next to the same
// line on a known-good board of the same board number, so the difference is what a reader scans for.
import type { ReadingMode } from '@railyard/shared';

export const readingModeLabel: Record<ReadingMode, string> = {
  diode_v: 'Diode mode',
  resistance_ohm: 'Resistance to ground',
  voltage_v: 'Voltage',
};

/** Short names for tight table cells. */
export const readingModeShort: Record<ReadingMode, string> = {
  diode_v: 'diode',
  resistance_ohm: 'resistance',
  voltage_v: 'voltage',
};

export const readingUnit: Record<ReadingMode, 'V' | 'Ω'> = {
  diode_v: 'V',
  resistance_ohm: 'Ω',
  voltage_v: 'V',
};

/** The order the mode picker lists them in: diode mode is the first check on a dead board. */
export const readingModesInOrder = Object.keys(readingModeLabel) as ReadingMode[];

// U+2212 minus lines up with the digits of the other rows in a tabular column.
const minus = '\u2212';

function signed(text: string, negative: boolean): string {
  return negative ? `${minus}${text}` : text;
}

// A meter in diode mode shows volts to the millivolt, so every diode reading keeps three decimals.
const diodeDigits = new Intl.NumberFormat('en-US', {
  minimumFractionDigits: 3,
  maximumFractionDigits: 3,
  useGrouping: false,
});
const voltDigits = new Intl.NumberFormat('en-US', {
  minimumFractionDigits: 2,
  maximumFractionDigits: 3,
  useGrouping: false,
});
// Four significant digits: what a 4-digit bench meter shows (1.234 kΩ).
const ohmDigits = new Intl.NumberFormat('en-US', {
  maximumSignificantDigits: 4,
  useGrouping: false,
});

// SI prefixes (BIPM SI Brochure, 9th ed., table 7), largest first.
const ohmPrefixes = [
  { factor: 1e6, symbol: 'MΩ' },
  { factor: 1e3, symbol: 'kΩ' },
  { factor: 1, symbol: 'Ω' },
  { factor: 1e-3, symbol: 'mΩ' },
] as const;

function formatOhms(ohms: number): string {
  if (ohms === 0) return '0 Ω';
  // Rounded first, so 999.96 Ω reads 1 kΩ and not "1000 Ω".
  const rounded = Number(Math.abs(ohms).toPrecision(4));
  const prefix = ohmPrefixes.find((p) => rounded >= p.factor * (1 - 1e-9)) ?? ohmPrefixes[3];
  const value = Number((rounded / prefix.factor).toPrecision(4));
  return `${signed(ohmDigits.format(value), ohms < 0)} ${prefix.symbol}`;
}

/** "0.336 V" in diode mode, "3.30 V" for a voltage, "1.2 kΩ" for a resistance; blank for no value. */
export function formatReading(mode: ReadingMode, value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  if (mode === 'resistance_ohm') return formatOhms(value);
  const digits = mode === 'diode_v' ? diodeDigits : voltDigits;
  const text = digits.format(Math.abs(value));
  return `${signed(text, value < 0 && Number(text) !== 0)} V`;
}

/**
 * How far the measured value is from the known-good one, as a fraction of the known-good value
 * (0.19 = 19 % high). Null when there is no known-good value, or it is zero: a percentage of
 * nothing says nothing, and the two values side by side say it all.
 */
export function readingDifference(measured: number, knownGood: number | null): number | null {
  if (knownGood === null || !Number.isFinite(knownGood) || knownGood === 0) return null;
  if (!Number.isFinite(measured)) return null;
  return (measured - knownGood) / Math.abs(knownGood);
}

/** "+19 %", "−44 %", "+8.3 %"; one decimal below 10 %, where a whole percent would hide the step. */
export function formatDifference(fraction: number | null): string {
  if (fraction === null || !Number.isFinite(fraction)) return '';
  const percent = fraction * 100;
  const size = Math.abs(percent);
  const text = size < 10 ? size.toFixed(1) : size.toFixed(0);
  if (Number(text) === 0) return '0 %';
  return `${percent < 0 ? minus : '+'}${text} %`;
}

/**
 * Whether a difference is large enough to tint the row. A display choice, not a diagnostic rule:
 * the FACTS.md §9 example calls 19 % high a clear difference, and a tenth is well below that.
 */
export function isMarkedDifference(fraction: number | null): boolean {
  return fraction !== null && Math.abs(fraction) >= 0.1;
}
