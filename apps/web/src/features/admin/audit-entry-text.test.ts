// The rows below have the shapes the API writes (apps/api/src/modules/auth/users.repository.ts and
// board-edits/board-edits.repository.ts), so a change there that this client does not follow fails here.
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
