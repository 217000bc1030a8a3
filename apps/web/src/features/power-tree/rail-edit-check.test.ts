import { netUpdateSchema, powerLinkCreateSchema, type NetRow } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { checkNewLink, findNet, readVolts } from './rail-edit-check';

function net(name: string, aliases: string[] = []): NetRow {
  return {
    name,
    normalizedName: name,
    kind: 'power',
    nominalVoltage: null,
    description: '',
    aliases,
    componentCount: 1,
    pinCount: 1,
  };
}

describe('nominal voltage as typed', () => {
  it('reads a point or a decimal comma, with or without the unit', () => {
    expect(readVolts('3.3')).toEqual({ ok: true, volts: 3.3 });
    expect(readVolts('3,3')).toEqual({ ok: true, volts: 3.3 });
    expect(readVolts('1.8 V')).toEqual({ ok: true, volts: 1.8 });
    expect(readVolts('-5V')).toEqual({ ok: true, volts: -5 });
    expect(readVolts('.9')).toEqual({ ok: true, volts: 0.9 });
  });

  it('takes an empty field as "not known"', () => {
    expect(readVolts('  ')).toEqual({ ok: true, volts: null });
  });

  it('refuses text that is not a number, saying how to write it', () => {
    const reading = readVolts('3V3');
    expect(reading.ok).toBe(false);
    if (!reading.ok) expect(reading.error).toMatch(/number of volts/);
  });

  // packages/shared/src/board-edits.ts, netUpdateSchema.nominalVoltage: -1000 to 1000 volts
  it.each(['1000', '-1000', '1000.5', '-1200', '12'])(
    'agrees with the API contract on whether %s volts is a nominal voltage',
    (text) => {
      const reading = readVolts(text);
      const contract = netUpdateSchema.safeParse({ nominalVoltage: Number(text), reason: 'x' });
      expect(reading.ok).toBe(contract.success);
    },
  );
});

describe('a new power link', () => {
  const nets = [net('VSYS'), net('VCC_1V8', ['V1P8_AON']), net('GND')];

  it('finds the other net by its printed name or an alias, in any case', () => {
    expect(findNet(nets, 'vcc_1v8')?.name).toBe('VCC_1V8');
    expect(findNet(nets, 'v1p8_aon')?.name).toBe('VCC_1V8');
    expect(findNet(nets, 'VCC_9V9')).toBeUndefined();
  });

  it('asks for the other net and the part when they are missing', () => {
    expect(checkNewLink({ otherNet: ' ', via: '' }, 'VSYS', nets)).toEqual({
      otherNet: 'Choose the net at the other end of the link.',
      via: 'Name the part the power passes through, e.g. U7.',
    });
  });

  it('refuses a net the board does not have, and a link from the rail to itself', () => {
    expect(checkNewLink({ otherNet: 'VCC_9V9', via: 'U2' }, 'VSYS', nets).otherNet).toMatch(
      /No net called/,
    );
    expect(checkNewLink({ otherNet: 'vsys', via: 'U2' }, 'VSYS', nets).otherNet).toMatch(
      /two different nets/,
    );
  });

  it('leaves the existence of the net to the API while the nets are loading', () => {
    expect(checkNewLink({ otherNet: 'VCC_9V9', via: 'U2' }, 'VSYS', undefined)).toEqual({});
  });

  it('lets through only links the API contract would take', () => {
    // packages/shared/src/board-edits.ts, powerLinkCreateSchema: non-empty from, to and via
    const fields = { otherNet: 'VCC_1V8', via: 'U2' };
    expect(checkNewLink(fields, 'VSYS', nets)).toEqual({});
    const body = { from: 'VSYS', to: fields.otherNet, via: fields.via, kind: 'converter' };
    expect(powerLinkCreateSchema.safeParse(body).success).toBe(true);
  });
});
