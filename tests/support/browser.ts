// Browser tests drive Debian's Chromium through playwright-core; no browser is ever downloaded.
import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import type { Env } from '../../apps/api/src/config/env';
import { createTestApp } from './test-app';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

export function chromiumPath(): string {
  const candidates = [process.env.CHROMIUM_PATH, '/usr/bin/chromium'].filter((p): p is string => Boolean(p));
  const found = candidates.find((p) => existsSync(p));
  if (!found) throw new Error('Chromium not found: install Debian\'s chromium package (npm test does it)');
  return found;
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: chromiumPath(),
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}

/** The real app with the built client, listening on an ephemeral loopback port. */
export async function startWebServer(overrides: Partial<Env> = {}) {
  const staticDir = process.env.RAILYARD_WEB_DIST ?? path.join(repoRoot, 'dist/web');
  if (!existsSync(path.join(staticDir, 'index.html'))) {
    throw new Error(`The built client is missing at ${staticDir}: run \`npx vite build\` (npm test does it)`);
  }
  const test = await createTestApp({ ...overrides, STATIC_DIR: staticDir });
  return { ...test, stop: () => test.close() };
}

/** Signs a browser page in through the fake GitHub's page, as a person would, and lands on `returnTo`. */
export async function signInInBrowser(page: Page, baseUrl: string, login: string, returnTo = '/') {
  await page.goto(`${baseUrl}/auth/github?returnTo=${encodeURIComponent(returnTo)}`);
  await page.getByRole('button', { name: new RegExp(login) }).click();
  await page.waitForURL(`${baseUrl}${returnTo}`);
}
