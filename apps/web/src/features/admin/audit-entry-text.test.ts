// The rows below have the shapes the API writes (apps/api/src/modules/auth/users.repository.ts,
// board-edits/board-edits.repository.ts and casebook/casebook.service.ts), so a change there that this
// client does not follow fails here.
import type { AuditEntry } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { auditValueText, describeAuditEntry } from './audit-entry-text';

function entry(action: string, targetType: string, targetId: string, details: object): AuditEntry {
  return {
    id: 1,
    actor: { id: 7, login: 'ines-harlow' },
    action,
    targetType,
    targetId,
    reason: 'checked on the bench',
    details: details as Record<string, unknown>,
    createdAt: '2025-03-01T10:00:00.000Z',
  };
}

const logins = new Map([['12', 'tamsin-reyl']]);
const loginOf = (id: string) => logins.get(id);

describe('audit entries in words', () => {
  it('names the person whose role changed and shows the change', () => {
    const line = describeAuditEntry(
      entry('user.role', 'user', '12', { from: 'member', to: 'moderator' }),
      loginOf,
    );
    expect(line).toEqual({
      what: 'changed the role of',
      target: 'tamsin-reyl',
      details: [['role', 'member → moderator']],
    });
  });

  it('falls back to the user id when the person is not in the list', () => {
    expect(describeAuditEntry(entry('user.ban', 'user', '99', {}), loginOf).target).toBe(
      'user #99',
    );
  });

  it('reads a rail edit field by field, before and after', () => {
    const line = describeAuditEntry(
      entry('net.update', 'net', '40', {
        board: 3,
        net: 'VCC_1V8',
        before: { nominalVoltage: null, description: '' },
        after: { nominalVoltage: 1.8, description: 'always-on 1.8 V' },
      }),
      loginOf,
    );
    expect(line.target).toBe('VCC_1V8');
    expect(line.details).toEqual([
      ['voltage', 'none → 1.8'],
      ['description', 'empty → always-on 1.8 V'],
      ['board', '#3'],
    ]);
  });

  it('shows a removed link by its label and keeps the details it does not know', () => {
    const line = describeAuditEntry(
      entry('power-link.remove', 'power-link', '5', {
        board: 3,
        link: 'switch VBAT → VSYS via U1',
        origin: 'entered',
      }),
      loginOf,
    );
    expect(line).toEqual({
      what: 'removed the power link',
      target: 'switch VBAT → VSYS via U1',
      details: [
        ['board', '#3'],
        ['origin', 'entered'],
      ],
    });
  });

  it('shows an action it does not know with its target and raw details', () => {
    const line = describeAuditEntry(entry('board.rename', 'board', '3', { to: 'X' }), loginOf);
    expect(line).toEqual({ what: 'board.rename', target: 'board #3', details: [['to', 'X']] });
  });

  it('writes absent values as none and objects as JSON', () => {
    expect(auditValueText(null)).toBe('none');
    expect(auditValueText('')).toBe('empty');
    expect(auditValueText({ a: 1 })).toBe('{"a":1}');
  });
});

const noRows = {
  nets: 0,
  components: 0,
  readings: 0,
  attachments: 0,
  comments: 0,
  confirmations: 0,
  votes: 0,
};

describe('casebook moderation in the audit log', () => {
  it('reads a merge as the duplicate, the kept case and what moved', () => {
    const line = describeAuditEntry(
      entry('case.merge', 'case', '21', {
        intoCaseId: 8,
        boardId: 2,
        moved: {
          nets: [301],
          components: [],
          readings: [
            { id: 55, position: 0 },
            { id: 56, position: 1 },
          ],
          attachments: [],
          comments: [90],
          confirmations: [],
          votes: [12, 13],
        },
        culpritMarked: [77],
        keptOnDuplicate: { ...noRows, votes: 1 },
        revisionId: 140,
        board: 'kestrel-mb-2210',
        fromTitle: 'Dead after a drop',
        intoTitle: 'No power: VSYS shorted by C812',
      }),
      loginOf,
    );
    expect(line).toEqual({
      what: 'merged the case',
      target: '#21 “Dead after a drop”',
      details: [
        ['into', '#8 “No power: VSYS shorted by C812”'],
        ['moved', '1 net link, 2 readings, 1 comment, 2 votes'],
        ['left on the duplicate', '1 vote'],
        ['culprits marked', '1'],
        ['board', 'kestrel-mb-2210'],
      ],
    });
  });

  it('reads an undone merge with the entry it undoes and what went back', () => {
    const line = describeAuditEntry(
      entry('case.unmerge', 'case', '21', {
        undoes: 95,
        intoCaseId: 8,
        boardId: 2,
        movedBack: { ...noRows, readings: 2, comments: 1 },
        skipped: noRows,
        skippedRows: {
          nets: [],
          components: [],
          readings: [],
          attachments: [],
          comments: [],
          confirmations: [],
          votes: [],
        },
        culpritMarksCleared: 0,
        revisionId: 141,
      }),
      loginOf,
    );
    expect(line).toEqual({
      what: 'undid the merge of the case',
      target: '#21',
      details: [
        ['undoes', 'entry #95'],
        ['kept case', '#8'],
        ['moved back', '2 readings, 1 comment'],
      ],
    });
  });

  it('names the author of a locked case and its board by slug', () => {
    const line = describeAuditEntry(
      entry('case.lock', 'case', '8', { author: 12, board: 'kestrel-mb-2210' }),
      loginOf,
    );
    expect(line).toEqual({
      what: 'locked the case',
      target: '#8',
      details: [
        ['author', 'tamsin-reyl'],
        ['board', 'kestrel-mb-2210'],
      ],
    });
  });

  it('has a verb for each of hiding, restoring and unlocking a case', () => {
    const what = (action: string) =>
      describeAuditEntry(entry(action, 'case', '8', {}), loginOf).what;
    expect([what('case.hide'), what('case.restore'), what('case.unlock')]).toEqual([
      'hid the case',
      'restored the case',
      'unlocked the case',
    ]);
  });

  it('shows a moderator’s edit of a comment before and after, on its case', () => {
    const line = describeAuditEntry(
      entry('comment.edit', 'comment', '40', {
        case: 8,
        author: 99,
        before: 'call me on 555 0100',
        after: 'call me',
      }),
      loginOf,
    );
    expect(line).toEqual({
      what: 'edited the comment',
      target: '#40 on case #8',
      details: [
        ['author', 'user #99'],
        ['before', 'call me on 555 0100'],
        ['after', 'call me'],
      ],
    });
  });

  it('keeps the text of a deleted comment and says nothing more of a hidden one', () => {
    const deleted = describeAuditEntry(
      entry('comment.delete', 'comment', '41', { case: 8, author: 12, body: 'spam link' }),
      loginOf,
    );
    expect(deleted.what).toBe('deleted the comment');
    expect(deleted.details).toEqual([
      ['author', 'tamsin-reyl'],
      ['text', 'spam link'],
    ]);
    const hidden = describeAuditEntry(
      entry('comment.hide', 'comment', '41', { case: 8, author: 12 }),
      loginOf,
    );
    expect(hidden).toEqual({
      what: 'hid the comment',
      target: '#41 on case #8',
      details: [['author', 'tamsin-reyl']],
    });
    expect(describeAuditEntry(entry('comment.restore', 'comment', '41', {}), loginOf).target).toBe(
      '#41',
    );
  });

  it('reads a resolved report as what was reported and by whom', () => {
    const line = describeAuditEntry(
      entry('flag.resolve', 'flag', '6', { contentType: 'comment', contentId: 41, flagger: 12 }),
      loginOf,
    );
    expect(line).toEqual({
      what: 'resolved the report of',
      target: 'comment #41',
      details: [
        ['report', '#6'],
        ['reported by', 'tamsin-reyl'],
      ],
    });
  });
});
