// Natural order of pin names, the order a datasheet's pin table reads in: 2 before 10, A2 before A10
// (ball grids). PostgreSQL's text order puts 10 before 2; ICU's numeric collation (ECMA-402
// Intl.Collator, built into Node) compares runs of digits by value.
const natural = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

/**
 * Compares pin names by the numeric collation, ignoring letter case. Names it calls equal (01 and 1,
 * a1 and A1) fall back to plain text order, so the order is total and the same on every run.
 */
export function comparePins(a: string, b: string): number {
  return natural.compare(a, b) || (a < b ? -1 : a > b ? 1 : 0);
}
