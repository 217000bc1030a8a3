// An invented phone mainboard, "Ostrand handset" board OS-M1-5521, for demos and manual testing.
// Nothing here describes a real product: the circuit is a plausible generic phone power tree
// (USB-C → charger → VSYS ⇄ battery, a PMIC with bucks and LDOs, load switches, ferrite-fed
// sub-rails) with the parts a technician expects around it. Positions are millimetres on a
// 65 × 140 mm outline, origin at the bottom-left corner seen from the top side.
import { ballMap } from './ball-map';
import { BoardBuilder, type DemoNetlistBoard, type Placement, type Point } from './board-builder';
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

export const phoneBoardSeed = 0x05521;

const c0201 = chip('0201');
const c0402 = chip('0402');
const c0603 = chip('0603');
const c0805 = chip('0805');

const top = (at: Point, spread = 0): Placement => ({ side: 'top', at, spread });
const bottom = (at: Point, spread = 0): Placement => ({ side: 'bottom', at, spread });

/** A buck output of the PMIC: switch node, inductor, rail, where its load sits. */
interface BuckOutput {
  rail: string;
  volts: number;
  lx: string;
  inductor: string;
  inductorSize: readonly [number, number];
  /** balls for input, switch node */
  balls: number;
  feedback: string;
  description: string;
  aliases?: string[];
}

const bucks: readonly BuckOutput[] = [
  {
    rail: 'VDD_CPU',
    volts: 0.8,
    lx: 'LX_CPU',
    inductor: '0.47uH',
    inductorSize: [2.5, 2.0],
    balls: 4,
    feedback: 'VDD_CPU_SENSE_P',
    description:
      'CPU cluster core supply, PMIC buck 1, remote-sensed at the SoC. Reads low resistance to ground on good boards.',
    aliases: ['VDD_CORE_CPU'],
  },
  {
    rail: 'VDD_GPU',
    volts: 0.75,
    lx: 'LX_GPU',
    inductor: '0.47uH',
    inductorSize: [2.5, 2.0],
    balls: 4,
    feedback: 'VDD_GPU_SENSE_P',
    description: 'Graphics core supply, PMIC buck 2, remote-sensed at the SoC.',
  },
  {
    rail: 'VDD_SOC',
    volts: 0.75,
    lx: 'LX_SOC',
    inductor: '0.47uH',
    inductorSize: [2.0, 1.6],
    balls: 3,
    feedback: 'VDD_SOC',
    description: 'SoC fabric and modem logic supply, PMIC buck 3.',
  },
  {
    rail: 'VDD_MEM',
    volts: 1.1,
    lx: 'LX_MEM',
    inductor: '0.47uH',
    inductorSize: [2.0, 1.6],
    balls: 3,
    feedback: 'VDD_MEM',
    description: 'DRAM core and I/O supply (1.1 V), PMIC buck 4; also feeds the SoC memory PHY.',
  },
  {
    rail: 'VCC_1V8',
    volts: 1.8,
    lx: 'LX_1V8',
    inductor: '1uH',
    inductorSize: [2.0, 1.6],
    balls: 2,
    feedback: 'VCC_1V8',
    description:
      'Main 1.8 V I/O rail, PMIC buck 5: pull-ups, sensors, display and camera interface.',
    aliases: ['VIO_1V8'],
  },
  {
    rail: 'VCC_3V3',
    volts: 3.3,
    lx: 'LX_3V3',
    inductor: '1uH',
    inductorSize: [2.0, 1.6],
    balls: 2,
    feedback: 'VCC_3V3',
    description: 'Main 3.3 V rail, PMIC buck-boost 6: storage, touch, sensor load switch.',
  },
];

/** PMIC linear regulators, all fed from VSYS. */
const ldos = [
  {
    rail: 'VDD_AON',
    volts: 0.9,
    description:
      'Always-on domain of the SoC (wake logic, RTC), PMIC LDO 1. Present whenever VSYS is.',
  },
  {
    rail: 'VCC_1V2',
    volts: 1.2,
    description: 'PLL, USB PHY and storage interface supply, PMIC LDO 2.',
  },
  { rail: 'VCC_2V8_CAM', volts: 2.8, description: 'Camera analogue supply, PMIC LDO 3.' },
  { rail: 'VCC_1V05_CAM', volts: 1.05, description: 'Camera sensor core supply, PMIC LDO 4.' },
  {
    rail: 'VCC_SIM',
    volts: 1.8,
    description:
      'SIM card supply (1.8 V class), PMIC LDO 5; switched off when no card is detected.',
  },
] as const;

const ddrSignals = [
  ...range(32).map((i) => `DDR_DQ${i}`),
  ...range(4).flatMap((i) => [`DDR_DQS${i}_P`, `DDR_DQS${i}_N`, `DDR_DMI${i}`]),
  ...range(6).map((i) => `DDR_CA${i}`),
  'DDR_CK_P',
  'DDR_CK_N',
  'DDR_CS0',
  'DDR_CKE0',
  'DDR_RESET_N',
];
const dsiSignals = [
  'MIPI_DSI_CK_P',
  'MIPI_DSI_CK_N',
  ...range(4).flatMap((i) => [`MIPI_DSI_D${i}_P`, `MIPI_DSI_D${i}_N`]),
];
const csi0Signals = [
  'MIPI_CSI0_CK_P',
  'MIPI_CSI0_CK_N',
  ...range(4).flatMap((i) => [`MIPI_CSI0_D${i}_P`, `MIPI_CSI0_D${i}_N`]),
];
const csi1Signals = [
  'MIPI_CSI1_CK_P',
  'MIPI_CSI1_CK_N',
  ...range(2).flatMap((i) => [`MIPI_CSI1_D${i}_P`, `MIPI_CSI1_D${i}_N`]),
];
const sdioSignals = ['WLAN_SDIO_CLK', 'WLAN_SDIO_CMD', ...range(4).map((i) => `WLAN_SDIO_D${i}`)];
const ufsSignals = ['UFS_TX_P', 'UFS_TX_N', 'UFS_RX_P', 'UFS_RX_N', 'UFS_REF_CLK', 'UFS_RST_N'];
const iqSignals = [
  'MDM_TX_I_P',
  'MDM_TX_I_N',
  'MDM_TX_Q_P',
  'MDM_TX_Q_N',
  'MDM_RX_I_P',
  'MDM_RX_I_N',
  'MDM_RX_Q_P',
  'MDM_RX_Q_N',
];
const simSignals = ['SIM_CLK', 'SIM_IO', 'SIM_RST', 'SIM_DET'];
const spi2Signals = ['SPI2_SCLK', 'SPI2_MOSI', 'SPI2_MISO', 'SPI2_CS0_N'];
const jtagSignals = ['JTAG_TCK', 'JTAG_TMS', 'JTAG_TDI', 'JTAG_TDO', 'JTAG_TRST_N'];
const thermistors = [
  { net: 'THERM_SOC', at: { x: 40, y: 102 } },
  { net: 'THERM_CHG', at: { x: 44, y: 30 } },
  { net: 'THERM_PA', at: { x: 12, y: 104 } },
  { net: 'THERM_USB', at: { x: 26, y: 10 } },
] as const;
const bootStraps = ['BOOT_CFG0', 'BOOT_CFG1', 'BOOT_CFG2', 'BOOT_CFG3'];

export function generatePhoneBoard(options: { seed?: number } = {}): DemoNetlistBoard {
  const random = new Random(options.seed ?? phoneBoardSeed);
  const b = new BoardBuilder(65, 140, random);
  declareRails(b);

  mountingHoles(b);
  usbAndCharger(b);
  battery(b);
  pmic(b);
  soc(b);
  memory(b);
  displayAndCameras(b);
  audio(b);
  sensors(b);
  radio(b);
  cellularRf(b);
  simAndFingerprint(b);
  keysAndDebug(b);
  testPoints(b);

  const title = 'Ostrand handset mainboard';
  return {
    slug: 'ostrand-os-m1-5521',
    job: 'OS-M1-5521',
    title,
    revision: 'B2',
    components: b.components,
    annotations: b.annotations(
      {
        title,
        deviceFamily: 'Ostrand handset',
        boardNumber: 'OS-M1-5521',
        revision: 'B2',
        batteryVoltage: 3.85,
        notes:
          'Invented demo board. Single-cell battery (3.85 V nominal). USB-C input through an OVP FET into a switching charger; ' +
          'the charger regulates VSYS, and a battery FET joins VBAT to VSYS.',
      },
      'VBAT',
    ),
  };
}

function declareRails(b: BoardBuilder): void {
  b.groundRail('GND', 'Board ground: shields, connector shells and every ground ball.');
  b.rail('VBAT', 3.85, 'Battery positive from the battery connector; the root of the power tree.', [
    'BATT_POS',
  ]);
  b.rail(
    'VSYS',
    3.85,
    'Main system rail regulated by the charger; feeds the PMIC, display boost, haptics and radio.',
    ['SYS'],
  );
  b.rail('USB_VBUS_CONN', 5.0, 'VBUS at the USB-C receptacle, before the fuse.');
  b.rail('USB_VBUS', 5.0, 'USB VBUS after the input fuse, clamped by the TVS.');
  b.rail('CHG_VIN', 5.0, 'Charger input after the over-voltage protection FET.');
  b.rail(
    'CHG_DRV',
    5.0,
    'Charger internal regulator output, biases the gate drivers and the battery NTC divider.',
  );
  b.rail('LX_CHG', null, 'Charger switch node: pulses between ground and CHG_VIN; not a DC rail.');
  b.rail('VBAT_AMP', 3.85, 'Speaker amplifier supply, VBAT through a fuse.');
  for (const buck of bucks) {
    b.rail(buck.lx, null, `Switch node of the ${buck.rail} buck; not a DC rail.`);
    b.rail(buck.rail, buck.volts, buck.description, buck.aliases);
  }
  for (const ldo of ldos) b.rail(ldo.rail, ldo.volts, ldo.description);
  b.rail('VCC_1V2_PLL', 1.2, 'SoC PLL supply, VCC_1V2 through a 0 Ω link.');
  b.rail('VCC_1V8_AUDIO', 1.8, 'Audio codec supply, VCC_1V8 through a ferrite bead.');
  b.rail('VCC_2V8_CAMF', 2.8, 'Front camera analogue supply, VCC_2V8_CAM through a ferrite bead.');
  b.rail(
    'VCC_3V3_SENSOR',
    3.3,
    'Sensor supply behind a load switch from VCC_3V3; off in deep sleep.',
  );
  b.rail('VCC_1V8_SENSOR', 1.8, 'Sensor I/O supply behind a P-channel MOSFET from VCC_1V8.');
  b.rail('VSYS_DISP', 3.85, 'Display boost input behind a load switch from VSYS.');
  b.rail('LX_DISP', null, 'Switch node of the display boost; not a DC rail.');
  b.rail('AVDD_DISP', 5.5, 'Display panel analogue supply from the boost converter.');
  b.rail('LX_FLASH', null, 'Switch node of the camera flash boost; not a DC rail.');
  b.rail(
    'VOUT_FLASH',
    4.5,
    'Camera flash LED anode supply from the flash boost; sits at VSYS when the flash is idle.',
  );
  b.rail('NFC_VDDPA', 3.3, "NFC transmitter supply from the NFC controller's internal regulator.");
  b.rail('LX_PA', null, 'Switch node of the RF power-amplifier supply; not a DC rail.');
  b.rail(
    'VCC_PA',
    3.4,
    'RF power-amplifier supply; follows the transmit envelope (about 0.5–4.5 V), so read it with the radio idle.',
  );
}

function mountingHoles(b: BoardBuilder): void {
  b.block(null);
  const hole = singlePad('HOLE-2.2', 2.2);
  for (const at of [
    { x: 4, y: 4 },
    { x: 61, y: 4 },
    { x: 4, y: 70 },
    { x: 61, y: 70 },
    { x: 4, y: 136 },
    { x: 61, y: 136 },
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
}

function usbAndCharger(b: BoardBuilder): void {
  b.block(1);
  const usbPins = [
    'A1',
    'A4',
    'A5',
    'A6',
    'A7',
    'A8',
    'A9',
    'A12',
    'B1',
    'B4',
    'B5',
    'B6',
    'B7',
    'B8',
    'B9',
    'B12',
  ];
  // prettier-ignore
  const usbNet: Record<string, string> = {
    A1: 'GND', A12: 'GND', B1: 'GND', B12: 'GND',
    A4: 'USB_VBUS_CONN', A9: 'USB_VBUS_CONN', B4: 'USB_VBUS_CONN', B9: 'USB_VBUS_CONN',
    A5: 'USB_CC1', B5: 'USB_CC2', A6: 'USB_DP', B6: 'USB_DP', A7: 'USB_DN', B7: 'USB_DN',
    A8: 'USB_SBU1', B8: 'USB_SBU2',
  };
  const receptacle = customFootprint('USB-C-16P', 8.94, 7.3, [
    ...usbPins.map((pin, i) => pad(pin, -3.375 + i * 0.45, 3.0)),
    ...['S1', 'S2', 'S3', 'S4'].map((pin, i) =>
      pad(pin, i < 2 ? -4.3 : 4.3, i % 2 === 0 ? 1.5 : -2.5),
    ),
  ]);
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'USB-C RECEPTACLE',
    footprint: receptacle,
    nets: [...usbPins.map((pin) => usbNet[pin] ?? null), 'GND', 'GND', 'GND', 'GND'],
    place: top({ x: 32.5, y: 4.7 }),
  });

  const nearUsb = { x: 32.5, y: 11 };
  b.twoPin('F', 'fuse', '3A', c0603, 'USB_VBUS_CONN', 'USB_VBUS', top(nearUsb, 2));
  const tvs = customFootprint('DFN1006-2', 1.0, 0.6, [pad('1', -0.35, 0), pad('2', 0.35, 0)]);
  b.twoPin('D', 'tvs', 'TVS 24V', tvs, 'USB_VBUS_CONN', 'GND', top(nearUsb, 2));
  b.twoPin('D', 'tvs', 'TVS 24V', tvs, 'USB_VBUS', 'GND', top(nearUsb, 2));
  const esd6 = dualRow('DFN-6', 3, 0.5, 1.0, 1.6, 1.0);
  b.add({
    prefix: 'D',
    kind: 'tvs',
    value: 'ESD 4CH 5V',
    footprint: esd6,
    nets: ['USB_DP', 'GND', 'USB_DN', 'USB_CC1', 'GND', 'USB_CC2'],
    place: top(nearUsb, 2),
  });
  b.add({
    prefix: 'D',
    kind: 'tvs',
    value: 'ESD 2CH 5V',
    footprint: esd6,
    nets: ['USB_SBU1', 'GND', 'USB_SBU2', null, 'GND', null],
    place: top(nearUsb, 2),
  });
  b.decouple('USB_VBUS_CONN', top(nearUsb), [[1, '1uF/25V', c0402]]);
  b.decouple('USB_VBUS', top(nearUsb), [
    [2, '10uF/25V', c0603],
    [1, '100nF/25V', c0201],
  ]);

  const ccController = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'USB-C CC CONTROLLER',
    footprint: gridArray('WLCSP-9', 3, 3, 0.4),
    nets: [
      'USB_CC1',
      'VCC_1V8',
      'USB_CC2',
      'I2C0_SCL',
      'GND',
      'I2C0_SDA',
      'CC_INT_N',
      'USB_VBUS',
      'GND',
    ],
    place: top({ x: 24, y: 13 }, 1),
  });
  const nearCc = { x: ccController.x, y: ccController.y };
  b.decouple('VCC_1V8', top(nearCc), [[1, '100nF', c0201]]);
  b.twoPin('R', 'resistor', '10K', c0201, 'CC_INT_N', 'VCC_1V8', top(nearCc, 1.5));

  const ovp = b.add({
    prefix: 'Q',
    kind: 'mosfet',
    value: 'NMOS DUAL 30V',
    footprint: dualRow('DFN-6', 3, 0.65, 1.6, 2.0, 2.0),
    nets: ['USB_VBUS', 'USB_VBUS', 'CHG_OVP_GATE', 'CHG_VIN', 'CHG_VIN', 'CHG_OVP_GATE'],
    place: top({ x: 40, y: 16 }, 1),
  });
  b.link('USB_VBUS', 'CHG_VIN', ovp, 'switch');

  const chargerAt = { x: 47, y: 25 };
  const chargerFootprint = gridArray('WLCSP-72', 8, 9, 0.4);
  const charger = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'CHARGER 3A SW',
    footprint: chargerFootprint,
    nets: ballMap(chargerFootprint, {
      // prettier-ignore
      signals: [
        'I2C0_SCL', 'I2C0_SDA', 'CHG_INT_N', 'CHG_OVP_GATE', 'BATFET_GATE', 'CHG_BOOT', 'BATT_NTC', 'BATT_ID',
        'USB_DP', 'USB_DN', 'CHG_ILIM', 'CHG_DRV', 'CHG_DRV',
      ],
      power: [
        ['CHG_VIN', 6],
        ['LX_CHG', 8],
        ['VSYS', 6],
        ['VBAT', 3],
      ],
      signalRings: 1,
      groundPattern: 'none',
    }),
    place: top(chargerAt),
  });
  b.link('CHG_VIN', 'LX_CHG', charger, 'converter');
  b.link('CHG_VIN', 'CHG_DRV', charger, 'converter');
  b.twoPin(
    'L',
    'inductor',
    '1uH 3A',
    powerInductor(2.5, 2.0),
    'LX_CHG',
    'VSYS',
    top({ x: 53, y: 25 }, 1.5),
  );
  b.twoPin('C', 'capacitor', '47nF', c0201, 'CHG_BOOT', 'LX_CHG', top(chargerAt, 3));
  b.decouple('CHG_VIN', top(chargerAt, 3), [
    [2, '10uF/25V', c0603],
    [1, '100nF/25V', c0201],
  ]);
  b.decouple('CHG_DRV', top(chargerAt, 3), [[1, '4u7/10V', c0402]]);
  b.decouple('VSYS', top({ x: 53, y: 30 }, 2), [
    [4, '22uF/6.3V', c0603],
    [1, '47uF/6.3V', c0805],
    [2, '100nF', c0201],
  ]);
  b.twoPin('R', 'resistor', '10K', c0201, 'CHG_DRV', 'BATT_NTC', top(chargerAt, 3));
  b.twoPin('R', 'resistor', '1K', c0201, 'CHG_ILIM', 'GND', top(chargerAt, 3));
  b.twoPin('R', 'resistor', '10K', c0201, 'CHG_INT_N', 'VCC_1V8', top(chargerAt, 3));
  b.twoPin('R', 'resistor', '100K', c0201, 'CHG_OVP_GATE', 'GND', top({ x: 40, y: 16 }, 2));

  const batfet = b.add({
    prefix: 'Q',
    kind: 'mosfet',
    value: 'NMOS 20V',
    footprint: dualRow('DFN-8', 4, 0.65, 2.2, 3.0, 3.0),
    nets: ['VBAT', 'VBAT', 'VBAT', 'BATFET_GATE', 'VSYS', 'VSYS', 'VSYS', 'VSYS'],
    place: top({ x: 54, y: 38 }, 1),
  });
  b.link('VBAT', 'VSYS', batfet, 'switch');
}

function battery(b: BoardBuilder): void {
  b.block(2);
  const at = { x: 54, y: 52 };
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'BATT B2B 10P',
    footprint: connectorRows('CONN-10', 5, 0.6, 2.0),
    nets: ['VBAT', 'VBAT', 'VBAT', 'VBAT', 'BATT_NTC', 'BATT_ID', 'GND', 'GND', 'GND', 'GND'],
    place: top(at),
  });
  b.twoPin(
    'D',
    'tvs',
    'TVS 6V',
    customFootprint('DFN1006-2', 1.0, 0.6, [pad('1', -0.35, 0), pad('2', 0.35, 0)]),
    'VBAT',
    'GND',
    top(at, 3),
  );
  b.decouple('VBAT', top(at, 3), [
    [2, '10uF/10V', c0402],
    [1, '100nF', c0201],
  ]);
  b.twoPin('C', 'capacitor', '100nF', c0201, 'BATT_NTC', 'GND', top(at, 3));
  b.twoPin('F', 'fuse', '2A', c0402, 'VBAT', 'VBAT_AMP', bottom({ x: 22, y: 18 }, 2));
}

function pmic(b: BoardBuilder): void {
  b.block(2);
  const at = { x: 17, y: 70 };
  const footprint = gridArray('WLCSP-140', 10, 14, 0.4);
  const power: [string, number][] = [['VSYS', 4]];
  for (const buck of bucks) power.push(['VSYS', buck.balls], [buck.lx, buck.balls]);
  for (const ldo of ldos) power.push(['VSYS', 1], [ldo.rail, 1]);
  const feedback = bucks.map((buck) => buck.feedback);
  const pmicPart = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'PMIC 6B5L',
    footprint,
    nets: ballMap(footprint, {
      signals: [
        ...feedback,
        'I2C0_SCL',
        'I2C0_SDA',
        'PMIC_INT_N',
        'PWR_KEY_N',
        'PMIC_RESET_N',
        'PWR_HOLD',
        'XTAL_32K_IN',
        'XTAL_32K_OUT',
        'CLK_32K',
        'PMIC_VREF',
        'LS_SENSOR_EN',
        ...thermistors.map((t) => t.net),
      ],
      power,
      signalRings: 1,
      groundPattern: 'none',
    }),
    place: top(at),
  });
  b.decouple('VSYS', top(at, 4), [
    [2, '10uF/10V', c0402],
    [2, '100nF', c0201],
  ]);
  b.decouple('PMIC_VREF', top(at, 3), [[1, '100nF', c0201]]);

  // Inductors ring the PMIC, each with its output capacitors beside it.
  const spots: Point[] = [
    { x: 8, y: 78 },
    { x: 13, y: 80 },
    { x: 20, y: 80 },
    { x: 26, y: 76 },
    { x: 26, y: 66 },
    { x: 9, y: 62 },
  ];
  bucks.forEach((buck, i) => {
    b.link('VSYS', buck.lx, pmicPart, 'converter');
    const spot = spots[i] as Point;
    b.decouple('VSYS', top(at, 4), [
      [1, '10uF/10V', c0402],
      [1, '100nF', c0201],
    ]);
    const inductor = b.twoPin(
      'L',
      'inductor',
      buck.inductor,
      powerInductor(...buck.inductorSize),
      buck.lx,
      buck.rail,
      top(spot, 1),
    );
    const big = buck.balls >= 4;
    b.decouple(buck.rail, top({ x: inductor.x, y: inductor.y }, 2), [
      [big ? 4 : 2, '22uF/6.3V', c0603],
      [1, '100nF', c0201],
    ]);
  });
  for (const ldo of ldos) {
    b.link('VSYS', ldo.rail, pmicPart, 'converter');
    b.decouple(ldo.rail, bottom(at, 4), [
      [1, ldo.volts > 2 ? '2u2' : '1uF', ldo.volts > 2 ? c0402 : c0201],
      [1, '100nF', c0201],
    ]);
  }

  const crystal = customFootprint('XTAL-2012', 2.0, 1.2, [pad('1', -0.7, 0), pad('2', 0.7, 0)]);
  const xtalAt = { x: 10, y: 70 };
  b.twoPin('Y', 'crystal', '32.768kHz', crystal, 'XTAL_32K_IN', 'XTAL_32K_OUT', top(xtalAt, 1));
  b.twoPin('C', 'capacitor', '12pF', c0201, 'XTAL_32K_IN', 'GND', top(xtalAt, 2));
  b.twoPin('C', 'capacitor', '12pF', c0201, 'XTAL_32K_OUT', 'GND', top(xtalAt, 2));
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C0_SCL', 'VCC_1V8', top(at, 4));
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C0_SDA', 'VCC_1V8', top(at, 4));
  b.twoPin('R', 'resistor', '10K', c0201, 'PMIC_INT_N', 'VCC_1V8', top(at, 4));
  b.twoPin('R', 'resistor', '100K', c0201, 'PMIC_RESET_N', 'VDD_AON', top(at, 4));

  // Board thermistors on the PMIC's ADC inputs: a 100K NTC to ground with a 100K bias from VCC_1V8.
  for (const thermistor of thermistors) {
    const place = bottom(thermistor.at, 2);
    b.twoPin('RT', 'resistor', 'NTC 100K', c0201, thermistor.net, 'GND', place);
    b.twoPin('R', 'resistor', '100K', c0201, thermistor.net, 'VCC_1V8', place);
    b.twoPin('C', 'capacitor', '100nF', c0201, thermistor.net, 'GND', place);
  }
}

function soc(b: BoardBuilder): void {
  b.block(3);
  const at = { x: 32.5, y: 110 };
  const footprint = gridArray('BGA-756', 28, 28, 0.4, (r, c) => {
    const corner = (r < 2 || r > 25) && (c < 2 || c > 25);
    const centre = r >= 12 && r < 16 && c >= 12 && c < 16;
    return corner || centre;
  });
  const signals = [
    ...ddrSignals,
    ...ufsSignals,
    ...dsiSignals,
    ...csi0Signals,
    ...csi1Signals,
    'USB_DP',
    'USB_DN',
    ...['I2C0', 'I2C1', 'I2C2', 'I2C3', 'I2C4'].flatMap((bus) => [`${bus}_SCL`, `${bus}_SDA`]),
    'SPI1_SCLK',
    'SPI1_MOSI',
    'SPI1_MISO',
    'SPI1_CS0_N',
    'UART_DBG_TX',
    'UART_DBG_RX',
    'BT_UART_TX',
    'BT_UART_RX',
    'BT_UART_RTS_N',
    'BT_UART_CTS_N',
    ...sdioSignals,
    'WLAN_EN',
    'BT_EN',
    'I2S_BCLK',
    'I2S_LRCK',
    'I2S_DOUT',
    'I2S_DIN',
    'CODEC_MCLK',
    'CAM0_MCLK',
    'CAM1_MCLK',
    'CAM0_RST_N',
    'CAM1_RST_N',
    'DISP_RST_N',
    'DISP_TE',
    'DISP_PWR_EN',
    'DISP_BST_EN',
    'TOUCH_INT_N',
    'TOUCH_RST_N',
    'IMU_INT1',
    'IMU_INT2',
    'ALS_INT_N',
    'CODEC_INT_N',
    'CODEC_RST_N',
    'AMP_RST_N',
    'HAPT_EN',
    'SNS_1V8_EN_N',
    'VOL_UP_N',
    'VOL_DN_N',
    'FLASH_STROBE',
    'NFC_IRQ',
    'NFC_EN',
    'PMIC_INT_N',
    'PMIC_RESET_N',
    'PWR_HOLD',
    'CLK_32K',
    'XTAL_24M_IN',
    'XTAL_24M_OUT',
    'VDD_CPU_SENSE_P',
    'VDD_GPU_SENSE_P',
    'CHG_INT_N',
    'CC_INT_N',
    ...iqSignals,
    'RFFE_CLK',
    'RFFE_DATA',
    'RF_CLK_EN',
    'PA_EN',
    ...simSignals,
    ...spi2Signals,
    'FP_INT_N',
    'FP_RST_N',
    ...jtagSignals,
    ...bootStraps,
  ];
  const socPart = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'SOC 8-CORE',
    footprint,
    nets: ballMap(footprint, {
      signals,
      power: [
        ['VDD_CPU', 64],
        ['VDD_GPU', 48],
        ['VDD_SOC', 40],
        ['VDD_MEM', 28],
        ['VCC_1V8', 14],
        ['VCC_1V2', 6],
        ['VCC_1V2_PLL', 4],
        ['VDD_AON', 4],
      ],
      signalRings: 3,
      groundPattern: 'checker',
      notConnected: 12,
    }),
    place: top(at),
  });
  const under = bottom(at, 4);
  b.decouple('VDD_CPU', under, [
    [26, '1uF', c0201],
    [8, '4u7', c0402],
    [6, '100nF', c0201],
  ]);
  b.decouple('VDD_GPU', under, [
    [20, '1uF', c0201],
    [6, '4u7', c0402],
  ]);
  b.decouple('VDD_SOC', under, [
    [16, '1uF', c0201],
    [4, '4u7', c0402],
  ]);
  b.decouple('VDD_MEM', under, [
    [12, '100nF', c0201],
    [3, '4u7', c0402],
  ]);
  b.decouple('VCC_1V8', under, [
    [8, '100nF', c0201],
    [2, '1uF', c0201],
  ]);
  b.decouple('VCC_1V2', under, [[4, '100nF', c0201]]);
  b.decouple('VCC_1V2_PLL', under, [
    [2, '100nF', c0201],
    [1, '1uF', c0201],
  ]);
  b.decouple('VDD_AON', under, [[2, '100nF', c0201]]);
  const beside = top(at, 8);
  b.decouple('VDD_CPU', beside, [
    [4, '22uF/6.3V', c0603],
    [6, '100nF', c0201],
  ]);
  b.decouple('VDD_GPU', beside, [
    [3, '22uF/6.3V', c0603],
    [4, '100nF', c0201],
  ]);
  b.decouple('VDD_SOC', beside, [
    [2, '10uF', c0402],
    [4, '100nF', c0201],
  ]);
  b.decouple('VDD_MEM', beside, [[2, '10uF', c0402]]);
  b.decouple('VCC_1V8', beside, [[2, '4u7', c0402]]);
  b.twoPin(
    'R',
    'resistor',
    '0R',
    c0402,
    'VCC_1V2',
    'VCC_1V2_PLL',
    top({ x: socPart.x - 8, y: socPart.y }, 2),
  );

  const xtalAt = { x: 22, y: 102 };
  const crystal = customFootprint('XTAL-2016', 2.0, 1.6, [
    pad('1', -0.7, -0.55),
    pad('2', 0.7, -0.55),
    pad('3', 0.7, 0.55),
    pad('4', -0.7, 0.55),
  ]);
  b.add({
    prefix: 'Y',
    kind: 'crystal',
    value: '24MHz',
    footprint: crystal,
    nets: ['XTAL_24M_IN', 'GND', 'XTAL_24M_OUT', 'GND'],
    place: top(xtalAt, 1),
  });
  b.twoPin('C', 'capacitor', '18pF', c0201, 'XTAL_24M_IN', 'GND', top(xtalAt, 2));
  b.twoPin('C', 'capacitor', '18pF', c0201, 'XTAL_24M_OUT', 'GND', top(xtalAt, 2));

  // Pull resistors for the SoC's buses and control lines, scattered around the package edge.
  for (const net of ['TOUCH_INT_N', 'CODEC_INT_N'])
    b.twoPin('R', 'resistor', '10K', c0201, net, 'VCC_1V8', beside);
  for (const net of [
    'CAM0_RST_N',
    'CAM1_RST_N',
    'DISP_RST_N',
    'WLAN_EN',
    'BT_EN',
    'DISP_PWR_EN',
    'DISP_BST_EN',
  ]) {
    b.twoPin('R', 'resistor', '100K', c0201, net, 'GND', beside);
  }
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C3_SCL', 'VCC_1V8', beside);
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C3_SDA', 'VCC_1V8', beside);
  b.twoPin('R', 'resistor', '2K2', c0201, 'I2C4_SCL', 'VCC_1V8', beside);
  b.twoPin('R', 'resistor', '2K2', c0201, 'I2C4_SDA', 'VCC_1V8', beside);
  // Series terminations on the camera clocks, close to the SoC.
  b.twoPin('R', 'resistor', '33R', c0201, 'CAM0_MCLK', 'CAM0_MCLK_CONN', beside);
  b.twoPin('R', 'resistor', '33R', c0201, 'CAM1_MCLK', 'CAM1_MCLK_CONN', beside);
  // Boot straps: the fitted resistor sets the boot source; both positions exist on the board.
  bootStraps.forEach((net, i) => {
    b.twoPin('R', 'resistor', '10K', c0201, net, i % 2 === 0 ? 'VCC_1V8' : 'GND', beside);
    b.twoPin('R', 'resistor', '10K', c0201, net, i % 2 === 0 ? 'GND' : 'VDD_AON', beside);
  });
  for (const net of ['JTAG_TMS', 'JTAG_TDI'])
    b.twoPin('R', 'resistor', '10K', c0201, net, 'VCC_1V8', beside);
  b.twoPin('R', 'resistor', '10K', c0201, 'JTAG_TRST_N', 'GND', beside);
  // Small filter capacitors on the remote-sense lines keep switching noise out of the regulation loop.
  for (const net of ['VDD_CPU_SENSE_P', 'VDD_GPU_SENSE_P'])
    b.twoPin('C', 'capacitor', '1nF', c0201, net, 'GND', beside);
}

function memory(b: BoardBuilder): void {
  b.block(4);
  const dramAt = { x: 32.5, y: 91 };
  const dram = gridArray('BGA-200', 20, 12, 0.65, (_r, c) => c === 5 || c === 6);
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'LPDDR 4GB X32',
    footprint: dram,
    nets: ballMap(dram, {
      signals: [...ddrSignals, 'DDR_ZQ'],
      power: [
        ['VDD_MEM', 24],
        ['VCC_1V8', 6],
      ],
      signalRings: 2,
      groundPattern: 'checker',
      notConnected: 24,
    }),
    place: { side: 'top', at: dramAt, rotation: 90 },
  });
  b.decouple('VDD_MEM', bottom(dramAt, 4), [
    [12, '1uF', c0201],
    [4, '4u7', c0402],
    [6, '100nF', c0201],
  ]);
  b.decouple('VCC_1V8', bottom(dramAt, 4), [
    [2, '100nF', c0201],
    [1, '1uF', c0201],
  ]);
  b.twoPin('R', 'resistor', '240R', c0201, 'DDR_ZQ', 'GND', bottom(dramAt, 3));

  const storageAt = { x: 52.5, y: 108 };
  const storage = gridArray('BGA-153', 13, 13, 0.8, (r, c) => r >= 5 && r < 9 && c >= 5 && c < 9);
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'FLASH 128GB',
    footprint: storage,
    nets: ballMap(storage, {
      signals: ufsSignals,
      power: [
        ['VCC_3V3', 8],
        ['VCC_1V8', 6],
        ['VCC_1V2', 6],
      ],
      signalRings: 2,
      groundPattern: 'checker',
      notConnected: 30,
    }),
    place: top(storageAt),
  });
  b.decouple('VCC_3V3', bottom(storageAt, 4), [
    [2, '4u7', c0402],
    [2, '100nF', c0201],
  ]);
  b.decouple('VCC_1V8', bottom(storageAt, 4), [[2, '1uF', c0201]]);
  b.decouple('VCC_1V2', bottom(storageAt, 4), [[2, '1uF', c0201]]);
}

function displayAndCameras(b: BoardBuilder): void {
  b.block(5);
  const dispAt = { x: 33, y: 125 };
  const loadSwitch = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'LOAD SWITCH 2A',
    footprint: gridArray('WLCSP-6', 3, 2, 0.4),
    nets: ['VSYS', 'VSYS_DISP', 'VSYS', 'VSYS_DISP', 'DISP_PWR_EN', 'GND'],
    place: bottom({ x: 20, y: 120 }, 1),
  });
  b.link('VSYS', 'VSYS_DISP', loadSwitch, 'switch');
  b.decouple('VSYS', bottom({ x: loadSwitch.x, y: loadSwitch.y }, 2), [[1, '10uF/10V', c0402]]);
  const boost = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'BOOST 5.5V',
    footprint: dualRow('DFN-8', 4, 0.5, 1.6, 2.0, 2.0),
    nets: [
      'VSYS_DISP',
      'LX_DISP',
      'LX_DISP',
      'GND',
      'AVDD_DISP',
      'AVDD_DISP',
      'DISP_BST_EN',
      'GND',
    ],
    place: bottom({ x: 24, y: 124 }, 1),
  });
  b.link('LX_DISP', 'AVDD_DISP', boost, 'converter');
  b.twoPin(
    'L',
    'inductor',
    '2.2uH',
    powerInductor(2.0, 1.6),
    'VSYS_DISP',
    'LX_DISP',
    bottom({ x: 24, y: 128 }, 1),
  );
  b.decouple('VSYS_DISP', bottom({ x: 20, y: 124 }, 2), [[2, '10uF/10V', c0402]]);
  b.decouple('AVDD_DISP', bottom({ x: 27, y: 124 }, 2), [
    [2, '10uF/10V', c0402],
    [1, '1uF/10V', c0201],
  ]);

  // prettier-ignore
  const dispNets = [
    'AVDD_DISP', 'AVDD_DISP', 'GND', 'GND', 'VCC_1V8', 'VCC_1V8', 'VCC_3V3', 'VCC_3V3', 'GND', 'GND',
    ...dsiSignals.flatMap((net, i) => (i % 2 === 1 ? [net, 'GND'] : [net])),
    'DISP_RST_N', 'DISP_TE', 'TOUCH_INT_N', 'TOUCH_RST_N', 'I2C3_SCL', 'I2C3_SDA', 'GND', 'GND',
  ];
  padTo(dispNets, 40, 'GND');
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'DISPLAY B2B 40P',
    footprint: connectorRows('CONN-40', 20, 0.35, 1.6),
    nets: dispNets,
    place: bottom(dispAt),
  });
  b.decouple('AVDD_DISP', bottom(dispAt, 3), [[1, '1uF/10V', c0201]]);
  b.decouple('VCC_1V8', bottom(dispAt, 3), [[1, '100nF', c0201]]);
  b.decouple('VCC_3V3', bottom(dispAt, 3), [[1, '1uF', c0201]]);

  const rearAt = { x: 30, y: 134 };
  // prettier-ignore
  const rearNets = [
    'VCC_2V8_CAM', 'VCC_2V8_CAM', 'VCC_1V05_CAM', 'VCC_1V05_CAM', 'VCC_1V8', 'GND',
    ...csi0Signals.flatMap((net, i) => (i % 2 === 1 ? [net, 'GND'] : [net])),
    'CAM0_RST_N', 'CAM0_MCLK_CONN', 'I2C4_SCL', 'I2C4_SDA',
  ];
  padTo(rearNets, 30, 'GND');
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'CAMERA B2B 30P',
    footprint: connectorRows('CONN-30', 15, 0.35, 1.6),
    nets: rearNets,
    place: top(rearAt),
  });
  b.decouple('VCC_2V8_CAM', top(rearAt, 3), [
    [2, '1uF', c0201],
    [1, '4u7', c0402],
  ]);
  b.decouple('VCC_1V05_CAM', top(rearAt, 3), [
    [2, '1uF', c0201],
    [1, '4u7', c0402],
  ]);
  b.decouple('VCC_1V8', top(rearAt, 3), [[1, '100nF', c0201]]);

  const frontAt = { x: 14, y: 134 };
  b.twoPin(
    'FB',
    'ferrite',
    '600R@100MHz',
    c0402,
    'VCC_2V8_CAM',
    'VCC_2V8_CAMF',
    top({ x: 21, y: 132 }, 1.5),
  );
  // prettier-ignore
  const frontNets = [
    'VCC_2V8_CAMF', 'VCC_2V8_CAMF', 'VCC_1V05_CAM', 'VCC_1V8', 'GND', 'GND',
    ...csi1Signals.flatMap((net, i) => (i % 2 === 1 ? [net, 'GND'] : [net])),
    'CAM1_RST_N', 'CAM1_MCLK_CONN', 'I2C4_SCL', 'I2C4_SDA',
  ];
  padTo(frontNets, 24, 'GND');
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'CAMERA B2B 24P',
    footprint: connectorRows('CONN-24', 12, 0.35, 1.6),
    nets: frontNets,
    place: top(frontAt),
  });
  b.decouple('VCC_2V8_CAMF', top(frontAt, 3), [
    [1, '1uF', c0201],
    [1, '2u2', c0402],
  ]);
  b.decouple('VCC_1V05_CAM', top(frontAt, 3), [[1, '1uF', c0201]]);

  // Flash LED: a boost from VSYS (inductor in front of the switch node) drives the LED anode.
  const flashAt = { x: 44, y: 128 };
  const flash = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'FLASH LED DRIVER',
    footprint: gridArray('WLCSP-12', 3, 4, 0.4),
    // prettier-ignore
    nets: [
      'VSYS', 'LX_FLASH', 'LX_FLASH', 'VOUT_FLASH',
      'GND', 'GND', 'VOUT_FLASH', 'FLASH_LED_K',
      'I2C4_SCL', 'I2C4_SDA', 'FLASH_STROBE', 'FLASH_LED_K',
    ],
    place: bottom(flashAt, 1),
  });
  b.link('LX_FLASH', 'VOUT_FLASH', flash, 'converter');
  const flashPart = { x: flash.x, y: flash.y };
  b.twoPin(
    'L',
    'inductor',
    '1uH',
    powerInductor(2.0, 1.6),
    'VSYS',
    'LX_FLASH',
    bottom(flashPart, 2),
  );
  b.decouple('VSYS', bottom(flashPart, 2.5), [[1, '10uF/10V', c0402]]);
  b.decouple('VOUT_FLASH', bottom(flashPart, 2.5), [
    [2, '10uF/10V', c0402],
    [1, '100nF/10V', c0201],
  ]);
  b.twoPin(
    'D',
    'diode',
    'LED WHITE FLASH',
    customFootprint('LED-2016', 2.0, 1.6, [pad('A', -0.65, 0), pad('K', 0.65, 0)]),
    'VOUT_FLASH',
    'FLASH_LED_K',
    top({ x: 56, y: 136 }, 1),
  );
  b.twoPin('R', 'resistor', '100K', c0201, 'FLASH_STROBE', 'GND', bottom(flashPart, 2.5));
}

function audio(b: BoardBuilder): void {
  b.block(6);
  const codecAt = { x: 45, y: 62 };
  b.twoPin(
    'FB',
    'ferrite',
    '600R@100MHz',
    c0402,
    'VCC_1V8',
    'VCC_1V8_AUDIO',
    bottom({ x: 40, y: 66 }, 1.5),
  );
  // prettier-ignore
  const codecNets: (string | null)[] = [
    'VCC_1V8_AUDIO', 'GND', 'I2S_BCLK', 'I2S_LRCK', 'I2S_DOUT', 'I2S_DIN', 'CODEC_MCLK', 'VCC_1V8_AUDIO', 'GND', 'I2C2_SCL',
    'I2C2_SDA', 'CODEC_INT_N', 'CODEC_RST_N', null, null, 'GND', 'VCC_1V8_AUDIO', 'CODEC_VREF', 'MIC_BIAS1', 'MIC_BIAS2',
    'MIC1_P', 'MIC1_N', 'MIC2_P', 'MIC2_N', 'GND', null, 'EAR_P', 'EAR_N', 'GND', null,
    null, null, 'GND', null, null, null, null, null, null, null,
    'GND',
  ];
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'AUDIO CODEC',
    footprint: quadFlat('QFN-40', 10, 0.4, 5.0, true),
    nets: codecNets,
    place: bottom(codecAt),
  });
  b.decouple('VCC_1V8_AUDIO', bottom(codecAt, 3.5), [
    [3, '1uF', c0201],
    [3, '100nF', c0201],
  ]);
  b.decouple('CODEC_VREF', bottom(codecAt, 3.5), [[1, '1uF', c0201]]);
  b.decouple('MIC_BIAS1', bottom(codecAt, 3.5), [[1, '1uF', c0201]]);
  b.decouple('MIC_BIAS2', bottom(codecAt, 3.5), [[1, '1uF', c0201]]);
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C2_SCL', 'VCC_1V8', bottom(codecAt, 3.5));
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C2_SDA', 'VCC_1V8', bottom(codecAt, 3.5));
  b.twoPin('R', 'resistor', '2K2', c0201, 'MIC_BIAS2', 'MIC2_BIAS_R', bottom(codecAt, 3.5));

  const micAt = { x: 45, y: 8 };
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'MEMS MIC',
    footprint: dualRow('LGA-4', 2, 1.3, 2.0, 3.5, 2.65),
    nets: ['MIC2_P', 'GND', 'MIC2_BIAS_R', 'GND'],
    place: bottom(micAt, 1),
  });
  b.decouple('MIC2_BIAS_R', bottom(micAt, 2), [[1, '100nF', c0201]]);
  b.twoPin('C', 'capacitor', '100nF', c0201, 'MIC2_N', 'GND', bottom(codecAt, 3.5));

  const ampAt = { x: 15, y: 18 };
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'SPEAKER AMP',
    footprint: gridArray('WLCSP-16', 4, 4, 0.4),
    // prettier-ignore
    nets: [
      'VBAT_AMP', 'VBAT_AMP', 'SPK_P', 'SPK_P',
      'VBAT_AMP', 'GND', 'SPK_N', 'SPK_N',
      'I2S_BCLK', 'GND', 'GND', 'AMP_RST_N',
      'I2S_LRCK', 'I2S_DOUT', 'I2C2_SCL', 'I2C2_SDA',
    ],
    place: bottom(ampAt),
  });
  b.decouple('VBAT_AMP', bottom(ampAt, 2.5), [
    [2, '10uF/10V', c0402],
    [1, '100nF', c0201],
  ]);
  b.twoPin('C', 'capacitor', '1nF', c0201, 'SPK_P', 'GND', bottom(ampAt, 2.5));
  b.twoPin('C', 'capacitor', '1nF', c0201, 'SPK_N', 'GND', bottom(ampAt, 2.5));
  const spring = customFootprint('SPRING-2P', 4.0, 1.5, [pad('1', -1.25, 0), pad('2', 1.25, 0)]);
  b.twoPin(
    'J',
    'connector',
    'SPEAKER CONTACT',
    spring,
    'SPK_P',
    'SPK_N',
    bottom({ x: 10, y: 9 }, 1),
  );

  const hapticAt = { x: 52, y: 16 };
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'HAPTIC DRIVER',
    footprint: gridArray('WLCSP-9', 3, 3, 0.4),
    nets: ['VSYS', 'VSYS', 'GND', 'HAPT_P', 'HAPT_N', 'GND', 'I2C2_SCL', 'I2C2_SDA', 'HAPT_EN'],
    place: bottom(hapticAt),
  });
  b.decouple('VSYS', bottom(hapticAt, 2), [
    [1, '10uF/10V', c0402],
    [1, '100nF', c0201],
  ]);
  b.twoPin(
    'J',
    'connector',
    'MOTOR CONTACT',
    spring,
    'HAPT_P',
    'HAPT_N',
    bottom({ x: 56, y: 9 }, 1),
  );
  b.twoPin('R', 'resistor', '100K', c0201, 'HAPT_EN', 'GND', bottom(hapticAt, 2));
}

function sensors(b: BoardBuilder): void {
  b.block(7);
  const at = { x: 20, y: 44 };
  const loadSwitch = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'LOAD SWITCH 1A',
    footprint: gridArray('WLCSP-4', 2, 2, 0.4),
    nets: ['VCC_3V3', 'VCC_3V3_SENSOR', 'LS_SENSOR_EN', 'GND'],
    place: bottom({ x: 12, y: 50 }, 1),
  });
  b.link('VCC_3V3', 'VCC_3V3_SENSOR', loadSwitch, 'switch');
  const lsAt = { x: loadSwitch.x, y: loadSwitch.y };
  b.decouple('VCC_3V3', bottom(lsAt, 2), [[1, '1uF', c0201]]);
  b.decouple('VCC_3V3_SENSOR', bottom(lsAt, 2), [[1, '1uF', c0201]]);
  b.twoPin('R', 'resistor', '100K', c0201, 'LS_SENSOR_EN', 'GND', bottom(lsAt, 2));

  const pfet = b.add({
    prefix: 'Q',
    kind: 'mosfet',
    value: 'PMOS 20V',
    footprint: sot3('SOT-723', 1.2, 1.2),
    nets: ['SNS_1V8_EN_N', 'VCC_1V8', 'VCC_1V8_SENSOR'],
    place: bottom({ x: 12, y: 40 }, 1),
  });
  b.link('VCC_1V8', 'VCC_1V8_SENSOR', pfet, 'switch');
  const fetAt = { x: pfet.x, y: pfet.y };
  b.twoPin('R', 'resistor', '100K', c0201, 'SNS_1V8_EN_N', 'VCC_1V8', bottom(fetAt, 2));
  b.decouple('VCC_1V8_SENSOR', bottom(fetAt, 2), [[1, '1uF', c0201]]);

  const imu = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'IMU 6-AXIS',
    footprint: dualRow('LGA-14', 7, 0.4, 2.2, 2.5, 3.0),
    // prettier-ignore
    nets: [
      'SPI1_MISO', null, null, 'IMU_INT1', 'VCC_1V8_SENSOR', 'GND', 'GND',
      'VCC_3V3_SENSOR', 'IMU_INT2', null, null, 'SPI1_CS0_N', 'SPI1_SCLK', 'SPI1_MOSI',
    ],
    place: bottom(at, 1),
  });
  b.decouple('VCC_3V3_SENSOR', bottom({ x: imu.x, y: imu.y }, 2), [[1, '100nF', c0201]]);
  b.decouple('VCC_1V8_SENSOR', bottom({ x: imu.x, y: imu.y }, 2), [[1, '100nF', c0201]]);

  const magnetometer = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'MAGNETOMETER',
    footprint: gridArray('WLCSP-4', 2, 2, 0.4),
    nets: ['VCC_1V8_SENSOR', 'GND', 'I2C1_SCL', 'I2C1_SDA'],
    place: bottom({ x: 26, y: 40 }, 1),
  });
  b.decouple('VCC_1V8_SENSOR', bottom({ x: magnetometer.x, y: magnetometer.y }, 2), [
    [1, '100nF', c0201],
  ]);

  const pressure = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'PRESSURE SENSOR',
    footprint: dualRow('LGA-8', 4, 0.65, 1.6, 2.0, 2.5),
    nets: ['VCC_3V3_SENSOR', 'GND', 'I2C1_SDA', 'I2C1_SCL', 'VCC_1V8_SENSOR', 'GND', null, null],
    place: bottom({ x: 26, y: 48 }, 1),
  });
  b.decouple('VCC_3V3_SENSOR', bottom({ x: pressure.x, y: pressure.y }, 2), [[1, '100nF', c0201]]);
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C1_SCL', 'VCC_1V8_SENSOR', bottom(at, 4));
  b.twoPin('R', 'resistor', '4K7', c0201, 'I2C1_SDA', 'VCC_1V8_SENSOR', bottom(at, 4));

  // The light and proximity sensor looks through the display glass, so it sits on the top side near the upper edge.
  const alsAt = { x: 42, y: 137 };
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'ALS PROX SENSOR',
    footprint: dualRow('LGA-8', 4, 0.5, 1.6, 2.0, 2.0),
    nets: [
      'VCC_3V3_SENSOR',
      'GND',
      'I2C1_SCL',
      'I2C1_SDA',
      'ALS_INT_N',
      'VCC_1V8_SENSOR',
      'GND',
      null,
    ],
    place: top(alsAt, 1),
  });
  b.decouple('VCC_3V3_SENSOR', top(alsAt, 2), [[1, '1uF', c0201]]);
  b.decouple('VCC_1V8_SENSOR', top(alsAt, 2), [[1, '100nF', c0201]]);
  b.twoPin('R', 'resistor', '10K', c0201, 'ALS_INT_N', 'VCC_1V8_SENSOR', top(alsAt, 2));
}

function radio(b: BoardBuilder): void {
  b.block(8);
  const at = { x: 52, y: 124 };
  const footprint = gridArray('LGA-64', 8, 8, 1.0);
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'WLAN BT MODULE',
    footprint,
    // prettier-ignore
    nets: ballMap(footprint, {
      signals: [...sdioSignals, 'BT_UART_TX', 'BT_UART_RX', 'BT_UART_RTS_N', 'BT_UART_CTS_N', 'WLAN_EN', 'BT_EN', 'CLK_32K', 'ANT_WLAN'],
      power: [
        ['VSYS', 3],
        ['VCC_1V8', 2],
      ],
      signalRings: 1,
      groundPattern: 'none',
      notConnected: 6,
    }),
    place: top(at),
  });
  b.decouple('VSYS', top(at, 6), [
    [2, '10uF/10V', c0402],
    [3, '100nF', c0201],
    [3, '10pF', c0201],
  ]);
  b.decouple('VCC_1V8', top(at, 6), [
    [1, '1uF', c0201],
    [2, '100nF', c0201],
  ]);
  const feedAt = { x: 60, y: 131 };
  b.twoPin('C', 'capacitor', '1pF', c0201, 'ANT_WLAN', 'ANT_WLAN_FEED', top(feedAt, 1.5));
  b.twoPin('C', 'capacitor', '0.5pF', c0201, 'ANT_WLAN_FEED', 'GND', top(feedAt, 1.5));
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'ANTENNA CLIP',
    footprint: customFootprint('CLIP-1P', 1.5, 2.0, [pad('1', 0, 0)]),
    nets: ['ANT_WLAN_FEED'],
    place: top(feedAt, 2),
  });
}

function cellularRf(b: BoardBuilder): void {
  b.block(8);
  const transceiverAt = { x: 14, y: 90 };
  const transceiverFootprint = gridArray('WLCSP-64', 8, 8, 0.4);
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'RF TRANSCEIVER',
    footprint: transceiverFootprint,
    // prettier-ignore
    nets: ballMap(transceiverFootprint, {
      signals: [...iqSignals, 'RFFE_CLK', 'RFFE_DATA', 'RF_CLK_EN', 'RF_TCXO_OUT', 'RF_TX_OUT', 'RF_RX_IN'],
      power: [
        ['VCC_1V8', 4],
        ['VCC_1V2', 4],
      ],
      signalRings: 1,
      groundPattern: 'none',
      notConnected: 4,
    }),
    place: top(transceiverAt),
  });
  b.decouple('VCC_1V8', top(transceiverAt, 3), [
    [3, '100nF', c0201],
    [2, '1uF', c0201],
    [3, '10pF', c0201],
  ]);
  b.decouple('VCC_1V2', top(transceiverAt, 3), [
    [3, '100nF', c0201],
    [1, '1uF', c0201],
  ]);
  const tcxo = customFootprint('XTAL-1612', 1.6, 1.2, [
    pad('1', -0.55, -0.4),
    pad('2', 0.55, -0.4),
    pad('3', 0.55, 0.4),
    pad('4', -0.55, 0.4),
  ]);
  b.add({
    prefix: 'Y',
    kind: 'crystal',
    value: 'TCXO 38.4MHz',
    footprint: tcxo,
    nets: ['RF_CLK_EN', 'GND', 'RF_TCXO_OUT', 'VCC_1V8'],
    place: top({ x: 20, y: 94 }, 1),
  });
  b.decouple('VCC_1V8', top({ x: 20, y: 94 }, 1.5), [[1, '100nF', c0201]]);

  const paAt = { x: 8, y: 100 };
  const paFootprint = gridArray('LGA-24', 6, 4, 0.8);
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'PA MODULE',
    footprint: paFootprint,
    // prettier-ignore
    nets: [
      'VBAT', 'VCC_PA', 'VCC_PA', 'GND',
      'RF_TX_PA', 'GND', 'GND', 'PA_ANT',
      'GND', 'GND', 'GND', 'GND',
      'RFFE_CLK', 'GND', 'GND', 'VCC_PA',
      'RFFE_DATA', 'GND', 'GND', 'GND',
      'VCC_1V8', 'PA_EN', 'VBAT', 'GND',
    ],
    place: top(paAt),
  });
  // Transmit match between transceiver and PA: series capacitor, shunt inductor and capacitor.
  b.twoPin('C', 'capacitor', '10pF', c0201, 'RF_TX_OUT', 'RF_TX_PA', top({ x: 10, y: 95 }, 1.5));
  b.twoPin('L', 'inductor', '8.2nH', c0201, 'RF_TX_PA', 'GND', top({ x: 10, y: 95 }, 1.5));
  b.twoPin('C', 'capacitor', '1.5pF', c0201, 'RF_TX_PA', 'GND', top({ x: 10, y: 95 }, 1.5));
  b.decouple('VBAT', top(paAt, 3), [
    [1, '10uF/10V', c0402],
    [2, '100pF', c0201],
  ]);
  b.decouple('VCC_PA', top(paAt, 3), [
    [1, '1uF', c0201],
    [2, '10pF', c0201],
  ]);

  const tracker = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'PA SUPPLY TRACKER',
    footprint: gridArray('WLCSP-12', 4, 3, 0.4),
    // prettier-ignore
    nets: [
      'VBAT', 'VBAT', 'GND',
      'LX_PA', 'LX_PA', 'GND',
      'VCC_PA', 'VCC_PA', 'PA_EN',
      'RFFE_CLK', 'RFFE_DATA', 'VCC_1V8',
    ],
    place: bottom({ x: 10, y: 96 }, 1),
  });
  b.link('VBAT', 'LX_PA', tracker, 'converter');
  const trackerAt = { x: tracker.x, y: tracker.y };
  b.twoPin(
    'L',
    'inductor',
    '1uH',
    powerInductor(2.0, 1.6),
    'LX_PA',
    'VCC_PA',
    bottom(trackerAt, 2),
  );
  b.decouple('VBAT', bottom(trackerAt, 3), [[2, '10uF/10V', c0402]]);
  b.decouple('VCC_PA', bottom(trackerAt, 3), [
    [2, '4u7', c0402],
    [1, '1uF', c0201],
    [2, '100pF', c0201],
  ]);

  const switchAt = { x: 6, y: 116 };
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'ANTENNA SWITCH',
    footprint: quadFlat('QFN-12', 3, 0.5, 2.0, true),
    nets: [
      'PA_ANT',
      'GND',
      'RF_RX_SW',
      'GND',
      'ANT_MAIN',
      'GND',
      'RFFE_CLK',
      'RFFE_DATA',
      'VCC_1V8',
      'GND',
      null,
      null,
      'GND',
    ],
    place: top(switchAt, 1),
  });
  b.decouple('VCC_1V8', top(switchAt, 2), [[1, '100nF', c0201]]);
  b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'SAW FILTER',
    footprint: customFootprint('DFN-5', 1.4, 1.1, [
      pad('1', -0.45, 0.3),
      pad('2', 0, 0.3),
      pad('3', 0.45, 0.3),
      pad('4', 0.45, -0.3),
      pad('5', -0.45, -0.3),
    ]),
    nets: ['RF_RX_SW', 'GND', 'RF_RX_FLT', 'GND', 'GND'],
    place: top({ x: 12, y: 112 }, 1.5),
  });
  b.twoPin('L', 'inductor', '3.3nH', c0201, 'RF_RX_FLT', 'RF_RX_IN', top({ x: 12, y: 108 }, 2));
  b.twoPin('C', 'capacitor', '1pF', c0201, 'RF_RX_IN', 'GND', top({ x: 12, y: 108 }, 2));
  const feedAt = { x: 3.5, y: 124 };
  b.twoPin('C', 'capacitor', '22pF', c0201, 'ANT_MAIN', 'ANT_MAIN_FEED', top(feedAt, 2));
  b.twoPin('L', 'inductor', '6.8nH', c0201, 'ANT_MAIN_FEED', 'GND', top(feedAt, 2));
  b.twoPin('C', 'capacitor', '0.8pF', c0201, 'ANT_MAIN_FEED', 'GND', top(feedAt, 2));
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'ANTENNA CLIP',
    footprint: customFootprint('CLIP-1P', 1.5, 2.0, [pad('1', 0, 0)]),
    nets: ['ANT_MAIN_FEED'],
    place: top(feedAt, 2),
  });
  for (const net of ['RFFE_CLK', 'RFFE_DATA'])
    b.twoPin('C', 'capacitor', '10pF', c0201, net, 'GND', top(transceiverAt, 4));
  b.twoPin('R', 'resistor', '100K', c0201, 'PA_EN', 'GND', top(paAt, 3));
}

function simAndFingerprint(b: BoardBuilder): void {
  b.block(7);
  const simAt = { x: 45, y: 86 };
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'NANO SIM 8P',
    footprint: customFootprint('SIM-8P', 12.0, 9.0, [
      pad('1', -3.8, 2.54),
      pad('2', -3.8, 0),
      pad('3', -3.8, -2.54),
      pad('4', 3.8, 2.54),
      pad('5', 3.8, 0),
      pad('6', 3.8, -2.54),
      pad('7', 0, 4.0),
      pad('8', 0, -4.0),
    ]),
    nets: ['VCC_SIM', 'SIM_RST', 'SIM_CLK', 'GND', null, 'SIM_IO', 'SIM_DET', 'GND'],
    place: bottom(simAt),
  });
  b.add({
    prefix: 'D',
    kind: 'tvs',
    value: 'ESD 4CH 5V',
    footprint: dualRow('DFN-6', 3, 0.5, 1.0, 1.6, 1.0),
    nets: ['SIM_CLK', 'GND', 'SIM_IO', 'SIM_RST', 'GND', 'VCC_SIM'],
    place: bottom(simAt, 7),
  });
  b.decouple('VCC_SIM', bottom(simAt, 7), [
    [1, '1uF', c0201],
    [1, '100nF', c0201],
  ]);
  b.twoPin('C', 'capacitor', '33pF', c0201, 'SIM_CLK', 'GND', bottom(simAt, 7));
  b.twoPin('R', 'resistor', '10K', c0201, 'SIM_IO', 'VCC_SIM', bottom(simAt, 7));
  b.twoPin('R', 'resistor', '100K', c0201, 'SIM_DET', 'VCC_1V8', bottom(simAt, 7));

  const fpAt = { x: 50, y: 76 };
  const fpNets = [
    'VCC_3V3',
    'GND',
    'VCC_1V8',
    'GND',
    ...spi2Signals,
    'FP_INT_N',
    'FP_RST_N',
    'GND',
    'GND',
  ];
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'FINGERPRINT FPC 12P',
    footprint: connectorRows('CONN-12', 6, 0.5, 1.6),
    nets: fpNets,
    place: bottom(fpAt),
  });
  b.add({
    prefix: 'D',
    kind: 'tvs',
    value: 'ESD 4CH 5V',
    footprint: dualRow('DFN-6', 3, 0.5, 1.0, 1.6, 1.0),
    nets: ['SPI2_SCLK', 'GND', 'SPI2_MOSI', 'SPI2_MISO', 'GND', 'SPI2_CS0_N'],
    place: bottom(fpAt, 3),
  });
  b.add({
    prefix: 'D',
    kind: 'tvs',
    value: 'ESD 2CH 5V',
    footprint: dualRow('DFN-6', 3, 0.5, 1.0, 1.6, 1.0),
    nets: ['FP_INT_N', 'GND', 'FP_RST_N', null, 'GND', null],
    place: bottom(fpAt, 3),
  });
  b.decouple('VCC_3V3', bottom(fpAt, 3), [[1, '1uF', c0201]]);
  b.decouple('VCC_1V8', bottom(fpAt, 3), [[1, '1uF', c0201]]);
  b.twoPin('R', 'resistor', '10K', c0201, 'FP_INT_N', 'VCC_1V8', bottom(fpAt, 3));

  // NFC controller with its loop antenna on the back-cover flex; the matching network sits at the connector.
  const nfcAt = { x: 36, y: 76 };
  const nfc = b.add({
    prefix: 'U',
    kind: 'ic',
    value: 'NFC CONTROLLER',
    footprint: gridArray('WLCSP-25', 5, 5, 0.4),
    // prettier-ignore
    nets: [
      'VBAT', 'VBAT', 'NFC_TX1', 'NFC_TX2', 'GND',
      'VCC_1V8', 'GND', 'GND', 'NFC_RX1', 'NFC_RX2',
      'I2C2_SCL', 'I2C2_SDA', 'GND', 'NFC_VDDPA', 'GND',
      'NFC_IRQ', 'NFC_EN', 'GND', 'NFC_VDDPA', null,
      'CLK_32K', null, 'GND', 'NFC_VREF', null,
    ],
    place: bottom(nfcAt),
  });
  b.link('VBAT', 'NFC_VDDPA', nfc, 'converter');
  b.decouple('VBAT', bottom(nfcAt, 3), [
    [1, '4u7', c0402],
    [1, '100nF', c0201],
  ]);
  b.decouple('VCC_1V8', bottom(nfcAt, 3), [[1, '1uF', c0201]]);
  b.decouple('NFC_VDDPA', bottom(nfcAt, 3), [
    [1, '2u2', c0402],
    [1, '100nF', c0201],
  ]);
  b.decouple('NFC_VREF', bottom(nfcAt, 3), [[1, '1uF', c0201]]);
  const matchAt = { x: 30, y: 80 };
  // prettier-ignore
  for (const [from, to, value] of [
    ['NFC_TX1', 'NFC_ANT_P', '220pF'],
    ['NFC_TX2', 'NFC_ANT_N', '220pF'],
    ['NFC_ANT_P', 'GND', '560pF'],
    ['NFC_ANT_N', 'GND', '560pF'],
    ['NFC_RX1', 'NFC_ANT_P', '1nF'],
    ['NFC_RX2', 'NFC_ANT_N', '1nF'],
  ] as const) {
    b.twoPin('C', 'capacitor', value, c0201, from, to, bottom(matchAt, 2));
  }
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'NFC ANTENNA CLIP 2P',
    footprint: customFootprint('CLIP-2P', 3.0, 1.5, [pad('1', -0.8, 0), pad('2', 0.8, 0)]),
    nets: ['NFC_ANT_P', 'NFC_ANT_N'],
    place: bottom(matchAt, 3),
  });
  b.twoPin('R', 'resistor', '10K', c0201, 'NFC_IRQ', 'GND', bottom(nfcAt, 3));
}

function keysAndDebug(b: BoardBuilder): void {
  b.block(9);
  const keysAt = { x: 61, y: 88 };
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'SIDE KEY FPC 8P',
    footprint: connectorRows('CONN-8', 4, 0.5, 1.6),
    nets: ['PWR_KEY_N', 'GND', 'VOL_UP_N', 'GND', 'VOL_DN_N', 'GND', 'VCC_1V8', 'GND'],
    place: { side: 'top', at: keysAt, rotation: 90 },
  });
  b.add({
    prefix: 'D',
    kind: 'tvs',
    value: 'ESD 3CH 5V',
    footprint: dualRow('DFN-6', 3, 0.5, 1.0, 1.6, 1.0),
    nets: ['PWR_KEY_N', 'GND', 'VOL_UP_N', 'VOL_DN_N', 'GND', null],
    place: top(keysAt, 3),
  });
  b.twoPin('R', 'resistor', '10K', c0201, 'VOL_UP_N', 'VCC_1V8', top(keysAt, 3));
  b.twoPin('R', 'resistor', '10K', c0201, 'VOL_DN_N', 'VCC_1V8', top(keysAt, 3));
  // Key lines run along the housing edge: small capacitors against ESD and switch bounce.
  for (const net of ['PWR_KEY_N', 'VOL_UP_N', 'VOL_DN_N'])
    b.twoPin('C', 'capacitor', '33pF', c0201, net, 'GND', top(keysAt, 3));

  const earAt = { x: 8, y: 112 };
  b.add({
    prefix: 'J',
    kind: 'connector',
    value: 'EARPIECE FPC 10P',
    footprint: connectorRows('CONN-10', 5, 0.5, 1.6),
    nets: ['EAR_P', 'EAR_N', 'GND', 'MIC1_P', 'MIC1_N', 'MIC_BIAS1', 'GND', 'GND', null, null],
    place: { side: 'top', at: earAt, rotation: 90 },
  });
  b.twoPin('C', 'capacitor', '100pF', c0201, 'EAR_P', 'GND', top(earAt, 2));
  b.twoPin('C', 'capacitor', '100pF', c0201, 'EAR_N', 'GND', top(earAt, 2));
}

function testPoints(b: BoardBuilder): void {
  b.block(null);
  // prettier-ignore
  const railPoints = [
    'VBAT', 'VSYS', 'USB_VBUS', 'CHG_VIN', 'VDD_CPU', 'VDD_GPU', 'VDD_SOC', 'VDD_MEM', 'VCC_1V8', 'VCC_3V3',
    'VCC_1V2', 'VDD_AON', 'VCC_2V8_CAM', 'VCC_1V05_CAM', 'AVDD_DISP', 'VCC_3V3_SENSOR', 'VBAT_AMP',
  ];
  // Rail test points go on the bottom side, reachable with the board out of the housing.
  for (const net of railPoints) b.testPoint(net, 'bottom');
  for (const net of ['VCC_SIM', 'VCC_PA', 'VCC_1V8_AUDIO', 'VSYS_DISP', 'VOUT_FLASH'])
    b.testPoint(net, 'bottom');
  // prettier-ignore
  for (const net of [
    'PWR_KEY_N', 'USB_DP', 'USB_DN', 'UART_DBG_TX', 'UART_DBG_RX', 'PWR_HOLD', 'PMIC_RESET_N',
    ...jtagSignals, 'I2C0_SCL', 'I2C0_SDA', 'CLK_32K',
  ]) {
    b.testPoint(net, 'bottom', 4);
  }
  for (const at of [
    { x: 10, y: 30 },
    { x: 55, y: 80 },
    { x: 10, y: 100 },
    { x: 55, y: 118 },
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

function padTo(nets: (string | null)[], length: number, filler: string): void {
  if (nets.length > length)
    throw new RangeError(`${nets.length} nets for a ${length}-pin connector`);
  while (nets.length < length) nets.push(filler);
}

function range(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i);
}
