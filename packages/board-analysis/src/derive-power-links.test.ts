import type { ComponentKind } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import type { DraftComponent, DraftPowerLink } from './board-draft';
import { deriveSeriesLinks, isSeriesElement } from './derive-power-links';
import { inferComponentKind } from './refdes-kind';
import { parseComponentValue } from './value-code';

function part(
  refdes: string,
  value: string,
  nets: (string | null)[],
  kind?: ComponentKind,
): DraftComponent {
  const resolvedKind = kind ?? inferComponentKind(refdes);
  const parsed = parseComponentValue(value, resolvedKind);
  return {
    refdes,
    kind: resolvedKind,
    value,
    magnitude: parsed.magnitude,
    unit: parsed.unit,
    tolerance: parsed.tolerance,
    ratedVoltage: parsed.ratedVoltage,
    package: '',
    side: null,
    x: null,
    y: null,
    rotation: null,
    pins: nets.map((net, i) => ({ pin: String(i + 1), net, x: null, y: null })),
  };
}

function entered(
  from: string,
  to: string,
  via: string,
  kind: DraftPowerLink['kind'],
): DraftPowerLink {
  return { from, to, via, kind, origin: 'entered' };
}

const ground = new Set(['GND']);

describe('isSeriesElement', () => {
  // common practice: what a rail passes straight through
  it.each([
    ['L1', '2u2'],
    ['FB1', '600R@100MHz'],
    ['F1', '2A'],
    ['R1', '0R'],
    ['R2', '1R0'],
    ['R3', 'R010'],
    ['R4', '0 ohm'],
    ['JP1', ''],
    ['PJ3', ''],
    ['W1', '0R'],
  ])('treats %s (%s) as a series element', (refdes, value) => {
    expect(isSeriesElement(part(refdes, value, ['A', 'B']))).toBe(true);
  });

  it.each([
    ['R5', '1R1'],
    ['R6', '10k'],
    ['R7', ''],
    ['C1', '100nF'],
    ['Q1', ''],
    ['U1', ''],
    ['D1', ''],
    ['J1', ''],
  ])('does not treat %s (%s) as a series element', (refdes, value) => {
    expect(isSeriesElement(part(refdes, value, ['A', 'B']))).toBe(false);
  });
});

describe('deriveSeriesLinks', () => {
  it('links the two nets of a two-pin series part, marked derived', () => {
    const links = deriveSeriesLinks([part('L1', '2u2', ['VSYS', 'VSYS_L'])], ground);
    expect(links).toEqual([
      { from: 'VSYS', to: 'VSYS_L', via: 'L1', kind: 'series', origin: 'derived' },
    ]);
  });

  it('skips parts with other than two pins, a pin not connected, both pins on one net, or a pin on ground', () => {
    const links = deriveSeriesLinks(
      [
        part('L1', '', ['A', 'B', 'C']),
        part('L2', '', ['A', 'B', 'C', 'D']),
        part('L3', '', ['A', null]),
        part('FB1', '', ['A', 'A']),
        part('F1', '', ['A', 'GND']),
      ],
      ground,
    );
    expect(links).toEqual([]);
  });

  it('does not duplicate a link already entered through the same part', () => {
    const links = deriveSeriesLinks(
      [part('L1', '', ['VSYS', 'VSYS_L']), part('L2', '', ['VSYS', 'N2'])],
      ground,
      {
        knownLinks: [entered('VSYS', 'VSYS_L', 'L1', 'series')],
      },
    );
    expect(links.map((link) => link.via)).toEqual(['L2']);
  });

  it('orders the nets by name when no root is known', () => {
    const links = deriveSeriesLinks([part('FB1', '', ['VSYS_F', 'VSYS'])], ground);
    expect(links[0]).toMatchObject({ from: 'VSYS', to: 'VSYS_F' });
  });

  it('orients links away from the root by breadth-first distance over known and series links', () => {
    // Worked by hand: VBAT =F1= VBAT_F -U1(converter)-> VSYS =L1= VSYS_L =FB1= VSYS_F.
    // Distances from VBAT: VBAT_F 1, VSYS 2, VSYS_L 3, VSYS_F 4. Pins are listed far side first.
    const links = deriveSeriesLinks(
      [
        part('F1', '2A', ['VBAT_F', 'VBAT']),
        part('L1', '1u', ['VSYS_L', 'VSYS']),
        part('FB1', '', ['VSYS_F', 'VSYS_L']),
      ],
      ground,
      { rootNet: 'VBAT', knownLinks: [entered('VBAT_F', 'VSYS', 'U1', 'converter')] },
    );
    expect(links.map((link) => [link.via, link.from, link.to])).toEqual([
      ['F1', 'VBAT', 'VBAT_F'],
      ['L1', 'VSYS', 'VSYS_L'],
      ['FB1', 'VSYS_L', 'VSYS_F'],
    ]);
  });

  it('falls back to name order for a part the root cannot reach', () => {
    const links = deriveSeriesLinks(
      [part('F1', '', ['VBAT', 'VBAT_F']), part('L9', '', ['N9', 'N10'])],
      ground,
      {
        rootNet: 'VBAT',
      },
    );
    expect(links.find((link) => link.via === 'L9')).toMatchObject({ from: 'N10', to: 'N9' });
  });

  it('falls back to name order when both nets are as far from the root', () => {
    // VBAT feeds A and B through entered switches; FB1 joins A and B at distance 1 each
    const links = deriveSeriesLinks([part('FB1', '', ['B', 'A'])], ground, {
      rootNet: 'VBAT',
      knownLinks: [entered('VBAT', 'A', 'Q1', 'switch'), entered('VBAT', 'B', 'Q2', 'switch')],
    });
    expect(links[0]).toMatchObject({ from: 'A', to: 'B' });
  });

  it('does not measure distance through ground', () => {
    // VBAT =F1= N1 =L2= N2 =L3= N3 =L1= VOUT: N3 is 3 steps from VBAT and VOUT 4. Entered links
    // touching ground would put VOUT 2 steps away (VBAT → GND → VOUT) and turn L1 around.
    const links = deriveSeriesLinks(
      [
        part('F1', '', ['VBAT', 'N1']),
        part('L2', '', ['N1', 'N2']),
        part('L3', '', ['N2', 'N3']),
        part('L1', '', ['VOUT', 'N3']),
      ],
      ground,
      {
        rootNet: 'VBAT',
        knownLinks: [
          entered('VBAT', 'GND', 'Q1', 'switch'),
          entered('GND', 'VOUT', 'Q2', 'switch'),
        ],
      },
    );
    expect(links.find((link) => link.via === 'L1')).toMatchObject({ from: 'N3', to: 'VOUT' });
  });
});
