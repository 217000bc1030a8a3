// The demo handset board (seed/boards/ostrand-os-m1-5521) imported under a test's own slug, so a test
// has a whole board with a power tree without depending on the demo data in the database.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import type { AnnotationFile } from '@railyard/shared';
import type { TestApp } from './test-app';

export const demoHandsetDir = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  '../../seed/boards/ostrand-os-m1-5521',
);

/** The board's annotation file: the outside record of which part feeds which rail. */
export function demoHandsetAnnotations(): AnnotationFile {
  return JSON.parse(
    readFileSync(path.join(demoHandsetDir, 'annotations.json'), 'utf8'),
  ) as AnnotationFile;
}

/** Imports the handset's netlist, parts and annotations as an admin, waiting for the import to end. */
export async function importDemoHandset(
  app: TestApp,
  slug: string,
  board?: { title: string; deviceFamily: string },
) {
  const admin = await app.agentAs('admin');
  let request = admin.post(`/api/boards/${slug}/imports?wait=true`);
  if (board) request = request.field('board', JSON.stringify(board));
  const res = await request
    .attach('netlist', path.join(demoHandsetDir, 'netlist.ipc'))
    .attach('parts', path.join(demoHandsetDir, 'parts.csv'))
    .attach('annotations', path.join(demoHandsetDir, 'annotations.json'));
  expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(201);
  return admin;
}
