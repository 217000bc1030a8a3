// An administrator changes someone's role on the admin page and finds the change in the audit log,
// in Debian's Chromium against the real app, signed in through the local fake GitHub.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, signInInBrowser, startWebServer } from '../support/browser';
import { createUser } from '../support/test-app';

/**
 * Waits for the page to show what the server now holds. Each step is a request and a redraw, which
 * on a busy test machine takes longer than vitest's default second.
 */
const poll = <T>(check: () => T | Promise<T>) => expect.poll(check, { timeout: 10_000 });

let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;

beforeAll(async () => {
  web = await startWebServer();
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await web?.stop();
});

/** The people table's row of one login, found through the page's own filter. */
async function personRow(page: Page, login: string) {
  await page.getByLabel('Filter people by login, name or e-mail').fill(login);
  return page.getByRole('row', { name: login, exact: true });
}

describe('administration in the browser', () => {
  it('makes a member a moderator with a reason, and the audit log says who, what and why', async () => {
    const admin = await createUser(web, 'admin');
    const member = await createUser(web, 'member');
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, admin.login, '/admin');

    const row = await personRow(page, member.login);
    await row.getByRole('button', { name: 'Change role' }).click();
    const dialog = page.getByRole('dialog', { name: `Change the role of ${member.login}` });
    await dialog.getByRole('radio', { name: /moderator/ }).check();
    await dialog.getByLabel('Reason').fill('leads the evening bench');
    await dialog.getByRole('button', { name: 'Change the role' }).click();

    await poll(() => dialog.isVisible()).toBe(false);
    await poll(() => row.getByText('moderator', { exact: true }).count()).toBe(1);
    const entry = page
      .getByRole('region', { name: 'Audit log' })
      .getByRole('row')
      .filter({ hasText: member.login });
    await poll(() => entry.count()).toBe(1);
    const text = await entry.textContent();
    expect(text).toContain(admin.login);
    expect(text).toContain('changed the role of');
    expect(text).toContain('leads the evening bench');
    expect(text).toContain('member → moderator');
    // The server holds the same: the role and its audit row.
    const { rows } = await web.pool.query(
      "SELECT u.role, a.actor_id, a.reason FROM users u JOIN audit_log a ON a.target_id = u.id::text AND a.action = 'user.role' WHERE u.id = $1",
      [member.id],
    );
    expect(rows).toEqual([
      { role: 'moderator', actor_id: admin.id, reason: 'leads the evening bench' },
    ]);
    await page.close();
  });

  it('shows the server’s refusal when an admin tries to ban themself', async () => {
    const admin = await createUser(web, 'admin');
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, admin.login, '/admin');

    const row = await personRow(page, admin.login);
    await row.getByRole('button', { name: 'Ban' }).click();
    const dialog = page.getByRole('dialog', { name: `Ban ${admin.login}` });
    await dialog.getByLabel('Reason').fill('seeing what happens');
    await dialog.getByRole('button', { name: 'Ban' }).click();

    await poll(() => dialog.getByRole('alert').textContent()).toBe(
      'You cannot ban or demote yourself',
    );
    const { rows } = await web.pool.query('SELECT banned_at FROM users WHERE id = $1', [admin.id]);
    expect(rows).toEqual([{ banned_at: null }]);
    await page.close();
  });

  it('tells a member that the page needs the admin role, and a visitor to sign in', async () => {
    const member = await createUser(web, 'member');
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, member.login, '/admin');
    const notice = page.getByRole('region', {
      name: 'The administration page needs the admin role',
    });
    await poll(() => notice.textContent()).toContain(`signed in as ${member.login}`);
    await page.getByRole('button', { name: /^Account:/ }).click();
    await poll(() => page.getByRole('button', { name: 'Sign out' }).count()).toBe(1);
    expect(await page.getByRole('link', { name: 'Administration' }).count()).toBe(0);

    const visitor = await browser.newPage();
    await visitor.goto(`${web.baseUrl}/import`);
    const signIn = visitor
      .getByRole('region', { name: 'Importing boards needs the admin role' })
      .getByRole('link', { name: 'Sign in with GitHub' });
    await poll(() => signIn.getAttribute('href')).toBe('/auth/github?returnTo=%2Fimport');
    await page.close();
    await visitor.close();
  });
});
