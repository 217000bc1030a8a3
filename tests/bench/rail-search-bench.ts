// The board page's rail search (apps/web/src/features/rails/rail-index.ts) as a technician types:
// each keystroke is one search of the whole prefix typed so far, over a big board's nets and aliases.
// Runs the client's own module in Node; V8 is the engine Chromium runs it on.
import type { NetKind, NetRow } from '@railyard/shared';
import { buildRailIndex } from '../../apps/web/src/features/rails/rail-index';
import { Random } from '../../seed/random';
import type { BenchSection } from './bench-section';
import { median, percentile } from './bench-section';

export const searchedNetCount = 5_000;
/** Names typed character by character, as a person looks for a rail while tracing a fault. */
export const typedNames = [
  'vcc_3v3_sensor',
  'vsys',
  'usb_vbus',
  'vdd_cpu',
  'vdd_mem_1v2',
  'en_vcc_1v8',
];
const keystrokeTargetMs = 5;
// the list the search box shows
const shownMatches = 8;

const railWords = ['VCC', 'VDD', 'VDDQ', 'AVDD', 'DVDD', 'VIO', 'VREF', 'VPP'];
const blockWords = [
  'CPU',
  'GPU',
  'SOC',
  'MEM',
  'DDR',
  'AON',
  'PLL',
  'USB',
  'PCIE',
  'SATA',
  'AUDIO',
  'CAM',
  'DISP',
  'WLAN',
  'BT',
  'SD',
  'EMMC',
  'SENSOR',
  'FAN',
  'KBD',
  'TPAD',
  'EC',
  'LCD',
  'HDMI',
];
const volts = [
  '0V6',
  '0V75',
  '0V8',
  '0V9',
  '1V0',
  '1V05',
  '1V1',
  '1V2',
  '1V35',
  '1V5',
  '1V8',
  '2V5',
  '2V8',
  '3V3',
  '5V0',
  '12V',
];
const signalWords = [
  'EN',
  'PG',
  'I2C',
  'SPI',
  'GPIO',
  'CLK',
  'RST',
  'INT',
  'SCL',
  'SDA',
  'TX',
  'RX',
  'DP',
  'DN',
  'FB',
  'SNS',
  'LX',
];

function row(name: string, kind: NetKind, aliases: string[]): NetRow {
  return {
    name,
    // as the API sends it: upper case, letters and digits
    normalizedName: name.toUpperCase().replace(/[^A-Z0-9]/g, ''),
    kind,
    nominalVoltage: null,
    description: '',
    aliases,
    componentCount: 0,
    pinCount: 0,
  };
}

/** A laptop-sized board's net names: rails, their enables and feedbacks, buses, grounds; some aliased. */
export function generatedNets(count: number, seed = 5521): NetRow[] {
  const random = new Random(seed);
  const byName = new Map<string, NetRow>();
  const add = (name: string, kind: NetKind) => {
    if (byName.has(name)) return;
    const aliases = random.chance(0.2)
      ? [random.chance(0.5) ? `NNAME${byName.size}` : `${name.replace(/_/g, '')}_ALT`]
      : [];
    byName.set(name, row(name, kind, aliases));
  };
  for (const name of [
    'VBAT',
    'VSYS',
    'USB_VBUS',
    'VDD_CPU',
    'VCC_3V3',
    'VCC_3V3_SENSOR',
    'VDD_MEM_1V2',
    'VCC_1V8',
    'EN_VCC_1V8',
    'GND',
    'AGND',
  ]) {
    add(name, name.includes('GND') ? 'ground' : name.startsWith('EN_') ? 'signal' : 'power');
  }
  while (byName.size < count) {
    const roll = random.float();
    const index = random.int(0, 99);
    if (roll < 0.45) {
      const parts = [random.pick(railWords), random.pick(volts)];
      if (random.chance(0.7)) parts.push(random.pick(blockWords));
      if (random.chance(0.3)) parts.push(String(index));
      add(parts.join('_'), 'power');
    } else if (roll < 0.95) {
      const parts = [random.pick(signalWords), random.pick(blockWords)];
      if (random.chance(0.4)) parts.push(random.pick(volts));
      parts.push(String(index));
      add(parts.join('_'), 'signal');
    } else {
      add(`GND_${random.pick(blockWords)}_${index}`, 'ground');
    }
  }
  return [...byName.values()];
}

export function railSearchBench(): BenchSection {
  const nets = generatedNets(searchedNetCount);
  const aliasCount = nets.reduce((sum, net) => sum + net.aliases.length, 0);
  const buildStart = performance.now();
  const index = buildRailIndex(nets);
  const buildMs = performance.now() - buildStart;

  // What the optimiser sees in a session of typing; these are not measured.
  for (let round = 0; round < 20; round++) {
    for (const name of typedNames)
      for (let n = 1; n <= name.length; n++) index.search(name.slice(0, n), shownMatches);
  }

  const rounds = 10;
  const perName = typedNames.map((name) => ({
    name,
    times: [] as number[],
    cpu: [] as number[],
    found: '',
  }));
  for (let round = 0; round < rounds; round++) {
    for (const entry of perName) {
      for (let n = 1; n <= entry.name.length; n++) {
        const cpuStart = process.cpuUsage();
        const start = performance.now();
        const matches = index.search(entry.name.slice(0, n), shownMatches);
        entry.times.push(performance.now() - start);
        const cpu = process.cpuUsage(cpuStart);
        entry.cpu.push((cpu.user + cpu.system) / 1000);
        if (n === entry.name.length) entry.found = matches[0]?.net.name ?? '(nothing)';
      }
    }
  }
  const all = perName.flatMap((entry) => entry.times);
  const allCpu = perName.flatMap((entry) => entry.cpu);
  const p50 = median(all);
  const p95 = percentile(all, 95);
  const met = p95 < keystrokeTargetMs;
  const ms = (value: number) => `${value.toFixed(2)} ms`;
  return {
    title: 'Rail search, per keystroke',
    met,
    body: [
      `The board page's rail search (\`apps/web/src/features/rails/rail-index.ts\`: exact folded substring hits when they fill the list, else fuse.js's Bitap search) over`,
      `${nets.length.toLocaleString('en')} generated net names with ${aliasCount.toLocaleString('en')} aliases (\`tests/bench/rail-search-bench.ts\`), run in Node (V8, as in Chromium).`,
      `Each keystroke is one search for the text typed so far, top ${shownMatches} as the box shows; each name typed ${rounds} times after a warm-up.`,
      `Times are wall clock, as a person waits; the CPU columns (this process's user + system time) leave out the time`,
      `other work on the machine took the core away. Building the index took ${ms(buildMs)}.`,
      '',
      '| typed | keystrokes | median | p95 | slowest | CPU median | CPU p95 | first match |',
      '| --- | --- | --- | --- | --- | --- | --- | --- |',
      ...perName.map(
        (entry) =>
          `| \`${entry.name}\` | ${entry.name.length} | ${ms(median(entry.times))} | ${ms(percentile(entry.times, 95))} | ${ms(Math.max(...entry.times))} | ${ms(median(entry.cpu))} | ${ms(percentile(entry.cpu, 95))} | ${entry.found} |`,
      ),
      '',
      `All ${all.length} keystrokes: median **${ms(p50)}**, p95 **${ms(p95)}** (CPU: median ${ms(median(allCpu))}, p95 ${ms(percentile(allCpu, 95))}).`,
      `Target: p95 under ${keystrokeTargetMs} ms — ${met ? 'met' : '**not met**'}.`,
    ].join('\n'),
  };
}
