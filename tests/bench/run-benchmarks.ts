// npm run bench — runs every benchmark against the bench database and writes docs/performance.md.
// Speed targets are checked here, never in timed tests.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const tsx = path.join(root, 'node_modules/.bin/tsx');

export interface BenchSection {
  title: string;
  /** markdown body: what was measured, the numbers, the target and whether it was met */
  body: string;
  met: boolean;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

function importBench(boardDir: string): BenchSection {
  const runs = [1, 2, 3].map((i) => {
    const out = execFileSync(tsx, ['tests/bench/import-once.ts', boardDir, `bench-laptop-${Date.now()}-${i}`], {
      cwd: root,
      env: process.env,
      encoding: 'utf8',
    });
    return JSON.parse(out.trim().split('\n').pop()!) as { ms: number; peakRssMb: number; summary: { components: number; pins: number; nets: number; powerLinks: number } };
  });
  const ms = median(runs.map((r) => r.ms));
  const rss = Math.max(...runs.map((r) => r.peakRssMb));
  const s = runs[0]!.summary;
  const met = ms < 3000 && rss < 500;
  return {
    title: 'Import of the synthetic laptop board',
    met,
    body: [
      `End to end from files on disk: read, parse (IPC-D-356 + parts CSV + annotations JSON), assemble, check, and write`,
      `in one transaction through COPY, in a fresh process each run (\`tests/bench/import-once.ts\`).`,
      '',
      `Board: ${s.components.toLocaleString('en')} components, ${s.pins.toLocaleString('en')} pins, ${s.nets.toLocaleString('en')} nets, ${s.powerLinks} power links.`,
      '',
      '| run | time | peak RSS |',
      '| --- | --- | --- |',
      ...runs.map((r, i) => `| ${i + 1} | ${(r.ms / 1000).toFixed(2)} s | ${r.peakRssMb.toFixed(0)} MB |`),
      '',
      `Median **${(ms / 1000).toFixed(2)} s**, peak **${rss.toFixed(0)} MB** (process peak, Node included). Target: under 3 s and under 500 MB — ${met ? 'met' : '**not met**'}.`,
    ].join('\n'),
  };
}

async function main() {
  if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set (npm run bench sets it)');
  const work = mkdtempSync(path.join(os.tmpdir(), 'railyard-bench-'));
  try {
    const boardDir = path.join(work, 'laptop');
    execFileSync(tsx, ['seed/write-laptop-board.ts', boardDir], { cwd: root, stdio: 'inherit' });
    const sections: BenchSection[] = [importBench(boardDir)];

    const cpu = os.cpus()[0]?.model ?? 'unknown CPU';
    const doc = [
      '# Performance',
      '',
      'Written by `npm run bench` (`tests/bench/run-benchmarks.ts`); do not edit by hand.',
      `Last run: ${new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC on ${os.cpus().length} × ${cpu}, Node ${process.version},`,
      'PostgreSQL from Debian in a private durable cluster (`jit = off`, `random_page_cost = 1.1`).',
      '',
      ...sections.flatMap((s) => [`## ${s.title}`, '', s.body, '']),
    ].join('\n');
    writeFileSync(path.join(root, 'docs/performance.md'), doc);
    for (const s of sections) console.log(`${s.met ? 'met    ' : 'NOT MET'}  ${s.title}`);
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

await main();
