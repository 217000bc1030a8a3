// What `npm start`, `npm test` and `npm run dev` do before any of Railyard's own code
// can run. These scripts run before node_modules exists, so they use only node: built-ins.
import { existsSync, statSync } from 'node:fs';
import path from 'node:path';
import { say } from './progress.mjs';
import { fromRoot, workDir } from './repo-paths.mjs';
import { StepError, localBin, runCommand } from './run-command.mjs';

export { ensureChromium, ensurePostgres } from './system-packages.mjs';
export {
  findFreePort,
  removeCluster,
  startCluster,
  stopCluster,
  storedDatabaseUrl,
} from './postgres-cluster.mjs';

/** The cluster behind `npm start`, `npm run dev` and `npm run db:*`. */
export const appCluster = {
  dataDir: path.join(workDir, 'pg', 'data'),
  database: 'railyard',
  port: () => portFromEnv('RAILYARD_PG_PORT', 54329),
};

/**
 * Runs `npm ci` when node_modules is missing or older than package-lock.json. npm
 * rewrites node_modules/.package-lock.json on every install, so its age tells whether
 * the installed tree predates the last change to the lock file.
 */
export async function ensureDependencies() {
  const lock = fromRoot('package-lock.json');
  const installed = fromRoot('node_modules', '.package-lock.json');
  if (!existsSync(lock))
    throw new StepError('package-lock.json is missing: cannot install the exact dependency tree');
  if (existsSync(installed) && statSync(installed).mtimeMs >= statSync(lock).mtimeMs) return;
  say(
    existsSync(installed)
      ? 'package-lock.json changed: reinstalling dependencies (npm ci)'
      : 'Installing dependencies (npm ci)',
  );
  const { code } = await runCommand('npm', ['ci']);
  if (code !== 0) throw new StepError(`npm ci failed (exit code ${code})`, code);
}

/** A file the next step runs, with a clear error when it is not there. */
export function requireFile(relativePath, purpose) {
  const file = fromRoot(relativePath);
  if (!existsSync(file))
    throw new StepError(`${relativePath} does not exist, so cannot ${purpose}`);
  return file;
}

/** Runs a TypeScript entry point with tsx; throws a StepError naming `what` when it fails. */
export async function runTypeScript(what, relativePath, env, purpose = what.toLowerCase()) {
  requireFile(relativePath, purpose);
  const { code } = await runCommand(localBin('tsx'), [relativePath], { env });
  if (code !== 0)
    throw new StepError(`${what} failed: ${relativePath} exited with code ${code}`, code);
}

export function portFromEnv(name, fallback) {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new StepError(`${name} must be a TCP port number from 1 to 65535, got "${raw}"`);
  }
  return port;
}
