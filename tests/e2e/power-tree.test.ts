// From the rail search on a board's page to a rail's power tree, and from there through the graph
// to the next rail, in Debian's Chromium against the real app and its Content Security Policy.
import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { NetDetail, PowerTree } from '@railyard/shared';
import { launchBrowser, startWebServer } from '../support/browser';
import { demoHandsetAnnotations, importDemoHandset } from '../support/demo-handset';
import { uniqueSlug } from '../support/test-app';

const annotations = demoHandsetAnnotations();
const slug = uniqueSlug('handset');
let web: Awaited<ReturnType<typeof startWebServer>>;
let browser: Browser;

beforeAll(async () => {
  web = await startWebServer();
  await importDemoHandset(web, slug, { title: `Handset ${slug}`, deviceFamily: 'Demo handsets' });
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await web?.stop();
});

async function api<T>(url: string): Promise<T> {
  const res = await web.agent().get(url);
  expect(res.status, `${url}: ${JSON.stringify(res.body).slice(0, 300)}`).toBe(200);
  return res.body as T;
}

/** What the graph's container says it drew (see describeDrawing in power-tree-graph.tsx). */
type Drawing = {
  rails: Record<string, [number, number]>;
  selected: string;
  /** the lit rails above the selected one, top of the drawing first */
  pathAbove: string[];
  viewport: { zoom: number; x: number; y: number };
};

async function readDrawing(graph: Locator): Promise<Drawing> {
  const raw = await graph.evaluate((element: HTMLElement) => ({ ...element.dataset }));
  const rails = JSON.parse(raw.rails ?? '{}') as Drawing['rails'];
  const lit = JSON.parse(raw.pathRails ?? '[]') as string[];
  // Power flows down the drawing, so the way from the root reads top to bottom.
  const pathAbove = lit.sort((a, b) => (rails[a]?.[1] ?? 0) - (rails[b]?.[1] ?? 0));
  const viewport = JSON.parse(raw.viewport ?? '{"zoom":1,"x":0,"y":0}') as Drawing['viewport'];
  return { rails, selected: raw.selectedRail ?? '', pathAbove, viewport };
}

/** Where a rail is drawn, relative to the graph's container, in CSS pixels. */
function onScreen(drawing: Drawing, net: string) {
  const at = drawing.rails[net];
  if (!at) throw new Error(`${net} is not drawn`);
  const { zoom, x, y } = drawing.viewport;
  return { x: at[0] * zoom + x, y: at[1] * zoom + y };
}

/** Every CSP violation, console error and uncaught exception from now on, whatever page the tab shows. */
async function watchForProblems(page: Page) {
  const problems = { policy: [] as string[], console: [] as string[], uncaught: [] as string[] };
  page.on('console', (message) => {
    if (message.type() === 'error') problems.console.push(message.text().slice(0, 200));
  });
  page.on('pageerror', (error) => problems.uncaught.push(error.message));
  await page.exposeFunction('reportPolicyViolation', (text: string) => problems.policy.push(text));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (event) => {
      const report = (window as unknown as { reportPolicyViolation(text: string): void })
        .reportPolicyViolation;
      report(
        `${event.effectiveDirective} blocked ${event.blockedURI || 'an inline piece'} on ${location.pathname}`,
      );
    });
  });
  return problems;
}

async function newTab() {
  const context = await browser.newContext({
    viewport: { width: 1600, height: 1000 },
    reducedMotion: 'reduce',
  });
  const page = await context.newPage();
  const problems = await watchForProblems(page);
  return { page, problems, close: () => context.close() };
}

/** From the board's page: "3v3" in the rail search, down the list with the arrow keys to VCC_3V3, Enter. */
async function openVcc3v3FromSearch(page: Page): Promise<Locator> {
  await page.goto(`${web.baseUrl}/boards/${slug}`);
  const search = page.getByRole('combobox', { name: 'Find a rail on this board' });
  await search.click();
  await search.pressSequentially('3v3');
  const options = page.getByRole('listbox', { name: 'Rails on this board' }).getByRole('option');
  const wanted = options.filter({ has: page.getByText('VCC_3V3', { exact: true }) });
  await expect.poll(() => wanted.count()).toBe(1);
  for (let step = 0; (await wanted.getAttribute('aria-selected')) !== 'true'; step++) {
    expect(step, 'VCC_3V3 is within reach of the arrow keys').toBeLessThan(await options.count());
    await search.press('ArrowDown');
  }
  await search.press('Enter');
  await page.waitForURL(`${web.baseUrl}/boards/${slug}/nets/VCC_3V3`);
  const graph = page.locator('[data-rails]');
  await expect
    .poll(async () => (await readDrawing(graph)).selected, { timeout: 15_000 })
    .toBe('VCC_3V3');
  return graph;
}

/** Clicks a rail where the canvas drew it, after checking it is inside the graph's frame. */
async function clickRailInGraph(graph: Locator, net: string) {
  const box = (await graph.boundingBox())!;
  const target = onScreen(await readDrawing(graph), net);
  expect(target.x, `${net} is inside the graph horizontally`).toBeGreaterThan(0);
  expect(target.x, `${net} is inside the graph horizontally`).toBeLessThan(box.width);
  expect(target.y, `${net} is inside the graph vertically`).toBeGreaterThan(0);
  expect(target.y, `${net} is inside the graph vertically`).toBeLessThan(box.height);
  await graph.click({ position: target });
}

describe('the power tree in the browser', () => {
  it('finds VCC_3V3 from the rail search, draws its tree, and follows a child rail clicked in the graph', async () => {
    const tab = await newTab();
    const tree = await api<PowerTree>(`/api/boards/${slug}/tree?direction=down&depth=32`);
    const railDetail = await api<NetDetail>(`/api/boards/${slug}/nets/VCC_3V3`);
    const childDetail = await api<NetDetail>(`/api/boards/${slug}/nets/VCC_3V3_SENSOR`);

    const graph = await openVcc3v3FromSearch(tab.page);
    const before = await readDrawing(graph);
    // The page draws the tree down from the root: every rail of that trace, none left folded.
    expect(Object.keys(before.rails).sort()).toEqual(tree.nodes.map((n) => n.net).sort());
    expect(Object.keys(before.rails)).toEqual(
      expect.arrayContaining(['VBAT', 'VSYS', 'VCC_3V3', 'VCC_3V3_SENSOR']),
    );
    // Rails the annotation file says VCC_3V3 feeds are drawn, below it.
    const children = annotations.powerLinks.filter((l) => l.from === 'VCC_3V3').map((l) => l.to);
    expect(children).toContain('VCC_3V3_SENSOR');
    for (const child of children)
      expect(before.rails[child]?.[1]).toBeGreaterThan(before.rails.VCC_3V3![1]);
    // Lit: the way the API gives from the root, top of the drawing first, ending above the rail.
    expect(before.pathAbove).toEqual(railDetail.upstreamPaths[0]!.map((s) => s.net).slice(0, -1));
    // The annotation file names the root and its switch to VSYS (Q1002).
    expect(before.pathAbove.slice(0, 2)).toEqual([annotations.rootNet, 'VSYS']);

    await clickRailInGraph(graph, 'VCC_3V3_SENSOR');
    await tab.page.waitForURL(`${web.baseUrl}/boards/${slug}/nets/VCC_3V3_SENSOR`);
    await expect.poll(async () => (await readDrawing(graph)).selected).toBe('VCC_3V3_SENSOR');
    const after = await readDrawing(graph);
    expect(after.pathAbove).toEqual(childDetail.upstreamPaths[0]!.map((s) => s.net).slice(0, -1));
    // One rail longer: the way to VCC_3V3 and then VCC_3V3 itself, its feed by switch U7001 in the annotations.
    expect(after.pathAbove).toEqual([...before.pathAbove, 'VCC_3V3']);
    // Same trace: every rail still drawn, each where it was.
    expect(after.rails).toEqual(before.rails);
    expect(tab.problems.uncaught).toEqual([]);
    await tab.close();
  });

  it('breaks no rule of the Content Security Policy and logs no error on the way from the search to a rail', async () => {
    const tab = await newTab();
    const graph = await openVcc3v3FromSearch(tab.page);
    await clickRailInGraph(graph, 'VCC_3V3_SENSOR');
    await expect.poll(async () => (await readDrawing(graph)).selected).toBe('VCC_3V3_SENSOR');
    expect(tab.problems.policy).toEqual([]);
    expect(tab.problems.console).toEqual([]);
    await tab.close();
  });
});
