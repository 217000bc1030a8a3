import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { RawComponent } from './board-draft';
import { readIpcD356 } from './ipc-d-356-reader';
import { IpcD356WriteError, writeIpcD356 } from './ipc-d-356-writer';

// The conformant IPC-D-356A sample of FACTS.md §11, used as the reference for column placement.
const sample = readFileSync(new URL('./fixtures/demo-board-a.ipc', import.meta.url), 'utf8');
const sampleLine = (prefix: string): string => {
  const found = sample.split('\n').find((l) => l.startsWith(prefix));
  if (!found) throw new Error(`sample has no line starting ${prefix}`);
  return found;
};

const INCH = 25.4;
// The sample board's parts, positions converted from its 0.0001 in units to millimetres.
const demoBoard: RawComponent[] = [
  {
    refdes: 'J1',
    pins: [
      { pin: '1', net: 'GND', x: 0.1 * INCH, y: 0.2 * INCH },
      { pin: '2', net: 'VBAT', x: 0.1 * INCH, y: 0.3 * INCH },
    ],
  },
  {
    refdes: 'U1',
    side: 'top',
    pins: [
      { pin: '1', net: 'VBAT', x: 0.85 * INCH, y: 0.25 * INCH },
      { pin: '4', net: 'VSYS', x: 0.95 * INCH, y: 0.25 * INCH },
    ],
  },
  { refdes: 'C5', side: 'bottom', pins: [{ pin: '1', net: '3V3', x: 1.1 * INCH, y: 0.4 * INCH }] },
  {
    refdes: 'R7',
    side: 'top',
    pins: [{ pin: '2', net: '3V3_LDO_FEEDBACK_DIVIDER', x: 1.25 * INCH, y: 0.4 * INCH }],
  },
];

const written = writeIpcD356({
  job: 'DEMO-BOARD-A',
  title: 'DEMO-BOARD-A',
  revision: 'A',
  components: demoBoard,
});
const writtenLines = written.trimEnd().split('\n');
const writtenLine = (prefix: string): string =>
  writtenLines.find((l) => l.startsWith(prefix)) ?? '';

/** Deterministic pseudo-random positions (a linear congruential generator), so failures reproduce. */
function scatteredBoard(count: number): RawComponent[] {
  let seed = 12345;
  const next = () => {
    seed = (seed * 1103515245 + 12345) % 2 ** 31;
    return seed / 2 ** 31;
  };
  const components: RawComponent[] = [];
  for (let i = 0; i < count; i++) {
    const side = i % 3 === 0 ? undefined : i % 3 === 1 ? 'top' : 'bottom';
    components.push({
      refdes: `R${i + 1}`,
      ...(side ? { side } : {}),
      pins: [1, 2].map((n) => ({
        pin: String(n),
        net: n === 1 ? (i % 5 === 0 ? null : `NET_${i % 40}`) : 'VCC_3V3_SENSE_DIVIDER_OUT',
        x: (next() - 0.5) * 400,
        y: (next() - 0.5) * 300,
      })),
    });
  }
  return components;
}

describe('writeIpcD356', () => {
  it('places test-record fields in the same columns as the conformant sample', () => {
    // Columns 1–57 hold the operation code, net, refdes, pin, hole, access and X/Y (IPC-D-356A);
    // feature sizes from column 58 on are nominal in our output, so they are not compared.
    for (const prefix of ['317GND', '317VBAT', '327VBAT', '327VSYS', '3273V3']) {
      expect(writtenLine(prefix).slice(0, 57)).toBe(sampleLine(prefix).slice(0, 57));
    }
    expect(writtenLine('327NNAME1').slice(0, 57)).toBe(sampleLine('327NNAME1').slice(0, 57));
  });

  it('writes the header parameters and the NNAME alias like the sample', () => {
    for (const record of [
      'P  JOB   DEMO-BOARD-A',
      'P  UNITS CUST 0',
      'P  TITLE DEMO-BOARD-A',
      'P  REV   A',
    ]) {
      expect(writtenLines).toContain(record);
    }
    expect(writtenLines).toContain(sampleLine('P  NNAME1'));
    expect(writtenLines.at(-1)).toBe('999');
  });

  it('keeps every line within 80 columns', () => {
    const text = writeIpcD356({
      job: 'X'.repeat(120),
      title: 'T'.repeat(120),
      components: scatteredBoard(30),
    });
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });

  it('gives back the same nets, pins and positions when read again, in inches', () => {
    const board = scatteredBoard(300);
    const read = readIpcD356(writeIpcD356({ job: 'ROUND-TRIP', components: board }));
    expect(read.errors).toEqual([]);
    expect(read.components.map((c) => c.refdes)).toEqual(board.map((c) => c.refdes));
    // One unit of CUST 0 resolution is 0.0001 in = 0.00254 mm (FACTS.md §1).
    board.forEach((component, i) => {
      const back = read.components[i];
      expect(back?.side).toBe(component.side);
      component.pins.forEach((pin, j) => {
        const got = back?.pins[j];
        expect(got?.pin).toBe(pin.pin);
        expect(got?.net).toBe(pin.net);
        expect(Math.abs((got?.x ?? NaN) - (pin.x ?? NaN))).toBeLessThanOrEqual(0.00254);
        expect(Math.abs((got?.y ?? NaN) - (pin.y ?? NaN))).toBeLessThanOrEqual(0.00254);
      });
    });
  });

  it('gives back the same positions within 0.001 mm when written in millimetres', () => {
    const board = scatteredBoard(60);
    const text = writeIpcD356({ job: 'ROUND-TRIP', components: board }, { units: 'mm' });
    expect(text).toContain('P  UNITS CUST 1');
    const read = readIpcD356(text);
    expect(read.units).toBe('mm');
    board.forEach((component, i) => {
      component.pins.forEach((pin, j) => {
        const got = read.components[i]?.pins[j];
        expect(Math.abs((got?.x ?? NaN) - (pin.x ?? NaN))).toBeLessThanOrEqual(0.001);
        expect(Math.abs((got?.y ?? NaN) - (pin.y ?? NaN))).toBeLessThanOrEqual(0.001);
      });
    });
  });

  it('writes a long net name once as an NNAME alias that reads back as the long name', () => {
    const text = writeIpcD356({ job: 'ALIASES', components: scatteredBoard(10) });
    expect(text.match(/^P {2}NNAME\d+ +VCC_3V3_SENSE_DIVIDER_OUT$/gm)).toHaveLength(1);
    const read = readIpcD356(text);
    expect(read.netAliases['VCC_3V3_SENSE_DIVIDER_OUT']).toEqual(['NNAME1']);
  });

  it('falls back to the component position for a pin that has none', () => {
    const text = writeIpcD356({
      job: 'FALLBACK',
      components: [
        { refdes: 'TP1', side: 'top', x: 2.54, y: 5.08, pins: [{ pin: '1', net: 'VSYS' }] },
      ],
    });
    const pin = readIpcD356(text).components[0]?.pins[0];
    expect(pin?.x).toBeCloseTo(2.54, 9);
    expect(pin?.y).toBeCloseTo(5.08, 9);
  });

  it('refuses what the fixed columns cannot hold, naming the pin or part', () => {
    const one = (component: RawComponent) => () =>
      writeIpcD356({ job: 'BAD', components: [component] });
    expect(one({ refdes: 'CONN123', pins: [{ pin: '1', net: 'GND', x: 0, y: 0 }] })).toThrow(
      /CONN123/,
    );
    expect(one({ refdes: 'U1', pins: [{ pin: 'AB123', net: 'GND', x: 0, y: 0 }] })).toThrow(
      /U1-AB123/,
    );
    expect(one({ refdes: 'U1', pins: [{ pin: '1', net: 'GND' }] })).toThrow(/U1-1 has no position/);
    // 999999 × 0.0001 in is just under 2540 mm, the largest coordinate the six digits hold.
    expect(one({ refdes: 'U1', pins: [{ pin: '1', net: 'GND', x: 2541, y: 0 }] })).toThrow(
      IpcD356WriteError,
    );
  });
});
