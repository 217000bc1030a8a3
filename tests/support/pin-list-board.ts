// A board of a test's own from a pin-list CSV (and an annotation file), imported and waited for.
import type request from 'supertest';
import { expect } from 'vitest';

/** Imports `csv` under `slug` with an admin's agent and expects the import to succeed (201). */
export async function importPinList(
  admin: request.Agent,
  slug: string,
  csv: string,
  options: { annotations?: string; board?: Record<string, unknown> } = {},
) {
  let upload = admin.post(`/api/boards/${slug}/imports?wait=true`).field('format', 'csv');
  if (options.board) upload = upload.field('board', JSON.stringify(options.board));
  upload = upload.attach('netlist', Buffer.from(csv), 'pins.csv');
  if (options.annotations !== undefined) {
    upload = upload.attach('annotations', Buffer.from(options.annotations), 'annotations.json');
  }
  const res = await upload;
  expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(201);
  return res;
}
