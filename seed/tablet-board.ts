// An invented tablet daughterboard, "Lumbre slate" board LS-IO-0930: the USB-C port, the USB-PD
// controller and input protection, a USB 3 redriver, the headphone codec, the speaker amplifier
// and two microphones, joined to the mainboard by a 60-pin board-to-board connector. Nothing here
// describes a real product. Millimetres on a 96 × 24 mm strip, origin bottom-left seen from the top.
// Written as a `railyard-board` v1 file, so it carries kinds, values and packages itself.
import type { BoardFile } from '@railyard/shared';
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
} from './footprints';
import { Random } from './random';

export const tabletBoardSeed = 0x0930;

const c0201 = chip('0201');
const c0402 = chip('0402');
const c0603 = chip('0603');

const top = (at: Point, spread = 0): Placement => ({ side: 'top', at, spread });
const bottom = (at: Point, spread = 0): Placement => ({ side: 'bottom', at, spread });

const superSpeed = [
  'USB_TX1_P',
  'USB_TX1_N',
  'USB_RX1_P',
  'USB_RX1_N',
  'USB_TX2_P',
  'USB_TX2_N',
  'USB_RX2_P',
  'USB_RX2_N',
];
/** The redriver's mainboard side of the SuperSpeed pairs. */
const superSpeedHost = ['SS_TX_P', 'SS_TX_N', 'SS_RX_P', 'SS_RX_N'];

// prettier-ignore
const speakerChannels = [
  { side: 'L', name: 'Left', lx: 'LX_SPK_L', boost: 'VBST_SPK_L', at: { x: 30, y: 5 }, connector: { x: 26, y: 20 } },
  { side: 'R', name: 'Right', lx: 'LX_SPK_R', boost: 'VBST_SPK_R', at: { x: 70, y: 10 }, connector: { x: 88, y: 20 } },
] as const;

export interface TabletBoard {
  slug: string;
  components: DemoComponent[];
  file: BoardFile;
}

export function generateTabletBoard(options: { seed?: number } = {}): TabletBoard {
  const random = new Random(options.seed ?? tabletBoardSeed);
  const b = new BoardBuilder(96, 24, random);
  declareRails(b);

  b.block(null);
  const hole = singlePad('HOLE-2.2', 2.2);
  for (const at of [
    { x: 3.5, y: 12 },
    { x: 92.5, y: 12 },
  ]) {
    b.add({
      prefix: 'H',
      kind: 'other',
      value: 'MOUNTING HOLE',
      footprint: hole,
      nets: ['GND'],
      place: { side: 'through', at },
    });
  }

  usbPort(b);
  boardToBoard(b);
  audio(b);
  extras(b);

  const board = {
    title: 'Lumbre slate USB-C and audio daughterboard',
    deviceFamily: 'Lumbre slate',
    boardNumber: 'LS-IO-0930',
    revision: 'A1',
    batteryVoltage: 3.87,
    notes:
      'Invented demo board. Sits at the bottom edge of the tablet; VSYS, VCC_1V8 and VCC_3V3 come from the mainboard ' +
      'over J2, and VBUS_OUT goes back to the mainboard charger.',
  };
  const annotations = b.annotations(board, 'VSYS');
  return {
    slug: 'lumbre-ls-io-0930',
    components: b.components,
    file: {
      format: 'railyard-board',
      version: 1,
      board,
      rootNet: 'VSYS',
      nets: annotations.nets,
      components: b.components.map((c) => ({
        refdes: c.refdes,
        kind: c.kind,
        value: c.value,
        package: c.package,
        ...(c.side ? { side: c.side } : {}),
        x: c.x,
        y: c.y,
        rotation: c.rotation,
        pins: c.pins.map((p) => ({
          pin: p.pin,
          net: p.net,
          ...(p.x !== undefined && p.y !== undefined ? { x: p.x, y: p.y } : {}),
        })),
      })),
      powerLinks: annotations.powerLinks,
    },
  };
}

function declareRails(b: BoardBuilder): void {
  b.groundRail('GND', 'Board ground, shared with the mainboard through J2.');
  b.rail(
    'VSYS',
    3.87,
    'System rail from the mainboard (J2); feeds the PD controller regulator and the speaker amplifier.',
    ['SYS'],
  );
  b.rail('VCC_1V8', 1.8, 'I/O rail from the mainboard (J2).');
  b.rail(
    'VCC_3V3',
    3.3,
    'Rail from the mainboard (J2); feeds the redriver through a ferrite and the charge LED.',
  );
  b.rail('USB_VBUS_CONN', 5.0, 'VBUS at the USB-C receptacle, before the fuse.');
  b.rail(
    'USB_VBUS',
    5.0,
    'VBUS after the fuse; input of the over-voltage switch. Up to 20 V when a PD source is negotiated.',
  );
  b.rail('VBUS_OUT', 5.0, 'VBUS behind the over-voltage switch, to the mainboard charger over J2.');
  b.rail('VCC_3V3_PD', 3.3, 'PD controller supply from its own LDO on VSYS.');
  b.rail('VCC_3V3_RDRV', 3.3, 'USB 3 redriver supply, VCC_3V3 through a ferrite bead.');
  b.rail(
    'VCC_1V8_AUD',
    1.8,
    'Codec, amplifier logic and microphone supply, VCC_1V8 through a ferrite bead.',
  );
  b.rail(
    'HP_VNEG',
    -1.8,
    'Negative headphone supply from the codec charge pump; reads about -1.8 V only while audio plays.',
  );
  for (const channel of speakerChannels) {
    b.rail(
      channel.lx,
      null,
      `Switch node of the ${channel.name} speaker amplifier boost; not a DC rail.`,
    );
    b.rail(
      channel.boost,
      8.5,
      `${channel.name} speaker amplifier boost output; idles near VSYS when the amplifier is off.`,
    );
  }
  b.rail('DOCK_PWR', 3.87, 'Keyboard-cover supply on the pogo pins, VSYS behind a load switch.');
}

function usbPort(b: BoardBuilder): void {
  b.block(1);
  // USB-C receptacle, full 24-pin, mid-mount at the board edge.
  // prettier-ignore
  const pinNets: [string, string | null][] = [
    ['A1', 'GND'], ['A2', 'USB_TX1_P'], ['A3', 'USB_TX1_N'], ['A4', 'USB_VBUS_CONN'], ['A5', 'USB_CC1'], ['A6', 'USB_DP'],
    ['A7', 'USB_DN'], ['A8', 'USB_SBU1'], ['A9', 'USB_VBUS_CONN'], ['A10', 'USB_RX2_N'], ['A11', 'USB_RX2_P'], ['A12', 'GND'],
    ['B1', 'GND'], ['B2', 'USB_TX2_P'], ['B3', 'USB_TX2_N'], ['B4', 'USB_VBUS_CONN'], ['B5', 'USB_CC2'], ['B6', 'USB_DP'],
    ['B7', 'USB_DN'], ['B8', 'USB_SBU2'], ['B9', 'USB_VBUS_CONN'], ['B10', 'USB_RX1_N'], ['B11', 'USB_RX1_P'], ['B12', 'GND'],
  ];
  const receptacle = customFootprint('USB-C-24P', 8.94, 7.5, [
    ...pinNets.map(([pin], i) => pad(pin, -2.75 + (i % 12) * 0.5, i < 12 ? 2.8 : 2.0)),
    ...['S1', 'S2', 'S3', 'S4'].map((pin, i) =>
      pad(pin, i < 2 ? -4.3 : 4.3, i % 2 === 0 ? 1.0 : -2.6),
    ),
  ]);
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'USB-C RECEPTACLE 24P',
    footprint: receptacle,
    nets: [...pinNets.map(([, net]) => net), 'GND', 'GND', 'GND', 'GND'],
    place: { side: 'top', at: { x: 48, y: 4.7 } },
  });

  const near = { x: 48, y: 12 };
  b.twoPin('F', 'fuse', '5A', c0603, 'USB_VBUS_CONN', 'USB_VBUS', top({ x: 40, y: 11 }, 1.5));
  const tvs = customFootprint('DFN1610-2', 1.6, 1.0, [pad('1', -0.55, 0), pad('2', 0.55, 0)]);
  b.twoPin('D', 'tvs', 'TVS 24V', tvs, 'USB_VBUS_CONN', 'GND', top({ x: 40, y: 11 }, 2));
  b.twoPin('D', 'tvs', 'TVS 24V', tvs, 'USB_VBUS', 'GND', top({ x: 40, y: 11 }, 2));
  const esd = dualRow('DFN-6', 3, 0.5, 1.0, 1.6, 1.0);
  // prettier-ignore
  for (const nets of [
    ['USB_DP', 'GND', 'USB_DN', 'USB_CC1', 'GND', 'USB_CC2'],
    ['USB_SBU1', 'GND', 'USB_SBU2', null, 'GND', null],
    ['USB_TX1_P', 'GND', 'USB_TX1_N', 'USB_RX1_P', 'GND', 'USB_RX1_N'],
    ['USB_TX2_P', 'GND', 'USB_TX2_N', 'USB_RX2_P', 'GND', 'USB_RX2_N'],
  ]) {
    b.add({ prefix: 'D', kind: 'tvs', value: 'ESD 4CH 5V', footprint: esd, nets, place: top(near, 2.5) });
  }
  b.decouple('USB_VBUS_CONN', top({ x: 40, y: 11 }, 2), [[1, '1uF/25V', c0402]]);
  b.decouple('USB_VBUS', top({ x: 36, y: 12 }, 2), [
    [2, '10uF/25V', c0603],
    [1, '100nF/25V', c0201],
  ]);

  const ovp = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'OVP SWITCH 28V',
    footprint: gridArray('WLCSP-12', 4, 3, 0.5),
    // prettier-ignore
    nets: [
      'USB_VBUS', 'USB_VBUS', 'USB_VBUS',
      'VBUS_OUT', 'VBUS_OUT', 'VBUS_OUT',
      'GND', 'OVP_EN_N', 'OVP_FLAG_N',
      'GND', 'GND', null,
    ],
    place: top({ x: 33, y: 12 }, 1),
  });
  b.link('USB_VBUS', 'VBUS_OUT', ovp, 'switch');
  b.decouple('VBUS_OUT', top({ x: 30, y: 12 }, 2), [
    [2, '10uF/25V', c0603],
    [1, '100nF/25V', c0201],
  ]);
  b.twoPin('R', 'resistor', '100K', c0201, 'OVP_FLAG_N', 'VCC_3V3_PD', top({ x: 33, y: 12 }, 2.5));
  b.twoPin('R', 'resistor', '100K', c0201, 'OVP_EN_N', 'GND', top({ x: 33, y: 12 }, 2.5));

  const pdAt = { x: 58, y: 14 };
  // prettier-ignore
  const pdNets: (string | null)[] = [
    'USB_CC1', 'USB_CC1', 'USB_CC2', 'USB_CC2', 'USB_VBUS', 'USB_VBUS', 'GND', 'VCC_3V3_PD',
    'VCC_3V3_PD', 'PD_LDO_1V5', 'GND', 'I2C_PD_SCL', 'I2C_PD_SDA', 'PD_INT_N', 'OVP_EN_N', 'OVP_FLAG_N',
    'USB_SBU1', 'USB_SBU2', 'SBU1_HOST', 'SBU2_HOST', 'PD_ADDR', 'PD_RESET_N', null, null,
    'USB_DP', 'USB_DN', 'REDRIVER_FLIP', 'REDRIVER_EN', 'GND', null, null, 'GND',
    'GND',
  ];
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'USB PD CONTROLLER',
    footprint: quadFlat('QFN-32', 8, 0.4, 4.0, true),
    nets: pdNets,
    place: bottom(pdAt),
  });
  b.decouple('VCC_3V3_PD', bottom(pdAt, 3), [
    [1, '1uF', c0201],
    [2, '100nF', c0201],
  ]);
  b.decouple('PD_LDO_1V5', bottom(pdAt, 3), [[1, '2u2', c0402]]);
  b.decouple('USB_VBUS', bottom(pdAt, 3), [[1, '100nF/25V', c0201]]);
  b.twoPin('C', 'capacitor', '220pF', c0201, 'USB_CC1', 'GND', bottom(pdAt, 3));
  b.twoPin('C', 'capacitor', '220pF', c0201, 'USB_CC2', 'GND', bottom(pdAt, 3));
  b.twoPin('R', 'resistor', '10K', c0201, 'PD_INT_N', 'VCC_1V8', bottom(pdAt, 3));
  b.twoPin('R', 'resistor', '100K', c0201, 'PD_ADDR', 'GND', bottom(pdAt, 3));
  b.twoPin('R', 'resistor', '100K', c0201, 'PD_RESET_N', 'VCC_3V3_PD', bottom(pdAt, 3));
  b.twoPin('C', 'capacitor', '100nF', c0201, 'PD_RESET_N', 'GND', bottom(pdAt, 3));

  const ldoAt = { x: 64, y: 8 };
  const ldo = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'LDO 3.3V 150mA',
    footprint: dualRow('SOT-23-5', 3, 0.95, 2.6, 2.9, 2.8),
    nets: ['VSYS', 'GND', 'VSYS', null, null, 'VCC_3V3_PD'],
    place: bottom(ldoAt, 1),
  });
  b.link('VSYS', 'VCC_3V3_PD', ldo, 'converter');
  b.decouple('VSYS', bottom(ldoAt, 2.5), [[1, '1uF', c0402]]);
  b.decouple('VCC_3V3_PD', bottom(ldoAt, 2.5), [[1, '1uF', c0402]]);

  const redriverAt = { x: 48, y: 18 };
  b.twoPin(
    'FB',
    'ferrite',
    '120R@100MHz',
    c0402,
    'VCC_3V3',
    'VCC_3V3_RDRV',
    top({ x: 56, y: 20 }, 1.5),
  );
  const ssCaps = superSpeed.map((net) => `${net}_C`);
  // prettier-ignore
  const redriverNets: (string | null)[] = [
    ...ssCaps.slice(0, 4), 'VCC_3V3_RDRV', 'GND', ...ssCaps.slice(4, 8), 'VCC_3V3_RDRV', 'GND',
    ...superSpeedHost, 'REDRIVER_FLIP', 'REDRIVER_EN', 'VCC_3V3_RDRV', 'GND', 'RDRV_EQ0', 'RDRV_EQ1',
    null, null, null, null, 'GND', null, null, null, null, 'VCC_3V3_RDRV',
    'GND', null, null, 'GND', null, null, 'GND', 'VCC_3V3_RDRV',
    'GND',
  ];
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'USB3 REDRIVER',
    footprint: quadFlat('QFN-40', 10, 0.4, 5.0, true),
    nets: redriverNets,
    place: top(redriverAt),
  });
  // AC-coupling capacitors on the SuperSpeed lanes between connector and redriver (USB 3 practice).
  superSpeed.forEach((net, i) => {
    b.twoPin(
      'C',
      'capacitor',
      '220nF',
      c0201,
      net,
      ssCaps[i] as string,
      top({ x: 48, y: 11.5 }, 3),
    );
  });
  b.decouple('VCC_3V3_RDRV', top(redriverAt, 4), [
    [6, '100nF', c0201],
    [2, '1uF', c0201],
    [1, '10uF', c0402],
  ]);
  b.twoPin('R', 'resistor', '10K', c0201, 'RDRV_EQ0', 'VCC_3V3_RDRV', top(redriverAt, 4));
  b.twoPin('R', 'resistor', '10K', c0201, 'RDRV_EQ1', 'GND', top(redriverAt, 4));
  b.twoPin('R', 'resistor', '100K', c0201, 'REDRIVER_EN', 'GND', top(redriverAt, 4));
}

function boardToBoard(b: BoardBuilder): void {
  b.block(2);
  const at = { x: 78, y: 12 };
  // prettier-ignore
  const nets: (string | null)[] = [
    'VSYS', 'VSYS', 'VSYS', 'VSYS', 'VSYS', 'VSYS', 'GND', 'GND',
    'VBUS_OUT', 'VBUS_OUT', 'VBUS_OUT', 'VBUS_OUT', 'VBUS_OUT', 'VBUS_OUT', 'GND', 'GND',
    'VCC_1V8', 'VCC_1V8', 'VCC_3V3', 'VCC_3V3', 'GND', 'GND',
    'USB_DP', 'USB_DN', 'GND', 'GND',
    'SS_TX_P', 'SS_TX_N', 'GND', 'GND', 'SS_RX_P', 'SS_RX_N', 'GND', 'GND',
    'SBU1_HOST', 'SBU2_HOST', 'I2C_PD_SCL', 'I2C_PD_SDA', 'PD_INT_N', 'OVP_FLAG_N',
    'I2S_BCLK', 'I2S_LRCK', 'I2S_DOUT', 'I2S_DIN', 'I2C_AUD_SCL', 'I2C_AUD_SDA', 'CODEC_INT_N', 'AMP_RST_N',
    'HALL_OUT_N', 'LED_CHG_N', 'CODEC_MCLK', 'GND', 'DOCK_EN', 'GND', 'DOCK_DATA', 'DOCK_DET_N', 'GND', 'GND', null, 'GND',
  ];
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'B2B PLUG 60P',
    footprint: connectorRows('CONN-60', 30, 0.4, 2.0),
    nets,
    place: { side: 'top', at, rotation: 90 },
  });
  b.decouple('VSYS', top(at, 6), [
    [2, '22uF/6.3V', c0603],
    [2, '100nF', c0201],
  ]);
  b.decouple('VBUS_OUT', top(at, 6), [[1, '1uF/25V', c0402]]);
  b.decouple('VCC_1V8', top(at, 6), [[2, '1uF', c0201]]);
  b.decouple('VCC_3V3', top(at, 6), [[2, '1uF', c0201]]);
  // The mainboard side of the flex is far away: bulk and high-frequency capacitors right under the plug.
  const under = bottom(at, 5);
  b.decouple('VSYS', under, [
    [2, '10uF/10V', c0402],
    [4, '100nF', c0201],
  ]);
  b.decouple('VBUS_OUT', under, [
    [1, '10uF/25V', c0603],
    [2, '100nF/25V', c0201],
  ]);
  b.decouple('VCC_1V8', under, [[2, '100nF', c0201]]);
  b.decouple('VCC_3V3', under, [[2, '100nF', c0201]]);
  // Edge-rate capacitors on the audio clocks and data that cross the flex.
  for (const net of ['I2S_BCLK', 'I2S_LRCK', 'I2S_DOUT', 'I2S_DIN', 'CODEC_MCLK'])
    b.twoPin('C', 'capacitor', '22pF', c0201, net, 'GND', under);
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C_PD_SCL', 'VCC_1V8', top(at, 6));
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C_PD_SDA', 'VCC_1V8', top(at, 6));
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C_AUD_SCL', 'VCC_1V8', top(at, 6));
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C_AUD_SDA', 'VCC_1V8', top(at, 6));
}

function audio(b: BoardBuilder): void {
  b.block(3);
  // The 3.5 mm jack is through-hole; ESD diodes and small filter capacitors sit at its pins.
  const jackAt = { x: 11, y: 12 };
  b.add({
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
    nets: ['HPL', 'HPR', 'HS_MIC', 'HP_SENSE', 'HP_DET'],
    place: { side: 'through', at: jackAt },
  });
  b.add({
    prefix: 'D',
    kind: 'tvs',
    value: 'ESD 4CH 5V',
    footprint: dualRow('DFN-6', 3, 0.5, 1.0, 1.6, 1.0),
    nets: ['HPL', 'GND', 'HPR', 'HS_MIC', 'GND', 'HP_DET'],
    place: top({ x: 19.5, y: 12 }, 2),
  });
  for (const net of ['HPL', 'HPR', 'HS_MIC'])
    b.twoPin('C', 'capacitor', '1nF', c0201, net, 'GND', top({ x: 19.5, y: 12 }, 3));
  b.twoPin('R', 'resistor', '1M', c0201, 'HP_DET', 'VCC_1V8_AUD', top({ x: 19.5, y: 12 }, 3));

  const codecAt = { x: 20, y: 12 };
  b.twoPin(
    'FB',
    'ferrite',
    '600R@100MHz',
    c0402,
    'VCC_1V8',
    'VCC_1V8_AUD',
    bottom({ x: 28, y: 16 }, 1.5),
  );
  const codec = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'HEADPHONE CODEC',
    footprint: quadFlat('QFN-32', 8, 0.4, 4.0, true),
    // prettier-ignore
    nets: [
      'VCC_1V8_AUD', 'GND', 'CP_FLYP', 'CP_FLYN', 'HP_VNEG', 'GND', 'HPL', 'HPR',
      'HP_SENSE', 'HS_MIC', 'MIC_BIAS', 'HP_DET', 'CODEC_VREF', 'VCC_1V8_AUD', 'DMIC_CLK', 'DMIC_DATA',
      'I2S_BCLK', 'I2S_LRCK', 'I2S_DOUT', 'I2S_DIN', 'CODEC_MCLK', 'I2C_AUD_SCL', 'I2C_AUD_SDA', 'CODEC_INT_N',
      'VCC_1V8_AUD', 'GND', null, null, 'GND', null, null, 'VCC_1V8_AUD',
      'GND',
    ],
    place: bottom(codecAt),
  });
  b.link('VCC_1V8_AUD', 'HP_VNEG', codec, 'converter');
  b.twoPin('C', 'capacitor', '1uF', c0201, 'CP_FLYP', 'CP_FLYN', bottom(codecAt, 3));
  b.decouple('HP_VNEG', bottom(codecAt, 3), [[1, '2u2', c0402]]);
  b.decouple('VCC_1V8_AUD', bottom(codecAt, 3), [
    [3, '1uF', c0201],
    [3, '100nF', c0201],
  ]);
  b.decouple('CODEC_VREF', bottom(codecAt, 3), [[1, '1uF', c0201]]);
  b.decouple('MIC_BIAS', bottom(codecAt, 3), [[1, '1uF', c0201]]);
  b.twoPin('R', 'resistor', '2K2', c0201, 'MIC_BIAS', 'HS_MIC', bottom(codecAt, 3));
  b.twoPin('R', 'resistor', '10K', c0201, 'CODEC_INT_N', 'VCC_1V8', bottom(codecAt, 3));

  // Two speakers at the bottom edge, each with its own boost amplifier (boost inductor in front of the switch node).
  for (const channel of speakerChannels) {
    const amp = b.add({
      prefix: 'U',
      kind: 'ic',
      value: 'SPEAKER AMP BOOST',
      footprint: gridArray('WLCSP-30', 5, 6, 0.4),
      // prettier-ignore
      nets: [
        'VSYS', 'VSYS', channel.lx, channel.lx, channel.lx, 'GND',
        channel.boost, channel.boost, channel.boost, 'GND', 'GND', 'GND',
        `SPK_${channel.side}_P`, `SPK_${channel.side}_P`, 'GND', `SPK_${channel.side}_N`, `SPK_${channel.side}_N`, 'GND',
        'I2S_BCLK', 'I2S_LRCK', 'I2S_DOUT', 'I2S_DIN', 'AMP_RST_N', 'VCC_1V8_AUD',
        'I2C_AUD_SCL', 'I2C_AUD_SDA', 'AMP_INT_N', 'GND', `AMP_ADDR_${channel.side}`, 'VCC_1V8_AUD',
      ],
      place: bottom(channel.at),
    });
    b.link(channel.lx, channel.boost, amp, 'converter');
    const near = bottom(channel.at, 3);
    b.twoPin(
      'L',
      'inductor',
      '1uH',
      powerInductor(2.0, 1.6),
      'VSYS',
      channel.lx,
      bottom({ x: channel.at.x + 5, y: channel.at.y }, 1.5),
    );
    b.decouple('VSYS', near, [
      [2, '10uF/10V', c0402],
      [1, '100nF', c0201],
    ]);
    b.decouple(channel.boost, near, [
      [2, '10uF/16V', c0603],
      [1, '100nF/16V', c0201],
    ]);
    b.decouple('VCC_1V8_AUD', near, [[1, '1uF', c0201]]);
    b.twoPin('C', 'capacitor', '1nF', c0201, `SPK_${channel.side}_P`, 'GND', near);
    b.twoPin('C', 'capacitor', '1nF', c0201, `SPK_${channel.side}_N`, 'GND', near);
    // The address strap tells the two amplifiers apart on the shared I2C bus.
    b.twoPin(
      'R',
      'resistor',
      '10K',
      c0201,
      `AMP_ADDR_${channel.side}`,
      channel.side === 'L' ? 'GND' : 'VCC_1V8_AUD',
      near,
    );
    b.add({
      prefix: 'J',
      kind: 'connector',
      value: 'SPEAKER CONN 2P',
      footprint: connectorRows('CONN-2', 1, 1.25, 1.6),
      nets: [`SPK_${channel.side}_P`, `SPK_${channel.side}_N`],
      place: top(channel.connector, 1),
    });
  }
  b.twoPin('R', 'resistor', '10K', c0201, 'AMP_INT_N', 'VCC_1V8_AUD', bottom({ x: 30, y: 5 }, 3));

  for (const [i, at] of [
    [0, { x: 12, y: 20 }],
    [1, { x: 88, y: 4 }],
  ] as const) {
    const mic = b.add({
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
      nets: ['VCC_1V8_AUD', 'DMIC_CLK', 'DMIC_DATA', 'GND', i === 0 ? 'GND' : 'VCC_1V8_AUD'],
      place: bottom(at, 1),
    });
    b.decouple('VCC_1V8_AUD', bottom({ x: mic.x, y: mic.y }, 2), [[1, '100nF', c0201]]);
  }
  b.twoPin('R', 'resistor', '33R', c0201, 'DMIC_CLK', 'DMIC_CLK_R', bottom(codecAt, 4));
  b.twoPin('C', 'capacitor', '22pF', c0201, 'DMIC_CLK_R', 'GND', bottom(codecAt, 4));
}

function extras(b: BoardBuilder): void {
  b.block(4);
  const hallAt = { x: 70, y: 20 };
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'HALL SWITCH',
    footprint: sot3('SOT-23', 2.9, 1.3),
    nets: ['VCC_1V8', 'HALL_OUT_N', 'GND'],
    place: bottom(hallAt, 1),
  });
  b.decouple('VCC_1V8', bottom(hallAt, 2), [[1, '100nF', c0201]]);
  b.twoPin('R', 'resistor', '100K', c0201, 'HALL_OUT_N', 'VCC_1V8', bottom(hallAt, 2));

  const ledAt = { x: 70, y: 4 };
  b.twoPin(
    'D',
    'diode',
    'LED AMBER',
    customFootprint('LED-0603', 1.6, 0.8, [pad('A', -0.65, 0), pad('K', 0.65, 0)]),
    'VCC_3V3',
    'LED_K',
    top(ledAt, 1),
  );
  b.twoPin('R', 'resistor', '1K', c0201, 'LED_K', 'LED_CHG_N', top(ledAt, 2));

  // Keyboard-cover pogo pins: switched power, a one-wire data line and a detect line, all ESD-clamped.
  const pogoAt = { x: 64, y: 21 };
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'POGO PADS 4P',
    footprint: customFootprint('POGO-4P', 10.0, 2.4, [
      pad('1', -3.75, 0),
      pad('2', -1.25, 0),
      pad('3', 1.25, 0),
      pad('4', 3.75, 0),
    ]),
    nets: ['DOCK_PWR', 'DOCK_DATA_POGO', 'DOCK_DET_N', 'GND'],
    place: top(pogoAt),
  });
  const dockSwitch = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'LOAD SWITCH 1A',
    footprint: gridArray('WLCSP-6', 3, 2, 0.4),
    nets: ['VSYS', 'DOCK_PWR', 'VSYS', 'DOCK_PWR', 'DOCK_EN', 'GND'],
    place: top({ x: 68, y: 16 }, 1),
  });
  b.link('VSYS', 'DOCK_PWR', dockSwitch, 'switch');
  const dockNear = top({ x: dockSwitch.x, y: dockSwitch.y }, 3);
  b.decouple('VSYS', dockNear, [[1, '1uF', c0201]]);
  b.decouple('DOCK_PWR', dockNear, [
    [1, '4u7', c0402],
    [1, '100nF', c0201],
  ]);
  b.twoPin(
    'D',
    'tvs',
    'TVS 6V',
    customFootprint('DFN1006-2', 1.0, 0.6, [pad('1', -0.35, 0), pad('2', 0.35, 0)]),
    'DOCK_PWR',
    'GND',
    dockNear,
  );
  b.add({
    prefix: 'D',
    kind: 'tvs',
    value: 'ESD 2CH 5V',
    footprint: dualRow('DFN-6', 3, 0.5, 1.0, 1.6, 1.0),
    nets: ['DOCK_DATA_POGO', 'GND', 'DOCK_DET_N', null, 'GND', null],
    place: dockNear,
  });
  b.twoPin('R', 'resistor', '100R', c0201, 'DOCK_DATA', 'DOCK_DATA_POGO', dockNear);
  b.twoPin('R', 'resistor', '100K', c0201, 'DOCK_DET_N', 'VCC_1V8', dockNear);
  b.twoPin('R', 'resistor', '100K', c0201, 'DOCK_EN', 'GND', dockNear);

  // Small bypass capacitors along VSYS keep radio-band noise from the amplifier off the mainboard flex.
  for (let i = 0; i < 8; i++)
    b.twoPin('C', 'capacitor', '10pF', c0201, 'VSYS', 'GND', bottom({ x: 40 + i * 5, y: 20 }, 2));

  b.block(null);
  // prettier-ignore
  for (const net of [
    'VSYS', 'VBUS_OUT', 'USB_VBUS', 'VCC_3V3_PD', 'VCC_3V3_RDRV', 'VCC_1V8_AUD', 'HP_VNEG', 'VBST_SPK_L', 'VBST_SPK_R', 'DOCK_PWR', 'VCC_1V8', 'VCC_3V3',
    'USB_CC1', 'USB_CC2', 'I2C_PD_SCL', 'I2C_PD_SDA', 'USB_DP', 'USB_DN',
    'I2S_BCLK', 'I2S_LRCK', 'I2S_DOUT', 'I2S_DIN', 'I2C_AUD_SCL', 'I2C_AUD_SDA', 'DOCK_DATA', 'HALL_OUT_N', 'PD_INT_N', 'CODEC_MCLK',
  ]) {
    b.testPoint(net, 'bottom', 4);
  }
  for (const at of [
    { x: 10, y: 4 },
    { x: 86, y: 20 },
  ]) {
    b.add({
      prefix: 'TP',
      kind: 'testpoint',
      value: 'TP',
      footprint: singlePad('TP-0.8', 0.8),
      nets: ['GND'],
      place: bottom(at, 3),
    });
  }
}
