import type { AnnotationFile } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { assembleBoard } from './assemble-board';
import type { NetlistRead, PartsRead, RawComponent } from './board-draft';

function part(
  refdes: string,
  nets: (string | null)[],
  extra: Partial<RawComponent> = {},
): RawComponent {
  return { refdes, pins: nets.map((net, i) => ({ pin: String(i + 1), net })), ...extra };
}

function netlist(components: RawComponent[], extra: Partial<NetlistRead> = {}): NetlistRead {
  return { meta: {}, components, netAliases: {}, warnings: [], errors: [], ...extra };
}

function annotations(extra: Partial<AnnotationFile>): AnnotationFile {
  return {
    format: 'railyard-annotations',
    version: 1,
    nets: [],
    components: [],
    powerLinks: [],
    ...extra,
  };
}

function partsList(rows: [string, string, string][]): PartsRead {
  return {
    parts: rows.map(([refdes, value, pkg], i) => ({ refdes, value, package: pkg, line: i + 2 })),
    warnings: [],
    errors: [],
  };
}

const fileNames = { netlist: 'board.ipc', parts: 'parts.csv', annotations: 'notes.json' };

/** A small board: battery connector, a converter, an inductor, decoupling, a signal 0R. */
function demoBoard(): RawComponent[] {
  return [
    part('J1', ['GND', 'VBAT', 'BAT_ID']),
    part('F1', ['VBAT', 'VBAT_F']),
    part('U1', ['VBAT_F', 'N0010', 'GND', 'VSYS']),
    part('L1', ['N0010', 'VSYS']),
    part('FB1', ['VSYS', 'N0020']),
    part('C1', ['VSYS', 'GND']),
    part('C2', ['N0020', 'GND']),
    part('R1', ['UART_TX', 'UART_TX_R']),
    part('U2', ['N0020', 'GND', 'UART_TX']),
    part('R2', ['BAT_ID', 'GND']),
  ];
}

function demoParts(): PartsRead {
  return partsList([
    ['F1', '2A', '0603'],
    ['L1', '1u', '2016'],
    ['FB1', '600R@100MHz', '0402'],
    ['C1', '22uF/6.3V', '0603'],
    ['C2', '100nF', '0201'],
    ['R1', '0R', '0201'],
    ['R2', '10k', '0201'],
  ]);
}

describe('assembleBoard', () => {
  it('builds the nets of the IPC-D-356A sample board in the order their first pin appears', () => {
    // invented IPC-D-356A sample board (shared/reference/FACTS.md §11), expected nets:
    // GND {J1-1}; VBAT {J1-2, U1-1}; VSYS {U1-4}; 3V3 {C5-1}; 3V3_LDO_FEEDBACK_DIVIDER {R7-2};
    // H1 is an unconnected tooling hole
    const draft = assembleBoard({
      netlist: netlist(
        [
          part('J1', ['GND', 'VBAT']),
          {
            refdes: 'U1',
            pins: [
              { pin: '1', net: 'VBAT' },
              { pin: '4', net: 'VSYS' },
            ],
          },
          part('C5', ['3V3']),
          { refdes: 'R7', pins: [{ pin: '2', net: '3V3_LDO_FEEDBACK_DIVIDER' }] },
          part('H1', [null]),
        ],
        { netAliases: { '3V3_LDO_FEEDBACK_DIVIDER': ['NNAME1'] } },
      ),
    });
    expect(draft.errors).toEqual([]);
    expect(draft.nets.map((net) => [net.name, net.kind])).toEqual([
      ['GND', 'ground'],
      ['VBAT', 'power'],
      ['VSYS', 'power'],
      ['3V3', 'power'],
      ['3V3_LDO_FEEDBACK_DIVIDER', 'signal'],
    ]);
    expect(draft.nets.find((net) => net.name === '3V3_LDO_FEEDBACK_DIVIDER')?.aliases).toEqual([
      'NNAME1',
    ]);
    expect(draft.groundNets).toEqual(['GND']);
    expect(draft.rootNet).toBe('VBAT');
    expect(draft.components.find((c) => c.refdes === 'H1')?.pins).toEqual([
      { pin: '1', net: null, x: null, y: null },
    ]);
  });

  it('fills values and packages from the parts list and parses them with the kind', () => {
    const draft = assembleBoard({ netlist: netlist(demoBoard()), parts: demoParts(), fileNames });
    const c1 = draft.components.find((c) => c.refdes === 'C1');
    expect(c1).toMatchObject({
      kind: 'capacitor',
      value: '22uF/6.3V',
      package: '0603',
      unit: 'F',
      ratedVoltage: 6.3,
    });
    expect(c1?.magnitude).toBeCloseTo(22e-6, 12);
    // common practice: 1u on an inductor is 1 µH
    const l1 = draft.components.find((c) => c.refdes === 'L1');
    expect(l1).toMatchObject({ kind: 'inductor', unit: 'H' });
    expect(l1?.magnitude).toBeCloseTo(1e-6, 12);
  });

  it('keeps an empty value for components without a parts row and says which they are', () => {
    const draft = assembleBoard({ netlist: netlist(demoBoard()), parts: demoParts(), fileNames });
    expect(draft.components.find((c) => c.refdes === 'U1')).toMatchObject({
      value: '',
      magnitude: null,
    });
    const summary = draft.warnings.find((w) => w.message.includes('no row in the parts list'));
    expect(summary).toMatchObject({ file: 'parts.csv' });
    expect(summary?.message).toContain('J1, U1, U2');
  });

  it('warns about a parts row whose refdes is not in the netlist, naming its line', () => {
    const parts = partsList([
      ['C1', '22uF', '0603'],
      ['C99', '1uF', '0402'],
    ]);
    const draft = assembleBoard({ netlist: netlist(demoBoard()), parts, fileNames });
    expect(draft.errors).toEqual([]);
    expect(draft.warnings).toContainEqual({
      file: 'parts.csv',
      line: 3,
      field: 'refdes',
      message: expect.stringContaining('C99'),
    });
  });

  it('matches parts rows to the netlist ignoring case', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      parts: partsList([['c1', '10uF', '0402']]),
    });
    expect(draft.components.find((c) => c.refdes === 'C1')?.value).toBe('10uF');
  });

  it('lets annotations override kind, value and package', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      parts: demoParts(),
      annotations: annotations({
        components: [{ refdes: 'R2', kind: 'other', value: '0R', package: '0402' }],
      }),
    });
    expect(draft.components.find((c) => c.refdes === 'R2')).toMatchObject({
      kind: 'other',
      value: '0R',
      package: '0402',
      magnitude: 0,
      unit: 'ohm',
    });
  });

  it('takes a kind given by the netlist over the refdes prefix', () => {
    const draft = assembleBoard({
      netlist: netlist([part('X1', ['A', 'B'], { kind: 'connector' })]),
    });
    expect(draft.components[0]?.kind).toBe('connector');
  });

  it('warns when a value reads as the wrong quantity for the part', () => {
    // IEC 60062: K is a resistance multiplier, so 4K7 on a capacitor is a mismatch
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      parts: partsList([['C2', '4K7', '0201']]),
      fileNames,
    });
    expect(draft.warnings).toContainEqual({
      file: 'parts.csv',
      line: 2,
      field: 'value',
      message: expect.stringContaining('reads as a resistance'),
    });
  });

  it('finds ground, the root and the derived series links of the demo board', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      parts: demoParts(),
      annotations: annotations({
        powerLinks: [{ from: 'VBAT_F', to: 'N0010', via: 'U1', kind: 'converter' }],
      }),
    });
    expect(draft.errors).toEqual([]);
    expect(draft.groundNets).toEqual(['GND']);
    expect(draft.rootNet).toBe('VBAT');
    // oriented away from VBAT: VBAT =F1= VBAT_F -U1-> N0010 =L1= VSYS =FB1= N0020
    expect(draft.powerLinks).toEqual([
      { from: 'VBAT_F', to: 'N0010', via: 'U1', kind: 'converter', origin: 'entered' },
      { from: 'VBAT', to: 'VBAT_F', via: 'F1', kind: 'series', origin: 'derived' },
      { from: 'N0010', to: 'VSYS', via: 'L1', kind: 'series', origin: 'derived' },
      { from: 'VSYS', to: 'N0020', via: 'FB1', kind: 'series', origin: 'derived' },
    ]);
  });

  it('makes nets power by voltage, by name, by link and along series links, and leaves signals alone', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      parts: demoParts(),
      annotations: annotations({ nets: [{ name: 'N0010', nominalVoltage: 1.8 }] }),
    });
    const kind = (name: string) => draft.nets.find((net) => net.name === name)?.kind;
    expect(kind('GND')).toBe('ground');
    expect(kind('VBAT')).toBe('power'); // name, and root
    expect(kind('N0010')).toBe('power'); // nominal voltage
    expect(kind('VBAT_F')).toBe('power'); // one fuse from VBAT
    expect(kind('N0020')).toBe('power'); // one bead from VSYS
    expect(kind('BAT_ID')).toBe('signal');
    expect(kind('UART_TX')).toBe('signal');
    expect(kind('UART_TX_R')).toBe('signal');
    // the 0R in the UART line joins two signals and is no power link
    expect(draft.powerLinks.some((link) => link.via === 'R1')).toBe(false);
  });

  it('applies net annotations: kind, voltage, description and aliases', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      annotations: annotations({
        nets: [
          { name: 'VSYS', nominalVoltage: 3.8, description: 'system rail', aliases: ['SYS_RAIL'] },
          { name: 'UART_TX_R', kind: 'power' },
        ],
      }),
    });
    expect(draft.nets.find((net) => net.name === 'VSYS')).toMatchObject({
      kind: 'power',
      nominalVoltage: 3.8,
      description: 'system rail',
      aliases: ['SYS_RAIL'],
      normalizedName: 'VSYS',
    });
    expect(draft.nets.find((net) => net.name === 'UART_TX_R')?.kind).toBe('power');
  });

  it('lets an annotation make a net ground or take it out of ground', () => {
    const draft = assembleBoard({
      netlist: netlist([part('U1', ['N0001', 'AGND', 'VCC_3V3'])]),
      annotations: annotations({
        nets: [
          { name: 'N0001', kind: 'ground' },
          { name: 'AGND', kind: 'signal' },
        ],
      }),
    });
    expect(draft.groundNets).toEqual(['N0001']);
    expect(draft.nets.find((net) => net.name === 'AGND')?.kind).toBe('signal');
  });

  it('reports an annotated net that does not exist as an error with its field and a suggestion', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      annotations: annotations({
        nets: [
          { name: 'VSYS', nominalVoltage: 3.8 },
          { name: 'vsys_', nominalVoltage: 1 },
        ],
      }),
      fileNames,
    });
    expect(draft.errors).toEqual([
      {
        file: 'notes.json',
        line: null,
        field: 'nets[1].name',
        message: expect.stringContaining('did you mean VSYS?'),
      },
    ]);
  });

  it('finds an annotated net by its alias', () => {
    const draft = assembleBoard({
      netlist: netlist([part('U1', ['3V3_LDO_FEEDBACK_DIVIDER', 'GND'])], {
        netAliases: { '3V3_LDO_FEEDBACK_DIVIDER': ['NNAME1'] },
      }),
      annotations: annotations({ nets: [{ name: 'NNAME1', description: 'divider tap' }] }),
    });
    expect(draft.errors).toEqual([]);
    expect(draft.nets[0]?.description).toBe('divider tap');
  });

  it('reports an alias that is the name of another net as an error', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      annotations: annotations({ nets: [{ name: 'VSYS', aliases: ['SYS', 'VBAT'] }] }),
      fileNames,
    });
    expect(draft.errors).toEqual([
      {
        file: 'notes.json',
        line: null,
        field: 'nets[0].aliases[1]',
        message: expect.stringContaining('VBAT'),
      },
    ]);
    expect(draft.nets.find((net) => net.name === 'VSYS')?.aliases).toEqual(['SYS']);
  });

  it('validates entered power links: missing nets and parts are errors, a part off both nets a warning', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      annotations: annotations({
        powerLinks: [
          { from: 'VBAT_F', to: 'NOPE', via: 'U1', kind: 'converter' },
          { from: 'VBAT_F', to: 'VSYS', via: 'U9', kind: 'converter' },
          { from: 'VSYS', to: 'N0020', via: 'C1', kind: 'switch' },
          { from: 'VBAT', to: 'VSYS', via: 'R1', kind: 'switch' },
        ],
      }),
      fileNames,
    });
    expect(draft.errors.map((e) => e.field)).toEqual(['powerLinks[0].to', 'powerLinks[1].via']);
    expect(draft.warnings).toContainEqual({
      file: 'notes.json',
      line: null,
      field: 'powerLinks[3].via',
      message: expect.stringContaining('no pin on VBAT or VSYS'),
    });
    expect(
      draft.powerLinks.filter((link) => link.origin === 'entered').map((link) => link.via),
    ).toEqual(['C1', 'R1']);
  });

  it('does not derive a series link through a part an entered link already goes through', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard()),
      parts: demoParts(),
      annotations: annotations({
        powerLinks: [{ from: 'VSYS', to: 'N0020', via: 'FB1', kind: 'switch' }],
      }),
    });
    expect(draft.powerLinks.filter((link) => link.via === 'FB1')).toEqual([
      { from: 'VSYS', to: 'N0020', via: 'FB1', kind: 'switch', origin: 'entered' },
    ]);
  });

  it('takes the root from the annotations, and reports one that is missing or ground', () => {
    const chosen = assembleBoard({
      netlist: netlist(demoBoard()),
      annotations: annotations({ rootNet: 'VSYS' }),
    });
    expect(chosen.rootNet).toBe('VSYS');
    const missing = assembleBoard({
      netlist: netlist(demoBoard()),
      annotations: annotations({ rootNet: 'VIN' }),
      fileNames,
    });
    expect(missing.rootNet).toBeNull();
    expect(missing.errors).toContainEqual({
      file: 'notes.json',
      line: null,
      field: 'rootNet',
      message: expect.any(String),
    });
    const grounded = assembleBoard({
      netlist: netlist(demoBoard()),
      annotations: annotations({ rootNet: 'GND' }),
    });
    expect(grounded.errors[0]?.field).toBe('rootNet');
  });

  it('passes on the readers’ issues with their file names', () => {
    const issue = { line: 4, field: 'net', message: 'net name cut to 14 characters' };
    const draft = assembleBoard({
      netlist: netlist(demoBoard(), {
        warnings: [issue],
        errors: [{ ...issue, message: 'bad record' }],
      }),
      parts: { ...demoParts(), warnings: [{ line: 9, field: 'value', message: 'empty value' }] },
      fileNames,
    });
    expect(draft.warnings).toContainEqual({ ...issue, file: 'board.ipc' });
    expect(draft.errors).toContainEqual({ ...issue, message: 'bad record', file: 'board.ipc' });
    expect(draft.warnings).toContainEqual({
      line: 9,
      field: 'value',
      message: 'empty value',
      file: 'parts.csv',
    });
  });

  it('reports a refdes that appears twice in the netlist', () => {
    const draft = assembleBoard({
      netlist: netlist([part('R1', ['A', 'B'], { line: 3 }), part('R1', ['C', 'D'], { line: 8 })]),
      fileNames,
    });
    expect(draft.errors).toEqual([
      { file: 'board.ipc', line: 8, field: 'refdes', message: expect.stringContaining('R1') },
    ]);
  });

  it('merges board metadata, annotations winning', () => {
    const draft = assembleBoard({
      netlist: netlist(demoBoard(), { meta: { title: 'DEMO-BOARD-A', revision: 'A' } }),
      annotations: annotations({ board: { revision: 'B', batteryVoltage: 3.85 } }),
    });
    expect(draft.meta).toEqual({ title: 'DEMO-BOARD-A', revision: 'B', batteryVoltage: 3.85 });
  });

  it('reports instead of throwing on an empty or unconnected netlist', () => {
    expect(assembleBoard({ netlist: netlist([]) })).toMatchObject({
      nets: [],
      rootNet: null,
      groundNets: [],
    });
    const draft = assembleBoard({ netlist: netlist([part('U1', [null, '', '  '])]) });
    expect(draft.nets).toEqual([]);
  });
});
