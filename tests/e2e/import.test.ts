import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, signInInBrowser, startWebServer } from '../support/browser';
import { boardRowCounts, createUser, uniqueSlug } from '../support/test-app';

const fixture = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../api/fixtures/sample-356a.ipc');
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

async function fillNewBoard(page: import('playwright-core').Page, slug: string, file: { name: string; buffer: Buffer }) {
  const admin = await createUser(web, 'admin');
  await signInInBrowser(page, web.baseUrl, admin.login, '/import');
  await page.getByLabel('Title').fill(`Upload ${slug}`);
  await page.getByLabel('Slug').fill(slug);
  await page.getByLabel('Netlist', { exact: true }).setInputFiles({ ...file, mimeType: 'text/plain' });
  await page.getByRole('button', { name: /upload and import/i }).click();
}

describe('importing a board in the browser', () => {
  it('uploads a netlist, follows the server progress to the end and opens the new board', async () => {
    const page = await browser.newPage();
    const slug = uniqueSlug('web-import');
    await fillNewBoard(page, slug, { name: 'sample.ipc', buffer: readFileSync(fixture) });
    const status = page.getByRole('region', { name: 'Import status' });
    await expect.poll(() => status.getByText('finished').count(), { timeout: 15_000 }).toBe(1);
    await page.getByRole('link', { name: 'Open the board' }).click();
    await page.waitForURL(`${web.baseUrl}/boards/${slug}`);
    expect(await boardRowCounts(web.pool, slug)).toMatchObject({ boards: 1, nets: 5, pins: 6 });
    await page.close();
  });

  it('lists every error of a refused file by line and field, and stores nothing', async () => {
    const page = await browser.newPage();
    const slug = uniqueSlug('web-refused');
    const broken = readFileSync(fixture, 'utf8').replace('X+008500', 'X+0A8500');
    const line = broken.split('\n').findIndex((l) => l.includes('X+0A8500')) + 1;
    await fillNewBoard(page, slug, { name: 'broken.ipc', buffer: Buffer.from(broken) });
    const errors = page.locator('section', { has: page.getByText('Errors', { exact: false }) }).getByRole('row');
    await expect.poll(() => errors.filter({ hasText: "X coordinate '+0A8500'" }).count()).toBe(1);
    const row = errors.filter({ hasText: "X coordinate '+0A8500'" });
    expect(await row.textContent()).toContain(String(line));
    expect(await boardRowCounts(web.pool, slug)).toMatchObject({ boards: 0 });
    await page.close();
  });
});
