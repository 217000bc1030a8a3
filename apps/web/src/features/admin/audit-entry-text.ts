// One audit row in words: what was done, to what, and the details worth reading. The actions and
// their details are the ones the API writes (apps/api: users.repository.ts, board-edits.repository.ts);
// an action this client does not know yet is still shown, with its details as they came.
import type { AuditEntry } from '@railyard/shared';

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
  const board: Array<[string, string]> =
    details.board === undefined ? [] : [['board', `#${auditValueText(details.board)}`]];
  const person = () => loginOf(entry.targetId) ?? `user #${entry.targetId}`;

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
    default:
      return {
        what: entry.action,
        target: `${entry.targetType} #${entry.targetId}`,
        details: remaining(details, []),
      };
  }
}
