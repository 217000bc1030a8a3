// Invented repair write-ups on the two demo boards, with votes, confirmations and comments from the
// demo people, so the casebook has something to rank, search and read on a fresh install. The
// readings are made up but follow bench habits (common practice, shared/reference/FACTS.md §8–9):
// diode mode with the red probe on ground, compared with a known-good board of the same number.
// Every case goes through the casebook service, so its nets and parts are checked against the board.
import type pg from 'pg';
import { caseCreateSchema, type CaseCreate, type SessionUser } from '@railyard/shared';
import { createDatabase } from '../apps/api/src/db/client';
import { demoAccountIds } from '../apps/api/src/dev/fake-github/demo-accounts';
import { createBoardsRepository } from '../apps/api/src/modules/boards/boards.repository';
import { createCasebookRepository } from '../apps/api/src/modules/casebook/casebook.repository';
import { createCasebookService } from '../apps/api/src/modules/casebook/casebook.service';

type Person = 'tamsin' | 'pelle' | 'oskar' | 'ines';

const githubIds: Record<Person, number> = {
  tamsin: demoAccountIds.member,
  pelle: demoAccountIds.secondMember,
  oskar: demoAccountIds.moderator,
  ines: demoAccountIds.adminToBe,
};

interface DemoCase {
  board: string;
  author: Person;
  daysAgo: number;
  write: Omit<Partial<CaseCreate>, 'outcome'> & Pick<CaseCreate, 'title' | 'symptom' | 'outcome'>;
  votes?: [Person, 1 | -1][];
  confirmations?: [Person, string][];
  comments?: [Person, string][];
  /** reports for the moderators' queue, so it is not empty on a fresh demo */
  flags?: [Person, string][];
}

const phone = 'ostrand-os-m1-5521';
const tablet = 'lumbre-ls-io-0930';

const batteryFirst = 'Disconnect the battery at J2001 before any measurement or heat.';

export const demoCases: DemoCase[] = [
  {
    board: phone,
    author: 'tamsin',
    daysAgo: 41,
    write: {
      title: 'Dead, VSYS shorted to ground: cracked 22 µF cap C1013',
      symptom: 'No power at all. On the bench supply the board pulls the current limit as soon as the battery connector is fed.',
      rootCause: 'C1013 (22 µF 0603 on VSYS next to the charger inductor) cracked, probably from a drop on the bottom edge.',
      fixSteps: [
        `1. ${batteryFirst}`,
        '2. Confirm the short: VSYS diode mode 0.003 V, known-good 0.398 V.',
        '3. Inject into TP2 (VSYS) at 1.0 V with the current limit at 1 A — no more than the rail’s own voltage, start low. Watch with a thermal camera or a film of isopropyl alcohol.',
        '4. Q1002 warmed a little first, but the hot spot settled on C1013: the FET only passes the current.',
        '5. Remove C1013 with hot air (mask the charger with tape; the shield and the board stay hot for a while). The short is gone: 0.401 V.',
        '6. Fit a new 22 µF 6.3 V 0603, check VSYS again, then reconnect the battery.',
      ].join('\n'),
      body: 'Took longer than it should because I suspected U1002 first. The charger was fine; check the VSYS caps around L1001 before lifting anything big.',
      outcome: 'solved',
      minutesSpent: 55,
      readings: [
        { net: 'VSYS', mode: 'diode_v', measured: 0.003, knownGood: 0.398 },
        { net: 'VSYS', mode: 'resistance_ohm', measured: 0.6, knownGood: 12_400 },
        { net: 'VBAT', mode: 'diode_v', measured: 0.41, knownGood: 0.415 },
      ],
      nets: ['VSYS'],
      components: [
        { refdes: 'C1013', culprit: true },
        { refdes: 'Q1002', culprit: false },
        { refdes: 'U1002', culprit: false },
      ],
    },
    votes: [['pelle', 1], ['oskar', 1], ['ines', 1]],
    confirmations: [['pelle', 'Same board, C1014 this time, same method. 20 minutes.']],
    comments: [
      ['oskar', 'Good write-up. On this board C1011–C1015 all sit on VSYS within 5 mm; injection finds the right one fast.'],
      ['pelle', 'Thanks, the note about Q1002 warming first saved me from pulling it.'],
    ],
  },
  {
    board: phone,
    author: 'pelle',
    daysAgo: 33,
    write: {
      title: 'Boot loop: VDD_CPU looks shorted but is normal, the fault was on VDD_MEM',
      symptom: 'Logo, restart, logo. Current on the bench supply climbs to 350 mA, drops to zero, repeats.',
      rootCause: 'Leaky 1 µF decoupling cap C4005 under the memory on VDD_MEM pulled the rail down during training.',
      fixSteps: [
        `1. ${batteryFirst}`,
        '2. VDD_CPU reads 1.3 Ω to ground: that is normal for this core rail (a good board reads 1.2 Ω). Do not chase it.',
        '3. Compare VDD_MEM against the known-good board: 0.192 V in diode mode where a good one reads 0.345 V, about 44 % low.',
        '4. Inject 0.8 V at 1 A into TP8 (VDD_MEM stays below its 1.1 V); C4005 warms within a few seconds.',
        '5. Hot air at low airflow, lift C4005 and fit a new 1 µF 0201. Let the area cool before touching it.',
      ].join('\n'),
      body: 'Core rails on this board read a few ohms when healthy. Judge VDD_CPU, VDD_GPU and VDD_SOC against a reference board, not against a fixed "short" threshold.',
      outcome: 'solved',
      minutesSpent: 95,
      readings: [
        { net: 'VDD_CPU', mode: 'resistance_ohm', measured: 1.3, knownGood: 1.2 },
        { net: 'VDD_MEM', mode: 'diode_v', measured: 0.192, knownGood: 0.345 },
        { net: 'VDD_MEM', mode: 'resistance_ohm', measured: 9.5, knownGood: 38 },
      ],
      nets: ['VDD_MEM', 'VDD_CPU'],
      components: [
        { refdes: 'C4005', culprit: true },
        { refdes: 'U4001', culprit: false },
      ],
    },
    votes: [['tamsin', 1], ['oskar', 1], ['ines', 1]],
    confirmations: [['oskar', 'Seen twice on this board number; C4003 on the second one.']],
    comments: [['tamsin', 'Worth pinning: the VDD_CPU resistance fools everyone the first time.']],
  },
  {
    board: phone,
    author: 'tamsin',
    daysAgo: 29,
    write: {
      title: 'Not charging from USB: TVS D1002 shorted and took fuse F1001 with it',
      symptom: 'Charges nothing on any cable; works on battery. No current on a USB power meter.',
      rootCause: 'A faulty charger spiked USB_VBUS; the TVS D1002 failed short and the 3 A fuse F1001 opened.',
      fixSteps: [
        '1. USB_VBUS_CONN has 5.02 V with a charger attached, USB_VBUS 0 V: open between them, so F1001.',
        '2. Unplug the charger and disconnect the battery. USB_VBUS diode mode 0.002 V (good: 0.520 V): the TVS.',
        '3. Remove D1002 first; the short is gone. Then replace F1001 (3 A 0603) and D1002.',
        '4. Test with a current-limited USB supply before a real charger.',
      ].join('\n'),
      body: 'Replacing only the fuse would have blown the new one at once. Always check what is on the far side of an open fuse.',
      outcome: 'solved',
      minutesSpent: 35,
      readings: [
        { net: 'USB_VBUS_CONN', mode: 'voltage_v', measured: 5.02, knownGood: 5.0 },
        { net: 'USB_VBUS', mode: 'voltage_v', measured: 0, knownGood: 5.0 },
        { net: 'USB_VBUS', mode: 'diode_v', measured: 0.002, knownGood: 0.52 },
      ],
      nets: ['USB_VBUS', 'USB_VBUS_CONN'],
      components: [
        { refdes: 'D1002', culprit: true },
        { refdes: 'F1001', culprit: true },
      ],
    },
    votes: [['pelle', 1], ['ines', 1]],
    confirmations: [['ines', 'Same pair failed on a unit from the same customer batch.']],
  },
  {
    board: phone,
    author: 'oskar',
    daysAgo: 24,
    write: {
      title: 'No image and no backlight: display load switch U5001 never turns on',
      symptom: 'Phone rings and vibrates, screen stays black. Known-good screen on this board: still black.',
      rootCause: 'U5001 does not switch VSYS through to VSYS_DISP although DISP_PWR_EN goes high.',
      fixSteps: [
        '1. VSYS_DISP 0 V while VSYS is 3.9 V; DISP_PWR_EN measures 1.8 V, so the enable arrives.',
        '2. VSYS_DISP diode mode 0.455 V, same as a good board: no short behind the switch.',
        `3. ${batteryFirst} Cover J5001 with heat-resistant tape: its plastic melts long before solder does.`,
        '4. Replace U5001 with hot air and flux; keep the nozzle moving, the board is hot afterwards.',
        '5. AVDD_DISP now reaches 5.5 V from the boost U5002.',
      ].join('\n'),
      outcome: 'solved',
      minutesSpent: 70,
      readings: [
        { net: 'VSYS_DISP', mode: 'voltage_v', measured: 0, knownGood: 3.85 },
        { net: 'VSYS_DISP', mode: 'diode_v', measured: 0.455, knownGood: 0.452 },
        { net: 'AVDD_DISP', mode: 'voltage_v', measured: 0, knownGood: 5.5 },
      ],
      nets: ['VSYS_DISP', 'DISP_PWR_EN', 'AVDD_DISP'],
      components: [
        { refdes: 'U5001', culprit: true },
        { refdes: 'U5002', culprit: false },
        { refdes: 'J5001', culprit: false },
      ],
    },
    votes: [['tamsin', 1], ['pelle', 1]],
  },
  {
    board: phone,
    author: 'pelle',
    daysAgo: 20,
    write: {
      title: 'Front camera missing: ferrite FB5001 open',
      symptom: 'Camera app opens the rear camera only; switching to the front one shows an error.',
      rootCause: 'FB5001 (600 Ω at 100 MHz) between VCC_2V8_CAM and VCC_2V8_CAMF measured open.',
      fixSteps: [
        '1. VCC_2V8_CAM 2.8 V at TP13; VCC_2V8_CAMF at the connector J5003: 0 V.',
        '2. Battery out. Across FB5001: OL in resistance mode where it should read well under 1 Ω.',
        '3. Replace FB5001 (0402). A 0 Ω link works as a stop-gap but the ferrite keeps the camera supply clean.',
      ].join('\n'),
      outcome: 'solved',
      minutesSpent: 25,
      readings: [
        { net: 'VCC_2V8_CAM', mode: 'voltage_v', measured: 2.8, knownGood: 2.8 },
        { net: 'VCC_2V8_CAMF', mode: 'voltage_v', measured: 0, knownGood: 2.8 },
      ],
      nets: ['VCC_2V8_CAMF', 'VCC_2V8_CAM'],
      components: [{ refdes: 'FB5001', culprit: true }],
    },
    votes: [['tamsin', 1], ['oskar', 1], ['ines', -1]],
    comments: [['ines', 'Please do not recommend the 0 Ω link even as a stop-gap; the camera shows noise bands without the ferrite.']],
  },
  {
    board: phone,
    author: 'tamsin',
    daysAgo: 16,
    write: {
      title: 'SIM not detected: VCC_SIM shorted by ESD array D7001',
      symptom: 'No SIM card found with any card. SIM tray and contacts look clean.',
      rootCause: 'D7001 (4-channel ESD array at the SIM socket) shorted VCC_SIM to ground.',
      fixSteps: [
        `1. ${batteryFirst}`,
        '2. VCC_SIM diode mode 0.008 V (known-good 0.455 V).',
        '3. Inject 1.0 V at 0.5 A into TP18 (VCC_SIM is a 1.8 V rail, stay below it). D7001 heats at once.',
        '4. Remove D7001 with hot air; the short is gone. Fit a new one; the parts nearby stay hot for a minute.',
      ].join('\n'),
      outcome: 'solved',
      minutesSpent: 30,
      readings: [
        { net: 'VCC_SIM', mode: 'diode_v', measured: 0.008, knownGood: 0.455 },
        { net: 'SIM_DET', mode: 'diode_v', measured: 0.61, knownGood: 0.605 },
      ],
      nets: ['VCC_SIM'],
      components: [
        { refdes: 'D7001', culprit: true },
        { refdes: 'J7001', culprit: false },
      ],
    },
    votes: [['pelle', 1], ['oskar', 1], ['ines', 1]],
    confirmations: [
      ['pelle', 'Worked, identical readings.'],
      ['oskar', 'Worked; on mine the short was gone after lifting D7001 and I left it off until a part arrived.'],
    ],
  },
  {
    board: phone,
    author: 'ines',
    daysAgo: 12,
    write: {
      title: 'Reboots when the speaker plays loud: VBAT_AMP sags, fuse F2001 cracked',
      symptom: 'Restarts during ringtones and loud music; fine with the volume low.',
      rootCause: 'F2001 (2 A 0402) cracked: high resistance, so VBAT_AMP sags under amplifier load. Not fully solved.',
      fixSteps: [
        '1. With music at full volume VBAT_AMP dips to 3.10 V while VBAT holds 3.85 V.',
        '2. Battery disconnected, F2001 reads 0.9 Ω across; a good one reads a few tens of milliohms.',
        '3. Replaced F2001. Reboots went from every song to about once an hour.',
        '4. Next suspect: contact resistance at the battery connector J2001.',
      ].join('\n'),
      outcome: 'partly',
      minutesSpent: 80,
      readings: [
        { net: 'VBAT_AMP', mode: 'voltage_v', measured: 3.1, knownGood: 3.85 },
        { net: 'VBAT', mode: 'voltage_v', measured: 3.85, knownGood: 3.85 },
      ],
      nets: ['VBAT_AMP', 'VBAT'],
      components: [
        { refdes: 'F2001', culprit: true },
        { refdes: 'U6003', culprit: false },
        { refdes: 'J2001', culprit: false },
      ],
    },
    votes: [['tamsin', 1], ['oskar', -1]],
    comments: [
      ['oskar', 'Measure VBAT at J2001 and at TP1 under load; a worn battery shows the same dips.'],
      ['ines', 'Good point, the customer’s battery is at 78 % health. Will try a fresh one.'],
    ],
  },
  {
    board: phone,
    author: 'pelle',
    daysAgo: 9,
    write: {
      title: 'No Wi-Fi after a drop: module U8001 suspected, not repaired',
      symptom: 'Wi-Fi and Bluetooth switches grey out after the phone fell on a corner.',
      rootCause: 'Supplies and enable are fine, so probably cracked pads under the WLAN module. Customer declined the rework.',
      fixSteps: [
        '1. VSYS and VCC_1V8 present at U8001.',
        '2. WLAN_EN toggles to 1.8 V when Wi-Fi is switched on.',
        '3. WLAN_SDIO_CLK shows no clock; pressing on the module shield makes it appear briefly.',
        '4. Stopped here: the next step is removing U8001 and reballing.',
      ].join('\n'),
      body: 'Written up so the next person skips the supply checks: on this symptom go straight to the module.',
      outcome: 'not_solved',
      minutesSpent: 45,
      readings: [
        { net: 'WLAN_EN', mode: 'voltage_v', measured: 1.8, knownGood: 1.8 },
        { net: 'VCC_1V8', mode: 'voltage_v', measured: 1.8, knownGood: 1.8 },
      ],
      nets: ['WLAN_EN', 'WLAN_SDIO_CLK', 'VCC_1V8'],
      components: [{ refdes: 'U8001', culprit: false }],
    },
    votes: [['oskar', 1]],
  },
  {
    board: phone,
    author: 'oskar',
    daysAgo: 6,
    write: {
      title: 'NFC not working: NFC_VDDPA shorted by C7018',
      symptom: 'Payments and tags never react; NFC toggle works.',
      rootCause: 'C7018 (2.2 µF 0402 on NFC_VDDPA) shorted after liquid damage near the antenna clip.',
      fixSteps: [
        `1. ${batteryFirst}`,
        '2. NFC_VDDPA diode mode 0.010 V, known-good 0.390 V.',
        '3. Inject 1.0 V at 0.5 A (NFC_VDDPA is 3.3 V): C7018 warms. Clean the corrosion around J7003 with isopropyl alcohol.',
        '4. Replace C7018; let the board cool before refitting the shield.',
      ].join('\n'),
      outcome: 'solved',
      minutesSpent: 40,
      readings: [{ net: 'NFC_VDDPA', mode: 'diode_v', measured: 0.01, knownGood: 0.39 }],
      nets: ['NFC_VDDPA'],
      components: [
        { refdes: 'C7018', culprit: true },
        { refdes: 'U7006', culprit: false },
      ],
    },
    votes: [['tamsin', 1], ['pelle', 1]],
    confirmations: [['tamsin', 'Same cap, same corrosion pattern.']],
  },
  {
    board: tablet,
    author: 'tamsin',
    daysAgo: 27,
    write: {
      title: 'Tablet does not charge: VBUS_OUT dead behind over-voltage switch U1001',
      symptom: 'Charger negotiates (the PD charger’s LED changes) but the tablet never shows charging.',
      rootCause: 'U1001 stays off although OVP_EN_N is low; the mainboard never gets VBUS_OUT.',
      fixSteps: [
        '1. USB_VBUS 5.1 V at TP3 with a 5 V charger; VBUS_OUT 0 V at TP2.',
        '2. OVP_EN_N low (switch enabled) and OVP_FLAG_N high: the PD controller U1002 asks for power.',
        '3. VBUS_OUT diode mode 0.480 V against 0.475 V on a good board: nothing shorted behind it.',
        '4. Disconnect the tablet battery from the mainboard before rework. Replace U1001 with hot air; the fuse F1001 next to it gets hot too.',
      ].join('\n'),
      outcome: 'solved',
      minutesSpent: 50,
      readings: [
        { net: 'USB_VBUS', mode: 'voltage_v', measured: 5.1, knownGood: 5.0 },
        { net: 'VBUS_OUT', mode: 'voltage_v', measured: 0, knownGood: 5.0 },
        { net: 'VBUS_OUT', mode: 'diode_v', measured: 0.48, knownGood: 0.475 },
      ],
      nets: ['VBUS_OUT', 'USB_VBUS', 'OVP_EN_N'],
      components: [
        { refdes: 'U1001', culprit: true },
        { refdes: 'U1002', culprit: false },
      ],
    },
    votes: [['pelle', 1], ['oskar', 1], ['ines', 1]],
    comments: [['pelle', 'If OVP_FLAG_N is low instead, check for a high USB_VBUS first; U1001 may be doing its job.']],
  },
  {
    board: tablet,
    author: 'pelle',
    daysAgo: 18,
    write: {
      title: 'No sound in headphones, speakers fine: HP_VNEG missing, C3005 shorted',
      symptom: 'Headphones detected (audio switches away from the speakers) but silent.',
      rootCause: 'The codec’s charge-pump capacitor C3005 on HP_VNEG shorted; no negative rail, no headphone output.',
      fixSteps: [
        '1. HP_VNEG at TP7 while music plays: 0 V, should be about −1.8 V.',
        '2. Power off, battery disconnected on the mainboard: HP_VNEG diode mode 0.004 V (good board 0.620 V).',
        '3. Replace C3005 (2.2 µF 0402). HP_VNEG back to −1.79 V.',
      ].join('\n'),
      outcome: 'solved',
      minutesSpent: 30,
      readings: [
        { net: 'HP_VNEG', mode: 'voltage_v', measured: 0, knownGood: -1.8 },
        { net: 'HP_VNEG', mode: 'diode_v', measured: 0.004, knownGood: 0.62 },
      ],
      nets: ['HP_VNEG'],
      components: [
        { refdes: 'C3005', culprit: true },
        { refdes: 'U3001', culprit: false },
      ],
    },
    votes: [['tamsin', 1], ['ines', 1]],
    confirmations: [['tamsin', 'Worked on a unit with a bent jack too: replaced J3001 as well.']],
  },
  {
    board: tablet,
    author: 'oskar',
    daysAgo: 4,
    write: {
      title: 'Keyboard cover not detected: DOCK_PWR shorted by TVS D4002 after liquid',
      symptom: 'Cover not recognised; the pogo pins show green corrosion.',
      rootCause: 'Liquid on the pogo pads; the 6 V TVS D4002 on DOCK_PWR failed short.',
      fixSteps: [
        '1. DOCK_PWR 1.5 Ω to ground at TP10, a good board reads 90 kΩ.',
        '2. Disconnect the battery on the mainboard. Clean J4001 and the area with isopropyl alcohol and a soft brush.',
        '3. Still shorted: lift D4002 with hot air (small part, low airflow). Short gone; fit a new TVS.',
        '4. U4002 switches DOCK_PWR on again when DOCK_EN goes high.',
      ].join('\n'),
      outcome: 'solved',
      minutesSpent: 35,
      readings: [
        { net: 'DOCK_PWR', mode: 'resistance_ohm', measured: 1.5, knownGood: 90_000 },
        { net: 'DOCK_PWR', mode: 'diode_v', measured: 0.006, knownGood: 0.51 },
      ],
      nets: ['DOCK_PWR', 'DOCK_EN'],
      components: [
        { refdes: 'D4002', culprit: true },
        { refdes: 'U4002', culprit: false },
        { refdes: 'J4001', culprit: false },
      ],
    },
    votes: [['tamsin', 1]],
  },
  {
    board: tablet,
    author: 'ines',
    daysAgo: 2,
    write: {
      title: 'Left speaker quiet: boost VBST_SPK_L stays at VSYS',
      symptom: 'Left speaker much quieter than the right, distorts at high volume.',
      rootCause: 'The left amplifier’s boost does not start: VBST_SPK_L idles at VSYS under load. Inductor L3001 tests fine; amplifier U3002 suspected.',
      fixSteps: [
        '1. Playing a loud tone: VBST_SPK_R reaches 8.5 V at TP9, VBST_SPK_L stays at 3.9 V at TP8.',
        '2. LX_SPK_L shows no switching on the scope.',
        '3. L3001 measures 1 µH and no short. Ordered a new U3002; will update.',
      ].join('\n'),
      outcome: 'not_solved',
      minutesSpent: 40,
      readings: [
        { net: 'VBST_SPK_L', mode: 'voltage_v', measured: 3.9, knownGood: 8.5 },
        { net: 'VBST_SPK_R', mode: 'voltage_v', measured: 8.5, knownGood: 8.5 },
      ],
      nets: ['VBST_SPK_L', 'LX_SPK_L'],
      components: [
        { refdes: 'U3002', culprit: false },
        { refdes: 'L3001', culprit: false },
      ],
    },
    comments: [['pelle', 'Check the amplifier’s I2C config first: a boost left disabled by firmware looks exactly like this.']],
    flags: [['pelle', 'Not solved yet and no readings of the amplifier supply: should it stay published as a fix?']],
  },
];

async function demoPeople(pool: pg.Pool): Promise<Record<Person, SessionUser> | null> {
  const { rows } = await pool.query<{ id: number; github_id: string | number; login: string; name: string; avatar_url: string; role: SessionUser['role'] }>(
    'SELECT id, github_id, login, name, avatar_url, role FROM users WHERE github_id = ANY($1::bigint[])',
    [Object.values(githubIds)],
  );
  const people: Partial<Record<Person, SessionUser>> = {};
  for (const [person, githubId] of Object.entries(githubIds) as [Person, number][]) {
    const row = rows.find((r) => Number(r.github_id) === githubId);
    if (!row) return null;
    people[person] = { id: row.id, login: row.login, name: row.name, avatarUrl: row.avatar_url, role: row.role };
  }
  return people as Record<Person, SessionUser>;
}

/**
 * Writes the demo cases when the database has none and the demo people and boards exist.
 * Returns the titles written.
 */
export async function loadDemoCases(pool: pg.Pool): Promise<string[]> {
  const { rows } = await pool.query<{ count: number }>('SELECT count(*)::int AS count FROM cases');
  if ((rows[0]?.count ?? 0) > 0) return [];
  const people = await demoPeople(pool);
  if (!people) return [];
  const db = createDatabase(pool);
  const boards = createBoardsRepository(db);
  const casebook = createCasebookService({ boards, cases: createCasebookRepository(db) });
  const written: string[] = [];
  for (const demo of demoCases) {
    if (!(await boards.findBoardId(demo.board))) continue;
    const created = await casebook.create(demo.board, caseCreateSchema.parse({ status: 'published', ...demo.write }), people[demo.author]);
    for (const [who, value] of demo.votes ?? []) await casebook.vote(created.id, value, people[who]);
    for (const [who, note] of demo.confirmations ?? []) await casebook.confirm(created.id, note, people[who]);
    for (const [who, body] of demo.comments ?? []) await casebook.addComment(created.id, body, people[who]);
    for (const [who, reason] of demo.flags ?? []) await casebook.flag('case', created.id, reason, people[who]);
    // spread over the past weeks, comments a few hours after the write-up, in order
    await pool.query(
      `UPDATE cases SET created_at = now() - make_interval(days => $2), updated_at = now() - make_interval(days => $2),
              published_at = now() - make_interval(days => $2) WHERE id = $1`,
      [created.id, demo.daysAgo],
    );
    await pool.query('UPDATE case_revisions SET created_at = now() - make_interval(days => $2) WHERE case_id = $1', [created.id, demo.daysAgo]);
    await pool.query(
      `UPDATE case_comments m SET created_at = now() - make_interval(days => $2) + make_interval(hours => 3 * o.n::int)
       FROM (SELECT id, row_number() OVER (ORDER BY id) AS n FROM case_comments WHERE case_id = $1) o
       WHERE m.id = o.id`,
      [created.id, demo.daysAgo],
    );
    written.push(demo.write.title);
  }
  return written;
}
