// The supply planner beside a rail's injection cautions: a technician types a setting and the rail's
// resistance to ground and reads what the supply will do to the short, in Debian's Chromium.
import path from 'node:path';
import type { Browser, Locator } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { NetDetail } from '@railyard/shared';
import { launchBrowser, startWebServer } from '../support/browser';
import { demoHandsetDir, importDemoHandset } from '../support/demo-handset';
import { uniqueSlug } from '../support/test-app';

const slug = uniqueSlug('handset');
// the demo tablet board, for its negative rail HP_VNEG (−1.8 V)
const tabletSlug = uniqueSlug('tablet');
const tabletFile = path.join(demoHandsetDir, '../lumbre-ls-io-0930/board.json');
let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;

beforeAll(async () => {
  web = await startWebServer();
  const admin = await importDemoHandset(web, slug, {
    title: `Handset ${slug}`,
    deviceFamily: 'Demo handsets',
  });
  const tablet = await admin
    .post(`/api/boards/${tabletSlug}/imports?wait=true`)
    .attach('netlist', tabletFile);
  expect(tablet.status, JSON.stringify(tablet.body).slice(0, 500)).toBe(201);
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await web?.stop();
});

async function openPlanner(net: string, board = slug): Promise<Locator> {
  const page = await (
    await browser.newContext({ viewport: { width: 1400, height: 1000 } })
  ).newPage();
  await page.goto(`${web.baseUrl}/boards/${board}/nets/${net}`);
  const planner = page.getByRole('region', { name: 'What the supply will do' });
  await planner.waitFor();
  return planner;
}

describe('the supply planner on a rail’s page', () => {
  it('starts at 1 V, works out a setting into a measured short, and warns above the rail’s voltage', async () => {
    const detail = (await web.agent().get(`/api/boards/${slug}/nets/VCC_3V3`)).body as NetDetail;
    expect(detail.net.nominalVoltage).toBe(3.3);
    const planner = await openPlanner('VCC_3V3');
    const supply = planner.getByRole('textbox', { name: 'Supply' });
    const limit = planner.getByRole('textbox', { name: 'Limit' });
    await limit.fill('500m');
    await expect.poll(() => limit.getAttribute('aria-invalid')).toBeNull();
    await expect.poll(() => planner.textContent()).toContain('at most 500 mW (1 V × 500 mA)');

    const toGround = planner.getByRole('textbox', { name: 'To ground' });

    // common practice: start around 1 V
    expect(await supply.inputValue()).toBe('1');
    // unmeasured: the most any short can take is V·I, at V ÷ I ohms
    await limit.fill('2');
    await expect
      .poll(() => planner.textContent())
      .toContain('at most 2 W (1 V × 2 A), reached at 500 mΩ');

    // Check rows of the constant-voltage / constant-current supply (textbook, from memory; arithmetic):
    // 1.0 V / 2.0 A into 0.1 Ω → current-limited, 0.2 V, 0.4 W; into 2 Ω → 1.0 V held, 0.5 A, 0.5 W.
    await toGround.fill('0.1');
    await expect
      .poll(() => planner.textContent())
      .toContain('The supply limits the current: 2 A through the short at 200 mV, 400 mW in it.');
    await toGround.fill('2');
    await expect
      .poll(() => planner.textContent())
      .toContain('The supply holds 1 V: 500 mA through the short, 500 mW in it.');
    expect(await planner.getByRole('alert').count()).toBe(0);

    // common practice: never above the rail's own voltage
    await supply.fill('5');
    await expect
      .poll(() => planner.getByRole('alert').textContent())
      .toMatch(/^5\.00 V is above this rail’s 3\.30 V/);
  });

  it('says what is wrong with a value, next to its field, and works nothing out until it is fixed', async () => {
    const planner = await openPlanner('VCC_3V3');
    const limit = planner.getByRole('textbox', { name: 'Limit' });
    const toGround = planner.getByRole('textbox', { name: 'To ground' });
    const shown = (text: string) => planner.getByText(text).isVisible();

    await limit.fill('lots');
    await expect.poll(() => limit.getAttribute('aria-invalid')).toBe('true');
    expect(await shown('not a number: e.g. 0.5 or 500m')).toBe(true);
    expect(await planner.textContent()).not.toContain('through the short');

    await limit.fill('0');
    await expect
      .poll(() => shown('the current limit must be a number above 0 A, not 0'))
      .toBe(true);

    await limit.fill('500m');
    await expect.poll(() => limit.getAttribute('aria-invalid')).toBeNull();
    await expect.poll(() => planner.textContent()).toContain('at most 500 mW (1 V × 500 mA)');

    await toGround.fill('-2');
    await expect
      .poll(() => shown('the resistance to ground must be a number of 0 Ω or more, not -2'))
      .toBe(true);
    expect(await planner.textContent()).not.toContain('at most');
  });

  it('gives the size of a negative rail as its ceiling and says the leads go the other way round', async () => {
    const planner = await openPlanner('HP_VNEG', tabletSlug);
    const caution = planner.locator('xpath=ancestor::aside[1]');

    expect(await caution.textContent()).toContain('never beyond this rail’s \u22121.80 V');
    await expect
      .poll(() => planner.textContent())
      .toContain('the supply’s positive lead goes to ground and its negative lead to the rail');
    expect(await planner.getByRole('alert').count()).toBe(0);

    await planner.getByRole('textbox', { name: 'Supply' }).fill('2');
    await expect
      .poll(() => planner.getByRole('alert').textContent())
      .toMatch(/^2\.00 V is above this rail’s 1\.80 V/);
  });
});
