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

// SI prefixes (BIPM SI Brochure, 9th ed., table 7), largest first. µ is U+00B5, as printed on parts
// lists and datasheets.
const siPrefixes = [
  { factor: 1e6, symbol: 'M' },
  { factor: 1e3, symbol: 'k' },
  { factor: 1, symbol: '' },
  { factor: 1e-3, symbol: 'm' },
  { factor: 1e-6, symbol: 'µ' },
  { factor: 1e-9, symbol: 'n' },
  { factor: 1e-12, symbol: 'p' },
] as const;
type SiPrefix = (typeof siPrefixes)[number];

const threeDigits = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 3 });

/** Three significant digits in the largest of `prefixes` that keeps the number at 1 or more. */
function formatWithPrefix(value: number, unit: string, prefixes: readonly SiPrefix[]): string {
  if (!Number.isFinite(value)) return '';
  if (value === 0) return `0 ${unit}`;
  // Rounded first, so 999.7 nF reads 1 µF and not "1,000 nF".
  const rounded = Number(value.toPrecision(3));
  const magnitude = Math.abs(rounded);
  const smallest = prefixes[prefixes.length - 1] as SiPrefix;
  const prefix = prefixes.find((p) => magnitude >= p.factor * (1 - 1e-9)) ?? smallest;
  const scaled = Number((rounded / prefix.factor).toPrecision(3));
  const text = threeDigits.format(Math.abs(scaled));
  // U+2212 minus, as formatVolts writes it
  return `${scaled < 0 ? '\u2212' : ''}${text} ${prefix.symbol}${unit}`;
}

/** "47.3 µF", "470 nF", "4.7 pF": capacitor values, from mF down. */
export function formatFarads(farads: number): string {
  return formatWithPrefix(farads, 'F', siPrefixes.slice(3));
}

/** "500 mA", "2.2 Ω", "4.95 W", "1.5 kΩ": any quantity in its SI unit with a prefix from M down to p. */
export function formatSi(value: number, unit: string): string {
  return formatWithPrefix(value, unit, siPrefixes);
}
