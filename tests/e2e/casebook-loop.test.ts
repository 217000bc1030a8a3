// The casebook's whole loop in Debian's Chromium against the real app, each person signed in through
// the local fake GitHub in a browser context of their own: a technician finds a rail, writes up the
// fix with a photo, a peer upvotes and comments, the author reads the mail in the development
// mailbox, and a moderator merges a duplicate write-up into it, after which the old address leads to
// the kept case.
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CaseDetail } from '@railyard/shared';
import { casebookBoard, writeCase } from '../api/casebook-fixtures';
import { launchBrowser, signInInBrowser, startWebServer } from '../support/browser';
import { samplePng } from '../support/sample-files';
import { createUser } from '../support/test-app';

/** Each step is a request and a redraw, which on a busy test machine takes longer than a second. */
const poll = <T>(check: () => T | Promise<T>) => expect.poll(check, { timeout: 15_000 });

/** a moment after every row's database-clock timestamps, so all queued rows are due */
const soon = () => new Date(Date.now() + 5_000);

let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;
const contexts: BrowserContext[] = [];

beforeAll(async () => {
  web = await startWebServer();
  // the outbox worker does not tick in tests; the test sends the queued mail when the comment is in
  await web.app.notifications.start();
  browser = await launchBrowser();
});

afterAll(async () => {
  await Promise.all(contexts.map((c) => c.close()));
  await browser?.close();
  await web?.stop();
});

/** A person's own browser (cookies apart from everyone else's), signed in and on `returnTo`. */
async function personAt(login: string, returnTo: string): Promise<Page> {
  const context = await browser.newContext();
  contexts.push(context);
  const page = await context.newPage();
  await signInInBrowser(page, web.baseUrl, login, returnTo);
  return page;
}


describe('the casebook loop in the browser', () => {
  it('goes from a rail search to a written-up fix, a vote, a comment, its mail and a merged duplicate', async () => {
    const slug = await casebookBoard(web, 'loop');
    const author = await createUser(web, 'member');
    const peer = await createUser(web, 'member');
    const moderator = await createUser(web, 'moderator');
    const title = 'Dead on the bench, VSYS shorted by C2';

    // The technician finds the rail from the board page's rail search and opens it.
    const tech = await personAt(author.login, `/boards/${slug}`);
    await tech.getByPlaceholder('Find a rail, e.g. 3v3').fill('vsys');
    await tech.getByRole('listbox', { name: 'Rails on this board' }).getByRole('option', { name: /VSYS/ }).first().click();
    await tech.waitForURL(`${web.baseUrl}/boards/${slug}/nets/VSYS`);

    // … and writes the fix up from the rail's page: the rail comes along, the capacitor is the culprit.
    await tech.getByRole('link', { name: 'Write one up' }).click();
    await tech.waitForURL(/\/cases\/new\?net=VSYS$/);
    await poll(() => tech.getByRole('list', { name: 'Nets of this case' }).textContent()).toContain('VSYS');
    await tech.getByLabel('Title').fill(title);
    await tech.getByLabel('Symptom').fill('No power-on; bench supply hits its 1 A limit at once');
    // the outcome's radio sits inside its label, drawn as a button: a person clicks the label
    await tech.locator('label').filter({ hasText: /^\s*solved\s*$/ }).click();
    expect(await tech.getByRole('radio', { name: 'solved', exact: true }).isChecked()).toBe(true);
    const parts = tech.getByLabel('Parts', { exact: true });
    await parts.fill('C2');
    await parts.press('Enter');
    await tech.getByRole('checkbox', { name: 'C2 was the culprit' }).check();
    await tech.getByLabel('Root cause').fill('C2 cracked and shorted VSYS to ground.');
    await tech.getByLabel('Fix steps').fill('1. Disconnect the battery.\n2. Inject 1 V at 1 A on VSYS; C2 warmed first.\n3. Replace C2.');
    await tech.getByRole('button', { name: 'Publish' }).click();
    await tech.waitForURL(/\/cases\/\d+$/);
    const caseId = Number(new URL(tech.url()).pathname.split('/').pop());
    await poll(() => tech.getByRole('heading', { level: 1 }).textContent()).toContain(title);

    // A photo of the board goes with it.
    await tech.getByLabel('Add photos, thermal images or scope captures').setInputFiles({
      name: 'board-top.png',
      mimeType: 'image/png',
      buffer: await samplePng(320, 240),
    });
    await tech.getByRole('button', { name: 'Attach' }).click();
    await poll(() => tech.getByRole('link', { name: /board-top\.png/ }).count()).toBeGreaterThan(0);

    const written = (await (await web.agent().get(`/api/cases/${caseId}`)).body.case) as CaseDetail;
    expect(written).toMatchObject({ status: 'published', outcome: 'solved', title });
    expect(written.components).toEqual([{ refdes: 'C2', culprit: true }]);
    expect(written.nets).toContain('VSYS');
    const attachments = await web.agent().get(`/api/cases/${caseId}/attachments`);
    expect(attachments.body.attachments).toHaveLength(1);
    expect(attachments.body.attachments[0]).toMatchObject({ name: 'board-top.png', contentType: 'image/png' });

    // A second technician upvotes the fix and comments on it.
    const second = await personAt(peer.login, `/cases/${caseId}`);
    await second.getByRole('button', { name: /^The fix is good, 0/ }).click();
    await poll(() => second.getByRole('button', { name: /^The fix is good, 1, your vote/ }).count()).toBe(1);
    await second.getByLabel('Add a comment').fill('Same here on a second board: C2 again, VSYS back to 0.38 V in diode mode.');
    await second.getByRole('button', { name: 'Post the comment' }).click();
    await poll(() => second.getByText('Same here on a second board').count()).toBe(1);

    // The author reads the mail about the comment in the development mailbox, once the outbox worker
    // has sent it (it does not tick in tests: each look sends what is due).
    const authorAddress = `${author.login}@example.com`;
    const subject = `New comment on "${title}"`;
    await poll(async () => {
      await web.app.notifications.worker!.sendPending(soon());
      const caught = await web.agent().get(`/api/dev/mailbox?to=${encodeURIComponent(authorAddress)}`);
      const subjects = (caught.body.messages as { subject: string }[]).map((m) => m.subject);
      if (subjects.includes(subject)) return subjects;
      // what the outbox holds for the author, so a failure says where the mail stopped
      const { rows } = await web.pool.query(
        'SELECT o.kind, o.status, o.attempts, o.last_error, u.email FROM notification_outbox o JOIN users u ON u.id = o.user_id WHERE u.login = $1',
        [author.login],
      );
      return { subjects, outbox: rows };
    }).toContainEqual(subject);
    await tech.goto(`${web.baseUrl}/mailbox`);
    await poll(() => tech.getByLabel('Recipient').inputValue()).toBe(authorAddress);
    const mail = tech.getByRole('article', { name: `Message: ${subject}` });
    await poll(() => mail.count()).toBe(1);
    expect(await mail.getByRole('region', { name: 'Text part' }).textContent()).toContain('C2 again');

    // Someone else wrote the same fault up; a moderator merges that duplicate into this case.
    const other = await web.agentAs('member');
    const duplicate = await writeCase(other, slug, {
      title: 'VSYS short to ground, no boot',
      components: [{ refdes: 'C2', culprit: true }],
    });
    const mod = await personAt(moderator.login, `/cases/${duplicate.id}`);
    await mod.getByRole('button', { name: 'Merge into another case…' }).click();
    await mod.getByLabel('Find the case to keep').fill(`#${caseId}`);
    await mod.getByRole('button', { name: new RegExp(`#${caseId}`) }).first().click();
    await mod.getByLabel('Why you merge them').fill('Same shorted capacitor on VSYS, written up twice');
    await mod.getByRole('button', { name: `Merge into #${caseId}` }).click();
    await mod.waitForURL(new RegExp(`/cases/${caseId}(\\?|$)`));

    // The duplicate's old address now leads to the kept case, which says where the reader came from.
    const reader = await personAt(peer.login, `/`);
    await reader.goto(`${web.baseUrl}/cases/${duplicate.id}`);
    await reader.waitForURL(`${web.baseUrl}/cases/${caseId}?mergedFrom=${duplicate.id}`);
    await poll(() => reader.getByRole('note').filter({ hasText: 'was merged into this one' }).textContent()).toContain(
      `#${duplicate.id}`,
    );
    const kept = (await web.agent().get(`/api/cases/${caseId}`)).body.case as CaseDetail;
    expect(kept.mergedFrom).toEqual([{ id: duplicate.id, title: 'VSYS short to ground, no boot' }]);
    // the duplicate's author hears of it too
    await web.app.notifications.worker!.sendPending(soon());
    const merged = await web.agent().get(`/api/dev/mailbox?to=${encodeURIComponent(`${other.user.login}@example.com`)}`);
    expect(merged.body.messages.map((m: { subject: string }) => m.subject)).toContainEqual(
      expect.stringContaining('was merged into'),
    );
  });
});
