import { describe, expect, it } from 'vitest';
import { matchNames } from './name-match';

const nets = [
  { name: 'VCC_3V3' },
  { name: 'VCC_3V3_AON' },
  { name: 'LDO_VCC_3V3' },
  { name: 'VSYS', aliases: ['SYS_PWR'] },
  { name: 'GND' },
];

describe('finding a name in a picker', () => {
  it('ignores case and separators', () => {
    expect(matchNames(nets, 'vcc 3v3', 5).map((n) => n.name)).toEqual([
      'VCC_3V3',
      'VCC_3V3_AON',
      'LDO_VCC_3V3',
    ]);
  });

  it('offers the exact name before longer ones that start with it', () => {
    const parts = [{ name: 'C1013' }, { name: 'C10' }, { name: 'C1' }, { name: 'TC1' }];
    expect(matchNames(parts, 'c1', 10).map((p) => p.name)).toEqual(['C1', 'C10', 'C1013', 'TC1']);
  });

  it('finds a net by its alias', () => {
    expect(matchNames(nets, 'sys_pwr', 5).map((n) => n.name)).toEqual(['VSYS']);
  });

  it('offers nothing for blank text and stops at the limit', () => {
    expect(matchNames(nets, ' _ ', 5)).toEqual([]);
    expect(matchNames(nets, 'v', 2)).toHaveLength(2);
  });
});
