import { caseRevisionSnapshotSchema, type CaseRevisionSnapshot } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { revisionChanges, snapshotFieldLabel } from './revision-changes';

const first: CaseRevisionSnapshot = {
  status: 'draft',
  title: 'Dead board',
  symptom: 'No current draw',
  rootCause: '',
  fixSteps: '',
  body: '',
  outcome: 'not_solved',
  minutesSpent: null,
  readings: [{ net: 'VSYS', mode: 'diode_v', measured: 0.004, knownGood: 0.336 }],
  nets: ['VSYS'],
  components: [{ refdes: 'C1013', culprit: false }],
};

describe('what a revision changed', () => {
  it('names every field of the contract’s snapshot but the merged case, which is shown apart', () => {
    // packages/shared/src/casebook.ts: caseRevisionSnapshotSchema
    expect(Object.keys(snapshotFieldLabel).sort()).toEqual(
      Object.keys(caseRevisionSnapshotSchema.shape)
        .filter((field) => field !== 'merged')
        .sort(),
    );
  });

  it('shows each changed field before and after, in field order', () => {
    const second: CaseRevisionSnapshot = {
      ...first,
      status: 'published',
      outcome: 'solved',
      minutesSpent: 95,
      components: [{ refdes: 'C1013', culprit: true }],
    };
    const changes = revisionChanges(second, first, [
      'components',
      'status',
      'outcome',
      'minutesSpent',
    ]);
    expect(changes).toEqual([
      { field: 'status', label: 'Status', before: 'draft', after: 'published' },
      { field: 'outcome', label: 'Outcome', before: 'not solved', after: 'solved' },
      { field: 'minutesSpent', label: 'Time spent', before: '', after: '1 h 35 min' },
      { field: 'components', label: 'Parts', before: 'C1013', after: 'C1013 (culprit)' },
    ]);
  });

  it('writes readings one per line with their units', () => {
    const [readings] = revisionChanges(first, null, ['readings']);
    expect(readings).toEqual({
      field: 'readings',
      label: 'Readings',
      before: null,
      after: 'VSYS diode 0.004 V, known-good 0.336 V',
    });
  });
});
