// A synthetic notebook mainboard ("Carrow notebook", board CN-MB-7740) for benchmarks and scale
// tests: about 10,000 parts and 30,000 pins by default, with a power tree several levels deep
// (adapter input → input FETs → charger → VSYS → two dozen converters → load switches and ferrites
// → sub-rails). The skeleton — processor, graphics, memory, connectors, every converter and switch —
// is laid out by hand; the rest is filled with decoupling, pull resistors and small ICs until the
// requested part count is reached, steering toward three pins per part. Invented throughout.
import type { AnnotationFile } from '@railyard/shared';
import { ballMap } from './ball-map';
import { BoardBuilder, type DemoComponent, type Placement, type Point } from './board-builder';
import {
  chip,
  connectorRows,
  customFootprint,
  dualRow,
  gridArray,
  pad,
  powerInductor,
  quadFlat,
  singlePad,
  sot3,
  type Footprint,
} from './footprints';
import { Random } from './random';

export const laptopBoardSeed = 0x7740;
export const laptopDefaultComponents = 10_000;
/** Below this the fixed skeleton alone would not fit the budget. */
export const laptopMinimumComponents = 2_000;
const pinsPerComponent = 3;

const c0201 = chip('0201');
const c0402 = chip('0402');
const c0603 = chip('0603');
const c0805 = chip('0805');
const c1206 = chip('1206');

export interface LaptopBoard {
  job: string;
  title: string;
  revision: string;
  components: DemoComponent[];
  annotations: AnnotationFile;
}

interface Load {
  at: Point;
  weight: number;
  /** half the body size: caps go on the far side within this radius first */
  radius: number;
}

type ConverterTopology = 'buck' | 'ldo' | 'multiphase';

interface ConverterSpec {
  rail: string;
  volts: number;
  input: string;
  topology: ConverterTopology;
  phases?: number;
  at: Point;
  description?: string;
}

interface SwitchSpec {
  rail: string;
  volts: number;
  input: string;
  device: 'ic' | 'mosfet';
  at: Point;
  description?: string;
}

interface FerriteSpec {
  rail: string;
  volts: number;
  input: string;
  at: Point;
}

// prettier-ignore
const converters: readonly ConverterSpec[] = [
  { rail: 'VCC_5V0_S5', volts: 5.0, input: 'VSYS', topology: 'buck', at: { x: 28, y: 100 }, description: 'Standby 5 V rail: USB ports, fan and speaker supplies hang behind its switches.' },
  { rail: 'VCC_3V3_S5', volts: 3.3, input: 'VSYS', topology: 'buck', at: { x: 28, y: 75 }, description: 'Standby 3.3 V rail; parent of the 1.8 V, 0.8 V and memory I/O converters.' },
  { rail: 'VCC_3V3_EC', volts: 3.3, input: 'VSYS', topology: 'ldo', at: { x: 80, y: 14 }, description: 'Always-on supply of the embedded controller; present whenever VSYS is.' },
  { rail: 'VCC_1V8_S5', volts: 1.8, input: 'VCC_3V3_S5', topology: 'buck', at: { x: 50, y: 100 } },
  { rail: 'VCC_0V8_S5', volts: 0.8, input: 'VCC_3V3_S5', topology: 'buck', at: { x: 50, y: 75 }, description: 'Always-on logic of the processor platform hub.' },
  { rail: 'VDD_CORE', volts: 1.0, input: 'VSYS', topology: 'multiphase', phases: 3, at: { x: 150, y: 118 }, description: 'Processor core rail, three phases. Reads a few ohms to ground on good boards; compare with a known-good board.' },
  { rail: 'VDD_GFX', volts: 0.9, input: 'VSYS', topology: 'multiphase', phases: 2, at: { x: 118, y: 118 }, description: 'Integrated graphics rail, two phases.' },
  { rail: 'VDD_FABRIC', volts: 1.05, input: 'VSYS', topology: 'buck', at: { x: 100, y: 75 } },
  { rail: 'VCC_1V05_S0', volts: 1.05, input: 'VSYS', topology: 'buck', at: { x: 100, y: 50 } },
  { rail: 'VDD1_MEM', volts: 1.8, input: 'VSYS', topology: 'buck', at: { x: 72, y: 50 } },
  { rail: 'VDD2_MEM', volts: 1.05, input: 'VSYS', topology: 'buck', at: { x: 72, y: 75 }, description: 'Memory core rail shared by the processor memory PHY and the four DRAM packages.' },
  { rail: 'VDDQ_MEM', volts: 0.5, input: 'VCC_3V3_S5', topology: 'buck', at: { x: 72, y: 100 } },
  { rail: 'VDD_DGPU', volts: 0.9, input: 'VSYS', topology: 'multiphase', phases: 2, at: { x: 215, y: 118 }, description: 'Discrete graphics core rail, two phases.' },
  { rail: 'VDDQ_GMEM', volts: 1.35, input: 'VSYS', topology: 'buck', at: { x: 245, y: 118 } },
  { rail: 'VCC_1V8_DGPU', volts: 1.8, input: 'VCC_3V3_S0', topology: 'ldo', at: { x: 190, y: 112 } },
  { rail: 'VCC_1V2_CAM', volts: 1.2, input: 'VCC_3V3_CAM', topology: 'ldo', at: { x: 262, y: 122 } },
  { rail: 'VCC_2V8_CAM', volts: 2.8, input: 'VCC_3V3_CAM', topology: 'ldo', at: { x: 270, y: 122 } },
];

// prettier-ignore
const switches: readonly SwitchSpec[] = [
  { rail: 'VCC_5V0_S0', volts: 5.0, input: 'VCC_5V0_S5', device: 'mosfet', at: { x: 28, y: 118 } },
  { rail: 'VCC_3V3_S0', volts: 3.3, input: 'VCC_3V3_S5', device: 'mosfet', at: { x: 28, y: 55 }, description: 'Main 3.3 V rail while running; parent of the storage, radio, panel and camera switches.' },
  { rail: 'VCC_1V8_S0', volts: 1.8, input: 'VCC_1V8_S5', device: 'ic', at: { x: 50, y: 118 } },
  { rail: 'VCC_3V3_SSD1', volts: 3.3, input: 'VCC_3V3_S0', device: 'ic', at: { x: 250, y: 14 } },
  { rail: 'VCC_3V3_SSD2', volts: 3.3, input: 'VCC_3V3_S0', device: 'ic', at: { x: 190, y: 14 } },
  { rail: 'VCC_3V3_WLAN', volts: 3.3, input: 'VCC_3V3_S0', device: 'ic', at: { x: 272, y: 45 } },
  { rail: 'VCC_3V3_LCD', volts: 3.3, input: 'VCC_3V3_S0', device: 'ic', at: { x: 240, y: 100 } },
  { rail: 'VCC_3V3_CAM', volts: 3.3, input: 'VCC_3V3_S0', device: 'ic', at: { x: 252, y: 106 } },
  { rail: 'VCC_3V3_TP', volts: 3.3, input: 'VCC_3V3_S5', device: 'ic', at: { x: 130, y: 14 } },
  { rail: 'VCC_5V0_USB1', volts: 5.0, input: 'VCC_5V0_S0', device: 'ic', at: { x: 280, y: 22 } },
  { rail: 'VCC_5V0_USB2', volts: 5.0, input: 'VCC_5V0_S0', device: 'ic', at: { x: 280, y: 88 } },
  { rail: 'VCC_5V0_USBA', volts: 5.0, input: 'VCC_5V0_S0', device: 'ic', at: { x: 280, y: 110 } },
  { rail: 'VCC_5V0_FAN', volts: 5.0, input: 'VCC_5V0_S0', device: 'mosfet', at: { x: 230, y: 10 } },
  { rail: 'VCC_5V0_HDMI', volts: 5.0, input: 'VCC_5V0_S0', device: 'ic', at: { x: 280, y: 66 } },
];

// prettier-ignore
const ferrites: readonly FerriteSpec[] = [
  { rail: 'VCC_1V8_AUD', volts: 1.8, input: 'VCC_1V8_S0', at: { x: 60, y: 26 } },
  { rail: 'VCC_5V0_AUD', volts: 5.0, input: 'VCC_5V0_S0', at: { x: 64, y: 26 } },
  { rail: 'VCC_3V3_AUD', volts: 3.3, input: 'VCC_3V3_S0', at: { x: 68, y: 26 } },
  { rail: 'VCC_1V8_PLL', volts: 1.8, input: 'VCC_1V8_S0', at: { x: 132, y: 40 } },
];

const gpuMemChannels = 4;
const dramPackages = 4;

export function generateLaptopBoard(
  options: { seed?: number; components?: number } = {},
): LaptopBoard {
  const target = options.components ?? laptopDefaultComponents;
  if (!Number.isInteger(target) || target < laptopMinimumComponents) {
    throw new RangeError(
      `components must be an integer of at least ${laptopMinimumComponents}, got ${target}`,
    );
  }
  const random = new Random(options.seed ?? laptopBoardSeed);
  // Boards with more parts get more room, so part density stays that of the default board.
  const grow = Math.max(1, Math.sqrt(target / laptopDefaultComponents));
  const scale = target / laptopDefaultComponents;
  const b = new BoardBuilder(round(300 * grow), round(130 * grow), random);
  const world = new LaptopWorld(b, random, grow, scale);

  world.declareRails();
  world.mountingHoles();
  world.inputAndCharger();
  for (const spec of converters) world.converter(spec);
  for (const spec of switches) world.loadSwitch(spec);
  for (const spec of ferrites) world.ferrite(spec);
  world.processor();
  world.memory();
  world.graphics();
  world.platform();
  world.connectors();
  world.testPoints();
  world.fill(target, target * pinsPerComponent);

  const title = 'Carrow notebook mainboard (synthetic)';
  return {
    job: 'CN-MB-7740',
    title,
    revision: 'C',
    components: b.components,
    annotations: b.annotations(
      {
        title,
        deviceFamily: 'Carrow notebook',
        boardNumber: 'CN-MB-7740',
        revision: 'C',
        batteryVoltage: 11.55,
        notes: `Invented scale-test board: ${b.components.length} parts. Three-cell battery (11.55 V nominal), 20 V adapter input.`,
      },
      'DC_IN',
    ),
  };
}

/** Board state shared by the skeleton steps and the filler. */
class LaptopWorld {
  private readonly loads = new Map<string, Load[]>();
  /** Signal nets with one pin so far: the filler ties them to something. */
  private readonly lonely = new Set<string>();
  private readonly seenSignals = new Set<string>();
  /** The same nets in first-seen order, for picking at random without copying the set. */
  private readonly signalList: string[] = [];
  private readonly railNames = new Set<string>(['GND']);
  private readonly pullTargets: string[] = [];
  private readonly connectorSignals: string[][] = [];
  private readonly smbus = ['SMB_CLK', 'SMB_DAT'] as const;
  private gateCount = 0;
  private filterCount = 0;

  constructor(
    private readonly b: BoardBuilder,
    private readonly random: Random,
    private readonly grow: number,
    private readonly scale: number,
  ) {}

  /** Maps a position drawn for the default outline onto a grown one. */
  private at(p: Point): Point {
    return { x: round(p.x * this.grow), y: round(p.y * this.grow) };
  }

  private top(p: Point, spread = 3): Placement {
    return { side: 'top', at: this.at(p), spread };
  }

  private bottom(p: Point, spread = 3): Placement {
    return { side: 'bottom', at: this.at(p), spread };
  }

  private addLoad(rail: string, at: Point, weight: number, radius: number): void {
    const list = this.loads.get(rail) ?? [];
    list.push({ at, weight, radius });
    this.loads.set(rail, list);
  }

  /** Records signal nets of a new part, so the filler can tie those left with a single pin. */
  private note(component: DemoComponent): DemoComponent {
    for (const pin of component.pins) {
      const net = pin.net;
      if (net === null || this.isRailOrGround(net)) continue;
      if (this.lonely.has(net)) this.lonely.delete(net);
      else if (!this.seenSignals.has(net)) {
        this.lonely.add(net);
        this.seenSignals.add(net);
        this.signalList.push(net);
      }
    }
    return component;
  }

  private isRailOrGround(net: string): boolean {
    return this.railNames.has(net);
  }

  private rail(name: string, volts: number | null, description?: string, aliases?: string[]): void {
    this.b.rail(name, volts, description, aliases);
    this.railNames.add(name);
  }

  private part(input: Parameters<BoardBuilder['add']>[0]): DemoComponent {
    return this.note(this.b.add(input));
  }

  private two(
    prefix: string,
    kind: DemoComponent['kind'],
    value: string,
    footprint: Footprint,
    a: string | null,
    z: string | null,
    place: Placement,
  ): DemoComponent {
    return this.note(this.b.twoPin(prefix, kind, value, footprint, a, z, place));
  }

  declareRails(): void {
    this.b.groundRail('GND', 'Board ground.');
    this.rail('DC_IN', 20.0, 'Adapter input at the DC jack; the root of the power tree.', [
      'ADP_IN',
    ]);
    this.rail('ADP_MID', 20.0, 'Between the two back-to-back input FETs.');
    this.rail('VIN_SNS', 20.0, 'Charger input before the input current-sense resistor.');
    this.rail('VIN_CHG', 20.0, 'Charger input after the current-sense resistor.');
    this.rail('LX_CHG', null, 'Charger switch node; not a DC rail.');
    this.rail(
      'VSYS',
      11.55,
      'Main system rail from the charger; feeds every first-level converter.',
      ['SYS_MAIN'],
    );
    this.rail(
      'VBAT',
      11.55,
      'Battery pack positive after the battery current-sense resistor; joined to VSYS by the battery FET.',
    );
    this.rail('VBAT_PACK', 11.55, 'Battery connector positive.');
    this.rail('CHG_DRV', 6.0, 'Charger gate-drive regulator output.');
    this.rail('EC_VCORE', 1.2, 'Embedded controller core, from its internal regulator.');
    this.rail('LX_BL', null, 'Switch node of the backlight boost; not a DC rail.');
    this.rail('VBL_LED', 30.0, 'Panel backlight LED string supply from the boost.');
    for (const spec of converters) {
      if (spec.topology === 'buck')
        this.rail(lxName(spec.rail), null, `Switch node of the ${spec.rail} buck; not a DC rail.`);
      if (spec.topology === 'multiphase') {
        for (let phase = 1; phase <= (spec.phases ?? 1); phase++) {
          this.rail(
            lxName(spec.rail, phase),
            null,
            `Phase ${phase} switch node of the ${spec.rail} regulator; not a DC rail.`,
          );
        }
      }
      this.rail(spec.rail, spec.volts, spec.description);
    }
    for (const spec of switches)
      this.rail(spec.rail, spec.volts, spec.description ?? `${spec.input} behind a load switch.`);
    for (const spec of ferrites)
      this.rail(spec.rail, spec.volts, `${spec.input} through a ferrite bead.`);
    this.pullTargets.push('VCC_3V3_S0', 'VCC_3V3_S0', 'VCC_1V8_S0', 'VCC_3V3_EC', 'VCC_3V3_S5');
  }

  mountingHoles(): void {
    this.b.block(null);
    const hole = singlePad('HOLE-3.0', 3.0);
    for (const p of [
      { x: 4, y: 4 },
      { x: 296, y: 4 },
      { x: 4, y: 126 },
      { x: 296, y: 126 },
      { x: 120, y: 20 },
      { x: 180, y: 100 },
      { x: 260, y: 70 },
      { x: 60, y: 60 },
    ]) {
      this.part({
        prefix: 'H',
        kind: 'other',
        value: 'MOUNTING HOLE',
        footprint: hole,
        nets: ['GND'],
        place: { side: 'through', at: this.at(p), spread: 4 },
      });
    }
  }

  inputAndCharger(): void {
    const b = this.b;
    const jack = this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'DC JACK 20V',
      footprint: customFootprint('DCJACK-TH-4P', 10.0, 9.0, [
        pad('1', -3.0, 2.5),
        pad('2', -3.0, -2.5),
        pad('3', 3.0, 2.5),
        pad('4', 3.0, -2.5),
      ]),
      nets: ['DC_IN', 'DC_IN', 'GND', 'GND'],
      place: { side: 'through', at: this.at({ x: 9, y: 40 }), spread: 2 },
    });
    const near = { x: jack.x / this.grow + 10, y: jack.y / this.grow };
    this.two(
      'D',
      'tvs',
      'TVS 24V',
      customFootprint('SMA', 4.3, 2.6, [pad('1', -1.9, 0), pad('2', 1.9, 0)]),
      'DC_IN',
      'GND',
      this.top(near),
    );
    this.caps('DC_IN', this.top(near), [
      [2, '10uF/25V', c0805],
      [2, '100nF/25V', c0402],
    ]);
    const fet = dualRow('DFN-8 3X3', 4, 0.65, 2.2, 3.3, 3.3);
    const q1 = this.part({
      prefix: 'Q',
      kind: 'mosfet',
      value: 'NMOS 30V 8MR',
      footprint: fet,
      nets: ['DC_IN', 'DC_IN', 'DC_IN', 'ADP_GATE', 'ADP_MID', 'ADP_MID', 'ADP_MID', 'ADP_MID'],
      place: this.top({ x: 20, y: 30 }),
    });
    const q2 = this.part({
      prefix: 'Q',
      kind: 'mosfet',
      value: 'NMOS 30V 8MR',
      footprint: fet,
      nets: [
        'VIN_SNS',
        'VIN_SNS',
        'VIN_SNS',
        'ADP_GATE',
        'ADP_MID',
        'ADP_MID',
        'ADP_MID',
        'ADP_MID',
      ],
      place: this.top({ x: 26, y: 30 }),
    });
    b.link('DC_IN', 'ADP_MID', q1, 'switch');
    b.link('ADP_MID', 'VIN_SNS', q2, 'switch');
    // Current-sense resistors sit in series with the power path; the importer reads them as series links.
    this.two('R', 'resistor', '0R01', c1206, 'VIN_SNS', 'VIN_CHG', this.top({ x: 32, y: 30 }));
    const charger = this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'BUCK-BOOST CHARGER 3S',
      footprint: quadFlat('QFN-32', 8, 0.4, 4.0, true),
      // prettier-ignore
      nets: [
        'VIN_CHG', 'VIN_CHG', 'VIN_SNS', 'ADP_GATE', 'ADP_DET', 'CHG_ILIM', 'SMB_CLK', 'SMB_DAT',
        'CHG_DRV', 'CHG_BOOT', 'LX_CHG', 'LX_CHG', 'GND', 'GND', 'VSYS', 'VSYS',
        'BATFET_GATE', 'VBAT', 'VBAT_PACK', 'BATT_NTC', 'CHG_THROTTLE_N', 'CHG_OK', 'CHG_IIN_MON', 'CHG_IBAT_MON',
        'GND', 'VCC_3V3_EC', null, null, 'CHG_CMP_IN', 'CHG_CMP_OUT', null, 'GND',
        'GND',
      ],
      place: this.top({ x: 40, y: 38 }),
    });
    b.link('VIN_CHG', 'LX_CHG', charger, 'converter');
    b.link('VIN_CHG', 'CHG_DRV', charger, 'converter');
    this.two(
      'L',
      'inductor',
      '2.2uH 8A',
      powerInductor(7.0, 7.0),
      'LX_CHG',
      'VSYS',
      this.top({ x: 48, y: 30 }),
    );
    this.two('C', 'capacitor', '47nF/25V', c0402, 'CHG_BOOT', 'LX_CHG', this.top({ x: 40, y: 38 }));
    this.caps('VIN_CHG', this.top({ x: 36, y: 34 }), [
      [4, '10uF/25V', c0805],
      [1, '100nF/25V', c0402],
    ]);
    this.caps('CHG_DRV', this.top({ x: 40, y: 38 }), [[1, '2u2/10V', c0402]]);
    this.caps('VSYS', this.top({ x: 52, y: 36 }), [
      [6, '10uF/25V', c0805],
      [2, '100nF/25V', c0402],
    ]);
    for (const [net, value] of [
      ['CHG_ILIM', '100K'],
      ['ADP_DET', '150K'],
      ['CHG_IIN_MON', '100K'],
      ['CHG_IBAT_MON', '100K'],
      ['CHG_CMP_IN', '100K'],
    ] as const) {
      this.two('R', 'resistor', value, c0201, net, 'GND', this.top({ x: 40, y: 38 }, 4));
    }
    this.two(
      'R',
      'resistor',
      '10K',
      c0201,
      'CHG_THROTTLE_N',
      'VCC_3V3_EC',
      this.top({ x: 40, y: 38 }, 4),
    );
    this.two('R', 'resistor', '10K', c0201, 'CHG_OK', 'VCC_3V3_EC', this.top({ x: 40, y: 38 }, 4));
    this.two(
      'R',
      'resistor',
      '10K',
      c0201,
      'CHG_CMP_OUT',
      'VCC_3V3_EC',
      this.top({ x: 40, y: 38 }, 4),
    );

    const batfet = this.part({
      prefix: 'Q',
      kind: 'mosfet',
      value: 'NMOS 30V 5MR',
      footprint: fet,
      nets: ['VBAT', 'VBAT', 'VBAT', 'BATFET_GATE', 'VSYS', 'VSYS', 'VSYS', 'VSYS'],
      place: this.top({ x: 52, y: 22 }),
    });
    b.link('VBAT', 'VSYS', batfet, 'switch');
    this.two('R', 'resistor', '0R01', c1206, 'VBAT_PACK', 'VBAT', this.top({ x: 58, y: 18 }));
    this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'BATTERY CONN 10P',
      footprint: connectorRows('CONN-10 2.0MM', 5, 2.0, 4.0),
      nets: [
        'VBAT_PACK',
        'VBAT_PACK',
        'VBAT_PACK',
        'VBAT_PACK',
        'SMB_CLK',
        'SMB_DAT',
        'BATT_NTC',
        'GND',
        'GND',
        'GND',
      ],
      place: this.top({ x: 66, y: 8 }, 2),
    });
    this.caps('VBAT', this.top({ x: 58, y: 18 }), [
      [2, '10uF/25V', c0805],
      [1, '100nF/25V', c0402],
    ]);
    this.two('C', 'capacitor', '100nF', c0201, 'BATT_NTC', 'GND', this.top({ x: 66, y: 8 }));

    // Backlight boost: the inductor sits in front of the switch node, as in every boost.
    const bl = this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'BACKLIGHT BOOST',
      footprint: quadFlat('QFN-16', 4, 0.5, 3.0, true),
      nets: [
        'VSYS',
        'LX_BL',
        'LX_BL',
        'GND',
        'VBL_LED',
        'BL_LED_K1',
        'BL_LED_K2',
        'BL_LED_K3',
        'BL_LED_K4',
        'BL_PWM',
        'BL_EN',
        'BL_ISET',
        'GND',
        'VCC_3V3_S0',
        null,
        null,
        'GND',
      ],
      place: this.top({ x: 232, y: 92 }),
    });
    b.link('LX_BL', 'VBL_LED', bl, 'converter');
    this.two(
      'L',
      'inductor',
      '10uH',
      powerInductor(4.0, 4.0),
      'VSYS',
      'LX_BL',
      this.top({ x: 226, y: 92 }),
    );
    this.caps('VBL_LED', this.top({ x: 236, y: 92 }), [[2, '1uF/50V', c0805]]);
    this.caps('VSYS', this.top({ x: 228, y: 96 }), [[1, '10uF/25V', c0805]]);
    this.two('R', 'resistor', '20K', c0201, 'BL_ISET', 'GND', this.top({ x: 232, y: 92 }));
    for (const [rail, weight] of [
      ['VSYS', 8],
      ['VIN_CHG', 2],
      ['DC_IN', 1],
      ['VBAT', 2],
    ] as const) {
      this.addLoad(rail, this.at({ x: 45, y: 30 }), weight, 6);
    }
  }

  converter(spec: ConverterSpec): void {
    const b = this.b;
    const enable = `${spec.rail}_EN`;
    const good = `${spec.rail}_PG`;
    if (spec.topology === 'ldo') {
      const ldo = this.part({
        prefix: 'U',
        kind: 'ic',
        value: `LDO ${spec.volts}V 300MA`,
        footprint: dualRow('SOT-23-5', 3, 0.95, 2.6, 2.9, 2.8),
        nets: [spec.input, 'GND', enable, null, null, spec.rail],
        place: this.top(spec.at),
      });
      b.link(spec.input, spec.rail, ldo, 'converter');
      this.caps(spec.input, this.top(spec.at), [[1, '1uF', c0402]]);
      this.caps(spec.rail, this.top(spec.at), [
        [1, '2u2', c0402],
        [1, '100nF', c0201],
      ]);
      this.two('R', 'resistor', '100K', c0201, enable, 'GND', this.top(spec.at));
      this.addLoad(spec.rail, this.at(spec.at), 1, 3);
      this.addLoad(spec.input, this.at(spec.at), 1, 3);
      return;
    }
    const phases = spec.topology === 'multiphase' ? (spec.phases ?? 2) : 1;
    const inputCap =
      spec.input === 'VSYS' ? (['10uF/25V', c0805] as const) : (['10uF/10V', c0603] as const);
    const outputCap =
      spec.volts > 3 ? (['22uF/10V', c0805] as const) : (['22uF/6.3V', c0603] as const);
    const feedback = `${spec.rail}_FB`;
    if (phases === 1) {
      const lx = lxName(spec.rail);
      const buck = this.part({
        prefix: 'U',
        kind: 'ic',
        value: spec.input === 'VSYS' ? 'BUCK 24V 6A' : 'BUCK 5.5V 3A',
        footprint: quadFlat('QFN-20', 5, 0.5, 3.5, true),
        // prettier-ignore
        nets: [
          spec.input, spec.input, spec.input, 'GND', 'GND',
          lx, lx, lx, `${spec.rail}_BST`, enable,
          good, feedback, 'GND', `${spec.rail}_SS`, null,
          'VCC_3V3_EC', null, 'GND', spec.input, spec.input,
          'GND',
        ],
        place: this.top(spec.at),
      });
      b.link(spec.input, lx, buck, 'converter');
      const inductorAt = { x: spec.at.x + 6, y: spec.at.y };
      this.two(
        'L',
        'inductor',
        spec.input === 'VSYS' ? '1.5uH' : '1uH',
        spec.input === 'VSYS' ? powerInductor(5.0, 5.0) : powerInductor(2.5, 2.0),
        lx,
        spec.rail,
        this.top(inductorAt),
      );
      this.two('C', 'capacitor', '100nF', c0201, `${spec.rail}_BST`, lx, this.top(spec.at));
      this.two('C', 'capacitor', '10nF', c0201, `${spec.rail}_SS`, 'GND', this.top(spec.at));
      this.caps(spec.input, this.top(spec.at), [
        [2, inputCap[0], inputCap[1]],
        [1, '100nF/25V', c0402],
      ]);
      this.caps(spec.rail, this.top(inductorAt), [
        [4, outputCap[0], outputCap[1]],
        [2, '100nF', c0201],
      ]);
    } else {
      // Multiphase: a controller sends PWM to one power stage per phase; each stage is a converter
      // from VSYS to its own switch node, and the phase inductors join on the rail.
      this.part({
        prefix: 'U',
        kind: 'ic',
        value: `VR CONTROLLER ${phases}PH`,
        footprint: quadFlat('QFN-40', 10, 0.4, 5.0, true),
        nets: padNets(
          // prettier-ignore
          [
            'VCC_5V0_S5', 'GND', enable, good, feedback, `${spec.rail}_SENSE_N`, 'VR_CLK', 'VR_DATA', 'VR_ALERT_N',
            'VCC_3V3_S5', 'VSYS',
            ...range(phases).flatMap((i) => [`${spec.rail}_PWM${i + 1}`, `${spec.rail}_CS${i + 1}`]),
          ],
          41,
          'GND',
        ),
        place: this.top(spec.at),
      });
      for (let phase = 1; phase <= phases; phase++) {
        const lx = lxName(spec.rail, phase);
        const stageAt = { x: spec.at.x - 10 + phase * 7, y: spec.at.y - 6 };
        const stage = this.part({
          prefix: 'U',
          kind: 'ic',
          value: 'POWER STAGE 50A',
          footprint: gridArray('LGA-35', 5, 7, 0.65),
          // prettier-ignore
          nets: [
            'VSYS', 'VSYS', 'VSYS', 'VSYS', 'VSYS', 'VSYS', 'VSYS',
            'GND', 'GND', 'GND', 'GND', 'GND', 'GND', 'GND',
            lx, lx, lx, lx, lx, lx, lx,
            'GND', 'GND', 'GND', 'GND', 'GND', `${spec.rail}_BST${phase}`, 'VCC_5V0_S5',
            `${spec.rail}_PWM${phase}`, `${spec.rail}_CS${phase}`, 'VCC_5V0_S5', 'GND', enable, null, null,
          ],
          place: this.top(stageAt, 2),
        });
        b.link('VSYS', lx, stage, 'converter');
        const inductorAt = { x: stageAt.x, y: stageAt.y - 7 };
        this.two(
          'L',
          'inductor',
          '0.15uH 45A',
          powerInductor(7.0, 7.0),
          lx,
          spec.rail,
          this.top(inductorAt, 2),
        );
        this.two(
          'C',
          'capacitor',
          '100nF',
          c0201,
          `${spec.rail}_BST${phase}`,
          lx,
          this.top(stageAt),
        );
        this.caps('VSYS', this.top(stageAt), [
          [3, '10uF/25V', c0805],
          [1, '100nF/25V', c0402],
        ]);
        this.caps('VCC_5V0_S5', this.top(stageAt), [[1, '1uF', c0402]]);
        this.caps(spec.rail, this.top(inductorAt), [[6, '22uF/6.3V', c0603]]);
      }
      this.two('R', 'resistor', '10R', c0201, `${spec.rail}_SENSE_N`, 'GND', this.top(spec.at));
    }
    this.two('R', 'resistor', '10K', c0201, feedback, 'GND', this.top(spec.at));
    this.two('R', 'resistor', '20K', c0201, spec.rail, feedback, this.top(spec.at));
    this.two('R', 'resistor', '100K', c0201, good, 'VCC_3V3_EC', this.top(spec.at));
    this.two('R', 'resistor', '100K', c0201, enable, 'GND', this.top(spec.at));
    this.addLoad(spec.input, this.at(spec.at), phases, 4);
  }

  loadSwitch(spec: SwitchSpec): void {
    const enable = `${spec.rail}_EN`;
    const device =
      spec.device === 'ic'
        ? this.part({
            prefix: 'U',
            kind: 'ic',
            value: spec.volts >= 5 ? 'USB POWER SWITCH 2A' : 'LOAD SWITCH 3A',
            footprint: dualRow('DFN-8 2X2', 4, 0.5, 1.6, 2.0, 2.0),
            nets: [
              spec.input,
              spec.input,
              enable,
              'GND',
              `${spec.rail}_FLT_N`,
              spec.rail,
              spec.rail,
              spec.rail,
            ],
            place: this.top(spec.at),
          })
        : this.part({
            prefix: 'Q',
            kind: 'mosfet',
            value: 'PMOS 20V 10MR',
            footprint: dualRow('DFN-8 3X3', 4, 0.65, 2.2, 3.3, 3.3),
            nets: [
              spec.input,
              spec.input,
              spec.input,
              `${spec.rail}_GATE`,
              spec.rail,
              spec.rail,
              spec.rail,
              spec.rail,
            ],
            place: this.top(spec.at),
          });
    this.b.link(spec.input, spec.rail, device, 'switch');
    if (spec.device === 'mosfet') {
      // The P-FET gate is held off by a pull-up and pulled low by a small N-FET the EC drives.
      this.two('R', 'resistor', '100K', c0201, `${spec.rail}_GATE`, spec.input, this.top(spec.at));
      this.part({
        prefix: 'Q',
        kind: 'mosfet',
        value: 'NMOS 30V SMALL',
        footprint: sot3('SOT-23', 2.9, 1.3),
        nets: [enable, 'GND', `${spec.rail}_GATE`],
        place: this.top(spec.at),
      });
    } else {
      this.two(
        'R',
        'resistor',
        '10K',
        c0201,
        `${spec.rail}_FLT_N`,
        'VCC_3V3_EC',
        this.top(spec.at),
      );
    }
    this.two('R', 'resistor', '100K', c0201, enable, 'GND', this.top(spec.at));
    this.caps(spec.rail, this.top(spec.at), [
      [1, spec.volts >= 5 ? '10uF/10V' : '10uF', spec.volts >= 5 ? c0603 : c0402],
      [1, '100nF', c0201],
    ]);
    this.addLoad(spec.input, this.at(spec.at), 1, 3);
    this.addLoad(spec.rail, this.at(spec.at), 1, 3);
  }

  ferrite(spec: FerriteSpec): void {
    this.two('FB', 'ferrite', '120R@100MHz', c0603, spec.input, spec.rail, this.top(spec.at));
    this.caps(spec.rail, this.top(spec.at), [
      [1, '10uF', c0402],
      [1, '100nF', c0201],
    ]);
    this.addLoad(spec.rail, this.at(spec.at), 1, 3);
  }

  /** A ball-grid part sized for its nets, with ground filling the rest to the scaled ball count. */
  private bga(
    value: string,
    at: Point,
    pitch: number,
    baseBalls: number,
    signals: string[],
    power: [string, number][],
  ): DemoComponent {
    const scaledPower = power.map(
      ([net, count]) => [net, Math.max(4, Math.round(count * this.scale))] as [string, number],
    );
    const supplies = scaledPower.reduce((sum, [, count]) => sum + count, 0);
    const balls = Math.max(
      Math.round(baseBalls * this.scale),
      Math.ceil((signals.length + supplies) * 1.6),
    );
    const side = Math.ceil(Math.sqrt(balls));
    // The fewest outer rings that hold every signal.
    let rings = 1;
    while (side * side - Math.max(0, side - 2 * rings) ** 2 < signals.length) rings++;
    const footprint = gridArray(`BGA-${side * side}`, side, side, pitch);
    const nets = ballMap(footprint, {
      signals,
      power: scaledPower,
      signalRings: rings,
      groundPattern: 'none',
    });
    const component = this.part({
      prefix: 'U',
      kind: 'ic',
      value,
      footprint,
      nets,
      place: { side: 'top', at: this.at(at), spread: 3 },
    });
    for (const [net, count] of scaledPower)
      this.addLoad(net, { x: component.x, y: component.y }, count, footprint.length / 2);
    return component;
  }

  processor(): void {
    const memory = range(dramPackages).flatMap((chipIndex) => dramChannelNets(chipIndex));
    const pcie = [
      ...pcieLanes('SSD1', 4),
      ...pcieLanes('SSD2', 4),
      ...pcieLanes('WLAN', 1),
      ...pcieLanes('PEG', 8),
      ...['SSD1', 'SSD2', 'WLAN', 'DGPU'].flatMap((dev) => [
        `CLK_${dev}_P`,
        `CLK_${dev}_N`,
        `CLKREQ_${dev}_N`,
      ]),
    ];
    const usb = [
      ...range(6).flatMap((i) => [`USB2_P${i}_DP`, `USB2_P${i}_DN`]),
      ...range(3).flatMap((i) => [
        `USB3_P${i}_TX_P`,
        `USB3_P${i}_TX_N`,
        `USB3_P${i}_RX_P`,
        `USB3_P${i}_RX_N`,
      ]),
    ];
    const display = [
      ...range(4).flatMap((i) => [`EDP_TX${i}_P`, `EDP_TX${i}_N`]),
      'EDP_AUX_P',
      'EDP_AUX_N',
      'EDP_HPD',
      ...range(4).flatMap((i) => [`HDMI_TX${i}_P`, `HDMI_TX${i}_N`]),
      'HDMI_DDC_SCL',
      'HDMI_DDC_SDA',
      'HDMI_HPD',
    ];
    // prettier-ignore
    const misc = [
      'HDA_BCLK', 'HDA_SYNC', 'HDA_SDO', 'HDA_SDI0', 'HDA_RST_N',
      'SPI_CLK', 'SPI_MOSI', 'SPI_MISO', 'SPI_CS0_N', 'SPI_CS1_N', 'SPI_WP_N',
      'ESPI_CLK', 'ESPI_CS_N', 'ESPI_IO0', 'ESPI_IO1', 'ESPI_IO2', 'ESPI_IO3', 'ESPI_RST_N', 'ESPI_ALERT_N',
      'SMB_CLK', 'SMB_DAT', 'I2C_TP_SCL', 'I2C_TP_SDA', 'TP_INT_N',
      'VR_CLK', 'VR_DATA', 'VR_ALERT_N', 'CPU_THROTTLE_N', 'SYS_RST_N', 'PWR_BTN_N', 'SUSPEND_N', 'HIBERNATE_N', 'AON_RST_N',
      'XTAL_38M_IN', 'XTAL_38M_OUT', 'RTC_X1', 'RTC_X2', 'BL_PWM', 'BL_EN', 'EDP_VDD_EN', 'CAM_RST_N', 'CAM_MCLK',
      'MIPI_CSI_CK_P', 'MIPI_CSI_CK_N', 'MIPI_CSI_D0_P', 'MIPI_CSI_D0_N', 'MIPI_CSI_D1_P', 'MIPI_CSI_D1_N', 'CAM_I2C_SCL', 'CAM_I2C_SDA',
      ...range(60).map((i) => `CPU_GPIO${i}`),
    ];
    const signals = [...memory, ...pcie, ...usb, ...display, ...misc];
    const cpu = this.bga('CPU 14-CORE', { x: 150, y: 72 }, 0.65, 1850, signals, [
      ['VDD_CORE', 260],
      ['VDD_GFX', 160],
      ['VDD_FABRIC', 50],
      ['VCC_1V05_S0', 40],
      ['VDD2_MEM', 24],
      ['VDDQ_MEM', 40],
      ['VCC_1V8_S0', 16],
      ['VCC_1V8_PLL', 6],
      ['VCC_0V8_S5', 12],
      ['VCC_3V3_S5', 4],
    ]);
    this.b.block(null);
    const xtal = customFootprint('XTAL-2016', 2.0, 1.6, [
      pad('1', -0.7, -0.55),
      pad('2', 0.7, -0.55),
      pad('3', 0.7, 0.55),
      pad('4', -0.7, 0.55),
    ]);
    const xAt = { x: cpu.x / this.grow - 20, y: cpu.y / this.grow - 20 };
    this.part({
      prefix: 'Y',
      kind: 'crystal',
      value: '38.4MHz',
      footprint: xtal,
      nets: ['XTAL_38M_IN', 'GND', 'XTAL_38M_OUT', 'GND'],
      place: this.top(xAt),
    });
    this.two('C', 'capacitor', '12pF', c0201, 'XTAL_38M_IN', 'GND', this.top(xAt));
    this.two('C', 'capacitor', '12pF', c0201, 'XTAL_38M_OUT', 'GND', this.top(xAt));
    const rtcAt = { x: xAt.x + 6, y: xAt.y };
    this.two(
      'Y',
      'crystal',
      '32.768kHz',
      customFootprint('XTAL-3215', 3.2, 1.5, [pad('1', -1.2, 0), pad('2', 1.2, 0)]),
      'RTC_X1',
      'RTC_X2',
      this.top(rtcAt),
    );
    this.two('C', 'capacitor', '15pF', c0201, 'RTC_X1', 'GND', this.top(rtcAt));
    this.two('C', 'capacitor', '15pF', c0201, 'RTC_X2', 'GND', this.top(rtcAt));
  }

  memory(): void {
    const places = [
      { x: 118, y: 94 },
      { x: 118, y: 72 },
      { x: 118, y: 50 },
      { x: 150, y: 38 },
    ];
    range(dramPackages).forEach((chipIndex) => {
      const signals = [...dramChannelNets(chipIndex), `M${chipIndex}_ZQ`];
      const dram = this.bga('LPDDR 8GB X32', places[chipIndex] as Point, 0.5, 315, signals, [
        ['VDD1_MEM', 8],
        ['VDD2_MEM', 24],
        ['VDDQ_MEM', 24],
      ]);
      this.two('R', 'resistor', '240R', c0201, `M${chipIndex}_ZQ`, 'GND', {
        side: 'bottom',
        at: { x: dram.x, y: dram.y },
        spread: 4,
      });
    });
  }

  graphics(): void {
    const memory = range(gpuMemChannels).flatMap((ch) => gpuMemNets(ch));
    const signals = [
      ...memory,
      ...pcieLanes('PEG', 8),
      'CLK_DGPU_P',
      'CLK_DGPU_N',
      'CLKREQ_DGPU_N',
      'SYS_RST_N',
      'SMB_CLK',
      'SMB_DAT',
      'DGPU_PWR_EN',
      'DGPU_PG',
      'DGPU_XTAL_IN',
      'DGPU_XTAL_OUT',
      'DGPU_THERM_ALERT_N',
      'DGPU_SPI_CLK',
      'DGPU_SPI_MOSI',
      'DGPU_SPI_MISO',
      'DGPU_SPI_CS_N',
    ];
    const gpu = this.bga('DISCRETE GPU', { x: 212, y: 70 }, 0.8, 1200, signals, [
      ['VDD_DGPU', 240],
      ['VDDQ_GMEM', 60],
      ['VCC_1V8_DGPU', 16],
    ]);
    const places = [
      { x: 240, y: 92 },
      { x: 240, y: 48 },
      { x: 186, y: 96 },
      { x: 186, y: 44 },
    ];
    range(gpuMemChannels).forEach((ch) => {
      this.bga(
        'GDDR 2GB X32',
        places[ch] as Point,
        0.8,
        180,
        [...gpuMemNets(ch), `G${ch}_ZQ`],
        [['VDDQ_GMEM', 30]],
      );
      this.two(
        'R',
        'resistor',
        '120R',
        c0201,
        `G${ch}_ZQ`,
        'GND',
        this.bottom(places[ch] as Point),
      );
    });
    const xAt = { x: gpu.x / this.grow + 16, y: gpu.y / this.grow - 18 };
    this.part({
      prefix: 'Y',
      kind: 'crystal',
      value: '27MHz',
      footprint: customFootprint('XTAL-2016', 2.0, 1.6, [
        pad('1', -0.7, -0.55),
        pad('2', 0.7, -0.55),
        pad('3', 0.7, 0.55),
        pad('4', -0.7, 0.55),
      ]),
      nets: ['DGPU_XTAL_IN', 'GND', 'DGPU_XTAL_OUT', 'GND'],
      place: this.top(xAt),
    });
    this.two('C', 'capacitor', '18pF', c0201, 'DGPU_XTAL_IN', 'GND', this.top(xAt));
    this.two('C', 'capacitor', '18pF', c0201, 'DGPU_XTAL_OUT', 'GND', this.top(xAt));
    this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'SPI FLASH 4MB',
      footprint: dualRow('SOIC-8', 4, 1.27, 5.2, 4.9, 3.9),
      nets: [
        'DGPU_SPI_CS_N',
        'DGPU_SPI_MISO',
        'VCC_1V8_DGPU',
        'GND',
        'DGPU_SPI_MOSI',
        'DGPU_SPI_CLK',
        'VCC_1V8_DGPU',
        'VCC_1V8_DGPU',
      ],
      place: this.top({ x: xAt.x + 8, y: xAt.y }),
    });
  }

  platform(): void {
    // prettier-ignore
    const ecSignals = [
      'ESPI_CLK', 'ESPI_CS_N', 'ESPI_IO0', 'ESPI_IO1', 'ESPI_IO2', 'ESPI_IO3', 'ESPI_RST_N', 'ESPI_ALERT_N',
      'SMB_CLK', 'SMB_DAT', 'PWR_BTN_N', 'SUSPEND_N', 'HIBERNATE_N', 'AON_RST_N', 'CHG_OK', 'CHG_THROTTLE_N', 'ADP_DET', 'CPU_THROTTLE_N',
      ...converters.map((c) => `${c.rail}_EN`),
      ...switches.map((s) => `${s.rail}_EN`),
      'VCC_5V0_S5_PG', 'VCC_3V3_S5_PG', 'VDD_CORE_PG', 'VDD_GFX_PG', 'VDD2_MEM_PG',
      'FAN_PWM', 'FAN_TACH', 'KB_BL_PWM', 'LID_SW_N', 'PWR_LED_N', 'CHG_LED_N', 'DGPU_PWR_EN', 'DGPU_PG',
      ...range(8).map((i) => `KSO${i}`),
      ...range(8).map((i) => `KSI${i}`),
      'EC_SPI_CLK', 'EC_SPI_MOSI', 'EC_SPI_MISO', 'EC_SPI_CS_N', 'EC_XTAL_IN', 'EC_XTAL_OUT',
      ...range(20).map((i) => `EC_GPIO${i}`),
    ];
    const perSide = Math.max(32, Math.ceil((ecSignals.length + 10) / 4));
    const ecNets = padNets(
      [
        ...ecSignals.slice(0, perSide * 4 - 10),
        'VCC_3V3_EC',
        'VCC_3V3_EC',
        'VCC_3V3_EC',
        'VCC_3V3_EC',
        'GND',
        'GND',
        'GND',
        'GND',
        'EC_VCORE',
        'EC_VCORE',
      ],
      perSide * 4,
      'GND',
    );
    const ec = this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'EMBEDDED CONTROLLER',
      footprint: quadFlat(`LQFP-${perSide * 4}`, perSide, 0.5, perSide * 0.5 + 2, false),
      nets: ecNets,
      place: this.top({ x: 100, y: 20 }),
    });
    this.addLoad('VCC_3V3_EC', { x: ec.x, y: ec.y }, 4, 6);
    this.caps('EC_VCORE', this.top({ x: 100, y: 20 }), [[2, '1uF', c0402]]);
    this.two(
      'Y',
      'crystal',
      '32.768kHz',
      customFootprint('XTAL-3215', 3.2, 1.5, [pad('1', -1.2, 0), pad('2', 1.2, 0)]),
      'EC_XTAL_IN',
      'EC_XTAL_OUT',
      this.top({ x: 112, y: 14 }),
    );
    this.two('C', 'capacitor', '15pF', c0201, 'EC_XTAL_IN', 'GND', this.top({ x: 112, y: 14 }));
    this.two('C', 'capacitor', '15pF', c0201, 'EC_XTAL_OUT', 'GND', this.top({ x: 112, y: 14 }));
    this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'SPI FLASH 32MB',
      footprint: dualRow('SOIC-8', 4, 1.27, 5.2, 4.9, 3.9),
      nets: [
        'SPI_CS0_N',
        'SPI_MISO',
        'SPI_WP_N',
        'GND',
        'SPI_MOSI',
        'SPI_CLK',
        'VCC_3V3_S5',
        'VCC_3V3_S5',
      ],
      place: this.top({ x: 120, y: 30 }),
    });
    this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'SPI FLASH 1MB',
      footprint: dualRow('SOIC-8', 4, 1.27, 5.2, 4.9, 3.9),
      nets: [
        'EC_SPI_CS_N',
        'EC_SPI_MISO',
        'VCC_3V3_EC',
        'GND',
        'EC_SPI_MOSI',
        'EC_SPI_CLK',
        'VCC_3V3_EC',
        'VCC_3V3_EC',
      ],
      place: this.top({ x: 88, y: 28 }),
    });
    this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'TPM MODULE',
      footprint: quadFlat('QFN-32', 8, 0.5, 5.0, true),
      nets: padNets(
        [
          'SPI_CLK',
          'SPI_MOSI',
          'SPI_MISO',
          'SPI_CS1_N',
          'SYS_RST_N',
          'TPM_IRQ_N',
          'VCC_3V3_S0',
          'VCC_3V3_S0',
          'GND',
          'GND',
        ],
        33,
        null,
      ),
      place: this.top({ x: 130, y: 28 }),
    });
    this.b.link('VCC_3V3_EC', 'EC_VCORE', ec, 'converter');

    const codecAt = { x: 46, y: 18 };
    const codec = this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'HD AUDIO CODEC',
      footprint: quadFlat('QFN-48', 12, 0.4, 6.0, true),
      nets: padNets(
        // prettier-ignore
        [
          'VCC_1V8_AUD', 'VCC_3V3_AUD', 'VCC_5V0_AUD', 'GND', 'HDA_BCLK', 'HDA_SYNC', 'HDA_SDO', 'HDA_SDI0', 'HDA_RST_N',
          'SPK_L_P', 'SPK_L_N', 'SPK_R_P', 'SPK_R_N', 'HP_L', 'HP_R', 'HP_DET', 'MIC_IN', 'MIC_BIAS', 'AUD_VREF', 'DMIC_CLK', 'DMIC_DATA',
          'VCC_5V0_AUD', 'VCC_5V0_AUD', 'VCC_1V8_AUD', 'GND', 'GND',
        ],
        49,
        'GND',
      ),
      place: this.top(codecAt),
    });
    this.addLoad('VCC_1V8_AUD', { x: codec.x, y: codec.y }, 2, 4);
    this.addLoad('VCC_5V0_AUD', { x: codec.x, y: codec.y }, 3, 4);
    this.addLoad('VCC_3V3_AUD', { x: codec.x, y: codec.y }, 1, 4);
    this.caps('AUD_VREF', this.top(codecAt), [[1, '10uF', c0402]]);
    this.caps('MIC_BIAS', this.top(codecAt), [[1, '1uF', c0201]]);
    this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'AUDIO JACK 3.5MM',
      footprint: customFootprint('JACK-3.5-5P', 12.0, 6.0, [
        pad('1', -4.5, 2.2),
        pad('2', -1.0, 2.2),
        pad('3', 2.5, 2.2),
        pad('4', -2.5, -2.2),
        pad('5', 3.5, -2.2),
      ]),
      nets: ['HP_L', 'HP_R', 'MIC_IN', 'GND', 'HP_DET'],
      place: { side: 'through', at: this.at({ x: 10, y: 15 }), spread: 3 },
    });
    for (const channel of ['L', 'R']) {
      this.part({
        prefix: 'J',
        kind: 'connector',
        value: 'SPEAKER CONN 2P',
        footprint: connectorRows('CONN-2', 1, 1.25, 1.6),
        nets: [`SPK_${channel}_P`, `SPK_${channel}_N`],
        place: this.top({ x: channel === 'L' ? 30 : 70, y: 6 }),
      });
    }
    this.part({
      prefix: 'U',
      kind: 'ic',
      value: 'DIGITAL MEMS MIC',
      footprint: customFootprint('LGA-5', 3.5, 2.65, [
        pad('1', -1.2, 0.8),
        pad('2', 0, 0.8),
        pad('3', 1.2, 0.8),
        pad('4', -1.2, -0.8),
        pad('5', 1.2, -0.8),
      ]),
      nets: ['VCC_1V8_AUD', 'DMIC_CLK', 'DMIC_DATA', 'GND', 'GND'],
      place: this.top({ x: 60, y: 10 }),
    });

    const sensorsAt = [
      { x: 150, y: 50 },
      { x: 212, y: 52 },
      { x: 40, y: 60 },
      { x: 270, y: 100 },
    ];
    for (const p of sensorsAt) {
      this.part({
        prefix: 'U',
        kind: 'ic',
        value: 'TEMP SENSOR',
        footprint: dualRow('SOT-23-6', 3, 0.95, 2.6, 2.9, 2.8),
        nets: ['VCC_3V3_S5', 'GND', 'THERM_ALERT_N', 'SMB_DAT', 'SMB_CLK', 'GND'],
        place: this.bottom(p),
      });
    }
    this.two(
      'R',
      'resistor',
      '10K',
      c0201,
      'THERM_ALERT_N',
      'VCC_3V3_S5',
      this.bottom(sensorsAt[0] as Point),
    );
    this.two('R', 'resistor', '2K2', c0201, 'SMB_CLK', 'VCC_3V3_S5', this.top({ x: 100, y: 20 }));
    this.two('R', 'resistor', '2K2', c0201, 'SMB_DAT', 'VCC_3V3_S5', this.top({ x: 100, y: 20 }));
  }

  connectors(): void {
    const m2 = (value: string, at: Point, lanes: string, rail: string, clock: string) => {
      const signals = [
        ...pcieLanes(lanes, lanes === 'WLAN' ? 1 : 4),
        `CLK_${clock}_P`,
        `CLK_${clock}_N`,
        `CLKREQ_${clock}_N`,
        'SYS_RST_N',
        'SMB_CLK',
        'SMB_DAT',
      ];
      const nets: (string | null)[] = [];
      for (let pin = 1; pin <= 75; pin++) {
        if (pin % 2 === 0 && pin <= 18) nets.push(rail);
        else if (pin % 3 === 0) nets.push('GND');
        else nets.push(signals.shift() ?? null);
      }
      const conn = this.part({
        prefix: 'J',
        kind: 'connector',
        value,
        footprint: customFootprint(
          'M.2-75P',
          22.0,
          5.0,
          range(75).map((i) =>
            pad(String(i + 1), -9.25 + Math.floor(i / 2) * 0.5, i % 2 === 0 ? 0.9 : -0.9),
          ),
        ),
        nets,
        place: this.top(at, 2),
      });
      this.addLoad(rail, { x: conn.x, y: conn.y }, 4, 11);
      this.connectorSignals.push(signals.length === 0 ? pcieLanes(lanes, 1) : signals);
    };
    m2('M.2 KEY M SOCKET', { x: 250, y: 26 }, 'SSD1', 'VCC_3V3_SSD1', 'SSD1');
    m2('M.2 KEY M SOCKET', { x: 190, y: 26 }, 'SSD2', 'VCC_3V3_SSD2', 'SSD2');
    m2('M.2 KEY E SOCKET', { x: 270, y: 55 }, 'WLAN', 'VCC_3V3_WLAN', 'WLAN');

    const usbc = (index: number, at: Point, vbus: string) => {
      const p = `USB2_P${index}`;
      const s = `USB3_P${index}`;
      // prettier-ignore
      const pinNets: [string, string | null][] = [
        ['A1', 'GND'], ['A2', `${s}_TX_P`], ['A3', `${s}_TX_N`], ['A4', vbus], ['A5', `USBC${index}_CC1`], ['A6', `${p}_DP`],
        ['A7', `${p}_DN`], ['A8', `USBC${index}_SBU1`], ['A9', vbus], ['A10', `${s}_RX_N`], ['A11', `${s}_RX_P`], ['A12', 'GND'],
        ['B1', 'GND'], ['B2', null], ['B3', null], ['B4', vbus], ['B5', `USBC${index}_CC2`], ['B6', `${p}_DP`],
        ['B7', `${p}_DN`], ['B8', `USBC${index}_SBU2`], ['B9', vbus], ['B10', null], ['B11', null], ['B12', 'GND'],
      ];
      const conn = this.part({
        prefix: 'J',
        kind: 'connector',
        value: 'USB-C RECEPTACLE 24P',
        footprint: customFootprint(
          'USB-C-24P',
          8.94,
          7.5,
          pinNets.map(([pin], i) => pad(pin, -2.75 + (i % 12) * 0.5, i < 12 ? 2.8 : 2.0)),
        ),
        nets: pinNets.map(([, net]) => net),
        place: { side: 'top', at: this.at(at), spread: 2, rotation: 90 },
      });
      const nearPd = { x: at.x - 14, y: at.y };
      this.part({
        prefix: 'U',
        kind: 'ic',
        value: 'USB-C PORT CONTROLLER',
        footprint: quadFlat('QFN-24', 6, 0.5, 4.0, true),
        nets: padNets(
          [
            `USBC${index}_CC1`,
            `USBC${index}_CC2`,
            vbus,
            'VCC_3V3_S5',
            'GND',
            'SMB_CLK',
            'SMB_DAT',
            `USBC${index}_INT_N`,
            `USBC${index}_SBU1`,
            `USBC${index}_SBU2`,
          ],
          25,
          'GND',
        ),
        place: this.top(nearPd),
      });
      this.two('R', 'resistor', '10K', c0201, `USBC${index}_INT_N`, 'VCC_3V3_S5', this.top(nearPd));
      this.addLoad(vbus, { x: conn.x, y: conn.y }, 3, 5);
      this.connectorSignals.push(
        [`${p}_DP`, `${p}_DN`, `USBC${index}_CC1`, `USBC${index}_CC2`],
        [`${s}_TX_P`, `${s}_TX_N`, `${s}_RX_P`, `${s}_RX_N`],
      );
    };
    usbc(0, { x: 294, y: 22 }, 'VCC_5V0_USB1');
    usbc(1, { x: 294, y: 88 }, 'VCC_5V0_USB2');

    const usbA = this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'USB-A RECEPTACLE',
      footprint: customFootprint(
        'USB-A-TH-9P',
        14.0,
        13.0,
        range(9).map((i) => pad(String(i + 1), -4.0 + i * 1.0, i < 4 ? 5.0 : 3.0)),
      ),
      nets: [
        'VCC_5V0_USBA',
        'USB2_P2_DN',
        'USB2_P2_DP',
        'GND',
        'USB3_P2_RX_N',
        'USB3_P2_RX_P',
        'GND',
        'USB3_P2_TX_N',
        'USB3_P2_TX_P',
      ],
      place: { side: 'through', at: this.at({ x: 290, y: 112 }), spread: 3 },
    });
    this.addLoad('VCC_5V0_USBA', { x: usbA.x, y: usbA.y }, 3, 6);
    const hdmi = this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'HDMI RECEPTACLE',
      footprint: customFootprint(
        'HDMI-19P',
        15.0,
        11.0,
        range(19).map((i) => pad(String(i + 1), -4.5 + i * 0.5, i % 2 === 0 ? 4.5 : 3.5)),
      ),
      // prettier-ignore
      nets: [
        'HDMI_TX2_P', 'GND', 'HDMI_TX2_N', 'HDMI_TX1_P', 'GND', 'HDMI_TX1_N', 'HDMI_TX0_P', 'GND', 'HDMI_TX0_N', 'HDMI_TX3_P',
        'GND', 'HDMI_TX3_N', null, null, 'HDMI_DDC_SCL', 'HDMI_DDC_SDA', 'GND', 'VCC_5V0_HDMI', 'HDMI_HPD',
      ],
      place: { side: 'top', at: this.at({ x: 292, y: 66 }), spread: 3, rotation: 90 },
    });
    this.addLoad('VCC_5V0_HDMI', { x: hdmi.x, y: hdmi.y }, 1, 6);
    this.connectorSignals.push(
      ['HDMI_TX0_P', 'HDMI_TX0_N', 'HDMI_TX1_P', 'HDMI_TX1_N'],
      ['HDMI_TX2_P', 'HDMI_TX2_N', 'HDMI_TX3_P', 'HDMI_TX3_N'],
      ['HDMI_DDC_SCL', 'HDMI_DDC_SDA', 'HDMI_HPD'],
    );

    const edpNets = padNets(
      // prettier-ignore
      [
        'VCC_3V3_LCD', 'VCC_3V3_LCD', 'VCC_3V3_LCD', 'GND', ...range(4).flatMap((i) => [`EDP_TX${i}_P`, `EDP_TX${i}_N`, 'GND']),
        'EDP_AUX_P', 'EDP_AUX_N', 'GND', 'EDP_HPD', 'BL_EN', 'BL_PWM', 'VBL_LED', 'VBL_LED', 'BL_LED_K1', 'BL_LED_K2', 'BL_LED_K3', 'BL_LED_K4',
        'VCC_3V3_CAM', 'VCC_1V2_CAM', 'VCC_2V8_CAM', 'MIPI_CSI_CK_P', 'MIPI_CSI_CK_N', 'MIPI_CSI_D0_P', 'MIPI_CSI_D0_N', 'MIPI_CSI_D1_P', 'MIPI_CSI_D1_N',
        'CAM_I2C_SCL', 'CAM_I2C_SDA', 'CAM_RST_N', 'CAM_MCLK', 'LID_SW_N',
      ],
      50,
      'GND',
    );
    const edp = this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'EDP CONN 50P',
      footprint: connectorRows('CONN-50', 25, 0.5, 2.0),
      nets: edpNets,
      place: this.top({ x: 262, y: 112 }, 2),
    });
    for (const rail of ['VCC_3V3_LCD', 'VCC_1V2_CAM', 'VCC_2V8_CAM', 'VBL_LED'])
      this.addLoad(rail, { x: edp.x, y: edp.y }, 1, 7);
    this.connectorSignals.push(
      ['EDP_TX0_P', 'EDP_TX0_N', 'EDP_TX1_P', 'EDP_TX1_N'],
      ['EDP_TX2_P', 'EDP_TX2_N', 'EDP_TX3_P', 'EDP_TX3_N'],
    );

    const kb = this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'KEYBOARD FPC 30P',
      footprint: connectorRows('CONN-30 FPC', 15, 0.5, 2.0),
      nets: padNets(
        [
          ...range(8).map((i) => `KSO${i}`),
          ...range(8).map((i) => `KSI${i}`),
          'KB_BL_PWM',
          'VCC_3V3_TP',
          'PWR_BTN_N',
          'PWR_LED_N',
          'CHG_LED_N',
          'GND',
        ],
        30,
        'GND',
      ),
      place: this.top({ x: 150, y: 14 }, 2),
    });
    this.addLoad('VCC_3V3_TP', { x: kb.x, y: kb.y }, 1, 6);
    this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'TOUCHPAD FPC 8P',
      footprint: connectorRows('CONN-8 FPC', 4, 0.5, 2.0),
      nets: ['VCC_3V3_TP', 'GND', 'I2C_TP_SCL', 'I2C_TP_SDA', 'TP_INT_N', 'GND', null, 'GND'],
      place: this.top({ x: 170, y: 10 }, 2),
    });
    this.two(
      'R',
      'resistor',
      '2K2',
      c0201,
      'I2C_TP_SCL',
      'VCC_3V3_TP',
      this.top({ x: 170, y: 10 }),
    );
    this.two(
      'R',
      'resistor',
      '2K2',
      c0201,
      'I2C_TP_SDA',
      'VCC_3V3_TP',
      this.top({ x: 170, y: 10 }),
    );
    this.connectorSignals.push(
      range(8)
        .map((i) => `KSI${i}`)
        .slice(0, 4),
      range(8)
        .map((i) => `KSI${i}`)
        .slice(4),
    );
    this.part({
      prefix: 'J',
      kind: 'connector',
      value: 'FAN CONN 4P',
      footprint: connectorRows('CONN-4 1.0MM', 2, 1.0, 1.8),
      nets: ['VCC_5V0_FAN', 'GND', 'FAN_TACH', 'FAN_PWM'],
      place: this.top({ x: 236, y: 6 }, 2),
    });
    this.two('R', 'resistor', '10K', c0201, 'FAN_TACH', 'VCC_3V3_EC', this.top({ x: 236, y: 6 }));
    this.addLoad('VCC_5V0_FAN', this.at({ x: 236, y: 6 }), 1, 3);
  }

  testPoints(): void {
    this.b.block(null);
    const rails = [
      'DC_IN',
      'VSYS',
      'VBAT',
      ...converters.map((c) => c.rail),
      ...switches.map((s) => s.rail),
      ...ferrites.map((f) => f.rail),
    ];
    for (const rail of rails) this.note(this.b.testPoint(rail, 'bottom', 4));
  }

  /**
   * Fills the board up to `components` parts, steering the pin total toward `pins`: decoupling and
   * pull resistors (two pins) when the budget allows, small ICs (five to ten pins) when pins run short,
   * and a resistor for every signal net still left with one pin.
   */
  fill(components: number, pins: number): void {
    const b = this.b;
    b.block(null);
    const railLoads = [...this.loads.entries()].filter(([rail]) => rail !== 'GND');
    const railWeights = railLoads.map(
      ([rail, list]) => [rail, list.reduce((sum, l) => sum + l.weight, 0)] as const,
    );
    while (b.components.length < components) {
      const left = components - b.components.length;
      const pinsShort = pins - b.pinTotal - 2 * left;
      if (this.lonely.size > 0 && (this.lonely.size >= left || this.random.chance(0.3))) {
        this.tieLonely();
      } else if (pinsShort > 8 && left > 3) {
        this.smallIc(Math.min(pinsShort + 2, 12));
      } else if (this.random.chance(0.78)) {
        this.decouplingCap(this.random.weighted(railWeights));
      } else {
        this.pullResistor();
      }
    }
  }

  private tieLonely(): void {
    const net = this.lonely.values().next().value as string;
    const target = this.random.chance(0.25) ? 'GND' : this.random.pick(this.pullTargets);
    this.two(
      'R',
      'resistor',
      this.random.pick(['10K', '100K', '4K7', '47K', '1K']),
      c0201,
      net,
      target,
      this.nearNet(net),
    );
  }

  private nearNet(net: string): Placement {
    return { side: this.random.chance(0.5) ? 'top' : 'bottom', at: this.b.homeOf(net), spread: 4 };
  }

  private decouplingCap(rail: string): void {
    const loads = this.loads.get(rail) ?? [];
    const load = this.random.weighted(loads.map((l) => [l, l.weight] as const));
    const volts = railVolts(rail);
    const [value, footprint] =
      volts !== null && volts > 6
        ? this.random.weighted([
            [['10uF/25V', c0805], 3],
            [['100nF/25V', c0402], 4],
            [['1uF/25V', c0603], 2],
          ] as const)
        : volts !== null && volts > 3.4
          ? this.random.weighted([
              [['10uF/10V', c0603], 3],
              [['100nF/16V', c0201], 4],
              [['1uF/10V', c0402], 2],
            ] as const)
          : this.random.weighted([
              [['1uF', c0201], 5],
              [['100nF', c0201], 4],
              [['10uF', c0402], 2],
              [['22uF/6.3V', c0603], 1],
              [['4u7', c0402], 1],
            ] as const);
    // Small capacitors go right under the load on the far side; bulk ones around it on the near side.
    const under = footprint === c0201 || this.random.chance(0.3);
    this.two('C', 'capacitor', value, footprint, rail, 'GND', {
      side: under ? 'bottom' : 'top',
      at: load.at,
      spread: under ? Math.max(1, load.radius * 0.8) : load.radius + 2,
    });
  }

  private pullResistor(): void {
    if (this.signalList.length === 0) return this.decouplingCap('VSYS');
    const net = this.random.pick(this.signalList);
    if (this.random.chance(0.35)) {
      // RC filter: series resistor onto a new net with a capacitor to ground behind it.
      this.filterCount++;
      const filtered = `RCF${this.filterCount}`;
      this.two(
        'R',
        'resistor',
        this.random.pick(['33R', '100R', '1K']),
        c0201,
        net,
        filtered,
        this.nearNet(net),
      );
      this.two(
        'C',
        'capacitor',
        this.random.pick(['10pF', '22pF', '100pF', '1nF']),
        c0201,
        filtered,
        'GND',
        this.nearNet(filtered),
      );
      return;
    }
    const target = this.random.chance(0.3) ? 'GND' : this.random.pick(this.pullTargets);
    this.two(
      'R',
      'resistor',
      this.random.pick(['10K', '100K', '4K7', '47K', '2K2', '1M']),
      c0201,
      net,
      target,
      this.nearNet(net),
    );
  }

  /** A small IC of at most `maxPins` pins, on nets that already exist where possible. */
  private smallIc(maxPins: number): void {
    const roll = this.random.float();
    if (maxPins >= 10 && roll < 0.45 && this.connectorSignals.length > 0) {
      const group = this.random.pick(this.connectorSignals);
      const lines = [...group.slice(0, 4)];
      while (lines.length < 4) lines.push(lines[0] as string);
      const rail = this.random.pick(['VCC_3V3_S0', 'VCC_5V0_S0']);
      this.part({
        prefix: 'D',
        kind: 'tvs',
        value: 'ESD ARRAY 4CH',
        footprint: dualRow('DFN-10', 5, 0.5, 1.0, 2.5, 1.0),
        nets: [
          lines[0] as string,
          lines[1] as string,
          'GND',
          lines[2] as string,
          lines[3] as string,
          lines[3] as string,
          lines[2] as string,
          rail,
          lines[1] as string,
          lines[0] as string,
        ],
        place: this.nearNet(lines[0] as string),
      });
    } else if (maxPins >= 8 && roll < 0.7) {
      const rail = this.random.pick(['VCC_3V3_S5', 'VCC_3V3_S0', 'VCC_1V8_S0']);
      this.part({
        prefix: 'U',
        kind: 'ic',
        value: 'EEPROM 2KBIT',
        footprint: dualRow('TSSOP-8', 4, 0.65, 4.4, 3.0, 4.4),
        // Address straps differ from part to part, as several EEPROMs share the bus.
        nets: [
          this.strap(rail),
          this.strap(rail),
          this.strap(rail),
          'GND',
          this.smbus[1],
          this.smbus[0],
          'GND',
          rail,
        ],
        place: {
          side: this.random.chance(0.5) ? 'top' : 'bottom',
          at: this.randomSpot(),
          spread: 6,
        },
      });
    } else {
      // A single gate combining two existing signals; its output is a new net the filler then ties.
      const a = this.random.pick(this.signalList);
      const c = this.random.pick(this.signalList);
      this.gateCount++;
      this.part({
        prefix: 'U',
        kind: 'ic',
        value: this.random.pick(['AND2 GATE', 'OR2 GATE', 'BUFFER OD']),
        footprint: dualRow('SOT-353', 3, 0.65, 1.9, 2.0, 2.1),
        nets: [
          a,
          c,
          'GND',
          `GATE${this.gateCount}_Y`,
          this.random.pick(['VCC_3V3_S0', 'VCC_1V8_S0', 'VCC_3V3_S5']),
          null,
        ],
        place: this.nearNet(a),
      });
    }
  }

  private strap(rail: string): string {
    return this.random.chance(0.5) ? 'GND' : rail;
  }

  private randomSpot(): Point {
    return {
      x: round(this.random.range(15, this.b.width - 15)),
      y: round(this.random.range(10, this.b.height - 10)),
    };
  }

  private caps(
    rail: string,
    place: Placement,
    caps: readonly (readonly [number, string, Footprint])[],
  ): void {
    for (const [count, value, footprint] of caps) {
      for (let i = 0; i < count; i++)
        this.two('C', 'capacitor', value, footprint, rail, 'GND', {
          ...place,
          spread: place.spread || 2,
        });
    }
  }
}

function lxName(rail: string, phase?: number): string {
  const base = rail.replace(/^(VCC|VDD)_?/, '');
  return phase === undefined ? `LX_${base}` : `LX_${base}_${phase}`;
}

function railVolts(rail: string): number | null {
  if (
    rail === 'VSYS' ||
    rail === 'VBAT' ||
    rail === 'DC_IN' ||
    rail.startsWith('VIN') ||
    rail === 'VBL_LED'
  )
    return 12;
  const spec = [...converters, ...switches, ...ferrites].find((s) => s.rail === rail);
  return spec ? spec.volts : null;
}

/** Nets of one DRAM package: two x16 channels, as LPDDR packages carry them. */
function dramChannelNets(chipIndex: number): string[] {
  return ['A', 'B'].flatMap((ch) => {
    const p = `M${chipIndex}${ch}`;
    return [
      ...range(16).map((i) => `${p}_DQ${i}`),
      `${p}_DQS0_P`,
      `${p}_DQS0_N`,
      `${p}_DQS1_P`,
      `${p}_DQS1_N`,
      `${p}_DMI0`,
      `${p}_DMI1`,
      ...range(7).map((i) => `${p}_CA${i}`),
      `${p}_CK_P`,
      `${p}_CK_N`,
      `${p}_CS0`,
    ];
  });
}

function gpuMemNets(channel: number): string[] {
  const p = `G${channel}`;
  return [
    ...range(32).map((i) => `${p}_DQ${i}`),
    ...range(4).flatMap((i) => [`${p}_EDC${i}`, `${p}_DBI${i}_N`]),
    ...range(10).map((i) => `${p}_CA${i}`),
    `${p}_CK_P`,
    `${p}_CK_N`,
    `${p}_WCK_P`,
    `${p}_WCK_N`,
    `${p}_CKE_N`,
    `${p}_RESET_N`,
  ];
}

function pcieLanes(prefix: string, lanes: number): string[] {
  return range(lanes).flatMap((i) => [
    `${prefix}_TX${i}_P`,
    `${prefix}_TX${i}_N`,
    `${prefix}_RX${i}_P`,
    `${prefix}_RX${i}_N`,
  ]);
}

function padNets(
  nets: (string | null)[],
  length: number,
  filler: string | null,
): (string | null)[] {
  if (nets.length > length) throw new RangeError(`${nets.length} nets for a ${length}-pin part`);
  return [...nets, ...Array.from({ length: length - nets.length }, () => filler)];
}

function range(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i);
}

function round(value: number): number {
  return Math.round(value * 1000) / 1000;
}
