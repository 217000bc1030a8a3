import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CaseScore, CaseSummary } from '@railyard/shared';
import { reputation, wilsonLowerBound } from '@railyard/vote-ranking';
import { createTestApp, type TestApp } from '../support/test-app';
import { casebookBoard, members, writeCase } from './casebook-fixtures';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const anonymous = () => request(t.baseUrl);

async function voteRows(caseId: number) {
  const { rows } = await t.pool.query<{ user_id: number; value: number }>('SELECT user_id, value FROM case_votes WHERE case_id = $1', [caseId]);
  return rows;
}

describe('votes on a case', () => {
  it('takes one vote per person, which they can change and take back', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const voter = await t.agentAs('member');
    const written = await writeCase(author, slug);

    const up = await voter.put(`/api/cases/${written.id}/vote`).send({ value: 1 });
    expect(up.status, JSON.stringify(up.body)).toBe(200);
    expect(up.body.score).toMatchObject({ ups: 1, downs: 0, myVote: 1 });
    // FACTS.md §6 check value for 1 up, 0 down [calc]
    expect(up.body.score.wilsonLowerBound).toBeCloseTo(0.206549, 6);

    const down = await voter.put(`/api/cases/${written.id}/vote`).send({ value: -1 });
    expect(down.body.score).toMatchObject({ ups: 0, downs: 1, myVote: -1, wilsonLowerBound: 0 });
    expect(await voteRows(written.id)).toEqual([{ user_id: voter.user.id, value: -1 }]);

    const taken = await voter.delete(`/api/cases/${written.id}/vote`);
    expect(taken.status).toBe(200);
    expect(taken.body.score).toMatchObject({ ups: 0, downs: 0, myVote: null });
    expect(await voteRows(written.id)).toEqual([]);

    // the author sees the count but has no vote of their own
    const seen = await author.get(`/api/cases/${written.id}`);
    expect(seen.body.case.score.myVote).toBeNull();
  });

  it('refuses a vote on one’s own case (403), from a signed-out visitor (401) and of any value but 1 or -1', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const written = await writeCase(author, slug);
    const own = await author.put(`/api/cases/${written.id}/vote`).send({ value: 1 });
    expect(own.status).toBe(403);
    expect(own.body.error.code).toBe('own_case');
    expect((await t.agent().put(`/api/cases/${written.id}/vote`).send({ value: 1 })).status).toBe(401);
    const voter = await t.agentAs('member');
    const two = await voter.put(`/api/cases/${written.id}/vote`).send({ value: 2 });
    expect(two.status).toBe(400);
    expect(two.body.error.details.issues[0]).toEqual({ field: 'value', message: 'vote 1 (up) or -1 (down)' });
    expect(await voteRows(written.id)).toEqual([]);
  });

  it('takes votes only on published cases: a draft is not there for others, and its author cannot vote', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const draft = await writeCase(author, slug, { status: 'draft' });
    const voter = await t.agentAs('member');
    expect((await voter.put(`/api/cases/${draft.id}/vote`).send({ value: 1 })).status).toBe(404);
    expect((await author.put(`/api/cases/${draft.id}/vote`).send({ value: 1 })).status).toBe(403);
    expect((await voter.put('/api/cases/2147483000/vote').send({ value: 1 })).status).toBe(404);
  });

  it('leaves one row and matching counts after fifty simultaneous votes from one person', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const voter = await t.agentAs('member');
    const written = await writeCase(author, slug);
    const answers = await Promise.all(
      Array.from({ length: 50 }, (_, i) => voter.put(`/api/cases/${written.id}/vote`).send({ value: i % 2 === 0 ? 1 : -1 })),
    );
    expect(answers.map((a) => a.status)).toEqual(Array(50).fill(200));
    const rows = await voteRows(written.id);
    expect(rows).toHaveLength(1);
    const { rows: counts } = await t.pool.query('SELECT up_votes, down_votes FROM cases WHERE id = $1', [written.id]);
    // the stored counts agree with the one vote that won, whichever it was
    expect(counts[0]).toEqual(rows[0]!.value === 1 ? { up_votes: 1, down_votes: 0 } : { up_votes: 0, down_votes: 1 });
  });
});

describe('confirmations ("this worked for me")', () => {
  it('takes one confirmation per person with a note, counts it in the score and lets them take it back', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const [voter, confirmer] = await members(t, 2);
    const written = await writeCase(author, slug);
    await voter!.put(`/api/cases/${written.id}/vote`).send({ value: -1 });

    const first = await confirmer!.post(`/api/cases/${written.id}/confirmation`).send({ note: 'Same short on a rev B2 board; C1 again.' });
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    const score = first.body.score as CaseScore;
    expect(score).toMatchObject({ ups: 0, downs: 1, confirmations: 1, confirmedByMe: true });
    // one positive person (the confirmer), one negative (the down-voter)
    expect(score.wilsonLowerBound).toBeCloseTo(wilsonLowerBound(1, 1), 12);

    const again = await confirmer!.post(`/api/cases/${written.id}/confirmation`).send({ note: 'Also on rev B3.' });
    expect(again.status).toBe(200);
    expect(again.body.score.confirmations).toBe(1);
    const list = await anonymous().get(`/api/cases/${written.id}/confirmations`);
    expect(list.body.confirmations).toEqual([
      expect.objectContaining({ user: expect.objectContaining({ id: confirmer!.user.id }), note: 'Also on rev B3.' }),
    ]);

    const own = await author.post(`/api/cases/${written.id}/confirmation`).send({});
    expect(own.status).toBe(403);

    const taken = await confirmer!.delete(`/api/cases/${written.id}/confirmation`);
    expect(taken.body.score).toMatchObject({ confirmations: 0, confirmedByMe: false, wilsonLowerBound: 0 });
  });
});

describe('ranking', () => {
  it('lists a board’s cases best first by the Wilson lower bound, as the pure function orders them', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const people = await members(t, 5);
    // up, down, confirmations from people who did not vote
    const plan: [title: string, up: number, down: number, confirmations: number][] = [
      ['One up-vote only', 1, 0, 0],
      ['Three up, one down', 3, 1, 0],
      ['Two up, two down', 2, 2, 0],
      ['One up, one down, one confirmation', 1, 1, 1],
      ['No votes at all', 0, 0, 0],
    ];
    const expected: { id: number; bound: number }[] = [];
    for (const [title, up, down, confirmations] of plan) {
      const written = await writeCase(author, slug, { title });
      let next = 0;
      for (let i = 0; i < up; i++) await people[next++]!.put(`/api/cases/${written.id}/vote`).send({ value: 1 });
      for (let i = 0; i < down; i++) await people[next++]!.put(`/api/cases/${written.id}/vote`).send({ value: -1 });
      for (let i = 0; i < confirmations; i++) await people[next++]!.post(`/api/cases/${written.id}/confirmation`).send({});
      expected.push({ id: written.id, bound: wilsonLowerBound(up + confirmations, down) });
    }
    const res = await anonymous().get(`/api/boards/${slug}/cases?sort=rank`);
    expect(res.status).toBe(200);
    const listed = res.body.cases as CaseSummary[];
    const byBound = [...expected].sort((a, b) => b.bound - a.bound || b.id - a.id);
    expect(listed.map((c) => c.id)).toEqual(byBound.map((e) => e.id));
    for (const c of listed) expect(c.score.wilsonLowerBound).toBeCloseTo(expected.find((e) => e.id === c.id)!.bound, 12);
    // rank is the default order without a search text
    expect((await anonymous().get(`/api/boards/${slug}/cases`)).body.cases.map((c: CaseSummary) => c.id)).toEqual(byBound.map((e) => e.id));
  });

  it('gives an author the reputation of the pure rule from the votes their cases received', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const people = await members(t, 3);
    const first = await writeCase(author, slug);
    const second = await writeCase(author, slug, { title: 'No charge, VBAT side fine' });
    await people[0]!.put(`/api/cases/${first.id}/vote`).send({ value: 1 });
    await people[1]!.put(`/api/cases/${first.id}/vote`).send({ value: 1 });
    await people[2]!.put(`/api/cases/${second.id}/vote`).send({ value: -1 });
    await people[2]!.post(`/api/cases/${first.id}/confirmation`).send({ note: 'worked' });
    const res = await anonymous().get(`/api/cases/${second.id}`);
    expect(res.body.case.author.reputation).toBe(reputation({ upvotes: 2, downvotes: 1, confirmations: 1 }));
    expect(res.body.case.author.reputation).toBe(23);
  });
});

describe('cases of a net and of a part', () => {
  it('lists the cases of a net and of a part best first, and counts the solved cases that named the part the culprit', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const people = await members(t, 2);
    const best = await writeCase(author, slug, { title: 'C1 shorted VSYS, replaced' });
    const plain = await writeCase(author, slug, { title: 'C1 shorted VSYS again' });
    const unsolved = await writeCase(author, slug, { title: 'VSYS low, C1 suspected', outcome: 'not_solved' });
    const mentioned = await writeCase(author, slug, {
      title: 'Buck U2 dead, C1 checked and fine',
      nets: ['VCC_1V8'],
      readings: [],
      components: [{ refdes: 'C1', culprit: false }, { refdes: 'U2', culprit: true }],
    });
    await writeCase(author, slug, { title: 'Draft about C1, not counted', status: 'draft' });
    await people[0]!.put(`/api/cases/${best.id}/vote`).send({ value: 1 });
    await people[1]!.put(`/api/cases/${best.id}/vote`).send({ value: 1 });
    await people[0]!.put(`/api/cases/${mentioned.id}/vote`).send({ value: 1 });

    const part = await anonymous().get(`/api/boards/${slug}/components/C1/cases`);
    expect(part.status).toBe(200);
    expect(part.body).toMatchObject({ board: slug, refdes: 'C1', solvedAsCulprit: 2, total: 4 });
    const partIds = (part.body.cases as CaseSummary[]).map((c) => c.id);
    expect(partIds[0]).toBe(best.id);
    expect(partIds[1]).toBe(mentioned.id);
    expect(new Set(partIds.slice(2))).toEqual(new Set([plain.id, unsolved.id]));

    const net = await anonymous().get(`/api/boards/${slug}/nets/SYS/cases`);
    expect(net.status).toBe(200);
    expect(net.body).toMatchObject({ board: slug, net: 'VSYS', total: 3 });
    expect((net.body.cases as CaseSummary[])[0]!.id).toBe(best.id);

    const u2 = await anonymous().get(`/api/boards/${slug}/components/U2/cases`);
    expect(u2.body).toMatchObject({ solvedAsCulprit: 1, total: 1 });
    expect((await anonymous().get(`/api/boards/${slug}/components/U77/cases`)).status).toBe(404);
    expect((await anonymous().get(`/api/boards/${slug}/nets/VDD_NONE/cases`)).status).toBe(404);
  });
});
