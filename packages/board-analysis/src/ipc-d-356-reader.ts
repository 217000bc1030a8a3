// Reads IPC-D-356 / IPC-D-356A bare-board test netlists into components and pins.
// Column positions follow the IPC-D-356A record layout (parameter records, clause 6; test-record
// fields, clause 8). Real exporters bend that layout in a few known ways; those are accepted and
// reported once per kind as warnings, so a technician sees them without a wall of repeats.
import type { BoardMeta, BoardSide, ImportIssue } from '@railyard/shared';
import type { NetlistRead, RawComponent, RawPin } from './board-draft';

export type IpcD356Units = 'inch' | 'mm';

/** Feature type from column 2 of a `3x7` / `0x7` operation code. */
export type IpcD356Feature = 'blind-via' | 'through-hole' | 'surface' | 'non-plated-hole';

/** One test record with its fields as written; coordinates and drill stay in file units. */
export interface IpcD356TestRecord {
  /** columns 1–3, e.g. `317` */
  operation: string;
  /** `0` in column 1: continues the record before it */
  continuation: boolean;
  feature: IpcD356Feature;
  /** columns 4–17 trimmed; '' when blank */
  net: string;
  /** columns 21–26 trimmed; '' when blank */
  refdes: string;
  /** columns 28–31 trimmed; '' when blank */
  pin: string;
  midpoint: boolean;
  /** hole diameter in file units, null when the record is not drilled */
  drill: number | null;
  /** `P` plated, `U` unplated, null when column 38 is blank */
  plated: boolean | null;
  /** layer number from `A` + columns 40–41 (0 = both sides), null when absent */
  access: number | null;
  /** file units (0.0001 in or 0.001 mm); null when the record gives no position */
  x: number | null;
  y: number | null;
}

/** Known ways exporters deviate from the fixed layout; the reader tallies them into warnings. */
export type IpcD356Quirk =
  | 'mask-in-column-72'
  | 'blank-pin-dash'
  | 'odd-pin-separator'
  | 'no-coordinates'
  | 'past-column-80';

export interface IpcD356RecordParse {
  record: IpcD356TestRecord | null;
  errors: ImportIssue[];
  quirks: IpcD356Quirk[];
}

export interface IpcD356Stats {
  /** 3x7 test records, continuations not counted */
  testRecords: number;
  componentPins: number;
  vias: number;
  nonPlatedHoles: number;
  /** records of types the reader does not use (conductors, outlines, tooling, unknown codes) */
  skippedRecords: number;
}

export interface IpcD356Read extends NetlistRead {
  units: IpcD356Units;
  stats: IpcD356Stats;
}

const FEATURE_BY_COLUMN_2: Record<string, IpcD356Feature> = {
  '0': 'blind-via',
  '1': 'through-hole',
  '2': 'surface',
  '6': 'non-plated-hole',
};

/** Record types a reader may meet but that carry no component pins (IPC-D-356A operation codes). */
const SKIPPED_RECORD_NAMES: Record<string, string> = {
  '337': 'tooling feature',
  '347': 'tooling hole',
  '378': 'conductor',
  '379': 'adjacency',
  '389': 'board outline',
};

const DIGITS = /^\d+$/;

/** 1-based inclusive column slice, as the standard numbers columns. */
function columns(line: string, from: number, to: number): string {
  return line.slice(from - 1, to);
}

/**
 * Reads a signed integer written in columns `from`–`to` (sign, then digits, spaces around allowed).
 * Returns undefined for an all-blank field and NaN for anything else that is not such a number.
 * Works on character codes because a large file has tens of thousands of these fields.
 */
function signedField(line: string, from: number, to: number): number | undefined {
  const end = Math.min(to, line.length);
  let i = from - 1;
  while (i < end && line.charCodeAt(i) === 0x20) i++;
  if (i >= end) return undefined;
  let sign = 1;
  const first = line.charCodeAt(i);
  if (first === 0x2b || first === 0x2d) {
    if (first === 0x2d) sign = -1;
    i++;
  }
  let value = 0;
  let digits = 0;
  for (; i < end; i++) {
    const c = line.charCodeAt(i);
    if (c < 0x30 || c > 0x39) break;
    value = value * 10 + (c - 0x30);
    digits++;
  }
  while (i < end && line.charCodeAt(i) === 0x20) i++;
  return digits > 0 && i === end ? sign * value : NaN;
}

function parseCoordinate(
  line: string,
  axis: 'X' | 'Y',
  letterColumn: number,
  lineNumber: number,
  errors: ImportIssue[],
): number | null | undefined {
  const letter = line[letterColumn - 1];
  const value = signedField(line, letterColumn + 1, letterColumn + 7);
  if ((letter === undefined || letter === ' ') && value === undefined) return undefined;
  if (letter !== axis) {
    errors.push({
      line: lineNumber,
      field: axis.toLowerCase(),
      message: `expected '${axis}' in column ${letterColumn}, found '${letter ?? ''}'`,
    });
    return null;
  }
  if (value === undefined || Number.isNaN(value)) {
    errors.push({
      line: lineNumber,
      field: axis.toLowerCase(),
      message: `${axis} coordinate '${columns(line, letterColumn + 1, letterColumn + 7).trim()}' is not a signed number`,
    });
    return null;
  }
  return value;
}

/**
 * Splits one `3x7` or `0x7` test record into its fields (IPC-D-356A test-record layout:
 * net 4–17, refdes 21–26, `-` 27, pin 28–31, M 32, D 33, drill 34–37, P/U 38, A 39 + access
 * 40–41, X 42 + 43–49, Y 50 + 51–57). Blank net and refdes are allowed on continuations only.
 */
export function parseIpcD356TestRecord(line: string, lineNumber: number): IpcD356RecordParse {
  const errors: ImportIssue[] = [];
  const quirks: IpcD356Quirk[] = [];
  return { record: parseTestRecord(line, lineNumber, errors, quirks), errors, quirks };
}

/** As parseIpcD356TestRecord, appending to the caller's lists so a large file allocates less. */
function parseTestRecord(
  line: string,
  lineNumber: number,
  errors: ImportIssue[],
  quirks: IpcD356Quirk[],
): IpcD356TestRecord | null {
  const errorsBefore = errors.length;
  const operation = columns(line, 1, 3);
  const feature = FEATURE_BY_COLUMN_2[operation[1] ?? ''];
  if (!/^[03]\d7$/.test(operation) || feature === undefined) {
    errors.push({
      line: lineNumber,
      field: 'operation',
      message: `'${operation}' is not a test record operation code (317, 327, 307, 367 or a 0x7 continuation)`,
    });
    return null;
  }
  const tab = line.indexOf('\t');
  if (tab >= 0) {
    errors.push({
      line: lineNumber,
      field: null,
      message: `tab character in column ${tab + 1}: test records are fixed-column and must use spaces`,
    });
    return null;
  }
  const continuation = operation[0] === '0';

  const net = columns(line, 4, 17).trim();
  const refdes = columns(line, 21, 26).trim();
  const pin = columns(line, 28, 31).trim();
  if (!continuation && net === '') {
    errors.push({ line: lineNumber, field: 'net', message: 'net name (columns 4–17) is blank' });
  }
  if (!continuation && refdes === '') {
    errors.push({
      line: lineNumber,
      field: 'refdes',
      message: 'test record has no refdes (columns 21–26)',
    });
  }
  const separator = columns(line, 27, 27);
  if (pin !== '' && separator !== '-') {
    quirks.push(separator.trim() === '' ? 'blank-pin-dash' : 'odd-pin-separator');
  }

  let drill: number | null = null;
  if (columns(line, 33, 33) === 'D') {
    const size = columns(line, 34, 37).trim();
    if (DIGITS.test(size)) drill = Number(size);
    else {
      errors.push({
        line: lineNumber,
        field: 'drill',
        message: `hole diameter '${size}' (columns 34–37) is not a number`,
      });
    }
  }
  const platedFlag = columns(line, 38, 38);
  const plated = platedFlag === 'P' ? true : platedFlag === 'U' ? false : null;

  let access: number | null = null;
  const accessField = columns(line, 39, 41);
  if (accessField.trim() !== '') {
    const layer = accessField.slice(1).trim();
    if (accessField[0] === 'A' && DIGITS.test(layer)) access = Number(layer);
    else {
      errors.push({
        line: lineNumber,
        field: 'access',
        message: `access code '${accessField}' (columns 39–41) is not 'A' followed by a layer number`,
      });
    }
  }

  const x = parseCoordinate(line, 'X', 42, lineNumber, errors);
  const y = parseCoordinate(line, 'Y', 50, lineNumber, errors);
  if (x === undefined && y === undefined) quirks.push('no-coordinates');
  else if (x === undefined || y === undefined) {
    const missing = x === undefined ? 'x' : 'y';
    errors.push({
      line: lineNumber,
      field: missing,
      message: `${missing.toUpperCase()} coordinate is missing while ${missing === 'x' ? 'Y' : 'X'} is given`,
    });
  }

  // One widely used exporter writes the soldermask field one column early (S in 72, line 73 long).
  if (columns(line, 72, 72) === 'S') quirks.push('mask-in-column-72');
  if (line.length > 80 && line.slice(80).trim() !== '') quirks.push('past-column-80');

  if (errors.length > errorsBefore) return null;
  return {
    operation,
    continuation,
    feature,
    net,
    refdes,
    pin,
    midpoint: columns(line, 32, 32) === 'M',
    drill,
    plated,
    access,
    x: x ?? null,
    y: y ?? null,
  };
}

const QUIRK_MESSAGES: Record<IpcD356Quirk, { field: string | null; message: string }> = {
  'mask-in-column-72': {
    field: 'soldermask',
    message: 'soldermask code starts in column 72 instead of 73; read anyway',
  },
  'blank-pin-dash': {
    field: 'pin',
    message: "column 27 is blank where '-' separates refdes and pin; read anyway",
  },
  'odd-pin-separator': {
    field: 'pin',
    message: "column 27 holds something other than '-' between refdes and pin; read anyway",
  },
  'no-coordinates': {
    field: 'x',
    message: 'test record gives no X/Y position; the pin is imported without one',
  },
  'past-column-80': {
    field: null,
    message: 'text beyond column 80 is ignored',
  },
};

/** Counts repeated findings so each kind becomes one warning naming its first line. */
class Tally {
  private readonly seen = new Map<
    string,
    { field: string | null; message: string; first: number; count: number }
  >();

  add(key: string, field: string | null, message: string, line: number): void {
    const entry = this.seen.get(key);
    if (entry) entry.count += 1;
    else this.seen.set(key, { field, message, first: line, count: 1 });
  }

  issues(): ImportIssue[] {
    return [...this.seen.values()].map(({ field, message, first, count }) => ({
      line: first,
      field,
      message: count === 1 ? message : `${message} (${count} records, first at line ${first})`,
    }));
  }
}

interface ComponentSlot {
  component: RawComponent;
  /** pin name → index into the reader's pin list */
  pins: Map<string, number>;
  /** side of its surface pads; 'mixed' when they disagree */
  side: BoardSide | 'mixed' | undefined;
}

/** A second record for a pin already read; compared once net names are resolved. */
interface RepeatedPin {
  first: number;
  refdes: string;
  token: string;
  line: number;
}

/** What the last 3xx record was, so a continuation knows what it continues. */
type Previous =
  | { kind: 'pin'; net: string; refdes: string; pin: string; access: number | null }
  | { kind: 'via'; net: string; access: number | null }
  | { kind: 'ignored' };

function parseUnits(value: string): IpcD356Units | null {
  const v = value.trim().toUpperCase();
  // IPC-D-356A UNITS: CUST / CUST 0 inch (0.0001 in), CUST 1 mm (0.001 mm), CUST 2 inch + radians.
  if (/^CUST(\s+[02])?$/.test(v)) return 'inch';
  if (/^CUST\s+1$/.test(v)) return 'mm';
  // SI is rarely written; read with the metric resolution (from memory, not checked against a file).
  if (v === 'SI') return 'mm';
  return null;
}

/** File units to millimetres: 0.0001 in = 2.54 µm exactly; 0.001 mm. Integer maths keeps 1000 → 2.54. */
function toMm(raw: number, units: IpcD356Units): number {
  return units === 'inch' ? (raw * 254) / 100_000 : raw / 1000;
}

function sideOf(access: number | null): BoardSide | undefined {
  if (access === null || access === 0) return undefined;
  return access === 1 ? 'top' : 'bottom';
}

const NNAME_TOKEN = /^NNAME(\d+)$/i;

export function readIpcD356(text: string): IpcD356Read {
  const errors: ImportIssue[] = [];
  const warnings: ImportIssue[] = [];
  const tally = new Tally();
  const stats: IpcD356Stats = {
    testRecords: 0,
    componentPins: 0,
    vias: 0,
    nonPlatedHoles: 0,
    skippedRecords: 0,
  };
  const params = new Map<string, { value: string; line: number }>();
  const longNames = new Map<number, { name: string; line: number }>();
  let unitsRecord: { value: string; line: number } | null = null;
  const components = new Map<string, ComponentSlot>();
  // Pins as first read, with their net tokens and file-unit positions beside them: net names are
  // resolved and positions scaled once the whole file (NNAME and UNITS records) has been seen.
  const pins: RawPin[] = [];
  const tokens: string[] = [];
  const rawXs: (number | null)[] = [];
  const rawYs: (number | null)[] = [];
  const repeats: RepeatedPin[] = [];
  const recordQuirks: IpcD356Quirk[] = [];
  let previous: Previous | null = null;
  let endLine: number | null = null;
  let firstStrayLine: number | null = null;
  let linesAfterEnd = 0;
  let firstAfterEnd = 0;

  const body = text.replace(/^\uFEFF/, '');
  const lines = body.includes('\r') ? body.split(/\r\n|\n|\r/) : body.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i] ?? '';
    const lineNumber = i + 1;
    if (line.length === 0 || (line.charCodeAt(0) === 0x20 && line.trim() === '')) continue;
    if (endLine !== null) {
      linesAfterEnd += 1;
      if (linesAfterEnd === 1) firstAfterEnd = lineNumber;
      continue;
    }
    const first = line[0];
    if (first === 'C') continue;
    if (first === 'P') {
      // Parameter records are keyword + value; whitespace-split so tabs and shifted values still read.
      const nname = /^P\s+NNAME(\d+)\s+(\S.*?)\s*$/i.exec(line);
      if (nname) {
        const number = Number(nname[1]);
        const name = nname[2] ?? '';
        const earlier = longNames.get(number);
        if (earlier && earlier.name !== name) {
          errors.push({
            line: lineNumber,
            field: 'NNAME',
            message: `NNAME${number} is defined as '${earlier.name}' at line ${earlier.line} and as '${name}' at line ${lineNumber}`,
          });
        } else if (!earlier) longNames.set(number, { name, line: lineNumber });
        continue;
      }
      const param = /^P\s+(\S+)\s*(.*?)\s*$/.exec(line);
      if (param) {
        const keyword = (param[1] ?? '').toUpperCase();
        const value = param[2] ?? '';
        if (keyword === 'UNITS') {
          if (unitsRecord && unitsRecord.value.toUpperCase() !== value.toUpperCase()) {
            errors.push({
              line: lineNumber,
              field: 'units',
              message: `UNITS '${value}' contradicts UNITS '${unitsRecord.value}' at line ${unitsRecord.line}`,
            });
          }
          unitsRecord ??= { value, line: lineNumber };
        } else if (!params.has(keyword)) params.set(keyword, { value, line: lineNumber });
      }
      continue;
    }
    if (line.startsWith('999')) {
      endLine = lineNumber;
      continue;
    }

    const operation = columns(line, 1, 3);
    const feature = /^[03]\d7$/.test(operation)
      ? FEATURE_BY_COLUMN_2[operation[1] ?? '']
      : undefined;
    const continuation = operation[0] === '0';

    if (feature === undefined) {
      if (/^[03]\d\d$/.test(operation)) {
        // A continuation of something we skip belongs to that skipped record: no second warning.
        if (continuation && previous?.kind === 'ignored') continue;
        const parent = continuation ? `3${operation.slice(1)}` : operation;
        const name = SKIPPED_RECORD_NAMES[parent];
        tally.add(
          `record ${operation}`,
          'operation',
          name
            ? `${operation} ${name} records are not used and were skipped`
            : `unknown record type '${operation}' skipped`,
          lineNumber,
        );
        stats.skippedRecords += 1;
        previous = { kind: 'ignored' };
      } else {
        firstStrayLine ??= lineNumber;
        tally.add(
          `line ${operation}`,
          null,
          `line starting '${operation.trimEnd()}' is not an IPC-D-356 record and was skipped`,
          lineNumber,
        );
      }
      continue;
    }

    if (!continuation) stats.testRecords += 1;
    // Non-plated holes are tooling and mounting holes, never component pins.
    if (feature === 'non-plated-hole') {
      if (!continuation) stats.nonPlatedHoles += 1;
      previous = { kind: 'ignored' };
      continue;
    }

    recordQuirks.length = 0;
    const record = parseTestRecord(line, lineNumber, errors, recordQuirks);
    for (const quirk of recordQuirks) {
      const { field, message } = QUIRK_MESSAGES[quirk];
      tally.add(quirk, field, message, lineNumber);
    }
    if (!record) {
      previous = { kind: 'ignored' };
      continue;
    }

    let net = record.net;
    let refdes = record.refdes;
    let pin = record.pin;
    let access = record.access;
    if (record.continuation) {
      if (previous === null) {
        errors.push({
          line: lineNumber,
          field: 'operation',
          message: `continuation record ${operation} has no test record before it to continue`,
        });
        continue;
      }
      if (previous.kind === 'ignored') continue;
      // A continuation extends the record before it: blank fields are inherited from it.
      net ||= previous.net;
      access ??= previous.access;
      if (previous.kind === 'pin' && refdes === '') {
        refdes = previous.refdes;
        pin ||= previous.pin;
        // Same pin again, e.g. a second probe point: the first record's position stands.
        if (pin === previous.pin) continue;
      }
      if (refdes === '' && previous.kind === 'via') continue;
    }

    if (refdes.toUpperCase() === 'VIA') {
      if (!record.continuation) stats.vias += 1;
      previous = { kind: 'via', net, access };
      continue;
    }
    if (pin === '') {
      tally.add(
        'no-pin',
        'pin',
        'record names a refdes but no pin (columns 28–31); read as pin 1',
        lineNumber,
      );
      pin = '1';
    }
    previous = { kind: 'pin', net, refdes, pin, access };

    let slot = components.get(refdes);
    if (!slot) {
      slot = {
        component: { refdes, pins: [], line: lineNumber },
        pins: new Map(),
        side: undefined,
      };
      components.set(refdes, slot);
    }
    const firstIndex = slot.pins.get(pin);
    if (firstIndex !== undefined) {
      repeats.push({ first: firstIndex, refdes, token: net, line: lineNumber });
      continue;
    }
    const rawPin: RawPin = { pin, net: null, line: lineNumber };
    slot.pins.set(pin, pins.length);
    pins.push(rawPin);
    tokens.push(net);
    rawXs.push(record.x);
    rawYs.push(record.y);
    slot.component.pins.push(rawPin);
    const side = record.feature === 'surface' ? sideOf(access) : undefined;
    if (side && slot.side !== side) slot.side = slot.side === undefined ? side : 'mixed';
  }

  let units: IpcD356Units = 'inch';
  if (unitsRecord) {
    const parsedUnits = parseUnits(unitsRecord.value);
    if (parsedUnits) {
      units = parsedUnits;
      if (unitsRecord.value.trim().toUpperCase() === 'SI') {
        warnings.push({
          line: unitsRecord.line,
          field: 'units',
          message: 'UNITS SI read as millimetres with 0.001 mm resolution; check the board size',
        });
      }
    } else {
      errors.push({
        line: unitsRecord.line,
        field: 'units',
        message: `UNITS '${unitsRecord.value}' is not one of CUST 0, CUST 1, CUST 2 or SI`,
      });
    }
  } else {
    warnings.push({
      line: null,
      field: 'units',
      message: 'no P UNITS record; coordinates read as inches (CUST 0, 0.0001 in)',
    });
  }

  const netAliases: Record<string, string[]> = {};
  const resolveNet = (token: string, line: number): string | null => {
    if (token.toUpperCase() === 'N/C') return null;
    const alias = NNAME_TOKEN.exec(token);
    if (!alias) return token;
    const long = longNames.get(Number(alias[1]));
    if (!long) {
      tally.add(
        `undefined ${token}`,
        'net',
        `${token} is used but no P NNAME record defines it; kept as the net name`,
        line,
      );
      return token;
    }
    const known = (netAliases[long.name] ??= []);
    if (!known.includes(token)) known.push(token);
    return long.name;
  };

  const resolved = new Map<string, string | null>();
  const netOf = (token: string, line: number): string | null => {
    let net = resolved.get(token);
    if (net === undefined) {
      net = resolveNet(token, line);
      resolved.set(token, net);
    }
    return net;
  };
  for (let i = 0; i < pins.length; i++) {
    const pin = pins[i] as RawPin;
    const rawX = rawXs[i] ?? null;
    const rawY = rawYs[i] ?? null;
    pin.net = netOf(tokens[i] ?? '', pin.line ?? 0);
    if (rawX !== null && rawY !== null) {
      pin.x = toMm(rawX, units);
      pin.y = toMm(rawY, units);
    }
  }
  for (const repeat of repeats) {
    const first = pins[repeat.first];
    if (!first) continue;
    const net = netOf(repeat.token, repeat.line);
    if (first.net !== net) {
      errors.push({
        line: repeat.line,
        field: 'net',
        message: `${repeat.refdes}-${first.pin} is on net ${first.net ?? 'N/C'} at line ${first.line} and on net ${net ?? 'N/C'} at line ${repeat.line}`,
      });
    } else {
      tally.add(
        'repeated pin',
        'pin',
        'pin listed again with the same net; the first record is kept',
        repeat.line,
      );
    }
  }
  stats.componentPins = pins.length;

  const componentList: RawComponent[] = [];
  for (const { component, side } of components.values()) {
    let placed = 0;
    let sumX = 0;
    let sumY = 0;
    for (const pin of component.pins) {
      if (pin.x === undefined || pin.y === undefined) continue;
      placed += 1;
      sumX += pin.x;
      sumY += pin.y;
    }
    if (placed > 0) {
      component.x = sumX / placed;
      component.y = sumY / placed;
    }
    if (side === 'mixed') {
      warnings.push({
        line: component.line ?? null,
        field: 'access',
        message: `${component.refdes} has surface-mount pads on both sides; its side is left open`,
      });
    } else if (side) component.side = side;
    componentList.push(component);
  }

  if (stats.testRecords === 0) {
    // Point at the first line that is not IPC-D-356 at all: the usual cause is a file of another format.
    errors.push({
      line: firstStrayLine,
      field: firstStrayLine === null ? null : 'operation',
      message:
        firstStrayLine === null
          ? 'no test records (lines starting 317, 327 or 307) found; this does not look like an IPC-D-356 netlist'
          : `no test records (lines starting 317, 327 or 307) found, and line ${firstStrayLine} is not an IPC-D-356 record; this does not look like an IPC-D-356 netlist`,
    });
  } else if (componentList.length === 0 && errors.length === 0) {
    errors.push({
      line: null,
      field: null,
      message: 'the file holds only vias and holes, no component pins to import',
    });
  }
  if (endLine === null) {
    warnings.push({
      line: null,
      field: null,
      message: 'no 999 end record; the file may have been cut short',
    });
  } else if (linesAfterEnd > 0) {
    warnings.push({
      line: firstAfterEnd,
      field: null,
      message: `${linesAfterEnd} line(s) after the 999 end record at line ${endLine} were ignored`,
    });
  }

  const meta: Partial<BoardMeta> = {};
  const title = params.get('TITLE')?.value || params.get('JOB')?.value;
  if (title) meta.title = title;
  const number = params.get('NUM')?.value;
  if (number) meta.boardNumber = number;
  const revision = params.get('REV')?.value;
  if (revision) meta.revision = revision;

  warnings.push(...tally.issues());
  // File-wide findings first, then in file order, however late in the read each was made.
  const byLine = (a: ImportIssue, b: ImportIssue) => (a.line ?? 0) - (b.line ?? 0);
  warnings.sort(byLine);
  errors.sort(byLine);
  return { meta, components: componentList, netAliases, warnings, errors, units, stats };
}
