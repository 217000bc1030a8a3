import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CaseDetail, CaseRevision } from '@railyard/shared';
import { createTestApp, type TestApp } from '../support/test-app';
import { casebookBoard, caseInput, writeCase } from './casebook-fixtures';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const anonymous = () => request(t.baseUrl);

describe('writing up a case', () => {
  it('keeps a draft to its author until it is published, then shows it to everyone', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const draft = await writeCase(author, slug, { status: 'draft' });
    expect(draft).toMatchObject({
      status: 'draft',
      publishedAt: null,
      board: { slug },
      author: { id: author.user.id, login: author.user.login, reputation: 0 },
      nets: ['VSYS'],
      culprits: ['C1'],
      readings: [{ position: 0, net: 'VSYS', mode: 'diode_v', measured: 0.003, knownGood: 0.38 }],
      components: [{ refdes: 'C1', culprit: true }],
      score: { ups: 0, downs: 0, confirmations: 0, wilsonLowerBound: 0, myVote: null, confirmedByMe: false },
    });

    expect((await anonymous().get(`/api/cases/${draft.id}`)).status).toBe(404);
    const other = await t.agentAs('member');
    expect((await other.get(`/api/cases/${draft.id}`)).status).toBe(404);
    const moderator = await t.agentAs('moderator');
    expect((await moderator.get(`/api/cases/${draft.id}`)).status).toBe(404);
    expect((await author.get(`/api/cases/${draft.id}`)).status).toBe(200);

    const published = await author.patch(`/api/cases/${draft.id}`).send({ status: 'published' });
    expect(published.status, JSON.stringify(published.body)).toBe(200);
    const seen = await anonymous().get(`/api/cases/${draft.id}`);
    expect(seen.status).toBe(200);
    expect(seen.body.case.status).toBe('published');
    expect(Date.parse(seen.body.case.publishedAt)).toBeGreaterThan(Date.parse(draft.createdAt) - 1);
  });

  it('renders the Markdown with the board’s nets and parts as links', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const written = await writeCase(author, slug, {
      body: 'Measured **VSYS** at TP-less pad of C2, then lifted `C1`; U9 is not on this board.',
    });
    const { html } = (await anonymous().get(`/api/cases/${written.id}`)).body.case as CaseDetail;
    expect(html.body).toContain(`<a href="/boards/${slug}/nets/VSYS" class="net-link" rel="nofollow noopener noreferrer">VSYS</a>`);
    expect(html.body).toContain(`<a href="/boards/${slug}/components/C2" class="part-link" rel="nofollow noopener noreferrer">C2</a>`);
    // code stays code, and a refdes the board does not have stays text
    expect(html.body).toContain('<code>C1</code>');
    expect(html.body).toContain('U9 is not');
    expect(html.fixSteps).toContain('<ol>');
  });

  it('links nets by alias or separator-insensitive name and parts in any case, storing the printed names', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const written = await writeCase(author, slug, {
      nets: ['SYS', 'vcc-1v8'],
      readings: [{ net: 'i2c_sda', mode: 'resistance_ohm', measured: 12, knownGood: 4700 }],
      components: [{ refdes: 'c3', culprit: true }, { refdes: 'U2' }],
    });
    expect(written.nets).toEqual(['I2C_SDA', 'VCC_1V8', 'VSYS']);
    expect(written.readings[0]!.net).toBe('I2C_SDA');
    expect(written.components).toEqual([
      { refdes: 'C3', culprit: true },
      { refdes: 'U2', culprit: false },
    ]);
  });

  it('records a revision with each change, saying who changed what and when', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const written = await writeCase(author, slug);
    const edit = await author.patch(`/api/cases/${written.id}`).send({
      title: 'No boot, VSYS shorted by a cracked capacitor',
      fixSteps: '1. Disconnect the battery.\n2. Inject 1 V at 1 A, watch for heat (the part gets hot).\n3. Replace C1.',
    });
    expect(edit.status, JSON.stringify(edit.body)).toBe(200);
    // the same values again change nothing and write no revision
    const again = await author.patch(`/api/cases/${written.id}`).send({ title: 'No boot, VSYS shorted by a cracked capacitor' });
    expect(again.status).toBe(200);

    const res = await anonymous().get(`/api/cases/${written.id}/revisions`);
    expect(res.status).toBe(200);
    const revisions = res.body.revisions as CaseRevision[];
    expect(revisions).toHaveLength(2);
    const [latest, first] = revisions;
    expect(latest).toMatchObject({
      editor: { id: author.user.id, login: author.user.login },
      changed: ['title', 'fixSteps'],
      summary: 'changed title and fix steps',
      snapshot: { title: 'No boot, VSYS shorted by a cracked capacitor', nets: ['VSYS'], components: [{ refdes: 'C1', culprit: true }] },
    });
    expect(first).toMatchObject({ summary: 'written and published', snapshot: { title: 'No boot, VSYS shorted to ground' } });
    expect(first!.changed).toContain('readings');
    expect(Date.parse(latest!.createdAt)).toBeGreaterThanOrEqual(Date.parse(first!.createdAt));
  });

  it('replaces the readings and parts when given, and links the nets that were read', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const written = await writeCase(author, slug);
    const res = await author.patch(`/api/cases/${written.id}`).send({
      readings: [
        { net: 'VSYS', mode: 'diode_v', measured: 0.003, knownGood: 0.38 },
        { net: 'VCC_1V8', mode: 'voltage_v', measured: 0, knownGood: 1.8 },
      ],
      components: [{ refdes: 'C2', culprit: true }],
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.case.nets).toEqual(['VCC_1V8', 'VSYS']);
    expect(res.body.case.culprits).toEqual(['C2']);
    expect(res.body.case.readings.map((r: { net: string }) => r.net)).toEqual(['VSYS', 'VCC_1V8']);
    const [latest] = (await anonymous().get(`/api/cases/${written.id}/revisions`)).body.revisions as CaseRevision[];
    expect(latest!.changed).toEqual(['readings', 'nets', 'components']);
    expect(latest!.summary).toBe('changed readings, nets and parts');
  });
});

describe('who may change a case', () => {
  it('answers 401 to a signed-out writer and 403 to a member or moderator changing another’s case by id', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const written = await writeCase(author, slug, { status: 'draft' });
    const published = await writeCase(author, slug);

    expect((await t.agent().post(`/api/boards/${slug}/cases`).send(caseInput())).status).toBe(401);
    expect((await t.agent().patch(`/api/cases/${published.id}`).send({ title: 'Taken over by nobody' })).status).toBe(401);

    const other = await t.agentAs('member');
    const edit = await other.patch(`/api/cases/${published.id}`).send({ title: 'Taken over by someone else' });
    expect(edit.status).toBe(403);
    expect(edit.body.error.code).toBe('forbidden');
    expect((await other.delete(`/api/cases/${published.id}`)).status).toBe(403);
    const moderator = await t.agentAs('moderator');
    expect((await moderator.patch(`/api/cases/${published.id}`).send({ title: 'Edited by a moderator' })).status).toBe(403);
    // someone else's draft does not exist for them
    expect((await other.delete(`/api/cases/${written.id}`)).status).toBe(404);

    const unchanged = await anonymous().get(`/api/cases/${published.id}`);
    expect(unchanged.body.case.title).toBe('No boot, VSYS shorted to ground');
  });

  it('lets an author delete a draft but not a published case', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const draft = await writeCase(author, slug, { status: 'draft' });
    const published = await writeCase(author, slug);
    expect((await author.delete(`/api/cases/${draft.id}`)).status).toBe(204);
    expect((await author.get(`/api/cases/${draft.id}`)).status).toBe(404);
    const refused = await author.delete(`/api/cases/${published.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('already_published');
    const back = await author.patch(`/api/cases/${published.id}`).send({ status: 'draft' });
    expect(back.status).toBe(409);
    expect(back.body.error.details).toEqual({ field: 'status' });
  });
});

describe('validation of a write-up', () => {
  const issuesOf = (body: { error: { details: { issues: { field: string | null; message: string }[] } } }) =>
    body.error.details.issues;

  it('refuses unknown fields', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const res = await author.post(`/api/boards/${slug}/cases`).send(caseInput({ rating: 5 }));
    expect(res.status).toBe(400);
    expect(issuesOf(res.body).map((i) => i.message).join(' ')).toMatch(/rating/);
    const reading = await author.post(`/api/boards/${slug}/cases`).send(caseInput({ readings: [{ net: 'VSYS', mode: 'diode_v', measured: 0.3, unit: 'V' }] }));
    expect(reading.status).toBe(400);
    expect(issuesOf(reading.body)[0]!.field).toBe('readings.0');
  });

  it('names each field that is missing, too long, repeated or of the wrong kind', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const res = await author.post(`/api/boards/${slug}/cases`).send(
      caseInput({
        title: 'VS',
        symptom: 'x'.repeat(2001),
        outcome: 'fixed',
        minutesSpent: 12.5,
        nets: ['VSYS', 'VSYS'],
        readings: [{ net: 'VSYS', mode: 'ohms', measured: 'low' }],
      }),
    );
    expect(res.status).toBe(400);
    const fields = issuesOf(res.body).map((i) => i.field);
    expect(fields).toEqual(expect.arrayContaining(['title', 'symptom', 'outcome', 'minutesSpent', 'nets.1', 'readings.0.mode', 'readings.0.measured']));
    expect(issuesOf(res.body).find((i) => i.field === 'nets.1')!.message).toBe('net VSYS is listed twice');
  });

  it('names every net and part the board does not have', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const res = await author.post(`/api/boards/${slug}/cases`).send(
      caseInput({
        nets: ['VSYS', 'VCC_9V9'],
        readings: [{ net: 'VDD_NOPE', mode: 'diode_v', measured: 0.1, knownGood: null }],
        components: [{ refdes: 'C1', culprit: true }, { refdes: 'U99' }],
      }),
    );
    expect(res.status).toBe(400);
    expect(issuesOf(res.body)).toEqual([
      { field: 'nets.1', message: `VCC_9V9 is not a net of board "${slug}"` },
      { field: 'readings.0.net', message: `VDD_NOPE is not a net of board "${slug}"` },
      { field: 'components.1.refdes', message: `U99 is not a part of board "${slug}"` },
    ]);
    const { rows } = await t.pool.query('SELECT count(*)::int AS n FROM cases c JOIN boards b ON b.id = c.board_id WHERE b.slug = $1', [slug]);
    expect(rows[0].n).toBe(0);
  });

  it('refuses an empty change, a malformed id and an unknown board or case', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const written = await writeCase(author, slug);
    expect((await author.patch(`/api/cases/${written.id}`).send({})).status).toBe(400);
    expect((await anonymous().get('/api/cases/abc')).status).toBe(400);
    expect((await anonymous().get('/api/cases/2147483000')).status).toBe(404);
    expect((await author.patch('/api/cases/2147483000').send({ title: 'Nothing to edit here' })).status).toBe(404);
    expect((await author.post('/api/boards/no-such-board-here/cases').send(caseInput())).status).toBe(404);
  });

  it('takes JSON bodies only', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const res = await author.post(`/api/boards/${slug}/cases`).type('form').send({ title: 'A form post' });
    expect(res.status).toBe(415);
  });
});
