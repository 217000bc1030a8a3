// A part's own page in Debian's Chromium against the real app: reached from a rail's parts table and
// from a case's text, showing the part's pins, and leading on to the nets they sit on.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CaseDetail } from '@railyard/shared';
import { writeCase } from '../api/casebook-fixtures';
import { launchBrowser, startWebServer } from '../support/browser';
import { importPinList } from '../support/pin-list-board';
import { uniqueSlug } from '../support/test-app';

// The reference for pin order: ICU's collation with numeric ordering (ECMA-402 Intl.Collator).
const naturalOrder = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

// U1's rows out of order, so text order (10 before 2) and the natural order differ.
const u1Pins: [pin: string, net: string][] = [
  ['10', 'VSYS'],
  ['2', 'VBAT'],
  ['1', 'VBAT'],
  ['11', 'I2C_SDA'],
  ['3', 'GND'],
  ['12', 'N/C'],
  ['9', 'VCC_1V8'],
  ['EP', 'GND'],
  ['4', 'VSYS'],
];
const csv = [
  'refdes,pin,net',
  'J1,1,GND',
  'J1,2,VBAT',
  ...u1Pins.map(([pin, net]) => `U1,${pin},${net}`),
  'C1,1,VSYS',
  'C1,2,GND',
  'C2,1,VCC_1V8',
  'C2,2,GND',
  'R1,1,VCC_1V8',
  'R1,2,I2C_SDA',
].join('\n');

const slug = uniqueSlug('partpage');
let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;
let written: CaseDetail;

beforeAll(async () => {
  web = await startWebServer();
  const admin = await web.agentAs('admin');
  const annotations = JSON.stringify({
    format: 'railyard-annotations',
    version: 1,
    rootNet: 'VBAT',
    nets: [
      { name: 'VSYS', kind: 'power', nominalVoltage: 3.85 },
      { name: 'VCC_1V8', kind: 'power', nominalVoltage: 1.8 },
    ],
    powerLinks: [{ from: 'VSYS', to: 'VCC_1V8', via: 'U1', kind: 'converter' }],
  });
  await importPinList(admin, slug, csv, { annotations, board: { title: `Part page board ${slug}` } });
  const member = await web.agentAs('member');
  written = await writeCase(member, slug, {
    title: 'VSYS short to ground, converter U1 cooked',
    rootCause: 'U1 shorted VSYS to ground inside the package.',
    components: [{ refdes: 'U1', culprit: true }],
  });
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await web?.stop();
});

async function newTab() {
  const context = await browser.newContext({
    viewport: { width: 1440, height: 900 },
    reducedMotion: 'reduce',
  });
  const page = await context.newPage();
  const problems = { console: [] as string[], uncaught: [] as string[] };
  page.on('console', (message) => {
    if (message.type() === 'error') problems.console.push(message.text().slice(0, 200));
  });
  page.on('pageerror', (error) => problems.uncaught.push(error.message));
  return { page, problems, close: () => context.close() };
}

const partUrl = () => `${web.baseUrl}/boards/${slug}/components/U1`;

async function expectPartPage(page: Page) {
  await page.waitForURL(partUrl());
  await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('U1');
}

describe('a part’s page in the browser', () => {
  it('opens from a rail’s parts table, lists the pins in natural order with ground marked, and leads to a pin’s net', async () => {
    const tab = await newTab();
    const { page } = tab;
    await page.goto(`${web.baseUrl}/boards/${slug}/nets/VSYS`);
    const parts = page.getByRole('table', { name: 'Parts with a pin on VSYS' });
    await parts.getByRole('link', { name: 'U1', exact: true }).click();
    await expectPartPage(page);

    const pins = page.getByRole('table', { name: 'Pins of U1 and their nets' });
    await expect
      .poll(() => pins.getByRole('rowheader').allTextContents())
      .toEqual(u1Pins.map(([pin]) => pin).sort(naturalOrder.compare));
    // every pin on the net the pin list gives it; ground pins say so, the unconnected one has no net
    for (const [pin, net] of u1Pins) {
      const row = pins
        .getByRole('row')
        .filter({ has: page.getByRole('rowheader', { name: pin, exact: true }) });
      const cells = await row.getByRole('cell').allTextContents();
      expect(cells[0], `pin ${pin}`).toBe(net === 'N/C' ? 'not connected' : net);
      expect(cells[1] === 'ground', `pin ${pin} marked ground`).toBe(net === 'GND');
    }
    await expect
      .poll(() => page.getByText('the culprit in').textContent())
      .toContain('1 solved case');
    const cases = page.getByRole('region', { name: 'Cases naming this part' });
    await expect.poll(() => cases.getByRole('link', { name: written.title }).count()).toBe(1);
    // U1 is the converter the annotations put between VSYS and VCC_1V8
    const links = page.getByRole('list', { name: 'Power links through U1' });
    await expect.poll(() => links.getByRole('listitem').allTextContents()).toEqual([
      expect.stringMatching(/^VSYS\s*VCC_1V8\s*converter$/),
    ]);

    const ninth = pins
      .getByRole('row')
      .filter({ has: page.getByRole('rowheader', { name: '9', exact: true }) });
    await ninth.getByRole('link', { name: 'VCC_1V8' }).click();
    await page.waitForURL(`${web.baseUrl}/boards/${slug}/nets/VCC_1V8`);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('VCC_1V8');
    expect(tab.problems.uncaught).toEqual([]);
    expect(tab.problems.console).toEqual([]);
    await tab.close();
  });

  it('opens from a part named in a case’s text, and Back returns to the case', async () => {
    const tab = await newTab();
    const { page } = tab;
    await page.goto(`${web.baseUrl}/cases/${written.id}`);
    const link = page.locator('a.part-link', { hasText: 'U1' }).first();
    // the part's own address, not the board's page with a query
    expect(await link.getAttribute('href')).toBe(`/boards/${slug}/components/U1`);
    await link.click();
    await expectPartPage(page);
    await page.goBack();
    await page.waitForURL(`${web.baseUrl}/cases/${written.id}`);
    await tab.close();
  });

  it('takes an old ?component= link to the part’s page in any letter case, leaving no stop in the history', async () => {
    const tab = await newTab();
    const { page } = tab;
    await page.goto(`${web.baseUrl}/boards`);
    await page.goto(`${web.baseUrl}/boards/${slug}?component=u1`);
    await expectPartPage(page);
    await page.goBack();
    await page.waitForURL(`${web.baseUrl}/boards`);
    expect(tab.problems.uncaught).toEqual([]);
    await tab.close();
  });
});
