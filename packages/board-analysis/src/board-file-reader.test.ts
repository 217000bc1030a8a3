import { describe, expect, it } from 'vitest';
import { formatJsonPath, readAnnotationFile, readBoardFile } from './board-file-reader';

const demoBoard = {
  format: 'railyard-board',
  version: 1,
  board: { title: 'Demo charger board', revision: 'B', batteryVoltage: 3.85 },
  rootNet: 'VBAT',
  nets: [
    { name: 'VBAT', kind: 'power', nominalVoltage: 3.85, aliases: ['BATT_POS'] },
    { name: 'VSYS', kind: 'power', nominalVoltage: 3.8 },
  ],
  components: [
    {
      refdes: 'Q1',
      kind: 'mosfet',
      side: 'top',
      x: 10,
      y: 5,
      pins: [
        { pin: 'S', net: 'VBAT', x: 9.5, y: 5 },
        { pin: 'D', net: 'VSYS', x: 10.5, y: 5 },
        { pin: 'G', net: null },
      ],
    },
    {
      refdes: 'C1',
      value: '10u',
      package: '0603',
      pins: [
        { pin: '1', net: 'VSYS' },
        { pin: '2', net: 'GND' },
      ],
    },
  ],
  powerLinks: [{ from: 'VBAT', to: 'VSYS', via: 'Q1', kind: 'switch' }],
};

const pretty = (value: unknown) => JSON.stringify(value, null, 2);

/** 1-based line of the first occurrence of `needle` in `text`, found independently of the reader. */
function lineOfText(text: string, needle: string, from = 0): number {
  const at = text.indexOf(needle, from);
  if (at < 0) throw new Error(`no ${needle}`);
  return text.slice(0, at).split('\n').length;
}

describe('readBoardFile', () => {
  it('turns the components into a netlist and the rest into annotations', () => {
    const { netlist, annotations } = readBoardFile(pretty(demoBoard));
    expect(netlist.errors).toEqual([]);
    expect(netlist.meta).toEqual({
      title: 'Demo charger board',
      revision: 'B',
      batteryVoltage: 3.85,
    });
    expect(netlist.components.map((c) => [c.refdes, c.pins.map((p) => [p.pin, p.net])])).toEqual([
      [
        'Q1',
        [
          ['S', 'VBAT'],
          ['D', 'VSYS'],
          ['G', null],
        ],
      ],
      [
        'C1',
        [
          ['1', 'VSYS'],
          ['2', 'GND'],
        ],
      ],
    ]);
    expect(netlist.components[0]).toMatchObject({ kind: 'mosfet', side: 'top', x: 10, y: 5 });
    expect(netlist.components[1]).toMatchObject({ value: '10u', package: '0603' });
    expect(annotations).toEqual({
      format: 'railyard-annotations',
      version: 1,
      board: { title: 'Demo charger board', revision: 'B', batteryVoltage: 3.85 },
      rootNet: 'VBAT',
      nets: demoBoard.nets,
      components: [],
      powerLinks: demoBoard.powerLinks,
    });
  });

  it('records the line where each component and pin starts', () => {
    const text = pretty(demoBoard);
    const { netlist } = readBoardFile(text);
    const c1 = netlist.components[1];
    // JSON.stringify puts each object's opening brace on the line before its first key.
    expect(c1?.line).toBe(lineOfText(text, '"refdes": "C1"') - 1);
    expect(c1?.pins[1]?.line).toBe(lineOfText(text, '"net": "GND"') - 2);
  });

  it('reports a JSON syntax error with its line and no field', () => {
    const text = pretty(demoBoard).replace('"kind": "mosfet",', '"kind": "mosfet"');
    const { netlist, annotations } = readBoardFile(text);
    expect(annotations).toBeNull();
    // The missing comma is noticed at the next key, one line below "kind".
    expect(netlist.errors).toEqual([
      {
        line: lineOfText(text, '"kind": "mosfet"') + 1,
        field: null,
        message: expect.stringMatching(
          /^JSON syntax: expected ',' or '}' after the value of "kind"/,
        ),
      },
    ]);
  });

  it('reports an unterminated file at its last line', () => {
    const text = pretty(demoBoard).slice(0, -2);
    const { netlist } = readBoardFile(text);
    expect(netlist.errors).toEqual([
      expect.objectContaining({ line: text.split('\n').length, field: null }),
    ]);
  });

  it('names the path and line of every schema problem', () => {
    const bad = structuredClone(demoBoard) as Record<string, unknown> & typeof demoBoard;
    (bad.components[1]!.pins[0] as Record<string, unknown>).net = 42;
    (bad.components[0] as Record<string, unknown>).side = 'left';
    (bad.board as Record<string, unknown>).colour = 'green';
    const text = pretty(bad);
    const { netlist } = readBoardFile(text);
    const byField = Object.fromEntries(netlist.errors.map((e) => [e.field, e.line]));
    expect(byField).toEqual({
      'components[1].pins[0].net': lineOfText(text, '"net": 42'),
      'components[0].side': lineOfText(text, '"side": "left"'),
      'board.colour': lineOfText(text, '"colour"'),
    });
  });

  it('points a missing required key at the object that lacks it', () => {
    const bad = structuredClone(demoBoard) as typeof demoBoard;
    const pin = bad.components[0]!.pins[2] as Record<string, unknown>;
    delete pin.net;
    const text = pretty(bad);
    const { netlist } = readBoardFile(text);
    expect(netlist.errors).toEqual([
      expect.objectContaining({
        field: 'components[0].pins[2].net',
        line: lineOfText(text, '"pin": "G"') - 1,
      }),
    ]);
  });

  it('refuses a file of another format, naming the format field', () => {
    const { netlist } = readBoardFile(pretty({ ...demoBoard, format: 'railyard-annotations' }));
    expect(netlist.errors).toEqual([expect.objectContaining({ field: 'format', line: 2 })]);
  });

  it('refuses a refdes listed twice and a pin listed twice, naming both places', () => {
    const bad = structuredClone(demoBoard);
    bad.components[1]!.refdes = 'Q1';
    bad.components[0]!.pins[2]!.pin = 'S';
    const text = pretty(bad);
    const { netlist } = readBoardFile(text);
    expect(netlist.errors.map((e) => e.field)).toEqual([
      'components[1].refdes',
      'components[0].pins[2].pin',
    ]);
    expect(netlist.errors[0]?.message).toBe(
      `refdes Q1 appears twice: components[0] (line ${lineOfText(text, '"Q1"')}) and components[1] (line ${lineOfText(text, '"Q1"', text.indexOf('"Q1"') + 1)})`,
    );
  });

  it('keeps only the metadata keys the file gives', () => {
    const { netlist } = readBoardFile(pretty({ ...demoBoard, board: { title: 'Only a title' } }));
    expect(netlist.meta).toEqual({ title: 'Only a title' });
  });

  it('reads a file with a byte-order mark', () => {
    expect(readBoardFile(`\uFEFF${JSON.stringify(demoBoard)}`).netlist.errors).toEqual([]);
  });
});

describe('readAnnotationFile', () => {
  const annotations = {
    format: 'railyard-annotations',
    version: 1,
    rootNet: 'VBAT',
    nets: [{ name: 'VCC_3V3', kind: 'power', nominalVoltage: 3.3 }],
    components: [{ refdes: 'U4', kind: 'ic', value: 'buck converter' }],
    powerLinks: [{ from: 'VSYS', to: 'VCC_3V3', via: 'U4', kind: 'converter' }],
  };

  it('reads annotations and fills the defaults', () => {
    const { annotations: read, errors } = readAnnotationFile(
      pretty({ ...annotations, powerLinks: undefined }),
    );
    expect(errors).toEqual([]);
    expect(read).toEqual({ ...annotations, powerLinks: [] });
  });

  it('maps schema problems to paths and lines', () => {
    const text = pretty({
      ...annotations,
      powerLinks: [{ from: 'VSYS', to: 'VCC_3V3', via: 'U4', kind: 'magic' }],
    });
    const { annotations: read, errors } = readAnnotationFile(text);
    expect(read).toBeNull();
    expect(errors).toEqual([
      expect.objectContaining({ field: 'powerLinks[0].kind', line: lineOfText(text, '"magic"') }),
    ]);
  });

  it('refuses a net annotated twice', () => {
    const text = pretty({ ...annotations, nets: [...annotations.nets, { name: 'VCC_3V3' }] });
    const { errors } = readAnnotationFile(text);
    expect(errors).toEqual([expect.objectContaining({ field: 'nets[1].name' })]);
  });

  it('reports JSON syntax errors with their line', () => {
    const { errors } = readAnnotationFile(
      '{\n  "format": "railyard-annotations",\n  "version": 1,\n}\n',
    );
    expect(errors).toEqual([expect.objectContaining({ line: 4, field: null })]);
  });
});

describe('formatJsonPath', () => {
  it('writes paths the way JavaScript would reach the value', () => {
    expect(formatJsonPath(['components', 3, 'pins', 0, 'net'])).toBe('components[3].pins[0].net');
    expect(formatJsonPath(['board', 'odd key'])).toBe('board["odd key"]');
    expect(formatJsonPath([])).toBe('');
  });
});
