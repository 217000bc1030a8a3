import type { NetKind, NetRow } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { buildRailIndex, normalizeRailText, railMatchThreshold } from './rail-index';

function net(name: string, kind: NetKind = 'power', aliases: string[] = []): NetRow {
  return {
    name,
    // what the API sends: upper case, letters and digits
    normalizedName: name.toUpperCase().replace(/[^A-Z0-9]/g, ''),
    kind,
    nominalVoltage: null,
    description: '',
    aliases,
    componentCount: 0,
    pinCount: 0,
  };
}

const board = [
  net('VBAT'),
  net('VSYS'),
  net('VSYS_FAN'),
  net('VCC_5V'),
  net('VCC_3V3', 'power', ['V3P3_AON']),
  net('VCC_3V3_SW'),
  net('VCC_3V3_SENSOR'),
  net('VCC_1V8'),
  net('VCC_1V8_AUDIO'),
  net('VDD_CPU'),
  net('VDD_MEM_1V2', 'power', ['VDDQ']),
  net('EN_VCC_3V3_SW', 'signal'),
  net('PG_5V0', 'signal'),
  net('GND', 'ground'),
  net('I2C0_SDA', 'signal'),
  net('USB_DP', 'signal'),
];
const index = buildRailIndex(board);
const names = (query: string, limit?: number) => index.search(query, limit).map((m) => m.net.name);

/**
 * Reference: P. H. Sellers, "The theory and computation of evolutionary distances: pattern
 * recognition", J. Algorithms 1 (1980): the fewest insertions, deletions and substitutions that
 * turn `pattern` into some substring of `text` (Levenshtein distance with a free start and end).
 */
function substringEditDistance(pattern: string, text: string): number {
  let previous = new Array<number>(text.length + 1).fill(0);
  for (let i = 1; i <= pattern.length; i++) {
    const current = [i];
    for (let j = 1; j <= text.length; j++) {
      const substitution = (previous[j - 1] ?? 0) + (pattern[i - 1] === text[j - 1] ? 0 : 1);
      current.push(Math.min((previous[j] ?? 0) + 1, (current[j - 1] ?? 0) + 1, substitution));
    }
    previous = current;
  }
  return Math.min(...previous);
}

describe('rail index', () => {
  it('folds case and the separators _ - . / and spaces out of names and queries', () => {
    expect(normalizeRailText('vcc_3v3')).toBe('VCC3V3');
    expect(normalizeRailText(' usb-vbus / in ')).toBe('USBVBUSIN');
    expect(normalizeRailText('vdd.cpu')).toBe('VDDCPU');
    // + changes what the net is (BAT+ is not BAT), so it is not a separator
    expect(normalizeRailText('bat+')).toBe('BAT+');
  });

  it('finds VCC_3V3 first for "3v3", ahead of the longer rails that contain it', () => {
    expect(names('3v3', 3)).toEqual(['VCC_3V3', 'VCC_3V3_SW', 'VCC_3V3_SENSOR']);
  });

  it('finds VSYS first for "vsys" and for the shortened "vsy"', () => {
    expect(names('vsys')[0]).toBe('VSYS');
    expect(names('vsy')[0]).toBe('VSYS');
  });

  it('finds VCC_3V3 first for "vcc3v" whatever separators are typed', () => {
    for (const typed of ['vcc3v', 'VCC_3V', 'vcc-3v', 'vcc 3v']) {
      expect(names(typed)[0], typed).toBe('VCC_3V3');
    }
  });

  it('still finds VCC_3V3 when one character is mistyped, as in "vcc_3v4"', () => {
    const [best] = index.search('vcc_3v4');
    // one substitution (4 for 3): Levenshtein distance 1
    expect(best?.net.name).toBe('VCC_3V3');
    expect(best?.errors).toBe(1);
  });

  it('reports the alias that matched when the printed name does not', () => {
    const [best] = index.search('v3p3 aon');
    expect(best?.net.name).toBe('VCC_3V3');
    expect(best?.matchedAlias).toBe('V3P3_AON');
    expect(index.search('vcc_3v3')[0]?.matchedAlias).toBeNull();
  });

  it('lists each net once even when its name and an alias both match', () => {
    const found = names('vdd', 20);
    expect(found.filter((name) => name === 'VDD_MEM_1V2')).toHaveLength(1);
  });

  it('puts a rail before a signal that matches equally well', () => {
    // VCC_5V and PG_5V0 both hold "5V" and fold to five characters
    expect(names('5v', 2)).toEqual(['VCC_5V', 'PG_5V0']);
  });

  it('finds nothing for an empty query, separators alone, or text far from every name', () => {
    expect(index.search('')).toEqual([]);
    expect(index.search(' _-/ ')).toEqual([]);
    expect(index.search('qqqq')).toEqual([]);
  });

  it('returns exactly the nets within the error budget by Sellers substring edit distance', () => {
    let seed = 11;
    const random = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    const words = ['VCC', 'VDD', 'VBAT', 'VSYS', 'USB', 'CPU', 'MEM', 'AUDIO', 'SNS', 'LX'];
    const volts = ['3V3', '1V8', '5V', '1V2', '0V9', '12V'];
    const many: NetRow[] = [];
    for (let i = 0; i < 1500; i++) {
      const parts = [words[Math.floor(random() * words.length)], volts[Math.floor(random() * 6)]];
      if (random() < 0.5) parts.push(words[Math.floor(random() * words.length)]);
      many.push(net(`${parts.join('_')}_${i}`, random() < 0.3 ? 'signal' : 'power'));
    }
    const bigIndex = buildRailIndex(many);
    // 1 or 3 characters take the pigeonhole filter (the q-gram bound says nothing there), the rest the q-gram count
    for (const typed of ['vcc3v3', 'vsys', 'vdd1v9', 'usbcpu', 'audo', 'mem12', 'vbat5vmem', 'usb1v8audo', 'vsys0v9lx', 'cpu12vsnss']) {
      const needle = normalizeRailText(typed);
      const budget = Math.floor(railMatchThreshold * needle.length);
      const expected = many
        .filter((row) => substringEditDistance(needle, normalizeRailText(row.name)) <= budget)
        .map((row) => row.name)
        .sort();
      const found = bigIndex
        .search(typed, many.length)
        .map((match) => match.net.name)
        .sort();
      expect(found, typed).toEqual(expected);
    }
  });
});
