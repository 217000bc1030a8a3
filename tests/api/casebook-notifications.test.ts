// Casebook actions that tell a case's author by e-mail: the outbox row is written with the action, the
// worker (driven here by hand) sends it to the app's local mail catcher.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { casebookBoard, writeCase } from './casebook-fixtures';

let t: TestApp;
let slug: string;

beforeAll(async () => {
  t = await createTestApp();
  await t.app.notifications.start();
  slug = await casebookBoard(t, 'notify');
});
afterAll(async () => {
  await t.close();
});

const emailOf = (login: string) => `${login}@example.com`;
/** a moment after every row's database-clock timestamps, so all queued rows are due */
const soon = () => new Date(Date.now() + 5_000);

async function outboxOf(userId: number) {
  const { rows } = await t.pool.query<{ kind: string; status: string; payload: Record<string, unknown> }>(
    'SELECT kind, status, payload FROM notification_outbox WHERE user_id = $1 ORDER BY id',
    [userId],
  );
  return rows;
}

describe('casebook notifications', () => {
  it('mails the author when another member comments on their case', async () => {
    const author = await t.agentAs('member');
    const reader = await t.agentAs('member');
    const theCase = await writeCase(author, slug, { title: 'VSYS short after a liquid spill' });

    const res = await reader.post(`/api/cases/${theCase.id}/comments`).send({ body: 'Check C2 as well, it sits next to C1.' });
    expect(res.status).toBe(201);
    await t.app.notifications.worker!.sendPending(soon());

    const mail = await t.app.notifications.catcher!.waitFor((m) => m.envelopeTo.includes(emailOf(author.user.login)));
    expect(mail.subject).toContain('VSYS short after a liquid spill');
    expect(mail.text).toContain('Check C2 as well');
    expect(mail.text).toContain(`/cases/${theCase.id}#comment-${res.body.comment.id}`);
    expect(await outboxOf(author.user.id)).toEqual([expect.objectContaining({ kind: 'case_commented', status: 'sent' })]);
  });

  it('queues nothing when the author comments on their own case', async () => {
    const author = await t.agentAs('member');
    const theCase = await writeCase(author, slug);

    const res = await author.post(`/api/cases/${theCase.id}/comments`).send({ body: 'Update: C2 was fine.' });

    expect(res.status).toBe(201);
    expect(await outboxOf(author.user.id)).toEqual([]);
  });

  it('mails the author once when a member confirms the fix, not again when the note changes', async () => {
    const author = await t.agentAs('member');
    const confirmer = await t.agentAs('member');
    const theCase = await writeCase(author, slug, { title: 'Dead board, C1 shorted VSYS' });

    expect((await confirmer.post(`/api/cases/${theCase.id}/confirmation`).send({ note: 'Same on mine.' })).status).toBe(201);
    expect((await confirmer.post(`/api/cases/${theCase.id}/confirmation`).send({ note: 'Same on two boards.' })).status).toBe(200);
    await t.app.notifications.worker!.sendPending(soon());

    const mail = await t.app.notifications.catcher!.waitFor((m) => m.envelopeTo.includes(emailOf(author.user.login)));
    expect(mail.subject).toContain('Dead board, C1 shorted VSYS');
    const rows = await outboxOf(author.user.id);
    expect(rows).toEqual([expect.objectContaining({ kind: 'case_confirmed', status: 'sent' })]);
    expect(rows[0]!.payload).toMatchObject({ caseId: theCase.id, note: 'Same on mine.' });
  });

  it('sends nothing to an author whose notifications are off', async () => {
    const author = await t.agentAs('member');
    const reader = await t.agentAs('member');
    expect((await author.put('/api/me/notifications').send({ mode: 'off' })).status).toBe(200);
    const theCase = await writeCase(author, slug);

    await reader.post(`/api/cases/${theCase.id}/comments`).send({ body: 'Did you check U1 too?' });
    await reader.post(`/api/cases/${theCase.id}/confirmation`).send({ note: '' });
    await t.app.notifications.worker!.sendPending(soon());

    const rows = await outboxOf(author.user.id);
    expect(rows.map((r) => [r.kind, r.status])).toEqual([
      ['case_commented', 'skipped'],
      ['case_confirmed', 'skipped'],
    ]);
    expect(t.app.notifications.catcher!.messages().some((m) => m.envelopeTo.includes(emailOf(author.user.login)))).toBe(false);
  });
});
