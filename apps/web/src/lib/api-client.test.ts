// The error bodies below have the shapes the API sends (apps/api/src/middleware/error-handler.ts:
// `details.issues` from a zod refusal; board-edits.service.ts: `details.field` on an unknown net).
import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';

describe('field errors of a refused request', () => {
  it('puts a refusal that names its field on that field, with the message', () => {
    const error = new ApiError(404, 'not_found', 'Net "VCC_9V9" on board "b" was not found', {
      field: 'to',
    });
    expect(error.fieldErrors).toEqual({ to: 'Net "VCC_9V9" on board "b" was not found' });
  });

  it('puts each validation issue on its field, the first message per field', () => {
    const error = new ApiError(400, 'invalid_request', 'The request is not valid', {
      issues: [
        { field: 'reason', message: 'say why, in a few words' },
        { field: 'reason', message: 'a second complaint' },
        { field: null, message: 'change the role or the ban' },
        { field: 'kind', message: 'Invalid option' },
      ],
    });
    expect(error.fieldErrors).toEqual({
      reason: 'say why, in a few words',
      kind: 'Invalid option',
    });
  });

  it('has no field errors when the refusal names no field', () => {
    expect(new ApiError(409, 'conflict', 'already a power link').fieldErrors).toEqual({});
  });
});
