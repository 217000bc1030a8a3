import { describe, expect, it } from 'vitest';
import {
  caseMergeRecordSchema,
  countMoves,
  rowsLeftBehind,
  type CaseMergeMoves,
} from './case-merge-record';

const none: CaseMergeMoves = {
  nets: [],
  components: [],
  readings: [],
  attachments: [],
  comments: [],
  confirmations: [],
  votes: [],
};

describe('rowsLeftBehind', () => {
  it('lists the recorded rows an undo did not move back, readings with their old positions', () => {
    const recorded = {
      ...none,
      nets: [4, 9],
      readings: [
        { id: 7, position: 0 },
        { id: 8, position: 1 },
      ],
      votes: [3],
    };
    const back = { ...none, nets: [9], readings: [{ id: 8, position: 1 }], votes: [3] };

    expect(rowsLeftBehind(recorded, back)).toEqual({
      ...none,
      nets: [4],
      readings: [{ id: 7, position: 0 }],
    });
    expect(countMoves(rowsLeftBehind(recorded, back))).toEqual({
      nets: 1,
      components: 0,
      readings: 1,
      attachments: 0,
      comments: 0,
      confirmations: 0,
      votes: 0,
    });
  });
});

describe('caseMergeRecordSchema', () => {
  it('refuses a record without the moved rows, so an undo never guesses', () => {
    const result = caseMergeRecordSchema.safeParse({
      intoCaseId: 2,
      boardId: 1,
      culpritMarked: [],
      revisionId: 5,
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => i.path.join('.'))).toEqual(['moved', 'keptOnDuplicate']);
  });
});
