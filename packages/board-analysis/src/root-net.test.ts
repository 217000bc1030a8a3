import type { ComponentKind } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import type { DraftComponent, DraftNet } from './board-draft';
import { normalizeNetName } from './net-name';
import { inferComponentKind } from './refdes-kind';
import { detectRootNet, isBatteryNetName } from './root-net';

function part(refdes: string, nets: (string | null)[], kind?: ComponentKind): DraftComponent {
  return {
    refdes,
    kind: kind ?? inferComponentKind(refdes),
    value: '',
    magnitude: null,
    unit: null,
    tolerance: null,
    ratedVoltage: null,
    package: '',
    side: null,
    x: null,
    y: null,
    rotation: null,
    pins: nets.map((net, i) => ({ pin: String(i + 1), net, x: null, y: null })),
  };
}

function netsOf(components: DraftComponent[], aliases: Record<string, string[]> = {}): DraftNet[] {
  const names = [
    ...new Set(components.flatMap((c) => c.pins.map((p) => p.net)).filter((n) => n !== null)),
  ];
  return names.map((name) => ({
    name,
    normalizedName: normalizeNetName(name),
    kind: 'signal',
    nominalVoltage: null,
    description: '',
    aliases: aliases[name] ?? [],
  }));
}

const ground = new Set(['GND']);

// Battery net names are common practice; no standard names them.
describe('isBatteryNetName', () => {
  it.each(['VBAT', 'vbat', 'VBATT', 'BAT', 'BATT', 'BAT+', 'VBAT+', 'BATTERY', 'V_BAT'])(
    'takes %s for the battery positive',
    (name) => {
      expect(isBatteryNetName(name)).toBe(true);
    },
  );

  it.each(['BAT-', 'VBAT_SNS', 'BAT_ID', 'VSYS', 'VBAT_CONN'])(
    'does not take %s for a plain battery name',
    (name) => {
      expect(isBatteryNetName(name)).toBe(false);
    },
  );
});

describe('detectRootNet', () => {
  it('picks the battery-named net on the battery connector', () => {
    const board = [
      part('J1', ['VBAT', 'GND', 'BAT_ID']),
      part('U1', ['VBAT', 'VSYS', 'GND']),
      part('L1', ['VSYS', 'VCC_3V3']),
    ];
    expect(detectRootNet(board, netsOf(board), ground)).toBe('VBAT');
  });

  it('picks BAT+ and never BAT-', () => {
    const board = [part('CN1', ['BAT-', 'BAT+']), part('U1', ['BAT+', 'BAT-', 'VSYS'])];
    expect(detectRootNet(board, netsOf(board), new Set(['BAT-']))).toBe('BAT+');
    expect(detectRootNet(board, netsOf(board), new Set())).toBe('BAT+');
  });

  it('does not pick a battery-named net that reaches no connector', () => {
    const board = [part('U1', ['VBAT', 'VSYS', 'GND']), part('J1', ['USB_VBUS', 'GND'])];
    expect(detectRootNet(board, netsOf(board), ground)).toBeNull();
  });

  it('falls back to a connector net that mentions the battery and reads as a rail', () => {
    const board = [
      part('J1', ['VBAT_CONN', 'BAT_ID', 'BATT_TEMP', 'GND']),
      part('F1', ['VBAT_CONN', 'VSYS']),
      part('R1', ['BAT_ID', 'GND']),
      part('R2', ['BATT_TEMP', 'GND']),
      part('R3', ['BATT_TEMP', 'VSYS']),
    ];
    expect(detectRootNet(board, netsOf(board), ground)).toBe('VBAT_CONN');
  });

  it('prefers a plain battery name over a busier net that only mentions the battery', () => {
    const board = [
      part('J1', ['VBAT_RAW', 'BATT']),
      part('U1', ['VBAT_RAW', 'VBAT_RAW', 'VBAT_RAW', 'BATT']),
    ];
    expect(detectRootNet(board, netsOf(board), ground)).toBe('BATT');
  });

  it('among several battery-named connector nets picks the one with most pins', () => {
    const board = [
      part('J1', ['VBAT', 'GND']),
      part('J2', ['BATT', 'GND']),
      part('U1', ['BATT', 'BATT', 'VSYS']),
      part('U2', ['VBAT', 'VSYS']),
    ];
    expect(detectRootNet(board, netsOf(board), ground)).toBe('BATT');
  });

  it('recognises the battery net by an alias', () => {
    const board = [part('J1', ['N0001', 'GND']), part('U1', ['N0001', 'VSYS'])];
    expect(detectRootNet(board, netsOf(board, { N0001: ['VBAT'] }), ground)).toBe('N0001');
  });

  it('takes a battery holder (BT) for a connector', () => {
    const board = [part('BT1', ['VBAT', 'GND']), part('U1', ['VBAT', 'VSYS'])];
    expect(detectRootNet(board, netsOf(board), ground)).toBe('VBAT');
  });

  it('returns null when no connector carries a battery net', () => {
    const board = [
      part('J1', ['USB_VBUS', 'USB_D+', 'USB_D-', 'GND']),
      part('U1', ['USB_VBUS', 'VSYS']),
    ];
    expect(detectRootNet(board, netsOf(board), ground)).toBeNull();
  });
});
