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
