// Self-consistency checks of the invented demo data: there is no outside source for a board that
// does not exist, so these tests hold the generated boards to their own annotations and to the
// rules of the formats (IPC-D-356 via the project's reader, the shared zod schemas), and make sure
// the committed files cannot drift from the generator.
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import * as prettier from 'prettier';
import { describe, expect, it } from 'vitest';
import { annotationFileSchema, boardFileSchema, type AnnotationFile } from '@railyard/shared';
import { readIpcD356 } from '../packages/board-analysis/src/ipc-d-356-reader';
import { readPinListCsv } from '../packages/board-analysis/src/pin-list-csv-reader';
import type { DemoComponent } from './board-builder';
import { demoBoardFiles, jsonText } from './demo-board-files';
import { generateLaptopBoard, laptopMinimumComponents } from './laptop-board';
import { generatePhoneBoard } from './phone-board';
import { generateTabletBoard } from './tablet-board';

const boardsDir = join(dirname(fileURLToPath(import.meta.url)), 'boards');

const phone = generatePhoneBoard();
const tablet = generateTabletBoard();
const tabletAnnotations: AnnotationFile = {
  format: 'railyard-annotations',
  version: 1,
  rootNet: 'VSYS',
  nets: tablet.file.nets,
  components: [],
  powerLinks: tablet.file.powerLinks,
};
let laptopCache: ReturnType<typeof generateLaptopBoard> | undefined;
function laptop() {
  laptopCache ??= generateLaptopBoard();
  return laptopCache;
}

function netPins(components: readonly DemoComponent[]): Map<string, number> {
  const pins = new Map<string, number>();
  for (const c of components)
    for (const p of c.pins) if (p.net !== null) pins.set(p.net, (pins.get(p.net) ?? 0) + 1);
  return pins;
}

function pinCount(components: readonly DemoComponent[]): number {
  return components.reduce((sum, c) => sum + c.pins.length, 0);
}

/**
 * Neighbours in the power graph: entered converter and switch links, plus two-pin parts a rail
 * passes straight through (inductor, ferrite, fuse, 0 Ω link or milliohm shunt), ground excluded.
 */
function powerGraph(
  components: readonly DemoComponent[],
  annotations: AnnotationFile,
): Map<string, Set<string>> {
  const ground = new Set(annotations.nets.filter((n) => n.kind === 'ground').map((n) => n.name));
  const graph = new Map<string, Set<string>>();
  const join = (a: string, b: string) => {
    if (ground.has(a) || ground.has(b)) return;
    for (const [x, y] of [
      [a, b],
      [b, a],
    ] as const) {
      const set = graph.get(x) ?? new Set<string>();
      set.add(y);
      graph.set(x, set);
    }
  };
  for (const link of annotations.powerLinks) join(link.from, link.to);
  for (const c of components) {
    const passesThrough =
      c.kind === 'inductor' ||
      c.kind === 'ferrite' ||
      c.kind === 'fuse' ||
      (c.kind === 'resistor' && /^0R/.test(c.value));
    const [a, b] = c.pins.map((p) => p.net);
    if (passesThrough && c.pins.length === 2 && a && b && a !== b) join(a, b);
  }
  return graph;
}

/** Breadth-first distance from each start net over the power graph. */
function distances(
  graph: Map<string, Set<string>>,
  starts: readonly string[],
): Map<string, number> {
  const distance = new Map<string, number>(starts.map((s) => [s, 0]));
  const queue = [...starts];
  for (let head = 0; head < queue.length; head++) {
    const net = queue[head] as string;
    for (const next of graph.get(net) ?? []) {
      if (distance.has(next)) continue;
      distance.set(next, (distance.get(net) ?? 0) + 1);
      queue.push(next);
    }
  }
  return distance;
}

const boards = [
  {
    name: 'phone',
    components: () => phone.components,
    annotations: () => phone.annotations,
    sources: ['VBAT', 'USB_VBUS_CONN'],
  },
  // The daughterboard gets VSYS, VCC_1V8 and VCC_3V3 from the mainboard and VBUS from its USB-C port.
  {
    name: 'tablet',
    components: () => tablet.components,
    annotations: () => tabletAnnotations,
    sources: ['VSYS', 'VCC_1V8', 'VCC_3V3', 'USB_VBUS_CONN'],
  },
  {
    name: 'laptop',
    components: () => laptop().components,
    annotations: () => laptop().annotations,
    sources: ['DC_IN', 'VBAT_PACK'],
  },
] as const;

describe.each(boards)('the $name demo board', ({ components, annotations, sources }) => {
  it('uses every reference designator once', () => {
    const refdes = components().map((c) => c.refdes);
    expect(refdes.length - new Set(refdes).size).toBe(0);
  });

  it('has every annotated net in its netlist', () => {
    const pins = netPins(components());
    const missing = annotations()
      .nets.map((n) => n.name)
      .filter((name) => !pins.has(name));
    expect(missing).toEqual([]);
  });

  it('gives every annotated power rail a nominal voltage, switch nodes excepted', () => {
    const without = annotations()
      .nets.filter(
        (n) =>
          n.kind === 'power' && (n.nominalVoltage ?? null) === null && !n.name.startsWith('LX_'),
      )
      .map((n) => n.name);
    expect(without).toEqual([]);
  });

  it('routes each converter and switch link through a part that touches both of its nets', () => {
    const byRefdes = new Map(components().map((c) => [c.refdes, c] as const));
    const broken = annotations()
      .powerLinks.filter((link) => {
        const nets = new Set(byRefdes.get(link.via)?.pins.map((p) => p.net));
        return !(nets.has(link.from) && nets.has(link.to));
      })
      .map((link) => `${link.from} → ${link.to} via ${link.via}`);
    expect(broken).toEqual([]);
  });

  it('enters only converter and switch links, leaving series parts to the importer', () => {
    expect(annotations().powerLinks.filter((link) => link.kind === 'series')).toEqual([]);
  });

  it('feeds every switch node through an inductor to an annotated rail', () => {
    const rails = new Set(
      annotations()
        .nets.filter((n) => n.kind === 'power')
        .map((n) => n.name),
    );
    const switchNodes = [...rails].filter((name) => name.startsWith('LX_'));
    const fed = new Set(
      components()
        .filter((c) => c.kind === 'inductor' && c.pins.length === 2)
        .flatMap((c) => {
          const [a, b] = c.pins.map((p) => p.net ?? '');
          return rails.has(a ?? '') && rails.has(b ?? '') ? [a, b] : [];
        }),
    );
    expect(switchNodes.length).toBeGreaterThan(0);
    expect(switchNodes.filter((lx) => !fed.has(lx))).toEqual([]);
  });

  it('reaches every annotated power rail from its supply inputs', () => {
    const reached = distances(powerGraph(components(), annotations()), sources);
    const unreached = annotations()
      .nets.filter((n) => n.kind === 'power' && !reached.has(n.name))
      .map((n) => n.name);
    expect(unreached).toEqual([]);
  });

  it('leaves no signal net with a single pin', () => {
    const rails = new Set(annotations().nets.map((n) => n.name));
    const single = [...netPins(components())]
      .filter(([net, count]) => count === 1 && !rails.has(net))
      .map(([net]) => net);
    expect(single).toEqual([]);
  });

  it('never puts two pads of different parts on the same spot of the same side', () => {
    const taken = new Map<string, string>();
    const clashes: string[] = [];
    for (const c of components()) {
      const sides = c.side ? [c.side] : ['top', 'bottom'];
      for (const p of c.pins) {
        for (const side of sides) {
          const key = `${side}:${p.x}:${p.y}`;
          const owner = taken.get(key);
          if (owner !== undefined && owner !== c.refdes)
            clashes.push(`${owner} and ${c.refdes}-${p.pin} at ${key}`);
          taken.set(key, c.refdes);
        }
      }
    }
    expect(clashes).toEqual([]);
  });
});

describe('the phone demo board', () => {
  it('has between 500 and 900 parts, on both sides of the board', () => {
    expect(phone.components.length).toBeGreaterThanOrEqual(500);
    expect(phone.components.length).toBeLessThanOrEqual(900);
    expect(phone.components.some((c) => c.side === 'top')).toBe(true);
    expect(phone.components.some((c) => c.side === 'bottom')).toBe(true);
  });

  it('keeps every pad inside its 65 × 140 mm outline', () => {
    const outside = phone.components.flatMap((c) =>
      c.pins
        .filter(
          (p) => !((p.x ?? -1) > 0 && (p.x ?? -1) < 65 && (p.y ?? -1) > 0 && (p.y ?? -1) < 140),
        )
        .map((p) => `${c.refdes}-${p.pin}`),
    );
    expect(outside).toEqual([]);
  });

  it('has a PMIC with at least six outputs, each entered as a converter link from VSYS', () => {
    const fromVsys = phone.annotations.powerLinks.filter(
      (l) => l.from === 'VSYS' && l.kind === 'converter',
    );
    const byPart = new Map<string, number>();
    for (const link of fromVsys) byPart.set(link.via, (byPart.get(link.via) ?? 0) + 1);
    expect(Math.max(...byPart.values())).toBeGreaterThanOrEqual(6);
  });

  it('reads back from its committed IPC-D-356 file with the same pins, nets and positions', () => {
    const read = readIpcD356(readFileSync(join(boardsDir, phone.slug, 'netlist.ipc'), 'utf8'));
    expect(read.errors).toEqual([]);
    const pins = (
      components: readonly { refdes: string; pins: { pin: string; net: string | null }[] }[],
    ) =>
      components.flatMap((c) => c.pins.map((p) => `${c.refdes}-${p.pin}=${p.net ?? 'N/C'}`)).sort();
    expect(pins(read.components)).toEqual(pins(phone.components));
    // FACTS §1: inch units resolve 0.0001 in = 2.54 µm, so positions come back within half of that.
    const generated = new Map(
      phone.components.flatMap((c) => c.pins.map((p) => [`${c.refdes}-${p.pin}`, p] as const)),
    );
    const worst = Math.max(
      ...read.components.flatMap((c) =>
        c.pins.map((p) => {
          const g = generated.get(`${c.refdes}-${p.pin}`);
          return Math.max(
            Math.abs((p.x ?? NaN) - (g?.x ?? NaN)),
            Math.abs((p.y ?? NaN) - (g?.y ?? NaN)),
          );
        }),
      ),
    );
    expect(worst).toBeLessThanOrEqual(0.00127 + 1e-9);
  });

  it('lists every netlist part once in its parts list', () => {
    const lines = readFileSync(join(boardsDir, phone.slug, 'parts.csv'), 'utf8')
      .trim()
      .split('\n')
      .slice(1);
    expect(lines.map((line) => line.split(',')[0]).sort()).toEqual(
      phone.components.map((c) => c.refdes).sort(),
    );
  });

  it('passes the annotation file schema', () => {
    const text = readFileSync(join(boardsDir, phone.slug, 'annotations.json'), 'utf8');
    expect(annotationFileSchema.safeParse(JSON.parse(text)).success).toBe(true);
  });
});

describe('the tablet demo board', () => {
  it('has between 150 and 400 parts', () => {
    expect(tablet.components.length).toBeGreaterThanOrEqual(150);
    expect(tablet.components.length).toBeLessThanOrEqual(400);
  });

  it('passes the railyard-board file schema', () => {
    const text = readFileSync(join(boardsDir, tablet.slug, 'board.json'), 'utf8');
    const result = boardFileSchema.safeParse(JSON.parse(text));
    expect(result.error?.issues ?? []).toEqual([]);
  });

  it('has a pin-list CSV with the same pins and nets as its board file', () => {
    const read = readPinListCsv(readFileSync(join(boardsDir, tablet.slug, 'pins.csv'), 'utf8'));
    expect(read.errors).toEqual([]);
    const pins = (
      components: readonly { refdes: string; pins: { pin: string; net: string | null }[] }[],
    ) =>
      components.flatMap((c) => c.pins.map((p) => `${c.refdes}-${p.pin}=${p.net ?? 'N/C'}`)).sort();
    expect(pins(read.components)).toEqual(pins(tablet.file.components));
  });
});

describe('the synthetic laptop board', () => {
  it('has 10,000 parts and 30,000 pins within 10 % by default', () => {
    const board = laptop();
    expect(board.components.length).toBe(10_000);
    const pins = pinCount(board.components);
    expect(pins).toBeGreaterThanOrEqual(27_000);
    expect(pins).toBeLessThanOrEqual(33_000);
  });

  it('has more than twenty converters in a power tree at least eight levels deep', () => {
    const board = laptop();
    const converters = board.annotations.powerLinks.filter((l) => l.kind === 'converter');
    expect(converters.length).toBeGreaterThan(20);
    const depth = Math.max(
      ...distances(powerGraph(board.components, board.annotations), ['DC_IN']).values(),
    );
    expect(depth).toBeGreaterThanOrEqual(8);
  });

  it('has thousands of decoupling capacitors and resistors', () => {
    const count = (kind: string) => laptop().components.filter((c) => c.kind === kind).length;
    expect(count('capacitor')).toBeGreaterThan(2_000);
    expect(count('resistor')).toBeGreaterThan(1_000);
  });

  it('gives exactly the number of parts asked for', () => {
    expect(generateLaptopBoard({ components: 3_000 }).components.length).toBe(3_000);
  });

  it('refuses fewer parts than its fixed skeleton needs, saying how many it needs', () => {
    expect(() => generateLaptopBoard({ components: laptopMinimumComponents - 1 })).toThrow(
      /at least 2000/,
    );
  });

  it('passes the annotation file schema', () => {
    expect(annotationFileSchema.safeParse(laptop().annotations).success).toBe(true);
  });
});

describe('the demo generators', () => {
  it('give the same board for the same seed and a different board for another seed', () => {
    const text = (components: readonly DemoComponent[]) => JSON.stringify(components);
    expect(text(generatePhoneBoard({ seed: 7 }).components)).toBe(
      text(generatePhoneBoard({ seed: 7 }).components),
    );
    expect(text(generatePhoneBoard({ seed: 7 }).components)).not.toBe(
      text(generatePhoneBoard({ seed: 8 }).components),
    );
    expect(text(generateTabletBoard({ seed: 7 }).components)).toBe(
      text(generateTabletBoard({ seed: 7 }).components),
    );
    const small = (seed: number) =>
      text(generateLaptopBoard({ seed, components: 2_500 }).components);
    expect(small(7)).toBe(small(7));
    expect(small(7)).not.toBe(small(8));
  });

  it('match the committed files in seed/boards exactly, with no stray files beside them', () => {
    const expected = demoBoardFiles();
    for (const file of expected) {
      expect(readFileSync(join(boardsDir, file.path), 'utf8'), file.path).toBe(file.content);
    }
    const onDisk = readdirSync(boardsDir, { recursive: true, withFileTypes: true })
      .filter((entry) => entry.isFile())
      .map((entry) => relative(boardsDir, join(entry.parentPath, entry.name)))
      .sort();
    expect(onDisk).toEqual(expected.map((file) => file.path).sort());
  });

  it('write JSON that the repository formatter leaves unchanged', async () => {
    const sample = jsonText({
      nets: [{ name: 'VBAT', aliases: ['BATT_POS'] }],
      pins: [{ pin: '1', net: null }],
    });
    const jsonFiles = [
      ...demoBoardFiles().filter((f) => f.path.endsWith('.json')),
      { path: 'sample.json', content: sample },
    ];
    for (const file of jsonFiles) {
      const options = (await prettier.resolveConfig(join(boardsDir, file.path))) ?? {};
      const formatted = await prettier.format(file.content, {
        ...options,
        filepath: join(boardsDir, file.path),
      });
      expect(formatted, file.path).toBe(file.content);
    }
  });
});
