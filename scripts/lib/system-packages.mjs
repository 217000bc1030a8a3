// The two programs Railyard needs from the operating system — a PostgreSQL server
// and, for the browser tests, Chromium — taken from Debian's packages and installed
// on the spot when we are root, so a fresh machine needs no setup by hand.
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { say } from './progress.mjs';
import { StepError, runCommand } from './run-command.mjs';

const POSTGRES_ROOT = '/usr/lib/postgresql';
const POSTGRES_PROGRAMS = ['initdb', 'pg_ctl', 'postgres', 'psql'];
const CHROMIUM = '/usr/bin/chromium';

/** Bin directory of a PostgreSQL major version, or null when its server is not installed. */
export function postgresBinDir(version) {
  const binDir = path.join(POSTGRES_ROOT, String(version), 'bin');
  return POSTGRES_PROGRAMS.every((program) => existsSync(path.join(binDir, program)))
    ? binDir
    : null;
}

function newestPostgres() {
  if (!existsSync(POSTGRES_ROOT)) return null;
  const versions = readdirSync(POSTGRES_ROOT)
    .filter((name) => /^\d+(\.\d+)?$/.test(name))
    .sort((a, b) => Number(b) - Number(a));
  for (const version of versions) {
    const binDir = postgresBinDir(version);
    if (binDir) return { version, binDir };
  }
  return null;
}

/** Finds Debian's PostgreSQL server programs, installing the `postgresql` package if needed. */
export async function ensurePostgres() {
  const found = newestPostgres();
  if (found) return found;
  await aptInstall('postgresql', 'the PostgreSQL server');
  const installed = newestPostgres();
  if (!installed) {
    throw new StepError(
      `installed the postgresql package, but found no initdb/pg_ctl/postgres/psql under ${POSTGRES_ROOT}/<version>/bin`,
    );
  }
  return installed;
}

/** Finds Chromium for the browser tests (installing it if needed) and exports CHROMIUM_PATH. */
export async function ensureChromium() {
  const preset = process.env.CHROMIUM_PATH;
  if (preset && existsSync(preset)) return preset;
  if (!existsSync(CHROMIUM)) await aptInstall('chromium', 'Chromium for the browser tests');
  if (!existsSync(CHROMIUM))
    throw new StepError(`installed the chromium package, but ${CHROMIUM} is still missing`);
  process.env.CHROMIUM_PATH = CHROMIUM;
  return CHROMIUM;
}

let packageListsFresh = false;

async function aptInstall(pkg, purpose) {
  if (process.getuid?.() !== 0) {
    throw new StepError(
      `${purpose} is not installed. Install it with: sudo apt-get install ${pkg}  (then run this command again)`,
    );
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!packageListsFresh) {
    say('Updating the package lists (apt-get update)');
    const update = await runCommand('apt-get', ['update'], { env });
    if (update.code !== 0)
      throw new StepError(`apt-get update failed (exit code ${update.code})`, update.code);
    packageListsFresh = true;
  }
  say(`Installing ${purpose} (apt-get install -y ${pkg})`);
  const install = await runCommand('apt-get', ['install', '-y', pkg], { env });
  if (install.code !== 0)
    throw new StepError(
      `apt-get install -y ${pkg} failed (exit code ${install.code})`,
      install.code,
    );
}
