import { describe, expect, it } from 'vitest';
import {
  checkNewBoard,
  emptyBoardFields,
  formFieldOf,
  parseVolts,
  slugFromTitle,
} from './import-form-check';

describe('import form check', () => {
  it('reads volts written with a comma, a unit or nothing at all', () => {
    expect(parseVolts('11.4')).toBe(11.4);
    expect(parseVolts(' 11,4 ')).toBe(11.4);
    expect(parseVolts('7.6 V')).toBe(7.6);
    expect(parseVolts('.5')).toBe(0.5);
    expect(parseVolts('')).toBeNull();
    expect(parseVolts('eleven')).toBe('invalid');
    expect(parseVolts('1.2.3')).toBe('invalid');
  });

  it('suggests a URL slug from a title, dropping accents and punctuation', () => {
    expect(slugFromTitle('Demo Mainboard — Rev B')).toBe('demo-mainboard-rev-b');
    expect(slugFromTitle('Carte mère 2')).toBe('carte-mere-2');
    expect(slugFromTitle('  --  ')).toBe('');
  });

  it('accepts a board with a slug and a title and nothing else', () => {
    const result = checkNewBoard({ ...emptyBoardFields, slug: 'bench-a', title: 'Bench board A' });
    expect(result).toEqual({
      ok: true,
      slug: 'bench-a',
      meta: {
        title: 'Bench board A',
        deviceFamily: '',
        boardNumber: '',
        revision: '',
        batteryVoltage: null,
        notes: '',
      },
    });
  });

  it('names each bad field with a message a person can act on', () => {
    const result = checkNewBoard({
      ...emptyBoardFields,
      slug: 'Bench_A',
      title: '   ',
      batteryVoltage: '-3',
    });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    // The slug message is the one the shared schema itself defines.
    expect(result.errors.slug).toBe('use lower-case letters, digits and single hyphens');
    expect(result.errors.title).toBe('Required');
    expect(result.errors.batteryVoltage).toBe('Must be more than 0 V');
  });

  it('says when the battery voltage is not a number instead of passing it on as blank', () => {
    const result = checkNewBoard({
      ...emptyBoardFields,
      slug: 'ab',
      title: 'T',
      batteryVoltage: 'x',
    });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.batteryVoltage).toMatch(/number/);
  });

  it('places an API issue on the form field its path ends in', () => {
    expect(formFieldOf('board.title')).toBe('title');
    expect(formFieldOf('netlist')).toBe('netlist');
    expect(formFieldOf('format')).toBeNull();
    expect(formFieldOf(null)).toBeNull();
  });
});
