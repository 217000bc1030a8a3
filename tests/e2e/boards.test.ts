import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, startWebServer } from '../support/browser';
import { uniqueSlug } from '../support/test-app';

const here = path.dirname(fileURLToPath(import.meta.url));
let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;
const slug = uniqueSlug('browse');
const title = `Browse test board ${slug}`;

beforeAll(async () => {
  web = await startWebServer();
  const admin = await web.agentAs('admin');
  const res = await admin
    .post(`/api/boards/${slug}/imports?wait=true`)
    .field('board', JSON.stringify({ title, deviceFamily: 'Test family' }))
    .attach('netlist', path.join(here, '../api/fixtures/sample-356a.ipc'));
  expect(res.status).toBe(201);
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await web?.stop();
});

describe('boards in the browser', () => {
  it('starts from the boards page, opens a board and shows its nets', async () => {
    const page = await browser.newPage();
    await page.goto(`${web.baseUrl}/`);
    await page.getByRole('link', { name: new RegExp(title) }).first().click();
    await page.waitForURL(`${web.baseUrl}/boards/${slug}`);
    await expect.poll(() => page.getByRole('heading', { name: title }).count()).toBeGreaterThan(0);
    const table = page.getByRole('table');
    await expect.poll(() => table.getByText('VBAT', { exact: true }).count()).toBeGreaterThan(0);
    await expect.poll(() => table.getByText('3V3_LDO_FEEDBACK_DIVIDER', { exact: true }).count()).toBe(1);
    await page.close();
  });
});
