// Designators and rail names carry numbers: C2 sorts before C10, VCC_1V8 before VCC_12V.
const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

export const naturalCompare: (a: string, b: string) => number = collator.compare;
