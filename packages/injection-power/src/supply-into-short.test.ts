import { describe, expect, it } from 'vitest';
import {
  InjectionInputError,
  injectionConcerns,
  mostPowerIntoShort,
  supplyIntoShort,
} from './supply-into-short';

// Check rows: the textbook constant-voltage / constant-current supply (from memory) worked by hand
// (arithmetic), as listed in the project's reference facts, "Bench supply into a short".
describe('supplyIntoShort', () => {
  it.each([
    { volts: 5.0, amps: 3.0, ohms: 0.05, mode: 'constant_current', i: 3.0, v: 0.15, w: 0.45 },
    { volts: 1.0, amps: 2.0, ohms: 0.1, mode: 'constant_current', i: 2.0, v: 0.2, w: 0.4 },
    { volts: 1.0, amps: 2.0, ohms: 2, mode: 'constant_voltage', i: 0.5, v: 1.0, w: 0.5 },
    { volts: 1.0, amps: 2.0, ohms: 0.5, mode: 'crossover', i: 2.0, v: 1.0, w: 2.0 },
  ] as const)(
    'sets $volts V / $amps A into $ohms Ω: $mode, $i A at $v V, $w W in the short',
    ({ volts, amps, ohms, mode, i, v, w }) => {
      const load = supplyIntoShort({ volts, amps }, ohms);

      expect(load.mode).toBe(mode);
      expect(load.amps).toBeCloseTo(i, 12);
      expect(load.volts).toBeCloseTo(v, 12);
      expect(load.watts).toBeCloseTo(w, 12);
      expect(load.crossoverOhms).toBeCloseTo(volts / amps, 12);
    },
  );

  it('puts the whole current limit through a dead short with no voltage across it and no heat in it', () => {
    expect(supplyIntoShort({ volts: 1, amps: 2 }, 0)).toEqual({
      mode: 'constant_current',
      amps: 2,
      volts: 0,
      watts: 0,
      crossoverOhms: 0.5,
    });
  });

  it('never puts more into a short than at the crossover resistance (P = V·I there)', () => {
    const setting = { volts: 3.3, amps: 1.5 };
    const most = mostPowerIntoShort(setting);
    expect(most.watts).toBeCloseTo(4.95, 12);
    expect(most.atOhms).toBeCloseTo(2.2, 12);
    for (let ohms = 0; ohms <= 20; ohms += 0.01) {
      expect(supplyIntoShort(setting, ohms).watts).toBeLessThanOrEqual(most.watts * (1 + 1e-12));
    }
  });

  it('meets Ohm’s law on both sides of the crossover: V = I·R across the short', () => {
    for (const ohms of [0.001, 0.3, 0.5, 0.7, 10, 1e6]) {
      const load = supplyIntoShort({ volts: 1, amps: 2 }, ohms);
      expect(load.volts).toBeCloseTo(load.amps * ohms, 9);
      expect(load.amps).toBeLessThanOrEqual(2);
      expect(load.volts).toBeLessThanOrEqual(1);
    }
  });

  it.each([
    [{ volts: 0, amps: 1 }, 1, 'volts'],
    [{ volts: -1, amps: 1 }, 1, 'volts'],
    [{ volts: Number.NaN, amps: 1 }, 1, 'volts'],
    [{ volts: 1, amps: 0 }, 1, 'amps'],
    [{ volts: 1, amps: Number.POSITIVE_INFINITY }, 1, 'amps'],
    [{ volts: 1, amps: 1 }, -0.1, 'ohms'],
    [{ volts: 1, amps: 1 }, Number.NaN, 'ohms'],
  ] as const)('refuses %o into %s Ω, naming the field %s', (setting, ohms, field) => {
    let thrown: unknown;
    try {
      supplyIntoShort(setting, ohms);
    } catch (err) {
      thrown = err;
    }
    expect(thrown).toBeInstanceOf(InjectionInputError);
    expect((thrown as InjectionInputError).field).toBe(field);
  });
});

// Common practice: inject no more than the rail's own nominal voltage.
describe('injectionConcerns', () => {
  it('has nothing to say about 1 V into a 3.3 V rail, or exactly the rail voltage', () => {
    expect(injectionConcerns({ volts: 1, amps: 1 }, 3.3)).toEqual([]);
    expect(injectionConcerns({ volts: 3.3, amps: 1 }, 3.3)).toEqual([]);
  });

  it('warns of a setting above the rail’s nominal voltage', () => {
    expect(injectionConcerns({ volts: 1.5, amps: 1 }, 1.2)).toEqual(['above_rail_voltage']);
  });

  it('says when the rail’s voltage is not known, so there is no ceiling to give', () => {
    expect(injectionConcerns({ volts: 1, amps: 1 }, null)).toEqual(['rail_voltage_unknown']);
    expect(injectionConcerns({ volts: 1, amps: 1 }, 0)).toEqual(['rail_voltage_unknown']);
  });

  it('takes the size of a negative rail as its ceiling and says the polarity is reversed', () => {
    expect(injectionConcerns({ volts: 1, amps: 0.5 }, -1.8)).toEqual(['negative_rail']);
    expect(injectionConcerns({ volts: 2, amps: 0.5 }, -1.8)).toEqual([
      'negative_rail',
      'above_rail_voltage',
    ]);
  });
});
