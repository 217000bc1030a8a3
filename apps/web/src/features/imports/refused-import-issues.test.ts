import { describe, expect, it } from 'vitest';
import { refusedImportIssues } from './refused-import-issues';

describe('refusedImportIssues', () => {
  it('reads the errors and warnings of a refused import', () => {
    const issue = { file: 'a.ipc', line: 12, field: 'x', message: "X coordinate '+00A000' is not a signed number" };
    expect(refusedImportIssues({ errors: [issue], warnings: [] })).toEqual({ errors: [issue], warnings: [] });
  });

  it('gives empty lists for details of another shape', () => {
    expect(refusedImportIssues({ issues: [{ field: 'q', message: 'x' }] })).toEqual({ errors: [], warnings: [] });
    expect(refusedImportIssues(undefined)).toEqual({ errors: [], warnings: [] });
    expect(refusedImportIssues({ errors: 'nope' })).toEqual({ errors: [], warnings: [] });
  });
});
