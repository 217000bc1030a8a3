// A board whose power tree has a given number of rails, as a `railyard-board` file (docs/formats.md):
// the battery feeds five converters or load switches, each of those five more, and so on, every rail
// with two capacitors to ground. It exists to load the graph, so its names only need to be distinct.
import type { BoardFile, BoardFileComponent, PowerLinkInput } from '@railyard/shared';

const fanOut = 5;
const voltages = [5, 3.3, 1.8, 1.2, 1.0, 0.9, 0.8];

function voltName(volts: number): string {
  const [whole, fraction = '0'] = volts.toFixed(1).split('.');
  return `${whole}V${fraction}`;
}

export function railName(index: number, volts: number): string {
  const family = ['VCC', 'VDD', 'VIO'][index % 3]!;
  return `${family}_${voltName(volts)}_${String(index).padStart(3, '0')}`;
}

export function powerTreeBoardFile(railCount: number): BoardFile {
  const rails: { name: string; volts: number; parent: number | null }[] = [
    { name: 'VBAT', volts: 3.8, parent: null },
  ];
  for (let i = 1; i < railCount; i++) {
    const volts = voltages[i % voltages.length]!;
    rails.push({ name: railName(i, volts), volts, parent: Math.floor((i - 1) / fanOut) });
  }
  const components: BoardFileComponent[] = [
    {
      refdes: 'J1',
      kind: 'connector',
      pins: [
        { pin: '1', net: 'VBAT' },
        { pin: '2', net: 'GND' },
      ],
    },
  ];
  const powerLinks: PowerLinkInput[] = [];
  rails.forEach((rail, i) => {
    for (const [n, value] of [
      [2 * i + 1, '10uF'],
      [2 * i + 2, '100nF'],
    ] as const) {
      components.push({
        refdes: `C${n}`,
        kind: 'capacitor',
        value,
        pins: [
          { pin: '1', net: rail.name },
          { pin: '2', net: 'GND' },
        ],
      });
    }
    if (rail.parent === null) return;
    const source = rails[rail.parent]!.name;
    const via = `U${i}`;
    components.push({
      refdes: via,
      kind: 'ic',
      pins: [
        { pin: '1', net: source },
        { pin: '2', net: rail.name },
        { pin: '3', net: 'GND' },
      ],
    });
    powerLinks.push({
      from: source,
      to: rail.name,
      via,
      kind: i % 4 === 0 ? 'switch' : 'converter',
    });
  });
  return {
    format: 'railyard-board',
    version: 1,
    board: { title: `Bench power tree, ${railCount} rails` },
    rootNet: 'VBAT',
    nets: [
      ...rails.map((rail) => ({
        name: rail.name,
        kind: 'power' as const,
        nominalVoltage: rail.volts,
      })),
      { name: 'GND', kind: 'ground' as const },
    ],
    components,
    powerLinks,
  };
}
