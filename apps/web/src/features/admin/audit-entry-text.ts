// One audit row in words: what was done, to what, and the details worth reading. The actions and
// their details are the ones the API writes (apps/api: users.repository.ts, board-edits.repository.ts,
// casebook.service.ts); an action this client does not know yet is still shown, with its details as
// they came.
import type { AuditEntry } from '@railyard/shared';
import { mergedRowsText } from '../../lib/merged-rows';

export type AuditLine = {
  /** the verb phrase, e.g. "changed the role of" */
  what: string;
  /** what it was done to, e.g. a login or "VBAT → VSYS via U1" */
  target: string;
  /** label and value pairs, in the order they read best */
  details: Array<[label: string, value: string]>;
};

/** A detail value as text: absent and null read "none", an empty text reads "empty". */
export function auditValueText(value: unknown): string {
  if (value === null || value === undefined) return 'none';
  if (typeof value === 'string') return value === '' ? 'empty' : value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return JSON.stringify(value);
}

/** Names of a net's fields as the rail editor labels them. */
const netFieldLabel: Record<string, string> = {
  nominalVoltage: 'voltage',
  description: 'description',
  kind: 'kind',
};

const change = (from: unknown, to: unknown) => `${auditValueText(from)} → ${auditValueText(to)}`;

function record(value: unknown): Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value)
    ? (value as Record<string, unknown>)
    : {};
}

/** "#12 “No boot after a drop”", or "#12" when the entry kept no title. */
function caseLabel(id: unknown, title: unknown): string {
  const number = `#${auditValueText(id)}`;
  return typeof title === 'string' && title !== '' ? `${number} “${title}”` : number;
}

const caseActionVerb: Record<string, string> = {
  'case.lock': 'locked the case',
  'case.unlock': 'unlocked the case',
  'case.hide': 'hid the case',
  'case.restore': 'restored the case',
};

const commentActionVerb: Record<string, string> = {
  'comment.hide': 'hid the comment',
  'comment.restore': 'restored the comment',
  'comment.edit': 'edited the comment',
  'comment.delete': 'deleted the comment',
};

/** A detail only worth a line when it says something (a count above zero, a value given). */
function detailIf(show: boolean, label: string, value: string): Array<[string, string]> {
  return show ? [[label, value]] : [];
}

/** What is left of `details` once `used` keys are shown their own way. */
function remaining(details: Record<string, unknown>, used: readonly string[]) {
  return Object.entries(details)
    .filter(([key]) => !used.includes(key))
    .map(([key, value]): [string, string] => [key, auditValueText(value)]);
}

export function describeAuditEntry(
  entry: AuditEntry,
  /** a user's login by their id, when the page knows it */
  loginOf: (userId: string) => string | undefined,
): AuditLine {
  const { details } = entry;
  // Board edits record the board's id, casebook actions its slug.
  const board = detailIf(
    details.board !== undefined,
    'board',
    typeof details.board === 'number' ? `#${details.board}` : auditValueText(details.board),
  );
  const person = () => loginOf(entry.targetId) ?? `user #${entry.targetId}`;
  const someone = (id: unknown): string => {
    const key = auditValueText(id);
    return loginOf(key) ?? `user #${key}`;
  };
  const author = detailIf(details.author !== undefined, 'author', someone(details.author));

  switch (entry.action) {
    case 'user.role':
      return {
        what: 'changed the role of',
        target: person(),
        details: [
          ['role', change(details.from, details.to)],
          ...remaining(details, ['from', 'to']),
        ],
      };
    case 'user.ban':
      return { what: 'banned', target: person(), details: remaining(details, []) };
    case 'user.unban':
      return { what: 'lifted the ban on', target: person(), details: remaining(details, []) };
    case 'power-link.add':
    case 'power-link.remove':
      return {
        what: entry.action === 'power-link.add' ? 'added the power link' : 'removed the power link',
        target: typeof details.link === 'string' ? details.link : `power link #${entry.targetId}`,
        details: [...board, ...remaining(details, ['board', 'link'])],
      };
    case 'net.update': {
      const before = record(details.before);
      const after = record(details.after);
      const fields = Object.keys(after).map((key): [string, string] => [
        netFieldLabel[key] ?? key,
        change(before[key], after[key]),
      ]);
      return {
        what: 'edited the rail',
        target: typeof details.net === 'string' ? details.net : `net #${entry.targetId}`,
        details: [...fields, ...board, ...remaining(details, ['board', 'net', 'before', 'after'])],
      };
    }
    case 'board.root':
      return {
        what: 'set the root net of',
        target: `board #${entry.targetId}`,
        details: [
          ['root', change(details.from, details.to)],
          ...remaining(details, ['from', 'to']),
        ],
      };
    case 'case.merge': {
      const leftBehind = mergedRowsText(details.keptOnDuplicate);
      const culprits = Array.isArray(details.culpritMarked) ? details.culpritMarked.length : 0;
      return {
        what: 'merged the case',
        target: caseLabel(entry.targetId, details.fromTitle),
        details: [
          ['into', caseLabel(details.intoCaseId, details.intoTitle)],
          ['moved', mergedRowsText(details.moved)],
          ...detailIf(leftBehind !== 'nothing', 'left on the duplicate', leftBehind),
          ...detailIf(culprits > 0, 'culprits marked', String(culprits)),
          ...board,
          ...remaining(details, [
            'intoCaseId',
            'intoTitle',
            'fromTitle',
            'moved',
            'keptOnDuplicate',
            'culpritMarked',
            'board',
            'boardId',
            'revisionId',
          ]),
        ],
      };
    }
    case 'case.unmerge': {
      const skipped = mergedRowsText(details.skipped);
      const cleared =
        typeof details.culpritMarksCleared === 'number' ? details.culpritMarksCleared : 0;
      return {
        what: 'undid the merge of the case',
        target: `#${entry.targetId}`,
        details: [
          ['undoes', `entry #${auditValueText(details.undoes)}`],
          ['kept case', `#${auditValueText(details.intoCaseId)}`],
          ['moved back', mergedRowsText(details.movedBack)],
          ...detailIf(skipped !== 'nothing', 'no longer there', skipped),
          ...detailIf(cleared > 0, 'culprit marks cleared', String(cleared)),
          ...remaining(details, [
            'undoes',
            'intoCaseId',
            'boardId',
            'movedBack',
            'skipped',
            'skippedRows',
            'culpritMarksCleared',
            'revisionId',
          ]),
        ],
      };
    }
    case 'case.lock':
    case 'case.unlock':
    case 'case.hide':
    case 'case.restore':
      return {
        what: caseActionVerb[entry.action] ?? entry.action,
        target: `#${entry.targetId}`,
        details: [...author, ...board, ...remaining(details, ['author', 'board'])],
      };
    case 'comment.hide':
    case 'comment.restore':
    case 'comment.edit':
    case 'comment.delete': {
      const text: Array<[string, string]> =
        entry.action === 'comment.edit'
          ? [
              ['before', auditValueText(details.before)],
              ['after', auditValueText(details.after)],
            ]
          : entry.action === 'comment.delete'
            ? [['text', auditValueText(details.body)]]
            : [];
      return {
        what: commentActionVerb[entry.action] ?? entry.action,
        target:
          details.case === undefined
            ? `#${entry.targetId}`
            : `#${entry.targetId} on case #${auditValueText(details.case)}`,
        details: [
          ...author,
          ...text,
          ...remaining(details, ['case', 'author', 'before', 'after', 'body']),
        ],
      };
    }
    case 'flag.resolve':
      return {
        what: 'resolved the report of',
        target:
          typeof details.contentType === 'string' && details.contentId !== undefined
            ? `${details.contentType} #${auditValueText(details.contentId)}`
            : `report #${entry.targetId}`,
        details: [
          ['report', `#${entry.targetId}`],
          ...detailIf(details.flagger !== undefined, 'reported by', someone(details.flagger)),
          ...remaining(details, ['contentType', 'contentId', 'flagger']),
        ],
      };
    default:
      return {
        what: entry.action,
        target: `${entry.targetType} #${entry.targetId}`,
        details: remaining(details, []),
      };
  }
}
