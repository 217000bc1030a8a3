// What a technician's browser does with the built client: how long the power tree of a big board
// takes to lay out and paint, and how much JavaScript the first page brings. Debian's Chromium
// through playwright-core, against the bench server serving the client from STATIC_DIR.
import { gzipSync } from 'node:zlib';
import type { Browser, Page } from 'playwright-core';
import { median, type BenchSection } from './bench-section';

const paintTargetMs = 1000;
const firstPageTargetKb = 250;
const viewport = { width: 1600, height: 1000 };

type Measure = { startTime: number; duration: number };

async function paintEntries(page: Page, name: string): Promise<Measure[]> {
  return page.evaluate(
    (entryName) =>
      performance
        .getEntriesByName(entryName)
        .map((e) => ({ startTime: e.startTime, duration: e.duration })),
    name,
  );
}

async function waitForEntries(page: Page, name: string, count: number): Promise<Measure[]> {
  const deadline = Date.now() + 30_000;
  for (;;) {
    const entries = await paintEntries(page, name);
    if (entries.length >= count) return entries;
    if (Date.now() > deadline)
      throw new Error(`no ${name} entry number ${count} within 30 s on ${page.url()}`);
    await page.waitForTimeout(50);
  }
}

/** Rails the graph says it drew (its container's data-rails, see power-tree-graph.tsx). */
async function railsDrawn(page: Page): Promise<number> {
  return page
    .locator('[data-rails]')
    .evaluate(
      (element: HTMLElement) => Object.keys(JSON.parse(element.dataset.rails ?? '{}')).length,
    );
}

type PaintRun = {
  /** from navigation start to the first frame of the tree */
  firstPaintAt: number;
  first: { rails: number; layoutMs: number; paintMs: number };
  full: { rails: number; layoutMs: number; paintMs: number };
};

async function paintRun(browser: Browser, url: string): Promise<PaintRun> {
  const context = await browser.newContext({ viewport, reducedMotion: 'reduce' });
  try {
    const page = await context.newPage();
    await page.goto(url);
    // A tree this big opens folded to about 150 rails; "Expand all" then draws every rail.
    const [firstPaint] = await waitForEntries(page, 'railyard:power-tree-paint', 1);
    const [firstLayout] = await waitForEntries(page, 'railyard:power-tree-layout', 1);
    const first = {
      rails: await railsDrawn(page),
      layoutMs: firstLayout!.duration,
      paintMs: firstPaint!.duration,
    };
    await page.getByRole('button', { name: 'Expand all' }).click();
    const paints = await waitForEntries(page, 'railyard:power-tree-paint', 2);
    const layouts = await waitForEntries(page, 'railyard:power-tree-layout', 2);
    const full = {
      rails: await railsDrawn(page),
      layoutMs: layouts[1]!.duration,
      paintMs: paints[1]!.duration,
    };
    return { firstPaintAt: firstPaint!.startTime + firstPaint!.duration, first, full };
  } finally {
    await context.close();
  }
}

export async function treePaintBench(
  browser: Browser,
  baseUrl: string,
  slug: string,
  railCount: number,
): Promise<BenchSection> {
  const url = `${baseUrl}/boards/${slug}/nets/VBAT`;
  await paintRun(browser, url); // warm-up: the server's graph cache, Chromium's code cache
  const runs: PaintRun[] = [];
  for (let i = 0; i < 5; i++) runs.push(await paintRun(browser, url));
  const fullPaint = median(runs.map((r) => r.full.paintMs));
  const allDrawn = runs.every((r) => r.full.rails === railCount);
  const met = allDrawn && fullPaint < paintTargetMs;
  const ms = (value: number) => `${Math.round(value)} ms`;
  return {
    title: `Power tree of ${railCount} rails in headless Chromium`,
    met,
    body: [
      `A generated board (\`tests/bench/power-tree-board.ts\`: VBAT, five converters or switches under every rail,`,
      `${railCount} rails in all, two capacitors each) imported as a \`railyard-board\` file; its net page \`/boards/<slug>/nets/VBAT\``,
      `opened in a fresh ${viewport.width}×${viewport.height} tab per run. The page's own performance entries are read:`,
      '`railyard:power-tree-layout` (dagre) and `railyard:power-tree-paint` (layout start to the first frame drawn with it).',
      `A tree this big opens folded; the bench then presses "Expand all", which lays out and paints every rail.`,
      '',
      '| run | opened: rails | layout | paint | tree on screen after navigation | expanded: rails | layout | paint |',
      '| --- | --- | --- | --- | --- | --- | --- | --- |',
      ...runs.map(
        (r, i) =>
          `| ${i + 1} | ${r.first.rails} | ${ms(r.first.layoutMs)} | ${ms(r.first.paintMs)} | ${ms(r.firstPaintAt)} | ${r.full.rails} | ${ms(r.full.layoutMs)} | ${ms(r.full.paintMs)} |`,
      ),
      '',
      `All ${railCount} rails laid out and painted in a median **${ms(fullPaint)}** (layout alone ${ms(median(runs.map((r) => r.full.layoutMs)))}).`,
      `Target: under ${paintTargetMs} ms with every rail drawn — ${met ? 'met' : '**not met**'}.`,
    ].join('\n'),
  };
}

export async function firstPageJsBench(browser: Browser, baseUrl: string): Promise<BenchSection> {
  const context = await browser.newContext({ viewport });
  try {
    const page = await context.newPage();
    const scripts: Promise<{ url: string; bytes: number; gzipped: number }>[] = [];
    page.on('response', (response) => {
      const type = response.headers()['content-type'] ?? '';
      if (response.request().resourceType() !== 'script' && !/javascript/.test(type)) return;
      scripts.push(
        response.body().then((body) => ({
          url: new URL(response.url()).pathname,
          bytes: body.length,
          gzipped: gzipSync(body, { level: 9 }).length,
        })),
      );
    });
    await page.goto(`${baseUrl}/`, { waitUntil: 'networkidle' });
    const files = (await Promise.all(scripts)).sort((a, b) => b.gzipped - a.gzipped);
    const kb = (bytes: number) => (bytes / 1024).toFixed(1);
    const total = files.reduce((sum, f) => sum + f.gzipped, 0);
    const raw = files.reduce((sum, f) => sum + f.bytes, 0);
    const met = files.length > 0 && total / 1024 < firstPageTargetKb;
    return {
      title: 'JavaScript of the first page',
      met,
      body: [
        'The boards page (`/`) opened in a fresh headless Chromium tab until the network was idle; every JavaScript',
        'response (module scripts and their preloads) gzipped at level 9 with node:zlib and summed.',
        '',
        '| file | size | gzip -9 |',
        '| --- | --- | --- |',
        ...files.map((f) => `| \`${f.url}\` | ${kb(f.bytes)} KB | ${kb(f.gzipped)} KB |`),
        '',
        `${files.length} files, ${kb(raw)} KB as sent, **${kb(total)} KB** gzipped. Target: under ${firstPageTargetKb} KB gzipped — ${met ? 'met' : '**not met**'}.`,
      ].join('\n'),
    };
  } finally {
    await context.close();
  }
}
