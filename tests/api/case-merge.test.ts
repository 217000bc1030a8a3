// A moderator folds a duplicate case into the case it repeats, and an admin can take the merge back
// through its audit row. Every row is counted before and after: a merge moves rows, it deletes none.
import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AuditEntry, CaseDetail } from '@railyard/shared';
import { createTestApp, type TestApp } from '../support/test-app';
import { casebookBoard, writeCase } from './casebook-fixtures';
import { samplePdf } from '../support/sample-files';

type Agent = Awaited<ReturnType<TestApp['agentAs']>>;

let t: TestApp;
/** one board, moderator and admin for the file: each moderator and admin gets every flagged-content mail */
let sharedSlug: string;
let moderator: Agent;
let admin: Agent;
let staticDir: string;
let attachmentsDir: string;
const appShell = '<!doctype html><title>Railyard test shell</title>';

beforeAll(async () => {
  // the page redirect sits in front of the app shell, which is served only with STATIC_DIR
  staticDir = await mkdtemp(path.join(tmpdir(), 'railyard-merge-web-'));
  await writeFile(path.join(staticDir, 'index.html'), appShell);
  attachmentsDir = await mkdtemp(path.join(tmpdir(), 'railyard-merge-files-'));
  t = await createTestApp({ STATIC_DIR: staticDir, ATTACHMENTS_DIR: attachmentsDir });
  sharedSlug = await board('merge');
  moderator = await t.agentAs('moderator');
  admin = await t.agentAs('admin');
});
afterAll(async () => {
  // the outbox worker of a later test file sends every pending row: leave it none of this file's
  await t.pool.query(
    `DELETE FROM notification_outbox WHERE (payload->>'caseId')::int IN
       (SELECT c.id FROM cases c JOIN boards b ON b.id = c.board_id WHERE b.slug = ANY($1))`,
    [boardSlugs],
  );
  await t.close();
  await rm(staticDir, { recursive: true, force: true });
  await rm(attachmentsDir, { recursive: true, force: true });
});

const boardSlugs: string[] = [];

async function board(prefix: string): Promise<string> {
  const slug = await casebookBoard(t, prefix);
  boardSlugs.push(slug);
  return slug;
}


async function attach(agent: Agent, caseId: number, name: string) {
  const res = await agent.post(`/api/cases/${caseId}/attachments`).attach('files', samplePdf(), name);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
}

const ok = async (req: PromiseLike<Response>, status = 200): Promise<Response> => {
  const res = await req;
  expect(res.status, JSON.stringify(res.body)).toBe(status);
  return res;
};

/**
 * Two cases of one board about the same short. The kept case B links VSYS, C1 and U1 and has one
 * reading; the duplicate A links VSYS and VCC_1V8, names C1 the culprit, links U2 and has two readings.
 * Voters: X voted on both (down on A, up on B) and confirmed both; Y voted up on A and confirmed it;
 * Z voted up on A only; B's author voted up on A and confirmed it. Y and B's author commented on A, X on
 * B. A's author attached two files to A, B's author one to B.
 */
async function duplicatePair(slug = sharedSlug) {
  const authorA = await t.agentAs('member');
  const authorB = await t.agentAs('member');
  const [x, y, z] = [await t.agentAs('member'), await t.agentAs('member'), await t.agentAs('member')];

  const kept = await writeCase(authorB, slug, {
    title: 'VSYS shorted to ground, C1 suspected',
    readings: [{ net: 'VSYS', mode: 'diode_v', measured: 0.003, knownGood: 0.38 }],
    nets: ['VSYS'],
    components: [
      { refdes: 'C1', culprit: false },
      { refdes: 'U1', culprit: false },
    ],
  });
  const duplicate = await writeCase(authorA, slug, {
    title: 'Board dead, VSYS near zero ohms',
    symptom: 'No current draw change when the power button is pressed',
    readings: [
      { net: 'VSYS', mode: 'resistance_ohm', measured: 0.8, knownGood: 420 },
      { net: 'VCC_1V8', mode: 'diode_v', measured: 0.41, knownGood: 0.41 },
    ],
    nets: ['VSYS', 'VCC_1V8'],
    components: [
      { refdes: 'C1', culprit: true },
      { refdes: 'U2', culprit: false },
    ],
  });
  const A = duplicate.id;
  const B = kept.id;

  await ok(x.put(`/api/cases/${A}/vote`).send({ value: -1 }));
  await ok(x.put(`/api/cases/${B}/vote`).send({ value: 1 }));
  await ok(x.post(`/api/cases/${A}/confirmation`).send({ note: 'same board, other fault' }), 201);
  await ok(x.post(`/api/cases/${B}/confirmation`).send({ note: 'C1 again' }), 201);
  await ok(y.put(`/api/cases/${A}/vote`).send({ value: 1 }));
  await ok(y.post(`/api/cases/${A}/confirmation`).send({ note: '' }), 201);
  await ok(z.put(`/api/cases/${A}/vote`).send({ value: 1 }));
  await ok(authorB.put(`/api/cases/${A}/vote`).send({ value: 1 }));
  await ok(authorB.post(`/api/cases/${A}/confirmation`).send({ note: 'mine says the same' }), 201);
  await ok(y.post(`/api/cases/${A}/comments`).send({ body: 'Check C2 too.' }), 201);
  await ok(authorB.post(`/api/cases/${A}/comments`).send({ body: 'This repeats my case.' }), 201);
  await ok(x.post(`/api/cases/${B}/comments`).send({ body: 'Worked for me.' }), 201);
  await attach(authorA, A, 'vsys thermal.pdf');
  await attach(authorA, A, 'vsys scope.pdf');
  await attach(authorB, B, 'c1 photo.pdf');

  return { slug, A, B, authorA, authorB, x, y, z, moderator, duplicate, kept };
}

const caseTables = [
  'case_readings',
  'case_nets',
  'case_components',
  'case_revisions',
  'case_votes',
  'case_confirmations',
  'case_comments',
  'case_attachments',
] as const;
type CaseTable = (typeof caseTables)[number];

/** Every row of every table a merge touches, in the whole database. */
async function totalRows(): Promise<Record<string, number>> {
  const tables = ['cases', ...caseTables, 'audit_log', 'notification_outbox'];
  const { rows } = await t.pool.query<Record<string, number>>(
    `SELECT ${tables.map((name) => `(SELECT count(*) FROM ${name})::int AS ${name}`).join(', ')}`,
  );
  return rows[0]!;
}

async function rowsOf(caseId: number): Promise<Record<CaseTable, number>> {
  const { rows } = await t.pool.query<Record<CaseTable, number>>(
    `SELECT ${caseTables.map((name) => `(SELECT count(*) FROM ${name} WHERE case_id = $1)::int AS ${name}`).join(', ')}`,
    [caseId],
  );
  return rows[0]!;
}

/** The ids (and, for readings and parts, what an undo must restore) of one case's rows. */
/** The files under the attachments folder (its shard folders may stay behind, empty). */
async function storedFiles(): Promise<string[]> {
  const entries = await readdir(attachmentsDir, { recursive: true, withFileTypes: true });
  return entries
    .filter((entry) => entry.isFile())
    .map((entry) => path.join(entry.parentPath, entry.name))
    .sort();
}

async function idsOf(caseId: number) {
  const ids = async (table: string) =>
    (await t.pool.query<{ id: number }>(`SELECT id FROM ${table} WHERE case_id = $1 ORDER BY id`, [caseId])).rows.map((r) => r.id);
  const readings = await t.pool.query('SELECT id, position FROM case_readings WHERE case_id = $1 ORDER BY id', [caseId]);
  const components = await t.pool.query('SELECT id, culprit FROM case_components WHERE case_id = $1 ORDER BY id', [caseId]);
  const own = await t.pool.query('SELECT search_text, merged_into_id FROM cases WHERE id = $1', [caseId]);
  return {
    readings: readings.rows,
    nets: await ids('case_nets'),
    components: components.rows,
    votes: await ids('case_votes'),
    confirmations: await ids('case_confirmations'),
    comments: await ids('case_comments'),
    attachments: await ids('case_attachments'),
    revisions: await ids('case_revisions'),
    ...own.rows[0],
  };
}

async function voteOf(userId: number, caseId: number) {
  const { rows } = await t.pool.query('SELECT value FROM case_votes WHERE user_id = $1 AND case_id = $2', [userId, caseId]);
  return rows.map((r) => r.value);
}

async function merge(moderator: Agent, from: number, into: number, reason = 'same short, written up twice') {
  return moderator.post(`/api/cases/${from}/merge`).send({ intoCaseId: into, reason });
}

async function auditEntry(admin: Agent, id: number): Promise<AuditEntry> {
  const res = await ok(admin.get(`/api/admin/audit?limit=1&before=${id + 1}`));
  const entry = (res.body as { entries: AuditEntry[] }).entries[0]!;
  expect(entry.id).toBe(id);
  return entry;
}

describe('merging a duplicate case', () => {
  it('moves rows from the duplicate to the kept case without losing or adding any but the revision, audit row and mail', async () => {
    const s = await duplicatePair();
    const before = await totalRows();

    const res = await ok(merge(s.moderator, s.A, s.B));

    const after = await totalRows();
    expect(after).toEqual({
      ...before,
      case_revisions: before.case_revisions! + 1,
      audit_log: before.audit_log! + 1,
      notification_outbox: before.notification_outbox! + 1,
    });
    // per case: B gains what A had and B lacked; A keeps the links B has and the second votes
    expect(await rowsOf(s.B)).toEqual({
      case_readings: 3,
      case_nets: 2,
      case_components: 3,
      case_revisions: 2,
      case_votes: 3,
      case_confirmations: 2,
      case_comments: 3,
      case_attachments: 3,
    });
    expect(await rowsOf(s.A)).toEqual({
      case_readings: 0,
      case_nets: 1,
      case_components: 1,
      case_revisions: 1,
      case_votes: 2,
      case_confirmations: 2,
      case_comments: 0,
      case_attachments: 0,
    });
    expect(res.body.merge).toEqual({
      auditId: expect.any(Number),
      fromCaseId: s.A,
      intoCaseId: s.B,
      moved: { nets: 1, components: 1, readings: 2, attachments: 2, comments: 2, confirmations: 1, votes: 2 },
      keptOnDuplicate: { nets: 1, components: 1, readings: 0, attachments: 0, comments: 0, confirmations: 2, votes: 2 },
    });
    // X voted on both: B's up-vote is the one on B, the down-vote stays behind on A
    expect(await voteOf(s.x.user.id, s.B)).toEqual([1]);
    expect(await voteOf(s.x.user.id, s.A)).toEqual([-1]);
    // B's author cannot vote on B: their vote on A stays on A
    expect(await voteOf(s.authorB.user.id, s.A)).toEqual([1]);
    expect(await voteOf(s.authorB.user.id, s.B)).toEqual([]);
    expect(await voteOf(s.z.user.id, s.B)).toEqual([1]);
  });

  it('appends the readings after the kept case’s own, marks the culprit and answers the kept case', async () => {
    const s = await duplicatePair();

    const res = await ok(merge(s.moderator, s.A, s.B));

    const kept = res.body.case as CaseDetail;
    expect(kept.id).toBe(s.B);
    expect(kept.readings).toEqual([
      { position: 0, net: 'VSYS', mode: 'diode_v', measured: 0.003, knownGood: 0.38 },
      { position: 1, net: 'VSYS', mode: 'resistance_ohm', measured: 0.8, knownGood: 420 },
      { position: 2, net: 'VCC_1V8', mode: 'diode_v', measured: 0.41, knownGood: 0.41 },
    ]);
    expect(kept.nets).toEqual(['VCC_1V8', 'VSYS']);
    expect(kept.components).toEqual([
      { refdes: 'C1', culprit: true },
      { refdes: 'U1', culprit: false },
      { refdes: 'U2', culprit: false },
    ]);
    expect(kept.mergedFrom).toEqual([{ id: s.A, title: 'Board dead, VSYS near zero ohms' }]);
    // people counted once each: X, Y, Z up (or confirmed), nobody against — FACTS.md §6, 3 up / 0 down [calc]
    expect(kept.score).toMatchObject({ ups: 3, downs: 0, confirmations: 2 });
    expect(kept.score.wilsonLowerBound).toBeCloseTo(0.438503, 6);
    expect(kept.commentCount).toBe(3);
  });

  it('keeps the duplicate’s text in a revision of the kept case, written by the moderator', async () => {
    const s = await duplicatePair();

    await ok(merge(s.moderator, s.A, s.B));

    const revisions = (await ok(t.agent().get(`/api/cases/${s.B}/revisions`))).body.revisions;
    const latest = revisions[0];
    expect(latest.editor.id).toBe(s.moderator.user.id);
    expect(latest.summary).toBe(`merged case #${s.A} “Board dead, VSYS near zero ohms” into this case`);
    expect(latest.changed).toEqual(['readings', 'nets', 'components']);
    expect(latest.snapshot.readings).toHaveLength(3);
    expect(latest.snapshot.merged).toEqual({
      caseId: s.A,
      snapshot: expect.objectContaining({
        title: 'Board dead, VSYS near zero ohms',
        symptom: 'No current draw change when the power button is pressed',
        nets: ['VCC_1V8', 'VSYS'],
        components: [
          { refdes: 'C1', culprit: true },
          { refdes: 'U2', culprit: false },
        ],
      }),
    });
  });

  it('makes the kept case findable by the duplicate’s nets and parts and leaves the duplicate out of lists', async () => {
    const s = await duplicatePair(await board('merge-search'));
    const ids = async (query: string) =>
      (await ok(t.agent().get(`/api/boards/${s.slug}/cases?${query}`))).body.cases.map((c: { id: number }) => c.id);
    expect(await ids('q=U2')).toEqual([s.A]);

    await ok(merge(s.moderator, s.A, s.B));

    expect(await ids('q=U2')).toEqual([s.B]);
    expect(await ids('component=U2')).toEqual([s.B]);
    expect(await ids('net=VCC_1V8')).toEqual([s.B]);
    expect(await ids('pageSize=50')).toEqual([s.B]);
    const similar = await ok(t.agent().get(`/api/boards/${s.slug}/cases/similar?nets=VSYS`));
    expect(similar.body.cases.map((c: { id: number }) => c.id)).toEqual([s.B]);
  });

  it('queues case_merged for the duplicate’s author, and nothing when the moderator merges their own case', async () => {
    const s = await duplicatePair();

    await ok(merge(s.moderator, s.A, s.B, 'two write-ups of one short'));

    const { rows } = await t.pool.query(
      `SELECT kind, payload FROM notification_outbox WHERE user_id = $1 AND kind = 'case_merged' ORDER BY id`,
      [s.authorA.user.id],
    );
    expect(rows).toEqual([
      {
        kind: 'case_merged',
        payload: {
          caseId: s.A,
          caseTitle: 'Board dead, VSYS near zero ohms',
          intoCaseId: s.B,
          intoCaseTitle: 'VSYS shorted to ground, C1 suspected',
          mergedByName: 'Test moderator',
          reason: 'two write-ups of one short',
        },
      },
    ]);

    const own = await writeCase(s.moderator, s.slug, { title: 'Moderator’s own duplicate of the VSYS short' });
    await ok(merge(s.moderator, own.id, s.B));
    const mine = await t.pool.query(`SELECT id FROM notification_outbox WHERE user_id = $1 AND kind = 'case_merged'`, [s.moderator.user.id]);
    expect(mine.rows).toEqual([]);
  });

  it('records the merge in the audit log with every moved row, undoable', async () => {
    const s = await duplicatePair();
    const beforeIds = await idsOf(s.A);

    const res = await ok(merge(s.moderator, s.A, s.B));

    const entry = await auditEntry(admin, res.body.merge.auditId);
    expect(entry).toMatchObject({
      actor: { id: s.moderator.user.id },
      action: 'case.merge',
      targetType: 'case',
      targetId: String(s.A),
      reason: 'same short, written up twice',
      undo: { possible: true, undoneByEntryId: null },
    });
    const details = entry.details as {
      intoCaseId: number;
      boardId: number;
      moved: { readings: { id: number; position: number }[]; attachments: number[]; comments: number[] };
      culpritMarked: number[];
    };
    expect(details.intoCaseId).toBe(s.B);
    expect(details.boardId).toEqual(expect.any(Number));
    expect(details.moved.readings).toEqual(beforeIds.readings.map((r: { id: number; position: number }) => ({ id: r.id, position: r.position })));
    expect(details.moved.attachments).toEqual(beforeIds.attachments);
    expect(details.moved.comments).toEqual(beforeIds.comments);
    expect(details.culpritMarked).toHaveLength(1);
  });
});

describe('reading a merged case', () => {
  it('redirects the duplicate’s API address to the kept case, which lists what was merged into it', async () => {
    const s = await duplicatePair();
    await ok(merge(s.moderator, s.A, s.B));

    const res = await t.agent().get(`/api/cases/${s.A}`).redirects(0);
    expect(res.status).toBe(301);
    expect(res.headers.location).toBe(`/api/cases/${s.B}`);
    expect(res.body).toEqual({ mergedInto: { id: s.B } });

    // fetch follows it, as the web client does
    const followed = await fetch(`${t.baseUrl}/api/cases/${s.A}`);
    expect(followed.redirected).toBe(true);
    expect(new URL(followed.url).pathname).toBe(`/api/cases/${s.B}`);
    const body = (await followed.json()) as { case: CaseDetail };
    expect(body.case.id).toBe(s.B);
    expect(body.case.mergedFrom).toEqual([{ id: s.A, title: 'Board dead, VSYS near zero ohms' }]);
  });

  it('redirects the duplicate’s web pages to the kept case’s, and serves other case pages as before', async () => {
    const s = await duplicatePair();
    await ok(merge(s.moderator, s.A, s.B));

    const page = await t.agent().get(`/cases/${s.A}`).redirects(0);
    expect(page.status).toBe(301);
    expect(page.headers.location).toBe(`/cases/${s.B}?mergedFrom=${s.A}`);
    const history = await t.agent().get(`/cases/${s.A}/history?from=mail`).redirects(0);
    expect(history.status).toBe(301);
    expect(history.headers.location).toBe(`/cases/${s.B}/history?from=mail&mergedFrom=${s.A}`);

    for (const url of [`/cases/${s.B}`, `/cases/${s.B}/history`, '/cases/2147483000', '/cases/not-a-number']) {
      const shell = await t.agent().get(url).redirects(0);
      expect(shell.status, url).toBe(200);
      expect(shell.text, url).toBe(appShell);
    }
  });

  it('follows a chain of merges to the case where it ends', async () => {
    const s = await duplicatePair();
    const third = await writeCase(s.authorB, s.slug, { title: 'VSYS short, the write-up everyone links to' });
    await ok(merge(s.moderator, s.A, s.B));
    await ok(merge(s.moderator, s.B, third.id));

    const page = await t.agent().get(`/cases/${s.A}`).redirects(0);

    expect(page.status).toBe(301);
    expect(page.headers.location).toBe(`/cases/${third.id}?mergedFrom=${s.A}`);
  });

  it('does not redirect a hidden duplicate’s page, so its existence is not given away', async () => {
    const s = await duplicatePair();
    await ok(s.moderator.post(`/api/cases/${s.A}/hide`).send({ reason: 'advertises a repair service' }));
    await ok(merge(s.moderator, s.A, s.B));

    const page = await t.agent().get(`/cases/${s.A}`).redirects(0);
    expect(page.status).toBe(200);
    expect(page.text).toBe(appShell);
    expect((await t.agent().get(`/api/cases/${s.A}`).redirects(0)).status).toBe(404);
  });
});

describe('who may merge and undo', () => {
  it('lets moderators merge, refusing anonymous callers with 401 and members, the duplicate’s author included, with 403', async () => {
    const s = await duplicatePair();
    const body = { intoCaseId: s.B, reason: 'same short' };

    expect((await t.agent().post(`/api/cases/${s.A}/merge`).send(body)).status).toBe(401);
    expect((await s.y.post(`/api/cases/${s.A}/merge`).send(body)).status).toBe(403);
    expect((await s.authorA.post(`/api/cases/${s.A}/merge`).send(body)).status).toBe(403);
    expect((await s.moderator.post(`/api/cases/${s.A}/merge`).send(body)).status).toBe(200);
  });

  it('lets only admins undo a merge: 401 anonymous, 403 members and moderators', async () => {
    const s = await duplicatePair();
    const auditId = (await ok(merge(s.moderator, s.A, s.B))).body.merge.auditId;
    const url = `/api/admin/audit/${auditId}/undo`;
    const body = { reason: 'not a duplicate after all' };

    expect((await t.agent().post(url).send(body)).status).toBe(401);
    expect((await s.y.post(url).send(body)).status).toBe(403);
    expect((await s.moderator.post(url).send(body)).status).toBe(403);
    expect((await admin.post(url).send(body)).status).toBe(200);
  });
});

describe('refused merges', () => {
  it('refuses merging a case into itself, naming the field', async () => {
    const s = await duplicatePair();
    const res = await merge(s.moderator, s.A, s.A);
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues).toEqual([{ field: 'intoCaseId', message: `case ${s.A} cannot be merged into itself` }]);
  });

  it('answers 400 naming the field for a merge or an undo sent without a reason or a case number, and changes nothing', async () => {
    const s = await duplicatePair();
    const before = await totalRows();
    const url = `/api/cases/${s.A}/merge`;
    const fieldsOf = (res: Response) => (res.body.error.details.issues as { field: string }[]).map((i) => i.field);

    const noReason = await s.moderator.post(url).send({ intoCaseId: s.B });
    expect(noReason.status).toBe(400);
    expect(fieldsOf(noReason)).toEqual(['reason']);
    const textNumber = await s.moderator.post(url).send({ intoCaseId: String(s.B), reason: 'same fault twice' });
    expect(textNumber.status).toBe(400);
    expect(fieldsOf(textNumber)).toEqual(['intoCaseId']);
    const stray = await s.moderator.post(url).send({ intoCaseId: s.B, reason: 'same fault twice', keepVotes: true });
    expect(stray.status).toBe(400);
    const mergeId = (await ok(merge(s.moderator, s.A, s.B))).body.merge.auditId as number;
    const afterMerge = await totalRows();
    const undoNoReason = await admin.post(`/api/admin/audit/${mergeId}/undo`).send({});
    expect(undoNoReason.status).toBe(400);
    expect(fieldsOf(undoNoReason)).toEqual(['reason']);
    expect((await admin.post('/api/admin/audit/not-a-number/undo').send({ reason: 'wrong merge' })).status).toBe(400);

    // only the accepted merge wrote anything, and the refused undo nothing
    expect(afterMerge.case_revisions).toBe(before.case_revisions! + 1);
    expect(await totalRows()).toEqual(afterMerge);
  });

  it('answers 404 for an unknown case on either side', async () => {
    const s = await duplicatePair();
    const unknownInto = await merge(s.moderator, s.A, 2147483000);
    expect(unknownInto.status).toBe(404);
    expect(unknownInto.body.error).toMatchObject({ message: 'Case 2147483000 was not found', details: { field: 'intoCaseId' } });
    expect((await merge(s.moderator, 2147483000, s.B)).status).toBe(404);
  });

  it('refuses cases of two boards, naming both boards', async () => {
    const s = await duplicatePair();
    const otherSlug = await board('merge-other');
    const other = await writeCase(s.authorB, otherSlug);

    const res = await merge(s.moderator, s.A, other.id);

    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('different_boards');
    expect(res.body.error.message).toContain(`"${s.slug}"`);
    expect(res.body.error.message).toContain(`"${otherSlug}"`);
  });

  it('refuses a draft as the kept case', async () => {
    const s = await duplicatePair();
    const draft = await writeCase(s.authorB, s.slug, { status: 'draft' });

    const res = await merge(s.moderator, s.A, draft.id);

    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe(`Case ${draft.id} is a draft: only published cases can be merged`);
  });

  it('refuses merging a case that was merged already, or into one that was', async () => {
    const s = await duplicatePair();
    const third = await writeCase(s.authorB, s.slug, { title: 'Third write-up of the VSYS short' });
    await ok(merge(s.moderator, s.A, s.B));

    const again = await merge(s.moderator, s.A, third.id);
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: 'case_merged', message: `Case ${s.A} was already merged into case ${s.B}` });
    const intoMerged = await merge(s.moderator, third.id, s.A);
    expect(intoMerged.status).toBe(409);
    expect(intoMerged.body.error.message).toBe(`Case ${s.A} was itself merged into case ${s.B}: merge into that case instead`);
  });

  it('changes nothing when it refuses', async () => {
    const s = await duplicatePair();
    const draft = await writeCase(s.authorB, s.slug, { status: 'draft' });
    const before = await totalRows();
    const rowsBefore = await idsOf(s.A);

    expect((await merge(s.moderator, s.A, draft.id)).status).toBe(409);

    expect(await totalRows()).toEqual(before);
    expect(await idsOf(s.A)).toEqual(rowsBefore);
  });

  it('refuses every write on the merged case with 409 case_merged, naming the kept case', async () => {
    const s = await duplicatePair();
    await ok(merge(s.moderator, s.A, s.B));
    const message = `Case ${s.A} was merged into case ${s.B}: make changes there`;
    const member = await t.agentAs('member');
    const reason = { reason: 'checking the merge' };

    const writes = {
      edit: await s.authorA.patch(`/api/cases/${s.A}`).send({ title: 'A new title for the old case' }),
      vote: await member.put(`/api/cases/${s.A}/vote`).send({ value: 1 }),
      unvote: await s.x.delete(`/api/cases/${s.A}/vote`),
      confirm: await member.post(`/api/cases/${s.A}/confirmation`).send({ note: '' }),
      comment: await member.post(`/api/cases/${s.A}/comments`).send({ body: 'Late comment' }),
      lock: await s.moderator.post(`/api/cases/${s.A}/lock`).send(reason),
      hide: await s.moderator.post(`/api/cases/${s.A}/hide`).send(reason),
      flag: await member.post(`/api/cases/${s.A}/flag`).send(reason),
      attach: await s.authorA.post(`/api/cases/${s.A}/attachments`).attach('files', samplePdf(), 'late.pdf'),
      merge: await merge(s.moderator, s.A, s.B),
    };

    for (const [what, res] of Object.entries(writes)) {
      expect(res.status, what).toBe(409);
      expect(res.body.error.code, what).toBe('case_merged');
      expect(res.body.error.message, what).toContain(`case ${s.B}`);
    }
    expect(writes.edit.body.error.message).toBe(message);
    expect(writes.attach.body.error.message).toBe(`Case ${s.A} was merged into case ${s.B}: attach files there`);
  });

  it('makes a vote, comment or attachment sent while the merge runs wait for it, then refuses it', async () => {
    const s = await duplicatePair();
    const member = await t.agentAs('member');
    const before = await idsOf(s.A);
    const filesBefore = await storedFiles();
    // Stands in for a merge in progress: holds the duplicate's row as the merge does (FOR UPDATE) and
    // marks it merged, so the writes pass the service's first check and meet the lock.
    const merging = await t.pool.connect();
    try {
      await merging.query('BEGIN');
      await merging.query('SELECT 1 FROM cases WHERE id = $1 FOR UPDATE', [s.A]);
      await merging.query('UPDATE cases SET merged_into_id = $2 WHERE id = $1', [s.A, s.B]);
      const vote = member.put(`/api/cases/${s.A}/vote`).send({ value: 1 }).then((r) => r);
      const comment = member.post(`/api/cases/${s.A}/comments`).send({ body: 'Sent as it merged' }).then((r) => r);
      const upload = s.authorA
        .post(`/api/cases/${s.A}/attachments`)
        .attach('files', samplePdf(), 'sent as it merged.pdf')
        .then((r) => r);
      // all three are waiting on the row lock
      await expect
        .poll(async () => {
          const { rows } = await t.pool.query<{ waiting: number }>(
            'SELECT count(DISTINCT pid)::int AS waiting FROM pg_locks WHERE NOT granted',
          );
          return rows[0]!.waiting;
        })
        .toBeGreaterThanOrEqual(3);
      await merging.query('COMMIT');

      for (const res of [await vote, await comment, await upload]) {
        expect(res.status, JSON.stringify(res.body)).toBe(409);
        expect(res.body.error.code).toBe('case_merged');
      }
      expect((await upload).body.error.message).toBe(`Case ${s.A} was merged into case ${s.B}: attach files there`);
    } finally {
      merging.release();
    }
    const after = await idsOf(s.A);
    expect(after.votes).toEqual(before.votes);
    expect(after.comments).toEqual(before.comments);
    expect(after.attachments).toEqual(before.attachments);
    // the refused upload's stored files are removed again
    expect(await storedFiles()).toEqual(filesBefore);
  });
});

describe('undoing a merge', () => {
  it('puts every row back where it was, restores the counts and refuses a second undo', async () => {
    const s = await duplicatePair();
    const idsA = await idsOf(s.A);
    const idsB = await idsOf(s.B);
    const scoreA = (await ok(t.agent().get(`/api/cases/${s.A}`))).body.case.score;
    const scoreB = (await ok(t.agent().get(`/api/cases/${s.B}`))).body.case.score;
    // FACTS.md §6, 1 up / 0 down [calc]: X alone is counted on B
    expect(scoreB.wilsonLowerBound).toBeCloseTo(0.206549, 6);
    const mergeId = (await ok(merge(s.moderator, s.A, s.B))).body.merge.auditId;
    const totalsMerged = await totalRows();

    const res = await ok(admin.post(`/api/admin/audit/${mergeId}/undo`).send({ reason: 'different faults after all' }));

    expect(await idsOf(s.A)).toEqual(idsA);
    const afterB = await idsOf(s.B);
    // B keeps the revisions of the merge and of its undo
    expect({ ...afterB, revisions: afterB.revisions.slice(0, -2) }).toEqual(idsB);
    expect((await totalRows()).case_revisions).toBe(totalsMerged.case_revisions! + 1);

    expect(res.body.fromCase.id).toBe(s.A);
    expect(res.body.fromCase.score).toEqual(scoreA);
    expect(res.body.intoCase.score).toEqual(scoreB);
    expect(res.body.intoCase.mergedFrom).toEqual([]);
    expect(res.body.intoCase.components).toEqual([
      { refdes: 'C1', culprit: false },
      { refdes: 'U1', culprit: false },
    ]);
    expect(res.body.entry).toMatchObject({
      action: 'case.unmerge',
      targetId: String(s.A),
      reason: 'different faults after all',
      actor: { id: admin.user.id },
      details: {
        undoes: mergeId,
        intoCaseId: s.B,
        movedBack: { nets: 1, components: 1, readings: 2, attachments: 2, comments: 2, confirmations: 1, votes: 2 },
        skipped: { nets: 0, components: 0, readings: 0, attachments: 0, comments: 0, confirmations: 0, votes: 0 },
        culpritMarksCleared: 1,
      },
    });
    const read = await t.agent().get(`/api/cases/${s.A}`).redirects(0);
    expect(read.status).toBe(200);
    expect(read.body.case.readings.map((r: { position: number }) => r.position)).toEqual([0, 1]);
    const page = await t.agent().get(`/cases/${s.A}`).redirects(0);
    expect(page.status).toBe(200);
    const revisions = (await ok(t.agent().get(`/api/cases/${s.B}/revisions`))).body.revisions;
    expect(revisions[0].summary).toBe(`undid the merge of case #${s.A} “Board dead, VSYS near zero ohms” into this case`);

    expect(await auditEntry(admin, mergeId)).toMatchObject({ undo: { possible: false, undoneByEntryId: res.body.entry.id } });
    const again = await admin.post(`/api/admin/audit/${mergeId}/undo`).send({ reason: 'once more' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('already_undone');
  });

  it('skips and reports rows the kept case’s author replaced since the merge', async () => {
    const s = await duplicatePair();
    const mergeId = (await ok(merge(s.moderator, s.A, s.B))).body.merge.auditId;
    // an edit of the links writes every link and reading row of B anew: the moved ones are gone
    await ok(s.authorB.patch(`/api/cases/${s.B}`).send({ nets: ['VSYS', 'VCC_1V8', 'I2C_SDA'] }));

    const res = await ok(admin.post(`/api/admin/audit/${mergeId}/undo`).send({ reason: 'different faults after all' }));

    expect(res.body.entry.details).toMatchObject({
      movedBack: { nets: 0, components: 0, readings: 0, attachments: 2, comments: 2, confirmations: 1, votes: 2 },
      skipped: { nets: 1, components: 1, readings: 2, attachments: 0, comments: 0, confirmations: 0, votes: 0 },
      culpritMarksCleared: 0,
    });
    expect(res.body.entry.details.skippedRows.readings).toHaveLength(2);
    expect(res.body.fromCase.readings).toEqual([]);
    expect(await rowsOf(s.A)).toMatchObject({ case_nets: 1, case_components: 1, case_comments: 2, case_attachments: 2 });
  });

  it('refuses while the kept case is merged on into another, and undoes once that merge is undone', async () => {
    const s = await duplicatePair();
    const third = await writeCase(s.authorB, s.slug, { title: 'VSYS short, the write-up everyone links to' });
    const first = (await ok(merge(s.moderator, s.A, s.B))).body.merge.auditId;
    const second = (await ok(merge(s.moderator, s.B, third.id))).body.merge.auditId;
    expect((await auditEntry(admin, first)).undo).toEqual({ possible: false, undoneByEntryId: null });

    const refused = await admin.post(`/api/admin/audit/${first}/undo`).send({ reason: 'wrong merge' });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toBe(`Case ${s.B} has since been merged into case ${third.id}: undo that merge first`);

    await ok(admin.post(`/api/admin/audit/${second}/undo`).send({ reason: 'wrong merge' }));
    await ok(admin.post(`/api/admin/audit/${first}/undo`).send({ reason: 'wrong merge' }));
    expect((await ok(t.agent().get(`/api/cases/${s.A}`))).body.case.id).toBe(s.A);
  });

  it('answers 404 for an unknown audit entry and 400 for an entry that is not a merge', async () => {
    const s = await duplicatePair();
    await ok(s.moderator.post(`/api/cases/${s.A}/lock`).send({ reason: 'heated thread' }));
    const lockEntry = await t.pool.query<{ id: number }>(
      `SELECT id FROM audit_log WHERE action = 'case.lock' AND target_id = $1`,
      [String(s.A)],
    );

    expect((await admin.post('/api/admin/audit/2147483000/undo').send({ reason: 'no such entry' })).status).toBe(404);
    const notMerge = await admin.post(`/api/admin/audit/${lockEntry.rows[0]!.id}/undo`).send({ reason: 'take it back' });
    expect(notMerge.status).toBe(400);
    expect(notMerge.body.error.message).toBe(`Only case merges can be undone; audit entry ${lockEntry.rows[0]!.id} records case.lock`);
    expect((await auditEntry(admin, lockEntry.rows[0]!.id)).undo).toBeUndefined();
  });
});
