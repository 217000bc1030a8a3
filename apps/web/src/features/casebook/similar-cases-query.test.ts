import { similarCasesQuerySchema } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { emptyCaseForm, newReadingRow } from './case-form';
import { similarCasesParams } from './similar-cases-query';

describe('the likely-duplicates question', () => {
  it('asks nothing while nothing is picked or typed', () => {
    const params = similarCasesParams(emptyCaseForm());
    expect(params).toBeNull();
    // the contract refuses the same empty question
    expect(similarCasesQuerySchema.safeParse({}).success).toBe(false);
  });

  it('asks with the nets, parts and text so far, in a form the contract accepts', () => {
    const form = {
      ...emptyCaseForm({ nets: ['VSYS'], parts: ['C1013', 'U1001'] }),
      title: 'Dead board',
      symptom: 'No current draw',
      readings: [newReadingRow('VBAT'), newReadingRow('VSYS'), newReadingRow('')],
    };
    const params = similarCasesParams(form, 12);
    expect(params).toEqual({
      nets: 'VSYS,VBAT',
      components: 'C1013,U1001',
      text: 'Dead board\nNo current draw',
      exclude: '12',
    });
    const parsed = similarCasesQuerySchema.parse(params);
    expect(parsed.nets).toEqual(['VSYS', 'VBAT']);
    expect(parsed.exclude).toBe(12);
  });

  it('waits for a few letters before asking by text alone', () => {
    expect(similarCasesParams({ ...emptyCaseForm(), title: 'No' })).toBeNull();
    expect(similarCasesParams({ ...emptyCaseForm(), title: 'No boot' })).toEqual({
      text: 'No boot',
    });
  });

  it('keeps a long list within what the contract takes', () => {
    const nets = Array.from(
      { length: 80 },
      (_, i) => `NET_${String(i).padStart(3, '0')}_${'X'.repeat(40)}`,
    );
    const params = similarCasesParams({ ...emptyCaseForm(), nets });
    expect(params).not.toBeNull();
    expect(similarCasesQuerySchema.safeParse(params).success).toBe(true);
  });
});
