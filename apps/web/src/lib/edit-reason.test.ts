import { userUpdateSchema } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { reasonProblem } from './edit-reason';

describe('edit reasons', () => {
  // The contract's rule (packages/shared/src/auth.ts, userUpdateSchema.reason): trimmed, 3 to 500
  // characters. The client must refuse exactly what the API would refuse.
  const samples = ['', '   ', 'ok', '  ok  ', 'yes', ' a b ', 'x'.repeat(500), 'x'.repeat(501)];

  it.each(samples.map((text) => [JSON.stringify(text).slice(0, 20), text]))(
    'agrees with the API contract about the reason %s',
    (_label, text) => {
      const accepted = userUpdateSchema.safeParse({ role: 'member', reason: text }).success;
      expect(reasonProblem(text) === undefined).toBe(accepted);
    },
  );

  it('asks for a few words when the reason is blank', () => {
    expect(reasonProblem('  ')).toMatch(/say why/i);
  });
});
