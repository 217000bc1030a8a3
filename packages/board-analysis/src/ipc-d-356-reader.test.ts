import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseIpcD356TestRecord, readIpcD356 } from './ipc-d-356-reader';
import type { RawComponent } from './board-draft';

// The conformant IPC-D-356A sample of FACTS.md §11 (invented 2-layer board, inch units).
const sample = readFileSync(new URL('./fixtures/demo-board-a.ipc', import.meta.url), 'utf8');
const sampleLines = sample.split('\n');
const lineOf = (prefix: string): string => {
  const found = sampleLines.find((l) => l.startsWith(prefix));
  if (!found) throw new Error(`sample has no line starting ${prefix}`);
  return found;
};
const J1_1 = lineOf('317GND');
const U1_1 = lineOf('327VBAT');

/** Overwrites text at a 1-based column, the way IPC-D-356A numbers its columns. */
function atColumn(line: string, column: number, text: string): string {
  const padded = line.padEnd(column - 1 + text.length, ' ');
  return padded.slice(0, column - 1) + text + padded.slice(column - 1 + text.length);
}

function file(...records: string[]): string {
  return ['P  JOB   TEST', 'P  UNITS CUST 0', ...records, '999', ''].join('\n');
}

function netsOf(components: RawComponent[]): Record<string, string[]> {
  const nets: Record<string, string[]> = {};
  for (const c of components) {
    for (const p of c.pins) (nets[p.net ?? 'N/C'] ??= []).push(`${c.refdes}-${p.pin}`);
  }
  for (const pins of Object.values(nets)) pins.sort();
  return nets;
}

const find = (components: RawComponent[], refdes: string): RawComponent => {
  const c = components.find((x) => x.refdes === refdes);
  if (!c) throw new Error(`no ${refdes}`);
  return c;
};

describe('readIpcD356 on the conformant sample (FACTS.md §11)', () => {
  const read = readIpcD356(sample);

  it('reads the sample without errors or warnings', () => {
    expect(read.errors).toEqual([]);
    expect(read.warnings).toEqual([]);
  });

  it('gives the expected nets, with the via and the tooling hole left out', () => {
    // FACTS.md §11: GND {J1-1}; VBAT {J1-2, U1-1}; VSYS {U1-4, a via}; 3V3 {C5-1};
    // 3V3_LDO_FEEDBACK_DIVIDER {R7-2}; H1 is an unconnected tooling hole.
    expect(netsOf(read.components)).toEqual({
      GND: ['J1-1'],
      VBAT: ['J1-2', 'U1-1'],
      VSYS: ['U1-4'],
      '3V3': ['C5-1'],
      '3V3_LDO_FEEDBACK_DIVIDER': ['R7-2'],
    });
    expect(read.components.map((c) => c.refdes)).not.toContain('H1');
    expect(read.stats.vias).toBe(1);
    expect(read.stats.nonPlatedHoles).toBe(1);
  });

  it('places J1-1 at 2.54 mm, 5.08 mm', () => {
    // FACTS.md §11; one CUST 0 unit is 0.0001 in = 2.54 µm (FACTS.md §1).
    const pin = find(read.components, 'J1').pins.find((p) => p.pin === '1');
    expect(pin?.x).toBeCloseTo(2.54, 9);
    expect(pin?.y).toBeCloseTo(5.08, 9);
    expect(pin?.line).toBe(11);
  });

  it('puts a component at the mean of its pins', () => {
    // J1 pins at (0.1 in, 0.2 in) and (0.1 in, 0.3 in): centre (0.1 in, 0.25 in) = (2.54, 6.35) mm.
    const j1 = find(read.components, 'J1');
    expect(j1.x).toBeCloseTo(2.54, 9);
    expect(j1.y).toBeCloseTo(6.35, 9);
  });

  it('takes the side from the access code of surface-mount pads', () => {
    // IPC-D-356A access: A01 top, A02 bottom on a 2-layer board, A00 both sides (through-hole).
    expect(find(read.components, 'U1').side).toBe('top');
    expect(find(read.components, 'C5').side).toBe('bottom');
    expect(find(read.components, 'J1').side).toBeUndefined();
  });

  it('turns the NNAME token into the long net name and keeps the token as an alias', () => {
    expect(read.netAliases).toEqual({ '3V3_LDO_FEEDBACK_DIVIDER': ['NNAME1'] });
  });

  it('reads the board title, number and revision from the parameter records', () => {
    expect(read.meta).toEqual({ title: 'DEMO-BOARD-A', boardNumber: '0001', revision: 'A' });
    expect(read.units).toBe('inch');
  });
});

describe('parseIpcD356TestRecord', () => {
  it('splits the J1-1 record at the IPC-D-356A test-record columns', () => {
    const { record, errors } = parseIpcD356TestRecord(J1_1, 11);
    expect(errors).toEqual([]);
    expect(record).toMatchObject({
      operation: '317',
      continuation: false,
      feature: 'through-hole',
      net: 'GND',
      refdes: 'J1',
      pin: '1',
      midpoint: false,
      drill: 400,
      plated: true,
      access: 0,
      x: 1000,
      y: 2000,
    });
    // FACTS.md §11: a 1.016 mm drill; 400 × 0.0001 in × 25.4 mm/in.
    expect((record?.drill ?? 0) * 0.0001 * 25.4).toBeCloseTo(1.016, 9);
  });

  it('reads the mid-net flag of the via record and the unplated flag of the tooling hole', () => {
    expect(parseIpcD356TestRecord(lineOf('317VSYS'), 15).record).toMatchObject({
      refdes: 'VIA',
      pin: '',
      midpoint: true,
      drill: 120,
    });
    expect(parseIpcD356TestRecord(lineOf('367'), 18).record).toMatchObject({
      feature: 'non-plated-hole',
      plated: false,
    });
  });
});

describe('readIpcD356 units', () => {
  it('reads CUST 1 coordinates as thousandths of a millimetre', () => {
    const text = file(atColumn(U1_1, 42, 'X+002540Y-005080')).replace('CUST 0', 'CUST 1');
    const read = readIpcD356(text);
    // IPC-D-356A UNITS CUST 1: 0.001 mm resolution.
    const pin = find(read.components, 'U1').pins[0];
    expect(pin?.x).toBeCloseTo(2.54, 9);
    expect(pin?.y).toBeCloseTo(-5.08, 9);
    expect(read.units).toBe('mm');
  });

  it('reads CUST 2 as inches like CUST 0', () => {
    // IPC-D-356A: CUST 2 is inch with angles in radians.
    const read = readIpcD356(file(U1_1).replace('CUST 0', 'CUST 2'));
    expect(find(read.components, 'U1').pins[0]?.x).toBeCloseTo(8500 * 0.00254, 9);
  });

  it('assumes inches and warns when there is no UNITS record', () => {
    const read = readIpcD356(['P  JOB   TEST', U1_1, '999'].join('\n'));
    expect(read.errors).toEqual([]);
    expect(read.units).toBe('inch');
    expect(read.warnings).toEqual([expect.objectContaining({ field: 'units' })]);
  });

  it('rejects a UNITS value it does not know, naming the line', () => {
    const read = readIpcD356(file(U1_1).replace('CUST 0', 'FURLONGS'));
    expect(read.errors).toEqual([expect.objectContaining({ line: 2, field: 'units' })]);
  });
});

describe('readIpcD356 errors', () => {
  it('reports a bad coordinate with its line and field', () => {
    const read = readIpcD356(file(atColumn(U1_1, 43, '+00A000')));
    expect(read.errors).toEqual([
      { line: 3, field: 'x', message: "X coordinate '+00A000' is not a signed number" },
    ]);
  });

  it('reports a test record without a refdes', () => {
    const read = readIpcD356(file(atColumn(U1_1, 21, '      ')));
    expect(read.errors).toEqual([expect.objectContaining({ line: 3, field: 'refdes' })]);
  });

  it('collects every error in the file instead of stopping at the first', () => {
    const read = readIpcD356(
      file(
        atColumn(U1_1, 51, '+0000?0'),
        J1_1,
        atColumn(J1_1, 21, '      '),
        atColumn(U1_1, 39, 'AXX'),
      ),
    );
    expect(read.errors.map((e) => [e.line, e.field])).toEqual([
      [3, 'y'],
      [5, 'refdes'],
      [6, 'access'],
    ]);
  });

  it('reports one error for a file with no test records', () => {
    const read = readIpcD356('C  nothing here\nP  JOB   EMPTY\n999\n');
    expect(read.errors).toHaveLength(1);
    expect(read.errors[0]?.message).toMatch(/no test records/);
  });

  it('names both lines when the same pin is on two nets', () => {
    const read = readIpcD356(file(U1_1, atColumn(U1_1, 4, 'VSYS          ')));
    expect(read.errors).toHaveLength(1);
    expect(read.errors[0]).toMatchObject({ line: 4, field: 'net' });
    expect(read.errors[0]?.message).toMatch(
      /U1-1 is on net VBAT at line 3 and on net VSYS at line 4/,
    );
  });

  it('rejects a tab inside a fixed-column record', () => {
    const read = readIpcD356(file(U1_1.replace('U1    ', 'U1\t    ')));
    expect(read.errors).toEqual([expect.objectContaining({ line: 3, field: null })]);
    expect(read.errors[0]?.message).toMatch(/tab character in column 23/);
  });

  it('rejects a continuation record with nothing before it', () => {
    const read = readIpcD356(file(atColumn(U1_1, 1, '027'), J1_1));
    expect(read.errors).toEqual([expect.objectContaining({ line: 3, field: 'operation' })]);
  });
});

describe('readIpcD356 tolerance of real-world files', () => {
  it('reads CRLF line endings like LF', () => {
    const read = readIpcD356(sample.replace(/\n/g, '\r\n'));
    expect(read.errors).toEqual([]);
    expect(netsOf(read.components)).toEqual(netsOf(readIpcD356(sample).components));
  });

  it('accepts the soldermask code in column 72 and warns once for all such lines', () => {
    // FACTS.md §1: one open-source exporter writes S in column 72, making lines 73 long.
    const early = (l: string) => l.slice(0, 71) + 'S0';
    const read = readIpcD356(file(early(U1_1), early(J1_1)));
    expect(read.errors).toEqual([]);
    expect(read.components).toHaveLength(2);
    expect(read.warnings).toEqual([
      expect.objectContaining({
        line: 3,
        field: 'soldermask',
        message: expect.stringMatching(/2 records/),
      }),
    ]);
  });

  it('accepts a blank dash between refdes and pin', () => {
    const read = readIpcD356(file(atColumn(U1_1, 27, ' ')));
    expect(read.errors).toEqual([]);
    expect(find(read.components, 'U1').pins[0]?.pin).toBe('1');
    expect(read.warnings).toEqual([expect.objectContaining({ line: 3, field: 'pin' })]);
  });

  it('accepts lines cut short after the Y coordinate and lines with trailing spaces', () => {
    // Columns 58 onwards (feature size, rotation, soldermask) are not needed for the netlist.
    const read = readIpcD356(file(U1_1.slice(0, 57), `${J1_1}      `));
    expect(read.errors).toEqual([]);
    expect(read.warnings).toEqual([]);
    expect(find(read.components, 'U1').pins[0]?.y).toBeCloseTo(2500 * 0.00254, 9);
  });

  it('imports a record without coordinates as a pin without a position, with a warning', () => {
    const read = readIpcD356(file(U1_1.slice(0, 41)));
    expect(read.errors).toEqual([]);
    const u1 = find(read.components, 'U1');
    expect(u1.pins[0]?.x).toBeUndefined();
    expect(u1.x).toBeUndefined();
    expect(read.warnings).toEqual([expect.objectContaining({ line: 3, field: 'x' })]);
  });

  it('warns about conductor, adjacency, outline and unknown records without failing', () => {
    const read = readIpcD356(
      file(
        U1_1,
        '378VBAT             X+001000Y+002000X+003000Y+002000',
        '078                 X+004000Y+002000',
        '379VBAT             VSYS',
        '389BOARD_EDGE       X+000000Y+000000',
        '313GND              TP1   -1          A01X+000100Y+000100',
      ),
    );
    expect(read.errors).toEqual([]);
    expect(read.components.map((c) => c.refdes)).toEqual(['U1']);
    expect(read.warnings.map((w) => w.line)).toEqual([4, 6, 7, 8]);
    expect(read.stats.skippedRecords).toBe(4);
  });

  it('warns about anything after the 999 end record and ignores it', () => {
    const read = readIpcD356(`${file(U1_1)}${J1_1}\n`);
    expect(read.components.map((c) => c.refdes)).toEqual(['U1']);
    expect(read.warnings).toEqual([expect.objectContaining({ line: 5 })]);
  });

  it('warns when the 999 end record is missing', () => {
    const read = readIpcD356(['P  UNITS CUST 0', U1_1].join('\n'));
    expect(read.errors).toEqual([]);
    expect(read.warnings).toEqual([
      expect.objectContaining({ message: expect.stringMatching(/999/) }),
    ]);
  });

  it('keeps a not-connected pin with a null net', () => {
    const read = readIpcD356(file(atColumn(U1_1, 4, 'N/C           ')));
    expect(find(read.components, 'U1').pins[0]?.net).toBeNull();
  });

  it('keeps an undefined NNAME token as the net name and warns', () => {
    const read = readIpcD356(file(atColumn(U1_1, 4, 'NNAME9        ')));
    expect(find(read.components, 'U1').pins[0]?.net).toBe('NNAME9');
    expect(read.warnings).toEqual([expect.objectContaining({ line: 3, field: 'net' })]);
  });

  it('warns and leaves the side open when surface pads sit on both sides', () => {
    const bottom = atColumn(atColumn(U1_1, 28, '2   '), 39, 'A02');
    const read = readIpcD356(file(U1_1, bottom));
    expect(find(read.components, 'U1').side).toBeUndefined();
    expect(read.warnings).toEqual([expect.objectContaining({ field: 'access' })]);
  });
});

describe('readIpcD356 continuation records', () => {
  it('adds a pin named by a continuation to the net of the record it continues', () => {
    const cont = atColumn(atColumn(atColumn(U1_1, 1, '027'), 4, ' '.repeat(14)), 21, '      ');
    const read = readIpcD356(file(U1_1, atColumn(cont, 28, '2   ')));
    expect(read.errors).toEqual([]);
    expect(netsOf(read.components)).toEqual({ VBAT: ['U1-1', 'U1-2'] });
  });

  it('adds nothing when a continuation repeats the same pin', () => {
    const cont = atColumn(atColumn(U1_1, 1, '027'), 43, '+009999');
    const read = readIpcD356(file(U1_1, cont));
    const u1 = find(read.components, 'U1');
    expect(u1.pins).toHaveLength(1);
    expect(u1.pins[0]?.x).toBeCloseTo(8500 * 0.00254, 9);
  });

  it('skips a continuation of a via like the via itself', () => {
    const via = lineOf('317VSYS');
    const read = readIpcD356(file(U1_1, via, atColumn(via, 1, '017')));
    expect(read.errors).toEqual([]);
    expect(read.stats.vias).toBe(1);
    expect(read.components.map((c) => c.refdes)).toEqual(['U1']);
  });
});
