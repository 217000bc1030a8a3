// A moderator edits a rail's power links on its page, in Debian's Chromium against the real app:
// signed in through the local fake GitHub, every write a same-origin JSON request the API checks.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, signInInBrowser, startWebServer } from '../support/browser';
import { importPinList } from '../support/pin-list-board';
import { createUser, uniqueSlug } from '../support/test-app';

/**
 * Waits for the page to show what the server now holds. Each step is a request and a redraw, which
 * on a busy test machine takes longer than vitest's default second.
 */
const poll = <T>(check: () => T | Promise<T>) => expect.poll(check, { timeout: 10_000 });

let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;

// Battery → load switch U1 → system rail → buck U2 → 1.8 V rail. The netlist says which pins share
// a net; only the annotations say power flows VBAT → VSYS through U1, so a moderator adds the rest.
const pins = [
  'refdes,pin,net',
  'J1,1,GND',
  'J1,2,VBAT',
  'U1,1,VBAT',
  'U1,2,VSYS',
  'U1,3,GND',
  'U2,1,VSYS',
  'U2,2,VCC_1V8',
  'U2,3,GND',
  'C1,1,VCC_1V8',
  'C1,2,GND',
].join('\n');
const annotations = JSON.stringify({
  format: 'railyard-annotations',
  version: 1,
  rootNet: 'VBAT',
  powerLinks: [{ from: 'VBAT', to: 'VSYS', via: 'U1', kind: 'switch' }],
});

async function importBoard(): Promise<string> {
  const slug = uniqueSlug('moderate');
  const admin = await web.agentAs('admin');
  await importPinList(admin, slug, pins, { annotations });
  return slug;
}

beforeAll(async () => {
  web = await startWebServer();
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await web?.stop();
});

/** The rail's own list of stored links, inside the edit area. */
const linksList = (page: Page, rail: string) =>
  page.getByRole('list', { name: `Power links of ${rail}` });

/** The power tree's drawing announces how many rails it drew in its label. */
const treeFigure = (page: Page) => page.getByRole('figure', { name: /^Power tree/ });

async function openEditor(page: Page) {
  await page.getByRole('button', { name: 'Edit this rail' }).click();
}

describe('moderating a power tree in the browser', () => {
  it('adds a link through a part on the rail, and the lists and the drawing follow it', async () => {
    const slug = await importBoard();
    const moderator = await createUser(web, 'moderator');
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, moderator.login, `/boards/${slug}/nets/VSYS`);

    // The tree from the root reaches VSYS only: VCC_1V8 is not fed by anything yet.
    await poll(() => treeFigure(page).getAttribute('aria-label')).toMatch(/2 rails drawn/);
    await openEditor(page);
    await poll(() => linksList(page, 'VSYS').getByRole('listitem').allTextContents()).toEqual([
      expect.stringMatching(/VBAT→VSYS.*via U1.*switch.*entered/),
    ]);

    const form = page.getByRole('form', { name: 'Add a power link at VSYS' });
    await form.getByLabel('To net').fill('VCC_1V8');
    await form.getByLabel('Via part').fill('U2');
    await form.getByLabel('Kind').selectOption('converter');
    await form.getByLabel('Reason').fill('buck output traced on the bench');
    await form.getByRole('button', { name: 'Add the link' }).click();

    const added = linksList(page, 'VSYS').getByRole('listitem', {
      name: 'VSYS → VCC_1V8 via U2',
    });
    await poll(() => added.textContent()).toMatch(/converter.*entered by you/);
    // The page's own "Feeds" list (from the net's detail) and the drawing from the root.
    const feeds = page.getByRole('region', { name: 'Power links', exact: true });
    await poll(() => feeds.getByRole('link', { name: 'VCC_1V8' }).count()).toBe(1);
    await poll(() => treeFigure(page).getAttribute('aria-label')).toMatch(/3 rails drawn/);

    const { rows } = await web.pool.query(
      "SELECT actor_id, reason, details->>'link' AS link FROM audit_log WHERE action = 'power-link.add' AND actor_id = $1",
      [moderator.id],
    );
    expect(rows).toEqual([
      {
        actor_id: moderator.id,
        reason: 'buck output traced on the bench',
        link: 'converter VSYS → VCC_1V8 via U2',
      },
    ]);
    await page.close();
  });

  it('shows the refusal of a part that is not on the board next to the part field', async () => {
    const slug = await importBoard();
    const moderator = await createUser(web, 'moderator');
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, moderator.login, `/boards/${slug}/nets/VSYS`);
    await openEditor(page);

    const form = page.getByRole('form', { name: 'Add a power link at VSYS' });
    await form.getByLabel('To net').fill('VCC_1V8');
    await form.getByLabel('Via part').fill('U99');
    await form.getByLabel('Reason').fill('guessing a part');
    await form.getByRole('button', { name: 'Add the link' }).click();

    // The API answers 404 with details.field "via"; the message is tied to the field it names.
    const via = form.getByLabel('Via part');
    await poll(() => via.getAttribute('aria-invalid')).toBe('true');
    const describedBy = (await via.getAttribute('aria-describedby')) ?? '';
    const message = page.locator(`[id="${describedBy.split(' ')[0]}"]`);
    expect(await message.textContent()).toBe(`Component "U99" on board "${slug}" was not found`);
    await page.close();
  });

  it('removes a link with a reason, then signing out takes the edit controls away', async () => {
    const slug = await importBoard();
    const moderator = await createUser(web, 'moderator');
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, moderator.login, `/boards/${slug}/nets/VSYS`);
    await openEditor(page);

    await page.getByRole('button', { name: 'Remove VBAT → VSYS via U1' }).click();
    const confirm = page.getByRole('form', { name: 'Remove VBAT → VSYS via U1' });
    await confirm.getByLabel('Why remove it').fill('U1 feeds another rail');
    await confirm.getByRole('button', { name: 'Remove the link' }).click();

    await poll(() => page.getByText(/No power link starts or ends at VSYS/).count()).toBe(1);
    const panel = page.getByRole('region', { name: 'Power links', exact: true });
    await poll(() => panel.getByText('No link feeds this net.').count()).toBe(1);
    const { rows } = await web.pool.query(
      "SELECT reason FROM audit_log WHERE action = 'power-link.remove' AND actor_id = $1",
      [moderator.id],
    );
    expect(rows).toEqual([{ reason: 'U1 feeds another rail' }]);

    await page.getByRole('button', { name: /^Account:/ }).click();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await poll(() => page.getByRole('link', { name: 'Sign in' }).count()).toBe(1);
    expect(await page.getByRole('button', { name: 'Edit this rail' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Remove / }).count()).toBe(0);
    // Signed out for the server too: a reload comes back without the controls.
    await page.reload();
    await poll(() => page.getByRole('link', { name: 'Sign in' }).count()).toBe(1);
    expect(await page.getByRole('button', { name: 'Edit this rail' }).count()).toBe(0);
    await page.close();
  });

  it('offers no edit controls to a member', async () => {
    const slug = await importBoard();
    const member = await createUser(web, 'member');
    const page = await browser.newPage();
    await signInInBrowser(page, web.baseUrl, member.login, `/boards/${slug}/nets/VSYS`);
    await poll(() => page.getByRole('button', { name: /^Account:/ }).count()).toBe(1);
    await poll(() => treeFigure(page).count()).toBe(1);
    expect(await page.getByRole('button', { name: 'Edit this rail' }).count()).toBe(0);
    await page.close();
  });
});
