// How quantities read on screen. Values a technician compares against a meter get fixed decimals.

const countFormat = new Intl.NumberFormat('en-US');

export function formatCount(value: number): string {
  return countFormat.format(value);
}

/** "3.30 V"; blank when the voltage is not known. */
export function formatVolts(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  // U+2212 minus lines up with the digits of the other rows in a tabular column.
  const text = Math.abs(value).toFixed(2);
  const negative = value < 0 && text !== '0.00';
  return `${negative ? '\u2212' : ''}${text} V`;
}

const byteUnits = ['B', 'KB', 'MB', 'GB'] as const;

export function formatBytes(bytes: number): string {
  let value = bytes;
  let unit = 0;
  while (value >= 1024 && unit < byteUnits.length - 1) {
    value /= 1024;
    unit += 1;
  }
  return `${unit === 0 ? value : value.toFixed(1)} ${byteUnits[unit]}`;
}

export function formatPercent(fraction: number): string {
  return `${Math.round(Math.min(1, Math.max(0, fraction)) * 100)}%`;
}

// SI prefixes a capacitor value is read in, largest first (BIPM SI Brochure, 9th ed., table 7).
// µ is U+00B5, as printed on parts lists and datasheets.
const capacitancePrefixes = [
  { factor: 1e-3, symbol: 'mF' },
  { factor: 1e-6, symbol: 'µF' },
  { factor: 1e-9, symbol: 'nF' },
  { factor: 1e-12, symbol: 'pF' },
] as const;

const capacitanceDigits = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 3 });

/** "47.3 µF", "470 nF", "4.7 pF": three significant digits in the largest prefix that keeps ≥ 1. */
export function formatFarads(farads: number): string {
  if (!Number.isFinite(farads)) return '';
  if (farads === 0) return '0 F';
  // Rounded first, so 999.7 nF reads 1 µF and not "1,000 nF".
  const rounded = Number(farads.toPrecision(3));
  const magnitude = Math.abs(rounded);
  const prefix =
    capacitancePrefixes.find((p) => magnitude >= p.factor * (1 - 1e-9)) ?? capacitancePrefixes[3];
  const value = rounded / prefix.factor;
  return `${capacitanceDigits.format(Number(value.toPrecision(3)))} ${prefix.symbol}`;
}
