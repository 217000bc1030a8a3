// Moderators lock, hide and restore cases and comments, and work through members' flags; each action
// leaves an audit row written in its own transaction.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { casebookBoard, writeCase } from './casebook-fixtures';

let t: TestApp;
let slug: string;

beforeAll(async () => {
  t = await createTestApp();
  slug = await casebookBoard(t, 'moderate');
});
afterAll(async () => {
  // a flag mails every moderator in the shared test database: drop this file's mails so later files'
  // workers do not spend their time sending them
  await t.pool.query(
    `DELETE FROM notification_outbox WHERE kind = 'content_flagged'
       AND (payload->>'caseId')::int IN (SELECT c.id FROM cases c JOIN boards b ON b.id = c.board_id WHERE b.slug = $1)`,
    [slug],
  );
  await t.close();
});

async function auditOf(targetType: string, targetId: number) {
  const { rows } = await t.pool.query<{ action: string; reason: string; actor_id: number }>(
    'SELECT action, reason, actor_id FROM audit_log WHERE target_type = $1 AND target_id = $2 ORDER BY id',
    [targetType, String(targetId)],
  );
  return rows;
}

describe('locking a case', () => {
  it('refuses new comments, votes and edits on a locked case with 409 until it is unlocked', async () => {
    const author = await t.agentAs('member');
    const reader = await t.agentAs('member');
    const moderator = await t.agentAs('moderator');
    const theCase = await writeCase(author, slug);

    const locked = await moderator.post(`/api/cases/${theCase.id}/lock`).send({ reason: 'thread went off topic' });
    expect(locked.status).toBe(200);
    expect(locked.body.case.moderation.lockedAt).not.toBeNull();

    const comment = await reader.post(`/api/cases/${theCase.id}/comments`).send({ body: 'One more thing' });
    expect(comment.status).toBe(409);
    expect(comment.body.error.code).toBe('case_locked');
    expect(comment.body.error.message).toMatch(/locked by a moderator/);
    expect((await reader.put(`/api/cases/${theCase.id}/vote`).send({ value: 1 })).status).toBe(409);
    expect((await author.patch(`/api/cases/${theCase.id}`).send({ title: 'A new title' })).status).toBe(409);
    // reading goes on as before
    expect((await t.agent().get(`/api/cases/${theCase.id}`)).status).toBe(200);

    expect((await moderator.post(`/api/cases/${theCase.id}/unlock`).send({ reason: 'calmed down' })).status).toBe(200);
    expect((await reader.post(`/api/cases/${theCase.id}/comments`).send({ body: 'One more thing' })).status).toBe(201);
    expect((await auditOf('case', theCase.id)).map((a) => [a.action, a.reason, a.actor_id])).toEqual([
      ['case.lock', 'thread went off topic', moderator.user.id],
      ['case.unlock', 'calmed down', moderator.user.id],
    ]);
  });

  it('takes a lock only from a moderator and only with a reason', async () => {
    const author = await t.agentAs('member');
    const moderator = await t.agentAs('moderator');
    const theCase = await writeCase(author, slug);

    expect((await author.post(`/api/cases/${theCase.id}/lock`).send({ reason: 'my own case' })).status).toBe(403);
    const noReason = await moderator.post(`/api/cases/${theCase.id}/lock`).send({});
    expect(noReason.status).toBe(400);
    expect(JSON.stringify(noReason.body.error)).toContain('reason');
    expect((await moderator.post(`/api/cases/${theCase.id}/unlock`).send({ reason: 'not locked yet' })).status).toBe(409);
    expect(await auditOf('case', theCase.id)).toEqual([]);
  });
});

describe('hiding a case', () => {
  it('answers 404 to others, shows the author and moderators the reason, and restores it', async () => {
    const author = await t.agentAs('member');
    const reader = await t.agentAs('member');
    const moderator = await t.agentAs('moderator');
    const theCase = await writeCase(author, slug, { title: 'Hidden soon: VSYS short' });

    expect((await moderator.post(`/api/cases/${theCase.id}/hide`).send({ reason: 'copied from elsewhere' })).status).toBe(200);

    expect((await t.agent().get(`/api/cases/${theCase.id}`)).status).toBe(404);
    expect((await reader.get(`/api/cases/${theCase.id}`)).status).toBe(404);
    expect((await reader.get(`/api/cases/${theCase.id}/comments`)).status).toBe(404);
    const seenByAuthor = await author.get(`/api/cases/${theCase.id}`);
    expect(seenByAuthor.status).toBe(200);
    expect(seenByAuthor.body.case.moderation).toMatchObject({ hiddenReason: 'copied from elsewhere' });
    expect(seenByAuthor.body.case.moderation.hiddenAt).not.toBeNull();
    expect((await moderator.get(`/api/cases/${theCase.id}`)).status).toBe(200);
    const listed = await reader.get(`/api/boards/${slug}/cases?pageSize=50`);
    expect(listed.body.cases.map((c: { id: number }) => c.id)).not.toContain(theCase.id);

    expect((await moderator.post(`/api/cases/${theCase.id}/restore`).send({ reason: 'author showed it is theirs' })).status).toBe(200);
    const restored = await reader.get(`/api/cases/${theCase.id}`);
    expect(restored.status).toBe(200);
    expect(restored.body.case.moderation).toEqual({ lockedAt: null, hiddenAt: null, hiddenReason: '' });
    expect((await auditOf('case', theCase.id)).map((a) => a.action)).toEqual(['case.hide', 'case.restore']);
  });
});

describe('hiding a comment', () => {
  it('leaves it out of the thread for others and shows its author and moderators why', async () => {
    const author = await t.agentAs('member');
    const commenter = await t.agentAs('member');
    const moderator = await t.agentAs('moderator');
    const theCase = await writeCase(author, slug);
    const comment = (await commenter.post(`/api/cases/${theCase.id}/comments`).send({ body: 'Buy my parts!' })).body.comment;

    const hidden = await moderator.post(`/api/comments/${comment.id}/hide`).send({ reason: 'advertising' });
    expect(hidden.status).toBe(200);
    expect(hidden.body.comment.hidden).toMatchObject({ reason: 'advertising' });

    const ids = async (agent: ReturnType<TestApp['agent']>) =>
      (await agent.get(`/api/cases/${theCase.id}/comments`)).body.comments.map((c: { id: number }) => c.id);
    expect(await ids(author)).toEqual([]);
    expect(await ids(t.agent())).toEqual([]);
    expect(await ids(commenter)).toEqual([comment.id]);
    expect(await ids(moderator)).toEqual([comment.id]);

    expect((await moderator.post(`/api/comments/${comment.id}/restore`).send({ reason: 'misread it' })).status).toBe(200);
    expect(await ids(author)).toEqual([comment.id]);
    expect((await auditOf('comment', comment.id)).map((a) => [a.action, a.reason])).toEqual([
      ['comment.hide', 'advertising'],
      ['comment.restore', 'misread it'],
    ]);
  });
});

describe('flags', () => {
  it('takes one open flag per member and item, tells the moderators and lets a moderator resolve it', async () => {
    const author = await t.agentAs('member');
    const flagger = await t.agentAs('member');
    const moderator = await t.agentAs('moderator');
    const theCase = await writeCase(author, slug, { title: 'Flag me: VSYS short' });

    const flagged = await flagger.post(`/api/cases/${theCase.id}/flag`).send({ reason: 'the fix is dangerous' });
    expect(flagged.status).toBe(201);
    expect(flagged.body.flag).toMatchObject({ contentType: 'case', contentId: theCase.id, caseId: theCase.id, status: 'open' });
    const again = await flagger.post(`/api/cases/${theCase.id}/flag`).send({ reason: 'still dangerous' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('already_flagged');

    const mail = await t.pool.query('SELECT payload FROM notification_outbox WHERE user_id = $1 AND kind = $2', [moderator.user.id, 'content_flagged']);
    expect(mail.rows.map((r) => r.payload)).toEqual([expect.objectContaining({ caseId: theCase.id, target: 'case', reason: 'the fix is dangerous' })]);

    expect((await flagger.get('/api/moderation/flags')).status).toBe(403);
    const open = await moderator.get('/api/moderation/flags?status=open');
    expect(open.status).toBe(200);
    expect(open.body.flags.map((f: { id: number }) => f.id)).toContain(flagged.body.flag.id);

    const resolved = await moderator.post(`/api/moderation/flags/${flagged.body.flag.id}/resolve`).send({ reason: 'fix is fine with a current limit' });
    expect(resolved.status).toBe(200);
    expect(resolved.body.flag).toMatchObject({ status: 'resolved', resolver: { id: moderator.user.id } });
    expect((await moderator.post(`/api/moderation/flags/${flagged.body.flag.id}/resolve`).send({ reason: 'twice' })).status).toBe(409);
    expect((await auditOf('flag', flagged.body.flag.id)).map((a) => a.action)).toEqual(['flag.resolve']);
    // once resolved, the member may flag the case again
    expect((await flagger.post(`/api/cases/${theCase.id}/flag`).send({ reason: 'new problem' })).status).toBe(201);
  });

  it('flags a comment, naming its case', async () => {
    const author = await t.agentAs('member');
    const flagger = await t.agentAs('member');
    const theCase = await writeCase(author, slug);
    const comment = (await author.post(`/api/cases/${theCase.id}/comments`).send({ body: 'Rude words' })).body.comment;

    const flagged = await flagger.post(`/api/comments/${comment.id}/flag`).send({ reason: 'insulting' });

    expect(flagged.status).toBe(201);
    expect(flagged.body.flag).toMatchObject({ contentType: 'comment', contentId: comment.id, caseId: theCase.id });
  });
});
