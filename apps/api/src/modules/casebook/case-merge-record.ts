// What the audit row of a case merge records: every row id the merge moved, the readings' old
// positions and the culprit marks it set. An admin's undo reads it back and moves exactly those rows
// home, so the record is checked on the way in as carefully as any request body.
import { z } from 'zod';
import { caseMergeCountsSchema, type CaseMergeCounts } from '@railyard/shared';

const rowIds = z.array(z.number().int().positive());

export const caseMergeMovesSchema = z.object({
  nets: rowIds,
  components: rowIds,
  /** each reading with its position on the duplicate before it was appended to the kept case */
  readings: z.array(
    z.object({ id: z.number().int().positive(), position: z.number().int().min(0) }),
  ),
  attachments: rowIds,
  comments: rowIds,
  confirmations: rowIds,
  votes: rowIds,
});
export type CaseMergeMoves = z.infer<typeof caseMergeMovesSchema>;

export const caseMergeRecordSchema = z.object({
  intoCaseId: z.number().int().positive(),
  boardId: z.number().int().positive(),
  moved: caseMergeMovesSchema,
  /** parts of the kept case that became culprits because the duplicate named them so */
  culpritMarked: rowIds,
  keptOnDuplicate: caseMergeCountsSchema,
  /** the revision of the kept case that holds the duplicate's text */
  revisionId: z.number().int().positive(),
});
export type CaseMergeRecord = z.infer<typeof caseMergeRecordSchema>;

export function countMoves(moves: CaseMergeMoves): CaseMergeCounts {
  return {
    nets: moves.nets.length,
    components: moves.components.length,
    readings: moves.readings.length,
    attachments: moves.attachments.length,
    comments: moves.comments.length,
    confirmations: moves.confirmations.length,
    votes: moves.votes.length,
  };
}

/** The recorded rows an undo did not find on the kept case to move back. */
export function rowsLeftBehind(recorded: CaseMergeMoves, back: CaseMergeMoves): CaseMergeMoves {
  const missing = (all: number[], found: number[]) => all.filter((id) => !found.includes(id));
  const readingsBack = back.readings.map((r) => r.id);
  return {
    nets: missing(recorded.nets, back.nets),
    components: missing(recorded.components, back.components),
    readings: recorded.readings.filter((r) => !readingsBack.includes(r.id)),
    attachments: missing(recorded.attachments, back.attachments),
    comments: missing(recorded.comments, back.comments),
    confirmations: missing(recorded.confirmations, back.confirmations),
    votes: missing(recorded.votes, back.votes),
  };
}
