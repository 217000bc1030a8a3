// Reads the value a parts list or netlist gives a component ("4K7J", "100nF 16V X5R", "22uF/6.3V")
// into a number in SI base units, a tolerance and a rated voltage. Never throws: text it cannot
// read comes back as written with nulls.
//
// Two notations are read:
// - the IEC 60062 letter-and-digit code, where the letter stands in for the decimal point and
//   gives the multiplier (R47, 4K7, 2M2, 1L5, 4n7, p68, 2m2), optionally followed by a unit and
//   an IEC 60062 tolerance letter (4K7J = 4.7 kΩ ±5 %). After a capacitance code an F is read as
//   the unit (4n7F = 4.7 nF), because parts lists write it that way far more often than they mean
//   ±1 %; after a resistance code F is the tolerance (4K7F = 4.7 kΩ ±1 %);
// - decimal numbers with an optional SI prefix and unit (100nF, 4.7kΩ, 10 kohm, 32.768kHz, 2A),
//   including all-capitals lists (100NF) where the capital prefix cannot mean anything else.
// Then a tolerance ("1%", "±5%", "+80/-20%", "±0.25pF") and a voltage rating ("16V", "6V3").
//
// Which quantity a code without a unit measures:
// - The letter's IEC 60062 class decides: R L K M G (and lower-case k, common practice in parts
//   lists) are resistance, p n u µ m F are capacitance. So 2M2 is 2.2 MΩ and 2m2 is 2.2 mF.
// - The part's kind, when given, refines this only where the trade writes values its own way:
//   inductors read p/n/u/m as henry (4u7 = 4.7 µH) and R as a decimal point in microhenries
//   (4R7 = 4.7 µH, inductor marking practice); ferrite beads read p/n/u as henry and
//   resistance letters as ohm (impedance at 100 MHz, as bead datasheets rate them); crystals read
//   k/K/M/G as hertz (32k768, 24M); fuses read m as milliampere; resistors read m as milliohm
//   (current-sense shunts written 2m2 or 10m). A resistance letter on a capacitor is still a
//   resistance: the letter is better evidence than the refdes, and the mismatch is reported by
//   the board assembly rather than hidden by a guess.
// - A plain number without prefix or unit ("470", "0") is ohm on a resistor, hertz on a crystal,
//   ampere on a fuse, and has no unit otherwise (on a capacitor "100" could be pF or µF).
import type { ComponentKind } from '@railyard/shared';

export const valueUnits = ['ohm', 'F', 'H', 'V', 'A', 'Hz'] as const;
export type ValueUnit = (typeof valueUnits)[number];

export interface ParsedValue {
  /** the value as written, trimmed */
  text: string;
  /** in SI base units: ohm, farad, henry, volt, ampere, hertz */
  magnitude: number | null;
  unit: ValueUnit | null;
  /**
   * Largest deviation from the nominal value as a fraction (0.01 = ±1 %). A tolerance stated in
   * farads (small capacitors: ±0.25 pF) is converted with the nominal value (±0.25 pF on 4.7 pF →
   * 0.0532), so every consumer can work in fractions; `toleranceAbsolute` keeps the stated figure.
   */
  tolerance: number | null;
  /** Deviation below nominal as a fraction; differs from `tolerance` only for asymmetric bands (Z: +80/−20 %). */
  toleranceMinus: number | null;
  /** A tolerance stated in farads, as stated (2.5e-13 for ±0.25 pF); null when stated in percent. */
  toleranceAbsolute: number | null;
  /** Voltage rating written after a capacitance or other value ("22uF/6.3V", "100nF 16V"). */
  ratedVoltage: number | null;
}

type LetterClass = 'resistance' | 'capacitance';

interface Letter {
  exponent: number;
  class: LetterClass;
}

// IEC 60062: R L K M G for resistance, p n µ m F for capacitance. Lower-case k is not in the
// standard but is how most parts lists write kilo-ohm (common practice).
const codeLetters: Record<string, Letter> = {
  L: { exponent: -3, class: 'resistance' },
  R: { exponent: 0, class: 'resistance' },
  K: { exponent: 3, class: 'resistance' },
  k: { exponent: 3, class: 'resistance' },
  M: { exponent: 6, class: 'resistance' },
  G: { exponent: 9, class: 'resistance' },
  p: { exponent: -12, class: 'capacitance' },
  n: { exponent: -9, class: 'capacitance' },
  u: { exponent: -6, class: 'capacitance' },
  m: { exponent: -3, class: 'capacitance' },
  F: { exponent: 0, class: 'capacitance' },
};

const siPrefixes: Record<string, number> = {
  p: -12,
  n: -9,
  u: -6,
  m: -3,
  k: 3,
  K: 3,
  M: 6,
  G: 9,
};

interface ToleranceLetter {
  fraction: number;
  minus?: number;
  /** IEC 60062 gives these letters in picofarads for capacitors below 10 pF */
  picofarads?: number;
}

// IEC 60062 tolerance letters. H (±3 %) and the F/G picofarad figures are from memory.
const toleranceLetters: Record<string, ToleranceLetter> = {
  B: { fraction: 0.001, picofarads: 0.1 },
  C: { fraction: 0.0025, picofarads: 0.25 },
  D: { fraction: 0.005, picofarads: 0.5 },
  F: { fraction: 0.01, picofarads: 1 },
  G: { fraction: 0.02, picofarads: 2 },
  H: { fraction: 0.03 },
  J: { fraction: 0.05 },
  K: { fraction: 0.1 },
  M: { fraction: 0.2 },
  N: { fraction: 0.3 },
  Z: { fraction: 0.8, minus: 0.2 },
};

/** Below this nominal capacitance IEC 60062 states B, C, D, F, G tolerances in picofarads. */
const absoluteToleranceBelow = 10e-12;

const unitWords: Record<string, ValueUnit> = {
  ohm: 'ohm',
  ohms: 'ohm',
  F: 'F',
  H: 'H',
  Hz: 'Hz',
  V: 'V',
  A: 'A',
};

/** The unit a kind's values are written in, used for plain numbers. */
const plainNumberUnit: Partial<Record<ComponentKind, ValueUnit>> = {
  resistor: 'ohm',
  crystal: 'Hz',
  fuse: 'A',
};

/** The kind of part a value's unit suggests; null when the unit does not point at one kind. */
export function kindHint(value: Pick<ParsedValue, 'unit'>): ComponentKind | null {
  switch (value.unit) {
    case 'ohm':
      return 'resistor';
    case 'F':
      return 'capacitor';
    case 'H':
      return 'inductor';
    case 'Hz':
      return 'crystal';
    case 'A':
      return 'fuse';
    default:
      return null;
  }
}

interface Reading {
  magnitude: number;
  unit: ValueUnit | null;
  toleranceLetter: string | null;
}

function emptyValue(text: string): ParsedValue {
  return {
    text,
    magnitude: null,
    unit: null,
    tolerance: null,
    toleranceMinus: null,
    toleranceAbsolute: null,
    ratedVoltage: null,
  };
}

/**
 * Builds the number from its decimal digits so 4K7 is exactly 4700 and 4n7 the double nearest to
 * 4.7e-9, not 4.7 × 1e-9 with its rounding error.
 */
function decimal(mantissa: string, exponent: number): number {
  return Number(`${mantissa}e${exponent}`);
}

/** Which quantity a multiplier letter (code letter or SI prefix) gives, and how far it shifts. */
function quantityOfLetter(
  letter: string,
  kind: ComponentKind | undefined,
): { unit: ValueUnit; exponent: number } | null {
  const code = codeLetters[letter];
  const exponent = code?.exponent ?? siPrefixes[letter];
  if (exponent === undefined) return null;
  const letterClass: LetterClass = code?.class ?? 'resistance';
  const fromClass: ValueUnit = letterClass === 'resistance' ? 'ohm' : 'F';
  const isSmallPrefix = 'pnu'.includes(letter);
  switch (kind) {
    case 'inductor':
      // inductor marking practice: R is the decimal point in microhenries (4R7 = 4.7 µH)
      if (letter === 'R') return { unit: 'H', exponent: -6 };
      if (isSmallPrefix || letter === 'm') return { unit: 'H', exponent };
      return { unit: fromClass, exponent };
    case 'ferrite':
      if (isSmallPrefix) return { unit: 'H', exponent };
      return { unit: letter === 'F' ? 'F' : 'ohm', exponent };
    case 'crystal':
      if ('kKMG'.includes(letter)) return { unit: 'Hz', exponent };
      return { unit: fromClass, exponent };
    case 'fuse':
      if (letter === 'm') return { unit: 'A', exponent };
      return { unit: fromClass, exponent };
    case 'resistor':
      if (letter === 'm') return { unit: 'ohm', exponent };
      return { unit: fromClass, exponent };
    default:
      return { unit: fromClass, exponent };
  }
}

/** Whether an explicit unit may follow this multiplier letter; "47KF" is 47 kΩ ±1 %, not 47 kF. */
function letterTakesUnit(letter: string, unit: ValueUnit): boolean {
  switch (unit) {
    case 'ohm':
      return 'LRKkMGmu'.includes(letter);
    case 'F':
    case 'H':
      return 'pnum'.includes(letter);
    case 'Hz':
      return 'kKMG'.includes(letter);
    case 'A':
    case 'V':
      return 'umk'.includes(letter);
  }
}

/** Splits what follows a code or number into a unit and a tolerance letter ("F", "FJ", "J", "Hz"). */
function readSuffix(
  suffix: string,
  letter: string | null,
): { unit: ValueUnit | null; toleranceLetter: string | null } | null {
  if (suffix === '') return { unit: null, toleranceLetter: null };
  for (const [word, unit] of Object.entries(unitWords)) {
    if (!suffix.startsWith(word)) continue;
    if (letter !== null && !letterTakesUnit(letter, unit)) continue;
    const rest = suffix.slice(word.length);
    if (rest === '') return { unit, toleranceLetter: null };
    if (toleranceLetters[rest]) return { unit, toleranceLetter: rest };
  }
  if (toleranceLetters[suffix]) return { unit: null, toleranceLetter: suffix };
  return null;
}

const codePattern = /^(\d*)([LRKkMGpnumF])(\d*)([A-Za-z]*)/;
const numberPattern = /^(\d+(?:\.\d+)?|\.\d+)(?: ?([pnumkKMG]))?(?: ?(ohms|ohm|Hz|F|H|V|A|R))?/;
const zenerVoltagePattern = /^(\d+)V(\d+)/;

/** A value must end where a separator or a tolerance/voltage part begins. */
function endsCleanly(rest: string): boolean {
  return rest === '' || /^[\s/,;_(±+@]/.test(rest);
}

function readCode(text: string, kind: ComponentKind | undefined): [Reading, string] | null {
  const match = codePattern.exec(text);
  if (!match) return null;
  const [whole, before = '', letter = '', after = '', suffix = ''] = match;
  if (before === '' && after === '') return null;
  const rest = text.slice(whole.length);
  if (!endsCleanly(rest)) return null;
  const tail = readSuffix(suffix, letter);
  if (!tail) return null;
  const mantissa = `${before === '' ? '0' : before}.${after === '' ? '0' : after}`;
  const isZeroOhmLink = letter === 'R' && Number(mantissa) === 0;
  const quantity =
    tail.unit !== null
      ? { unit: tail.unit, exponent: codeLetters[letter]?.exponent ?? 0 }
      : isZeroOhmLink
        ? // a 0R fitted where an inductor or bead could go is still a link, not 0 µH
          { unit: 'ohm' as const, exponent: 0 }
        : quantityOfLetter(letter, kind);
  if (!quantity) return null;
  return [
    {
      magnitude: decimal(mantissa, quantity.exponent),
      unit: quantity.unit,
      toleranceLetter: tail.toleranceLetter,
    },
    rest,
  ];
}

function readNumber(text: string, kind: ComponentKind | undefined): [Reading, string] | null {
  const zener = zenerVoltagePattern.exec(text);
  if (zener && endsCleanly(text.slice(zener[0].length))) {
    // "5V1" for a 5.1 V zener or clamp voltage (common practice, same idea as IEC 60062)
    return [
      { magnitude: decimal(`${zener[1]}.${zener[2]}`, 0), unit: 'V', toleranceLetter: null },
      text.slice(zener[0].length),
    ];
  }
  const match = numberPattern.exec(text);
  if (!match) return null;
  const [whole, digits = '', prefix, unitWord] = match;
  const rest = text.slice(whole.length);
  if (!endsCleanly(rest)) return null;
  const mantissa = digits.startsWith('.') ? `0${digits}` : digits;
  if (unitWord !== undefined) {
    if (unitWord === 'R' && prefix !== undefined) return null;
    const unit = unitWord === 'R' ? 'ohm' : unitWords[unitWord];
    if (!unit) return null;
    if (prefix !== undefined && !letterTakesUnit(prefix, unit)) return null;
    const exponent = prefix === undefined ? 0 : (siPrefixes[prefix] ?? 0);
    return [{ magnitude: decimal(mantissa, exponent), unit, toleranceLetter: null }, rest];
  }
  if (prefix !== undefined) {
    const quantity = quantityOfLetter(prefix, kind);
    if (!quantity) return null;
    return [
      {
        magnitude: decimal(mantissa, quantity.exponent),
        unit: quantity.unit,
        toleranceLetter: null,
      },
      rest,
    ];
  }
  const unit = kind === undefined ? null : (plainNumberUnit[kind] ?? null);
  return [{ magnitude: decimal(mantissa, 0), unit, toleranceLetter: null }, rest];
}

function normalise(text: string): string {
  return (
    text
      // micro sign U+00B5 and Greek mu U+03BC
      .replace(/[\u00b5\u03bc]/g, 'u')
      // ohm sign U+2126 and Greek capital omega U+03A9
      .replace(/[\u2126\u03a9]/g, 'ohm')
      .replace(/ohm(s?)/gi, 'ohm$1')
      // all-capitals parts lists ("100NF", "10UF", "4.7UH"); only before F or H, where the
      // capital cannot mean anything else, and never inside a part number such as 2N7002
      .replace(
        /(\d ?)([PNU])([FH])(?![A-Za-z0-9])/g,
        (_, number: string, prefix: string, unit: string) =>
          `${number}${prefix.toLowerCase()}${unit}`,
      )
      .replace(/\+\/-|\+-/g, '±')
      // decimal comma between digits ("4,7k")
      .replace(/(\d),(\d)/g, '$1.$2')
  );
}

interface Extras {
  tolerance: number | null;
  toleranceMinus: number | null;
  toleranceAbsoluteFarads: number | null;
  ratedVoltage: number | null;
}

/** Tolerance and voltage rating written after the value: "1%", "±5%", "+80/-20%", "±0.25pF", "16V", "6V3". */
function readExtras(rest: string): Extras {
  const extras: Extras = {
    tolerance: null,
    toleranceMinus: null,
    toleranceAbsoluteFarads: null,
    ratedVoltage: null,
  };
  let remaining = rest;
  const asymmetric = /\+\s?(\d+(?:\.\d+)?)\s?%?\s?\/\s?-\s?(\d+(?:\.\d+)?)\s?%/.exec(remaining);
  if (asymmetric) {
    const plus = Number(asymmetric[1]) / 100;
    const minus = Number(asymmetric[2]) / 100;
    extras.tolerance = Math.max(plus, minus);
    extras.toleranceMinus = minus;
    remaining = remaining.replace(asymmetric[0], ' ');
  }
  for (const token of remaining.split(/[\s/,;_()]+/)) {
    if (token === '') continue;
    const percent = /^±?(\d+(?:\.\d+)?)%$/.exec(token);
    if (percent && extras.tolerance === null) {
      extras.tolerance = Number(percent[1]) / 100;
      extras.toleranceMinus = extras.tolerance;
      continue;
    }
    const absolute = /^±(\d+(?:\.\d+)?)(p|n)F$/.exec(token);
    if (absolute && extras.toleranceAbsoluteFarads === null && extras.tolerance === null) {
      extras.toleranceAbsoluteFarads = decimal(absolute[1] ?? '0', absolute[2] === 'n' ? -9 : -12);
      continue;
    }
    const volts = /^(\d+(?:\.\d+)?)(k?)V(?:DC)?$/.exec(token);
    if (volts && extras.ratedVoltage === null) {
      extras.ratedVoltage = decimal(volts[1] ?? '0', volts[2] === 'k' ? 3 : 0);
      continue;
    }
    const voltsCode = /^(\d+)V(\d+)$/.exec(token);
    if (voltsCode && extras.ratedVoltage === null) {
      // "6V3" = 6.3 V, the letter-as-decimal-point habit applied to voltage ratings
      extras.ratedVoltage = decimal(`${voltsCode[1]}.${voltsCode[2]}`, 0);
    }
  }
  return extras;
}

/**
 * Reads a component value. `kind` decides the quantity of codes that do not state a unit
 * (see the file header); without it the IEC 60062 letter classes decide.
 */
export function parseComponentValue(text: string, kind?: ComponentKind): ParsedValue {
  const written = text.trim();
  const result = emptyValue(written);
  const source = normalise(written);
  if (source === '') return result;

  const read = readCode(source, kind) ?? readNumber(source, kind);
  if (!read) return result;
  const [reading, rest] = read;
  result.magnitude = reading.magnitude;
  result.unit = reading.unit;

  const extras = readExtras(rest);
  result.ratedVoltage = reading.unit === 'V' ? null : extras.ratedVoltage;

  const letter = reading.toleranceLetter ? toleranceLetters[reading.toleranceLetter] : undefined;
  const smallCapacitor =
    reading.unit === 'F' && reading.magnitude > 0 && reading.magnitude < absoluteToleranceBelow;
  if (letter && smallCapacitor && letter.picofarads !== undefined) {
    result.toleranceAbsolute = decimal(String(letter.picofarads), -12);
  } else if (letter) {
    result.tolerance = letter.fraction;
    result.toleranceMinus = letter.minus ?? letter.fraction;
  } else if (extras.toleranceAbsoluteFarads !== null) {
    result.toleranceAbsolute = extras.toleranceAbsoluteFarads;
  } else if (extras.tolerance !== null) {
    result.tolerance = extras.tolerance;
    result.toleranceMinus = extras.toleranceMinus;
  }
  if (result.toleranceAbsolute !== null) {
    if (reading.unit === 'F' && reading.magnitude > 0) {
      result.tolerance = result.toleranceAbsolute / reading.magnitude;
      result.toleranceMinus = result.tolerance;
    } else {
      // a tolerance in farads on something that is not a capacitance cannot be used
      result.toleranceAbsolute = null;
    }
  }
  return result;
}
