// A member chooses how Railyard e-mails them and reads the mail the server caught, in Debian's
// Chromium against the real app (its Content Security Policy included), signed in through the local
// fake GitHub. The test app has no SMTP_URL, so its mail goes to the local mail catcher.
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { casebookBoard, writeCase } from '../api/casebook-fixtures';
import { launchBrowser, signInInBrowser, startWebServer } from '../support/browser';
import { createUser } from '../support/test-app';

/**
 * Waits for the page to show what the server now holds. Each step is a request and a redraw, which
 * on a busy test machine takes longer than vitest's default second.
 */
const poll = <T>(check: () => T | Promise<T>) => expect.poll(check, { timeout: 10_000 });

/** a moment after every row's database-clock timestamps, so all queued rows are due */
const soon = () => new Date(Date.now() + 5_000);

let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;

beforeAll(async () => {
  web = await startWebServer();
  // the outbox worker does not tick in tests; the mail test sends by hand once the comment is in
  await web.app.notifications.start();
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await web?.stop();
});

describe('e-mail settings in the browser', () => {
  it('keeps a member’s choice of the daily digest after a reload, and the API holds it too', async () => {
    const member = await createUser(web, 'member');
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, member.login, '/settings/notifications');

    await poll(() => page.getByRole('region', { name: 'Where mail goes' }).textContent()).toContain(
      `${member.login}@example.com`,
    );
    expect(await page.getByRole('radio', { name: 'Each as it happens' }).isChecked()).toBe(true);
    await page.getByRole('radio', { name: 'One daily digest' }).check();
    await page.getByRole('button', { name: 'Save' }).click();
    await poll(() => page.getByRole('status').textContent()).toBe('Saved: one daily digest.');

    await page.reload();
    const digest = page.getByRole('radio', { name: 'One daily digest' });
    await poll(() => digest.isChecked()).toBe(true);
    expect(await page.getByRole('radio', { name: 'Each as it happens' }).isChecked()).toBe(false);
    // The page's own session asks the API, as the page does.
    const stored = await page.evaluate(() =>
      fetch('/api/me/notifications', { headers: { Accept: 'application/json' } }).then((r) =>
        r.json(),
      ),
    );
    expect(stored).toEqual({ mode: 'daily_digest', email: `${member.login}@example.com` });
    await page.close();
  });

  it('asks a visitor to sign in first and brings them back to the settings', async () => {
    const visitor = await browser.newPage();
    await visitor.goto(`${web.baseUrl}/settings/notifications`);
    const signIn = visitor
      .getByRole('region', { name: /needs the member role/ })
      .getByRole('link', { name: 'Sign in with GitHub' });
    await poll(() => signIn.getAttribute('href')).toBe(
      '/auth/github?returnTo=%2Fsettings%2Fnotifications',
    );
    await visitor.close();
  });
});

describe('the development mailbox in the browser', () => {
  it('starts at the member’s own address, empty, and shows a comment’s mail with a link to it', async () => {
    const slug = await casebookBoard(web, 'mailbox');
    const author = await web.agentAs('member');
    const theCase = await writeCase(author, slug, { title: 'VCC_1V8 missing, U2 cold' });
    const address = `${author.user.login}@example.com`;
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, author.user.login, '/');

    // The account menu offers the mailbox, since this server keeps one.
    await page.getByRole('button', { name: /^Account:/ }).click();
    await page.getByRole('link', { name: /^Mailbox/ }).click();
    await page.waitForURL(`${web.baseUrl}/mailbox`);
    await poll(() => page.getByLabel('Recipient').inputValue()).toBe(address);
    await poll(() => page.getByRole('region', { name: 'No mail' }).textContent()).toContain(
      `No mail to ${address} yet`,
    );

    const reader = await web.agentAs('member');
    const comment = await reader
      .post(`/api/cases/${theCase.id}/comments`)
      .send({ body: 'Check C3 for a short before blaming U2.' });
    expect(comment.status).toBe(201);
    await web.app.notifications.worker!.sendPending(soon());

    // The page looks again by itself.
    const message = page.getByRole('article', {
      name: 'Message: New comment on "VCC_1V8 missing, U2 cold"',
    });
    await poll(() => message.count()).toBe(1);
    expect(await message.getByRole('region', { name: 'Text part' }).textContent()).toContain(
      'Check C3 for a short before blaming U2.',
    );
    // the HTML part, in its sandboxed frame, as sent
    const htmlPart = message.frameLocator('iframe[sandbox=""]');
    await poll(() => htmlPart.getByText('Check C3 for a short before blaming U2.').count()).toBe(1);
    const link = message
      .getByRole('region', { name: 'Links in this message' })
      .getByRole('link', { name: 'Read the comment' });
    await link.click();
    await page.waitForURL(
      `${web.baseUrl}/cases/${theCase.id}#comment-${comment.body.comment.id as number}`,
    );
    await page.close();
  });
});
