import type { ComponentKind, LoadRole } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { createPowerGraph, type PowerGraphInput } from './power-graph';
import { loadRoleOf } from './rail-loads';
import { parseComponentValue } from './value-code';

type Part = PowerGraphInput['parts'][number];

function part(refdes: string, kind: ComponentKind, value: string, nets: (string | null)[]): Part {
  const parsed = parseComponentValue(value, kind);
  return {
    refdes,
    kind,
    value,
    magnitude: parsed.magnitude,
    unit: parsed.unit,
    package: '0402',
    side: 'top',
    pins: nets.map((net, i) => ({ pin: String(i + 1), net })),
  };
}

// A 3.3 V rail made by U4 from VSYS, carried on to an audio rail by FB1, with the parts a
// technician meets on such a rail.
function audioRailBoard(extraParts: Part[] = []): PowerGraphInput {
  return {
    nets: [
      { name: 'VSYS', kind: 'power', nominalVoltage: 12 },
      { name: 'VCC_3V3', kind: 'power', nominalVoltage: 3.3 },
      { name: 'VCC_3V3_AUD', kind: 'power', nominalVoltage: 3.3 },
      { name: 'GND', kind: 'ground', nominalVoltage: 0 },
      { name: 'AGND', kind: 'ground', nominalVoltage: 0 },
      { name: 'RESET_L', kind: 'signal', nominalVoltage: null },
      { name: 'CLK_REF', kind: 'signal', nominalVoltage: null },
    ],
    links: [
      { from: 'VSYS', to: 'VCC_3V3', via: 'U4', kind: 'converter', origin: 'entered' },
      { from: 'VCC_3V3', to: 'VCC_3V3_AUD', via: 'FB1', kind: 'series', origin: 'derived' },
    ],
    parts: [
      part('U4', 'ic', 'BUCK', ['VSYS', 'VCC_3V3', 'GND', 'VCC_3V3']),
      part('FB1', 'ferrite', '600R', ['VCC_3V3', 'VCC_3V3_AUD']),
      part('C1', 'capacitor', '4u7', ['VCC_3V3', 'GND']),
      part('C2', 'capacitor', '100nF', ['GND', 'VCC_3V3']),
      part('C3', 'capacitor', '22uF', ['VCC_3V3', 'AGND']),
      part('C4', 'capacitor', '104', ['VCC_3V3', 'GND']),
      part('C5', 'capacitor', '100nF', ['VCC_3V3', 'CLK_REF']),
      part('R1', 'resistor', '10K', ['VCC_3V3', 'RESET_L']),
      part('R2', 'resistor', '100K', ['VCC_3V3', 'GND']),
      part('D1', 'tvs', '5V', ['VCC_3V3', 'GND']),
      part('U7', 'ic', 'CODEC', ['VCC_3V3_AUD', 'VCC_3V3', 'GND', 'RESET_L']),
      part('J1', 'connector', '', ['VCC_3V3', 'GND', null]),
      part('TP1', 'testpoint', '', ['VCC_3V3']),
      ...extraParts,
    ],
    rootNet: 'VSYS',
  };
}

describe('loadRoleOf', () => {
  it.each<[ComponentKind, boolean, boolean, LoadRole]>([
    ['ic', true, false, 'series'],
    ['capacitor', true, true, 'series'],
    ['capacitor', false, true, 'shunt'],
    ['tvs', false, true, 'shunt'],
    ['diode', false, true, 'shunt'],
    ['resistor', false, true, 'shunt'],
    ['ic', false, true, 'draw'],
    ['connector', false, false, 'draw'],
    ['mosfet', false, false, 'draw'],
    ['transistor', false, true, 'draw'],
    ['crystal', false, false, 'draw'],
    ['other', false, false, 'draw'],
    ['resistor', false, false, 'other'],
    ['capacitor', false, false, 'other'],
    ['testpoint', false, true, 'other'],
    ['inductor', false, false, 'other'],
  ])(
    'gives a %s (via of a rail link: %s, other pin on ground: %s) the role %s',
    (kind, via, ground, role) => {
      expect(loadRoleOf(kind, { isViaOfRailLink: via, hasOtherPinOnGround: ground })).toBe(role);
    },
  );
});

describe('rail loads', () => {
  it('sums the shunt capacitors of a rail, 4u7 + 100nF + 22uF = 26.8 µF', () => {
    const loads = createPowerGraph(audioRailBoard()).loads('VCC_3V3');

    // IEC 60062 letter-and-digit code: 4u7 = 4.7 µF (FACTS §2, marked from memory there);
    // 100nF and 22uF are plain SI prefixes. 4.7 + 0.1 + 22 = 26.8 µF. C3 goes to AGND, which is
    // ground too; C5 goes to a clock net and is not capacitance to ground.
    expect(loads.capacitance.totalFarads).toBeCloseTo(26.8e-6, 12);
    expect(loads.capacitance.counted).toBe(3);
  });

  it('lists a capacitor whose value does not read in farads as unparsed and leaves it out of the sum', () => {
    const loads = createPowerGraph(audioRailBoard()).loads('VCC_3V3');

    // "104" is a three-digit capacitor code the value reader does not interpret (no unit), so it
    // must not be guessed as 100 nF.
    expect(loads.capacitance.unparsed).toEqual(['C4']);
    expect(loads.parts.find((p) => p.refdes === 'C4')?.role).toBe('shunt');
  });

  it('lists a capacitor without any value as unparsed too', () => {
    const loads = createPowerGraph(
      audioRailBoard([part('C9', 'capacitor', '', ['VCC_3V3', 'GND'])]),
    ).loads('VCC_3V3');

    expect(loads.capacitance.unparsed).toEqual(['C4', 'C9']);
    expect(loads.capacitance.counted).toBe(3);
  });

  it('splits the parts of a rail into series, shunt, draw and other', () => {
    const loads = createPowerGraph(audioRailBoard()).loads('VCC_3V3');
    const roleOf = Object.fromEntries(loads.parts.map((p) => [p.refdes, p.role]));

    expect(roleOf).toEqual({
      U4: 'series', // makes the rail
      FB1: 'series', // carries it on to the audio rail
      C1: 'shunt',
      C2: 'shunt',
      C3: 'shunt',
      C4: 'shunt',
      D1: 'shunt',
      R2: 'shunt',
      C5: 'other', // to a clock net, not to ground
      R1: 'other', // pull-up to a signal
      TP1: 'other',
      U7: 'draw',
      J1: 'draw',
    });
    expect(loads.countsByRole).toEqual({ shunt: 6, draw: 2, series: 2, other: 3 });
    expect(loads.countsByKind).toEqual({
      ic: 2,
      ferrite: 1,
      capacitor: 5,
      resistor: 2,
      tvs: 1,
      connector: 1,
      testpoint: 1,
    });
  });

  it('counts every role, zero included, on a rail with one part', () => {
    const loads = createPowerGraph(audioRailBoard()).loads('CLK_REF');

    expect(loads.countsByRole).toEqual({ shunt: 0, draw: 0, series: 0, other: 1 });
    expect(loads.capacitance).toEqual({ totalFarads: 0, counted: 0, unparsed: [] });
  });

  it("gives each part's pins on the rail and the other nets it touches", () => {
    const loads = createPowerGraph(audioRailBoard()).loads('VCC_3V3');
    const u4 = loads.parts.find((p) => p.refdes === 'U4');
    const u7 = loads.parts.find((p) => p.refdes === 'U7');
    const j1 = loads.parts.find((p) => p.refdes === 'J1');

    expect(u4?.pins).toEqual(['2', '4']);
    expect(u4?.otherNets).toEqual(['GND', 'VSYS']);
    expect(u7?.otherNets).toEqual(['GND', 'RESET_L', 'VCC_3V3_AUD']);
    expect(j1?.otherNets).toEqual(['GND']);
  });

  it('gives the role on each rail separately: the ferrite is series on both of its rails, the codec draws from both', () => {
    const graph = createPowerGraph(audioRailBoard());
    const audio = graph.loads('VCC_3V3_AUD');

    expect(audio.parts.map((p) => [p.refdes, p.role])).toEqual([
      ['FB1', 'series'],
      ['U7', 'draw'],
    ]);
  });

  it('lists the parts by refdes in code-unit order', () => {
    const loads = createPowerGraph(audioRailBoard()).loads('VCC_3V3');
    const refdes = loads.parts.map((p) => p.refdes);

    expect(refdes).toEqual([...refdes].sort());
  });

  it('gives trace nodes the same load counts as the rail load list', () => {
    const graph = createPowerGraph(audioRailBoard());
    const tree = graph.trace('VSYS', 'down', 8);

    for (const node of tree.nodes) {
      const loads = graph.loads(node.net);
      expect(node.loadCount).toBe(loads.parts.length);
      expect(node.countsByRole).toEqual(loads.countsByRole);
    }
  });
});
