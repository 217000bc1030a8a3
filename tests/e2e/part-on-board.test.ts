// A part's page shows where the part sits on the board, on its own side, and the other side on request.
import type { Browser, Locator } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, startWebServer } from '../support/browser';
import { importPlacedBoard } from '../support/placed-board';
import { uniqueSlug } from '../support/test-app';

const slug = uniqueSlug('placed');
let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;

beforeAll(async () => {
  web = await startWebServer();
  await importPlacedBoard(web, slug);
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await web?.stop();
});

async function openPart(refdes: string): Promise<Locator> {
  const page = await (
    await browser.newContext({ viewport: { width: 1400, height: 1000 } })
  ).newPage();
  await page.goto(`${web.baseUrl}/boards/${slug}/components/${refdes}`);
  const panel = page.getByRole('region', { name: 'On the board' });
  await panel.locator('svg[role="img"]').waitFor();
  return panel;
}

describe('a part on the board, in the browser', () => {
  it('lights the part on its own side and says where it is', async () => {
    const panel = await openPart('U1');
    const drawing = panel.locator('svg[role="img"]');

    expect(await drawing.getAttribute('data-side')).toBe('top');
    expect(await drawing.getAttribute('data-lit')).toBe('U1');
    // centre of the pins' box: ((20 + 24) / 2, (10 + 14) / 2); outline 40.5 × 19.5 mm (0.25 mm pad margin)
    expect(await drawing.getAttribute('aria-label')).toBe(
      'Top side, seen from above, 40.5 mm by 19.5 mm: U1 at x 22 mm, y 12 mm.',
    );
    expect(await panel.getByRole('button', { name: 'Top' }).getAttribute('aria-pressed')).toBe(
      'true',
    );
  });

  it('opens a bottom part on the bottom side, mirrored, and says so when shown the top', async () => {
    const panel = await openPart('C1');
    const drawing = panel.locator('svg[role="img"]');
    expect(await drawing.getAttribute('data-side')).toBe('bottom');
    // seen from below the board turns over left to right: C1, at the right edge from above, is drawn at the left
    const lit = await drawing.locator('g[data-refdes="C1"] rect').boundingBox();
    const board = await drawing.locator('rect').first().boundingBox();
    expect(lit!.x - board!.x).toBeLessThan(board!.width * 0.1);

    await panel.getByRole('button', { name: 'Top' }).click();
    await expect.poll(() => drawing.getAttribute('data-side')).toBe('top');
    expect(await drawing.getAttribute('data-lit')).toBe('');
    expect(await panel.textContent()).toContain('C1 sits on the bottom side.');
  });

  it('says when the netlist gives the part no position', async () => {
    const panel = await openPart('H1');
    expect(await panel.textContent()).toContain('The netlist gives no position for H1.');
  });

  it('lights every part of a rail on its net page, side by side', async () => {
    const page = await (
      await browser.newContext({ viewport: { width: 1400, height: 1000 } })
    ).newPage();
    await page.goto(`${web.baseUrl}/boards/${slug}/nets/VSYS`);
    const panel = page.getByRole('region', { name: 'Parts of VSYS on the board' });
    const drawing = panel.locator('svg[role="img"]');
    await drawing.waitFor();

    // VSYS touches U1 (top) and C1 (bottom)
    expect(await drawing.getAttribute('data-lit')).toBe('U1');
    expect(await panel.textContent()).toContain('C1 sits on the bottom side.');
    await panel.getByRole('button', { name: 'Bottom' }).click();
    await expect.poll(() => drawing.getAttribute('data-lit')).toBe('C1');
  });
});
