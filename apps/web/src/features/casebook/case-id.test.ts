import { idParamSchema } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import { caseIdOf } from './case-id';

function refuses(param: string | undefined) {
  try {
    caseIdOf(param);
    return false;
  } catch (thrown) {
    return thrown instanceof Response && thrown.status === 404;
  }
}

describe('case ids in the address', () => {
  // packages/shared/src/casebook.ts: idParamSchema is what the API reads ids with
  it.each(['1', '12', '2147483647'])('takes %s, as the API does', (param) => {
    expect(caseIdOf(param)).toBe(idParamSchema.parse(param));
  });

  it.each(['0', '-3', '2147483648', '1.5', '1e3', 'abc', ''])(
    'answers not found for %j',
    (param) => {
      expect(refuses(param)).toBe(true);
    },
  );

  it('answers not found without a parameter', () => {
    expect(refuses(undefined)).toBe(true);
  });
});
