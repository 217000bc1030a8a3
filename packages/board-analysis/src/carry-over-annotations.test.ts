import { describe, expect, it } from 'vitest';
import type { BoardDraft, DraftNet } from './board-draft';
import { carryOverAnnotations, type PreviousAnnotations } from './carry-over-annotations';

// Self-consistency checks of the replace rule documented in docs/formats.md: no external source applies.
function net(name: string, extra: Partial<DraftNet> = {}): DraftNet {
  return { name, normalizedName: name, kind: 'signal', nominalVoltage: null, description: '', aliases: [], ...extra };
}

function draft(nets: DraftNet[]): BoardDraft {
  return {
    meta: {},
    nets,
    components: [
      { refdes: 'U5', kind: 'ic', value: '', magnitude: null, unit: null, tolerance: null, ratedVoltage: null,
        package: '', side: 'top', x: null, y: null, rotation: null, pins: [] },
    ],
    powerLinks: [],
    rootNet: 'VBAT',
    groundNets: ['GND'],
    warnings: [],
    errors: [],
  };
}

const none: PreviousAnnotations = { nets: [], enteredLinks: [], enteredRoot: null };

describe('carryOverAnnotations', () => {
  it('keeps a nominal voltage the new files do not give, and makes the net a power rail', () => {
    const result = carryOverAnnotations(draft([net('VBAT'), net('VCC_3V3')]), {
      ...none,
      nets: [{ name: 'VCC_3V3', nominalVoltage: 3.3, description: 'main 3.3 V', aliases: [] }],
    }, false);
    const rail = result.draft.nets.find((n) => n.name === 'VCC_3V3')!;
    expect(rail.nominalVoltage).toBe(3.3);
    expect(rail.kind).toBe('power');
    expect(rail.description).toBe('main 3.3 V');
    expect(result.dropped).toEqual([]);
  });

  it('lets the new files win over a previous value', () => {
    const result = carryOverAnnotations(draft([net('VCC_3V3', { nominalVoltage: 3.4 })]), {
      ...none,
      nets: [{ name: 'VCC_3V3', nominalVoltage: 3.3, description: '', aliases: [] }],
    }, false);
    expect(result.draft.nets[0]!.nominalVoltage).toBe(3.4);
  });

  it('reports the annotations of a net that is gone as dropped', () => {
    const result = carryOverAnnotations(draft([net('VBAT')]), {
      ...none,
      nets: [{ name: 'VCC_OLD', nominalVoltage: 1.8, description: '', aliases: [] }],
    }, false);
    expect(result.dropped).toEqual(['annotations of net VCC_OLD: the net is not in the new netlist']);
  });

  it('drops an alias that now names another net', () => {
    const result = carryOverAnnotations(draft([net('VBAT'), net('VSYS'), net('MAIN')]), {
      ...none,
      nets: [{ name: 'VSYS', nominalVoltage: null, description: '', aliases: ['MAIN', 'SYS_RAIL'] }],
    }, false);
    expect(result.draft.nets.find((n) => n.name === 'VSYS')!.aliases).toEqual(['SYS_RAIL']);
    expect(result.dropped).toHaveLength(1);
    expect(result.dropped[0]).toContain('alias MAIN');
  });

  it('keeps an entered link whose nets still exist and drops one whose net is gone', () => {
    const result = carryOverAnnotations(draft([net('VSYS'), net('VCC_3V3')]), {
      ...none,
      enteredLinks: [
        { from: 'VSYS', to: 'VCC_3V3', via: 'U5', kind: 'converter', enteredBy: 'user:7' },
        { from: 'VSYS', to: 'VCC_GONE', via: 'U9', kind: 'converter', enteredBy: null },
      ],
    }, false);
    expect(result.draft.powerLinks).toEqual([
      { from: 'VSYS', to: 'VCC_3V3', via: 'U5', kind: 'converter', origin: 'entered' },
    ]);
    expect(result.enteredBy.get(result.draft.powerLinks[0]!)).toBe('user:7');
    expect(result.dropped).toEqual(['converter link VSYS → VCC_GONE via U9: net VCC_GONE is not in the new netlist']);
  });

  it('keeps a chosen root unless the new files name one', () => {
    const previous = { ...none, enteredRoot: 'VSYS' };
    expect(carryOverAnnotations(draft([net('VBAT'), net('VSYS')]), previous, false).draft.rootNet).toBe('VSYS');
    expect(carryOverAnnotations(draft([net('VBAT'), net('VSYS')]), previous, true).draft.rootNet).toBe('VBAT');
  });
});
