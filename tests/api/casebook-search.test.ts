import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CaseListResponse, SimilarCase } from '@railyard/shared';
import { createTestApp, type TestApp } from '../support/test-app';
import { casebookBoard, writeCase } from './casebook-fixtures';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const anonymous = () => request(t.baseUrl);
const search = async (slug: string, query: string) => {
  const res = await anonymous().get(`/api/boards/${slug}/cases?${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as CaseListResponse;
};
const titles = (list: CaseListResponse) => list.cases.map((c) => c.title);

describe('full-text search of a board’s cases', () => {
  it('finds a case by a word of its symptom and by the name of a net it links', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    await writeCase(author, slug, {
      title: 'Reboots under load',
      symptom: 'Restarts whenever the vibration motor kicks in',
      rootCause: 'Buck output collapses',
      fixSteps: 'Replaced the output capacitor.',
      body: '',
      nets: ['VCC_1V8'],
      readings: [],
      components: [{ refdes: 'C3', culprit: true }],
    });
    await writeCase(author, slug, {
      title: 'Dead board',
      symptom: 'No current draw at all',
      rootCause: 'Switch open',
      fixSteps: 'Reflowed the switch.',
      body: '',
      nets: ['VSYS'],
      readings: [],
      components: [{ refdes: 'U1', culprit: true }],
    });

    const bySymptom = await search(slug, 'q=vibration');
    expect(titles(bySymptom)).toEqual(['Reboots under load']);
    expect(bySymptom.sort).toBe('relevance');
    expect(bySymptom.cases[0]!.relevance).toBeGreaterThan(0);
    // the net name is in no text of the case, only in its links
    expect(titles(await search(slug, 'q=VCC_1V8'))).toEqual(['Reboots under load']);
    expect(titles(await search(slug, 'q=U1'))).toEqual(['Dead board']);
    // websearch syntax: quoted phrases and exclusions
    expect(titles(await search(slug, `q=${encodeURIComponent('"current draw"')}`))).toEqual(['Dead board']);
    expect(titles(await search(slug, `q=${encodeURIComponent('board -reboots')}`))).toEqual(['Dead board']);
    expect((await search(slug, 'q=nonexistentword')).total).toBe(0);
  });

  it('ranks a match in the title above the same word deep in the write-up', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    await writeCase(author, slug, { title: 'Touch works after reflow', body: 'The sensor was fine; the flex had corrosion.' });
    await writeCase(author, slug, { title: 'Corrosion on the flex connector', body: 'Cleaned it.' });
    expect(titles(await search(slug, 'q=corrosion'))).toEqual(['Corrosion on the flex connector', 'Touch works after reflow']);
  });

  it('filters by net, part and outcome and pages with a total', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    for (let i = 1; i <= 7; i++) {
      await writeCase(author, slug, {
        title: `Case number ${i} of seven`,
        outcome: i <= 4 ? 'solved' : i <= 6 ? 'partly' : 'not_solved',
        nets: i % 2 === 0 ? ['VCC_1V8'] : ['VSYS'],
        readings: [],
        components: i === 7 ? [{ refdes: 'U3', culprit: true }] : [{ refdes: 'C1', culprit: true }],
      });
    }
    expect((await search(slug, 'outcome=solved')).total).toBe(4);
    expect((await search(slug, 'outcome=not_solved')).cases.map((c) => c.title)).toEqual(['Case number 7 of seven']);
    expect((await search(slug, 'net=VCC_1V8')).total).toBe(3);
    expect((await search(slug, 'net=SYS&outcome=partly')).total).toBe(1);
    expect((await search(slug, 'component=U3')).total).toBe(1);
    expect((await search(slug, 'component=C1&q=seven')).total).toBe(6);

    const pages = await Promise.all([1, 2, 3].map((page) => search(slug, `pageSize=3&page=${page}&sort=newest`)));
    expect(pages.map((p) => p.total)).toEqual([7, 7, 7]);
    expect(pages.map((p) => p.cases.length)).toEqual([3, 3, 1]);
    const seen = pages.flatMap((p) => p.cases.map((c) => c.id));
    expect(new Set(seen).size).toBe(7);
    expect(pages[0]!.cases[0]!.title).toBe('Case number 7 of seven');
    expect((await search(slug, 'pageSize=3&page=4')).cases).toEqual([]);
  });

  it('refuses a page over 50, an unknown parameter and relevance without a search text, naming the field', async () => {
    const slug = await casebookBoard(t);
    const big = await anonymous().get(`/api/boards/${slug}/cases?pageSize=51`);
    expect(big.status).toBe(400);
    expect(big.body.error.details.issues).toEqual([{ field: 'pageSize', message: 'at most 50 per page' }]);
    expect((await anonymous().get(`/api/boards/${slug}/cases?colour=red`)).status).toBe(400);
    const relevance = await anonymous().get(`/api/boards/${slug}/cases?sort=relevance`);
    expect(relevance.status).toBe(400);
    expect(relevance.body.error.details.issues[0].field).toBe('sort');
    expect((await anonymous().get(`/api/boards/${slug}/cases?net=VDD_NONE`)).status).toBe(404);
  });

  it('keeps drafts out of search; their author lists them with status=draft', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    await writeCase(author, slug, { title: 'Unfinished write-up about the flex', status: 'draft' });
    expect((await search(slug, 'q=unfinished')).total).toBe(0);
    const mine = await author.get(`/api/boards/${slug}/cases?status=draft`);
    expect(mine.body.cases.map((c: { title: string }) => c.title)).toEqual(['Unfinished write-up about the flex']);
    const other = await t.agentAs('member');
    expect((await other.get(`/api/boards/${slug}/cases?status=draft`)).body.total).toBe(0);
    expect((await anonymous().get(`/api/boards/${slug}/cases?status=draft`)).status).toBe(401);
  });
});

describe('likely duplicates for the create form', () => {
  it('suggests cases of the same board sharing nets, culprit parts or words, each with why it matched', async () => {
    const slug = await casebookBoard(t);
    const elsewhere = await casebookBoard(t);
    const author = await t.agentAs('member');
    const short = await writeCase(author, slug, { title: 'VSYS shorted to ground by C1' });
    const reboots = await writeCase(author, slug, {
      title: 'Random reboots under load',
      symptom: 'Restarts when the speaker plays loud',
      nets: ['VCC_1V8'],
      readings: [],
      components: [{ refdes: 'C3', culprit: true }],
    });
    await writeCase(author, slug, {
      title: 'Sensor missing on the bus',
      symptom: 'Accelerometer not found',
      nets: ['I2C_SDA'],
      readings: [],
      components: [{ refdes: 'R1', culprit: true }],
    });
    await writeCase(author, elsewhere, { title: 'VSYS shorted to ground by C1' });

    const similar = async (query: string) => {
      const res = await anonymous().get(`/api/boards/${slug}/cases/similar?${query}`);
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      return res.body.cases as SimilarCase[];
    };

    const byNet = await similar('nets=VSYS');
    expect(byNet.map((c) => c.id)).toEqual([short.id]);
    expect(byNet[0]!.why).toEqual({ nets: ['VSYS'], culprits: [], text: null });

    const byPart = await similar('components=C3,U2');
    expect(byPart.map((c) => c.id)).toEqual([reboots.id]);
    expect(byPart[0]!.why.culprits).toEqual(['C3']);

    const byText = await similar(`text=${encodeURIComponent('reboots when the speaker is loud')}`);
    expect(byText[0]!.id).toBe(reboots.id);
    expect(byText[0]!.why.text).toBeGreaterThan(0);
    // "the" and "is" are English stop words: they alone match nothing
    expect(await similar(`text=${encodeURIComponent('the is')}`)).toEqual([]);

    const both = await similar(`nets=VSYS,VCC_1V8&components=C1&text=shorted`);
    expect(both[0]!.id).toBe(short.id);
    expect(both[0]!.why.nets).toEqual(['VSYS']);
    expect(both[0]!.why.culprits).toEqual(['C1']);

    expect((await similar(`nets=VSYS&exclude=${short.id}`)).map((c) => c.id)).toEqual([]);
    const none = await anonymous().get(`/api/boards/${slug}/cases/similar`);
    expect(none.status).toBe(400);
  });
});
