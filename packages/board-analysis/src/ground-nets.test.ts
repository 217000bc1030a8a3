import { describe, expect, it } from 'vitest';
import type { RawComponent } from './board-draft';
import { findGroundNets } from './ground-nets';

function part(refdes: string, nets: (string | null)[]): RawComponent {
  return { refdes, pins: nets.map((net, i) => ({ pin: String(i + 1), net })) };
}

/** An IC with `icPins` pins spread over the given nets, plus decoupling capacitors rail → ground. */
function decoupledBoard(options: {
  ground: string;
  rails: string[];
  capacitorsPerRail: number;
  icPins: Record<string, number>;
}): RawComponent[] {
  const icNets = Object.entries(options.icPins).flatMap(([net, count]) =>
    Array.from({ length: count }, () => net),
  );
  const parts = [part('U1', icNets)];
  let n = 1;
  for (const rail of options.rails) {
    for (let i = 0; i < options.capacitorsPerRail; i++)
      parts.push(part(`C${n++}`, [rail, options.ground]));
  }
  parts.push(part('R1', ['I2C_SDA', 'VCC_3V3']), part('R2', ['I2C_SCL', 'VCC_3V3']));
  return parts;
}

// Net naming and the decoupling pattern are common practice; there is no standard to cite.
describe('findGroundNets', () => {
  it('finds ground by its name', () => {
    const board = decoupledBoard({
      ground: 'GND',
      rails: ['VCC_3V3', 'VDD_CPU'],
      capacitorsPerRail: 4,
      icPins: { GND: 8, VCC_3V3: 2, VDD_CPU: 4, I2C_SDA: 1, I2C_SCL: 1 },
    });
    expect(findGroundNets(board)).toEqual(['GND']);
  });

  it('finds every ground net by name, most connected first', () => {
    const board = [
      part('C1', ['VCC_3V3', 'GND']),
      part('C2', ['VCC_3V3', 'GND']),
      part('C3', ['AVDD', 'AGND']),
      part('U1', ['GND', 'GND', 'AGND', 'VCC_3V3', 'AVDD', 'PGND']),
    ];
    expect(findGroundNets(board)).toEqual(['GND', 'AGND', 'PGND']);
  });

  it('finds an oddly named ground by its connections when it dominates and touches most capacitors', () => {
    const board = decoupledBoard({
      ground: 'N0001',
      rails: ['VCC_3V3', 'VDD_CPU'],
      capacitorsPerRail: 6,
      icPins: { N0001: 10, VCC_3V3: 2, VDD_CPU: 4, I2C_SDA: 1, I2C_SCL: 1 },
    });
    expect(findGroundNets(board)).toEqual(['N0001']);
  });

  it('does not take a power rail for ground even when it is the most connected net', () => {
    // VDD_CPU: 100 IC pins + 20 capacitors = 120, more than twice GND's 30 + 20 = 50, and it
    // touches every capacitor; only its name keeps it out
    const board = decoupledBoard({
      ground: 'GND',
      rails: ['VDD_CPU'],
      capacitorsPerRail: 20,
      icPins: { VDD_CPU: 100, GND: 30, I2C_SDA: 1, I2C_SCL: 1 },
    });
    expect(findGroundNets(board)).toEqual(['GND']);
  });

  it('does not take the most connected net for ground when it does not lead the next clearly', () => {
    // N0001 has 16 pins, N0002 has 12: less than twice as many
    const board = [
      ...decoupledBoard({
        ground: 'N0001',
        rails: ['N0002'],
        capacitorsPerRail: 6,
        icPins: { N0001: 10, N0002: 6 },
      }),
    ];
    expect(findGroundNets(board)).toEqual([]);
  });

  it('does not take the most connected net for ground when it touches few capacitors', () => {
    const board = [
      part(
        'U1',
        Array.from({ length: 30 }, () => 'N0001'),
      ),
      part('C1', ['VCC_3V3', 'N0005']),
      part('C2', ['VCC_3V3', 'N0005']),
      part('C3', ['VCC_3V3', 'N0005']),
      part('C4', ['VCC_3V3', 'N0001']),
    ];
    expect(findGroundNets(board)).toEqual([]);
  });

  it('does not decide by count on a board with fewer than three capacitors', () => {
    const board = [
      part(
        'U1',
        Array.from({ length: 30 }, () => 'N0001'),
      ),
      part('C1', ['VCC_3V3', 'N0001']),
    ];
    expect(findGroundNets(board)).toEqual([]);
  });

  it('does not take a ground sense line for ground', () => {
    const board = [part('U1', ['GND', 'GND_SENSE', 'GNDSENSE', 'VCC_3V3'])];
    expect(findGroundNets(board)).toEqual(['GND']);
  });

  it('uses a kind given by the netlist over the refdes to count capacitors', () => {
    const capacitor = (refdes: string, rail: string): RawComponent => ({
      ...part(refdes, [rail, 'N0001']),
      kind: 'capacitor',
    });
    const board = [
      part(
        'U1',
        Array.from({ length: 6 }, () => 'N0001'),
      ),
      capacitor('X1', 'VCC_3V3'),
      capacitor('X2', 'VCC_3V3'),
      capacitor('X3', 'VCC_3V3'),
    ];
    expect(findGroundNets(board)).toEqual(['N0001']);
  });

  it('ignores pins that are not connected', () => {
    const board = [part('U1', [null, null, null, 'GND'])];
    expect(findGroundNets(board)).toEqual(['GND']);
  });
});
