import type { NetRow } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { foldNetName, netMatcher } from './net-search';

function net(name: string, extra: Partial<NetRow> = {}): NetRow {
  return {
    name,
    normalizedName: name.toUpperCase(),
    kind: 'signal',
    nominalVoltage: null,
    description: '',
    aliases: [],
    componentCount: 0,
    pinCount: 0,
    ...extra,
  };
}

const noKinds = new Set<never>();

describe('net search', () => {
  it('folds case and every separator away', () => {
    expect(foldNetName('vcc_3v3')).toBe('VCC3V3');
    expect(foldNetName(' usb-vbus / in ')).toBe('USBVBUSIN');
    expect(foldNetName('VDD.CPU(1)')).toBe('VDDCPU1');
  });

  it('finds a rail whatever separators the technician types', () => {
    const row = net('VCC_3V3');
    for (const typed of ['vcc 3v3', 'VCC-3V3', 'vcc3v3', '3v3', 'c_3']) {
      expect(netMatcher({ text: typed, kinds: noKinds })(row), typed).toBe(true);
    }
  });

  it('does not match a substring that only exists across a different rail name', () => {
    expect(netMatcher({ text: '3v3', kinds: noKinds })(net('VCC_1V8'))).toBe(false);
  });

  it('matches on an alias when the name itself does not contain the text', () => {
    const row = net('VSYS', { aliases: ['SYS_MAIN'] });
    expect(netMatcher({ text: 'sys main', kinds: noKinds })(row)).toBe(true);
  });

  it('keeps only the chosen kinds, and every kind when none is chosen', () => {
    const ground = net('GND', { kind: 'ground' });
    const power = net('VBAT', { kind: 'power' });
    const onlyGround = netMatcher({ text: '', kinds: new Set(['ground']) });
    expect(onlyGround(ground)).toBe(true);
    expect(onlyGround(power)).toBe(false);
    expect(netMatcher({ text: '', kinds: noKinds })(power)).toBe(true);
  });
});
