import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CaseComment, CaseDetail } from '@railyard/shared';
import { createTestApp, type TestApp } from '../support/test-app';
import { casebookBoard, writeCase } from './casebook-fixtures';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const anonymous = () => request(t.baseUrl);
const thread = async (caseId: number) => (await anonymous().get(`/api/cases/${caseId}/comments`)).body.comments as CaseComment[];

describe('comments on a case', () => {
  it('lets members comment on a published case, rendered with the board’s names as links', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const commenter = await t.agentAs('member');
    const written = await writeCase(author, slug);
    const res = await commenter.post(`/api/cases/${written.id}/comments`).send({ body: 'Check **C2** too, it sits on VSYS.' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.comment).toMatchObject({ caseId: written.id, author: { id: commenter.user.id }, deleted: false, editedAt: null });
    expect(res.body.comment.html).toContain(`<a href="/boards/${slug}/components/C2" class="part-link" rel="nofollow noopener noreferrer">C2</a>`);
    expect(res.body.comment.html).toContain(`href="/boards/${slug}/nets/VSYS"`);
    expect((await thread(written.id)).map((c) => c.body)).toEqual(['Check **C2** too, it sits on VSYS.']);
    expect((await anonymous().get(`/api/cases/${written.id}`)).body.case.commentCount).toBe(1);

    expect((await t.agent().post(`/api/cases/${written.id}/comments`).send({ body: 'anonymous' })).status).toBe(401);
    const empty = await commenter.post(`/api/cases/${written.id}/comments`).send({ body: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.details.issues).toEqual([{ field: 'body', message: 'write something' }]);
  });

  it('takes no comments on a draft', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const draft = await writeCase(author, slug, { status: 'draft' });
    const res = await author.post(`/api/cases/${draft.id}/comments`).send({ body: 'note to self' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('not_published');
  });

  it('lets the author edit and delete their comment, leaving a placeholder in the thread', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const commenter = await t.agentAs('member');
    const written = await writeCase(author, slug);
    const { comment } = (await commenter.post(`/api/cases/${written.id}/comments`).send({ body: 'first try' })).body;
    const edited = await commenter.patch(`/api/comments/${comment.id}`).send({ body: 'second try' });
    expect(edited.status).toBe(200);
    expect(edited.body.comment.body).toBe('second try');
    expect(edited.body.comment.editedAt).not.toBeNull();

    expect((await commenter.delete(`/api/comments/${comment.id}`)).status).toBe(204);
    expect(await thread(written.id)).toEqual([expect.objectContaining({ id: comment.id, deleted: true, body: '', html: '' })]);
    expect((await anonymous().get(`/api/cases/${written.id}`)).body.case.commentCount).toBe(0);
    expect((await commenter.patch(`/api/comments/${comment.id}`).send({ body: 'back again' })).status).toBe(404);
    expect((await commenter.delete(`/api/comments/${comment.id}`)).status).toBe(404);
  });

  it('refuses a member changing another’s comment by id (403) and lets a moderator do it, with an audit row', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const commenter = await t.agentAs('member');
    const other = await t.agentAs('member');
    const moderator = await t.agentAs('moderator');
    const written = await writeCase(author, slug);
    const { comment } = (await commenter.post(`/api/cases/${written.id}/comments`).send({ body: 'Buy my repair service at example.net' })).body;

    const edit = await other.patch(`/api/comments/${comment.id}`).send({ body: 'rewritten by someone else' });
    expect(edit.status).toBe(403);
    expect(edit.body.error.message).toBe('You can only edit your own comments');
    expect((await other.delete(`/api/comments/${comment.id}`)).status).toBe(403);
    // even the case's author may not change the comments under it
    expect((await author.delete(`/api/comments/${comment.id}`)).status).toBe(403);
    expect((await t.agent().delete(`/api/comments/${comment.id}`)).status).toBe(401);
    expect((await thread(written.id))[0]!.body).toBe('Buy my repair service at example.net');

    const moderated = await moderator.patch(`/api/comments/${comment.id}`).send({ body: '(advertising removed)', reason: 'advertising' });
    expect(moderated.status).toBe(200);
    expect((await moderator.delete(`/api/comments/${comment.id}?reason=spam`)).status).toBe(204);
    const { rows } = await t.pool.query(
      "SELECT action, actor_id, reason FROM audit_log WHERE target_type = 'comment' AND target_id = $1 ORDER BY id",
      [String(comment.id)],
    );
    expect(rows).toEqual([
      { action: 'comment.edit', actor_id: moderator.user.id, reason: 'advertising' },
      { action: 'comment.delete', actor_id: moderator.user.id, reason: 'spam' },
    ]);
  });
});

describe('Markdown in GET /api/cases/:id', () => {
  // Vectors from the OWASP XSS Filter Evasion Cheat Sheet (cheatsheetseries.owasp.org), put where a
  // technician's write-up can carry them: raw HTML, and Markdown links and autolinks.
  const vectors = [
    '<SCRIPT SRC=https://xss.example/xss.js></SCRIPT>',
    '<IMG SRC="javascript:alert(\'XSS\');">',
    '<IMG SRC=x onerror="alert(String.fromCharCode(88,83,83))">',
    '<svg/onload=alert(1)>',
    '<a onmouseover="alert(document.cookie)">xxs link</a>',
    '<IFRAME SRC="javascript:alert(\'XSS\');"></IFRAME>',
    '[x](javascript:alert(1))',
    '[x](JaVaScRiPt:alert(1))',
    '[x](&#106;&#97;&#118;&#97;&#115;&#99;&#114;&#105;&#112;&#116;&#58;alert(1))',
    '[x](jav&#x09;ascript:alert(1))',
    '[x](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)',
    '[x](vbscript:msgbox(1))',
    '<javascript:alert(1)>',
    '[ref][evil]\n\n[evil]: javascript:alert(1)',
    '&lt;script&gt;alert(1)&lt;/script&gt;',
  ];

  it('renders each XSS vector as harmless text, keeping the source as written', async () => {
    const slug = await casebookBoard(t);
    const author = await t.agentAs('member');
    const body = vectors.join('\n\n');
    const written = await writeCase(author, slug, { body, rootCause: '<img src=x onerror=alert(1)> on VSYS' });
    const detail = (await anonymous().get(`/api/cases/${written.id}`)).body.case as CaseDetail;
    expect(detail.body).toBe(body);
    for (const html of [detail.html.body, detail.html.rootCause]) {
      expect(html).not.toMatch(/<(script|img|svg|iframe)/i);
      // no tag carries an event-handler attribute
      expect(html).not.toMatch(/<[a-z][^>]*\son[a-z]+\s*=/i);
      for (const [, href] of html.matchAll(/href="([^"]*)"/g)) {
        expect(new URL(href!, 'https://railyard.invalid').protocol).toMatch(/^(https?|mailto):$/);
      }
    }
    // shown as text, not dropped: the reader sees what was written
    expect(detail.html.body).toContain('<p>&lt;SCRIPT SRC=');
    expect(detail.html.body).toContain('<p>&lt;IMG SRC=x onerror="alert(String.fromCharCode(88,83,83))"&gt;</p>');
    expect(detail.html.body).toContain('<p>[x](JaVaScRiPt:alert(1))</p>');
    expect(detail.html.rootCause).toContain(`&lt;img src=x onerror=alert(1)&gt; on <a href="/boards/${slug}/nets/VSYS"`);
  });
});
