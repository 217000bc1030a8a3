// npm test — everything a change must pass, on a fresh machine or a used one:
// dependencies, a throwaway PostgreSQL cluster, migrations, typecheck, the client
// build and every vitest project. A failing step does not stop the ones after it, so
// one run reports everything; the last line is always `N passed, N failed`.
//
//   npm test -- <vitest args>          e.g. a file filter: npm test -- power-tree
//   RAILYARD_SKIP_TYPECHECK=1 npm test skips typecheck and build for quick loops
import { existsSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import {
  ensureChromium,
  ensureDependencies,
  ensurePostgres,
  findFreePort,
  removeCluster,
  runTypeScript,
  startCluster,
} from './lib/bootstrap.mjs';
import { complain, say, seconds, warn } from './lib/progress.mjs';
import { fromRoot, workDir } from './lib/repo-paths.mjs';
import {
  StepError,
  forwardSignals,
  localBin,
  runCommand,
  signalExitCode,
} from './lib/run-command.mjs';

const WORKSPACES = [
  'packages/shared',
  'packages/board-analysis',
  'packages/vote-ranking',
  'packages/injection-power',
  'apps/api',
  'apps/web',
  'tests',
  'seed',
];
const RESULTS_FILE = path.join('.railyard', 'test-results.json');
const TEST_CLUSTER_PREFIX = 'pg-test-';

const failedSteps = [];
let interruptedBy = null;

forwardSignals((signal) => {
  interruptedBy ??= signal;
  say(`${signal}: stopping after the current step, then removing the test database`);
});

/** Runs one step; a failure is recorded and reported, and the run goes on. */
async function step(label, action) {
  if (interruptedBy) return false;
  const startedAt = performance.now();
  say(`${label} ...`);
  try {
    await action();
    if (interruptedBy) return false;
    say(`${label}: ok (${seconds(startedAt)})`);
    return true;
  } catch (error) {
    if (interruptedBy) return false;
    failedSteps.push(label);
    complain(
      `${label}: ${error instanceof StepError ? error.message : (error?.stack ?? String(error))}`,
    );
    return false;
  }
}

async function runTool(what, bin, args, env) {
  const { code } = await runCommand(localBin(bin), args, { env });
  if (code !== 0) throw new StepError(`${what} exited with code ${code}`, code);
}

/** Clusters left by runs that were killed outright (their pid is gone); they may still be running. */
async function removeAbandonedTestClusters() {
  if (!existsSync(workDir)) return;
  for (const name of readdirSync(workDir)) {
    const pid = Number(name.slice(TEST_CLUSTER_PREFIX.length));
    if (!name.startsWith(TEST_CLUSTER_PREFIX) || !Number.isInteger(pid) || isAlive(pid)) continue;
    say(`Removing ${name}, left behind by an earlier test run`);
    await removeCluster(path.join(workDir, name, 'data'));
  }
}

function isAlive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return error.code === 'EPERM';
  }
}

/**
 * Counts from vitest's JSON report. A test file that failed without a failing test
 * (it did not load, or a hook threw) counts as one failure, and so does a vitest
 * that exited non-zero with nothing failed in its report (no test files matched, an
 * unhandled error).
 */
function vitestCounts(exitCode) {
  let report = null;
  try {
    report = JSON.parse(readFileSync(fromRoot(RESULTS_FILE), 'utf8'));
  } catch {
    complain(`vitest wrote no readable report to ${RESULTS_FILE}`);
  }
  const passed = report?.numPassedTests ?? 0;
  const brokenFiles = (report?.testResults ?? []).filter(
    (file) =>
      file.status === 'failed' && !file.assertionResults.some((test) => test.status === 'failed'),
  );
  for (const file of brokenFiles) {
    complain(
      `${path.relative(fromRoot(), file.name)} failed outside its tests: ${file.message || 'see the output above'}`,
    );
  }
  let failed = (report?.numFailedTests ?? 0) + brokenFiles.length;
  if (exitCode !== 0 && failed === 0) {
    complain(
      `vitest exited with code ${exitCode} without a failed test in its report (see its output above)`,
    );
    failed = 1;
  }
  return { passed, failed };
}

async function main() {
  const vitestArgs = process.argv.slice(2);
  const skipChecks = process.env.RAILYARD_SKIP_TYPECHECK === '1';
  const env = { ...process.env, RAILYARD_WEB_DIST: 'dist/web' };
  let tests = { passed: 0, failed: 0 };
  const clusterDataDir = path.join(workDir, `${TEST_CLUSTER_PREFIX}${process.pid}`, 'data');
  let clusterStarted = false;

  try {
    // Nothing below can run without the dev dependencies.
    if (!(await step('Dependencies', ensureDependencies))) return tests;

    let binDir = null;
    await step('PostgreSQL server', async () => ({ binDir } = await ensurePostgres()));
    await step('Chromium', async () => {
      env.CHROMIUM_PATH = await ensureChromium();
    });

    if (binDir || process.env.DATABASE_URL) {
      await step('Test database', async () => {
        if (!process.env.DATABASE_URL) await removeAbandonedTestClusters();
        clusterStarted = !process.env.DATABASE_URL;
        const { databaseUrl } = await startCluster({
          binDir,
          dataDir: clusterDataDir,
          port: await findFreePort(),
          database: 'railyard_test',
          throwaway: true,
        });
        env.DATABASE_URL = databaseUrl;
      });
    }
    if (env.DATABASE_URL) {
      await step('Migrations', () =>
        runTypeScript('Migrations', 'apps/api/src/db/migrate.ts', env, 'migrate the test database'),
      );
    } else {
      warn('no test database: skipping migrations; tests that need the database will fail');
    }

    if (skipChecks) {
      warn('RAILYARD_SKIP_TYPECHECK=1: skipping typecheck and build');
    } else {
      const projects = WORKSPACES.filter((dir) => existsSync(fromRoot(dir, 'tsconfig.json')));
      say(
        projects.length > 0
          ? `Typechecking ${projects.join(', ')}`
          : 'No workspace tsconfig.json found: nothing to typecheck',
      );
      for (const dir of projects) {
        await step(`Typecheck ${dir}`, () =>
          runTool(`tsc -p ${dir}`, 'tsc', ['-p', `${dir}/tsconfig.json`], env),
        );
      }
      // The browser tests drive the built client, as `npm start` serves it.
      await step('Build web client', () => runTool('vite build', 'vite', ['build'], env));
    }

    rmSync(fromRoot(RESULTS_FILE), { force: true });
    if (!interruptedBy) {
      say('Tests ...');
      try {
        const { code } = await runCommand(
          localBin('vitest'),
          [
            'run',
            '--config',
            'vitest.config.ts',
            '--reporter=default',
            '--reporter=json',
            `--outputFile=${RESULTS_FILE}`,
            ...vitestArgs,
          ],
          { env },
        );
        // Failed tests count one each, from the report, not as one failed step.
        if (!interruptedBy) tests = vitestCounts(code);
      } catch (error) {
        failedSteps.push('Tests');
        complain(
          `Tests: ${error instanceof StepError ? error.message : (error?.stack ?? String(error))}`,
        );
      }
    }
    return tests;
  } finally {
    if (clusterStarted) {
      try {
        await removeCluster(clusterDataDir);
        say('Removed the test database');
      } catch (error) {
        complain(`could not remove ${path.dirname(clusterDataDir)}: ${error.message}`);
      }
    }
  }
}

const startedAt = performance.now();
main()
  .catch((error) => {
    failedSteps.push('test runner');
    complain(error?.stack ?? String(error));
    return { passed: 0, failed: 0 };
  })
  .then(({ passed, failed }) => {
    if (interruptedBy) {
      complain(`interrupted by ${interruptedBy}`);
      process.exit(signalExitCode(interruptedBy));
    }
    if (failedSteps.length > 0) complain(`failed steps: ${failedSteps.join('; ')}`);
    say(`finished in ${seconds(startedAt)}`);
    const total = failed + failedSteps.length;
    console.log(`${passed} passed, ${total} failed`);
    process.exitCode = total === 0 ? 0 : 1;
  });
