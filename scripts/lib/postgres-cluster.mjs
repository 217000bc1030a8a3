// A private PostgreSQL cluster inside the checkout: its own data directory, port and
// password, reachable only over TCP on 127.0.0.1 (no Unix socket), so `npm start` and
// `npm test` never touch — or depend on — a system-wide database.
//
// Layout, for a data directory <dir>/data:
//   <dir>/data            the cluster, owned by the user the server runs as
//   <dir>/cluster.json    superuser name, generated password, last port (mode 600)
//   <dir>/postgres.log    the server's log
import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import {
  chmodSync,
  chownSync,
  existsSync,
  mkdirSync,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
import { say, seconds, warn } from './progress.mjs';
import { StepError, runCommand } from './run-command.mjs';
import { postgresBinDir } from './system-packages.mjs';

const SUPERUSER = 'railyard';
const HOST = '127.0.0.1';
const SETTINGS_FILE = 'railyard.conf';
const DATABASE_NAME = /^[a-z_][a-z0-9_]*$/;

function clusterFiles(dataDir) {
  const clusterDir = path.dirname(dataDir);
  return {
    clusterDir,
    dataDir,
    credentialsFile: path.join(clusterDir, 'cluster.json'),
    logFile: path.join(clusterDir, 'postgres.log'),
  };
}

/**
 * Starts (creating it first if needed) the cluster in `dataDir` on `port`, makes sure
 * `database` exists, and returns its `databaseUrl`. Reuses a server already running on
 * that data directory. When DATABASE_URL is set, that database is used instead and no
 * cluster is touched.
 *
 * `throwaway` turns off durability (fsync, synchronous commit, full-page writes): a
 * test cluster that is deleted after the run gains speed and loses nothing.
 */
export async function startCluster({ binDir, dataDir, port, database, throwaway = false }) {
  if (process.env.DATABASE_URL) {
    say('DATABASE_URL is set: using that database, no local PostgreSQL cluster is started');
    return { databaseUrl: process.env.DATABASE_URL, external: true };
  }
  if (!DATABASE_NAME.test(database))
    throw new StepError(`database name "${database}" must match ${DATABASE_NAME}`);

  const files = clusterFiles(dataDir);
  const account = serverAccount();
  prepareClusterDir(files, account);

  let credentials;
  if (existsSync(path.join(dataDir, 'PG_VERSION'))) {
    credentials = readCredentials(files);
    binDir = binDirForCluster(dataDir, binDir);
  } else {
    credentials = await initCluster(files, account, binDir);
  }

  let actualPort = port;
  if (await isRunning(files, account, binDir)) {
    actualPort = runningPort(dataDir) ?? port;
    say(
      `PostgreSQL already running on ${HOST}:${actualPort} (${path.relative(process.cwd(), dataDir) || dataDir})`,
    );
    if (actualPort !== port)
      warn(
        `it was started on port ${actualPort}, not ${port}; run npm run db:stop to restart it on ${port}`,
      );
  } else {
    writeSettings(files, account, { port, throwaway });
    const startedAt = performance.now();
    const { code, output } = await asServer(account, files, path.join(binDir, 'pg_ctl'), [
      'start',
      '-w',
      '-t',
      '60',
      '-D',
      dataDir,
      '-l',
      files.logFile,
    ]);
    if (code !== 0) {
      throw new StepError(
        `PostgreSQL did not start (pg_ctl exit code ${code}).\n${output.trim()}\n${logTail(files)}`,
        code,
      );
    }
    say(`PostgreSQL started on ${HOST}:${port} in ${seconds(startedAt)}`);
  }
  writeCredentials(files, { ...credentials, port: actualPort });

  await ensureDatabase(binDir, { ...credentials, port: actualPort }, database);
  return {
    databaseUrl: databaseUrl(credentials, actualPort, database),
    port: actualPort,
    external: false,
  };
}

/** Stops the cluster in `dataDir` if it is running (fast shutdown: open sessions are ended). */
export async function stopCluster(dataDir) {
  const files = clusterFiles(dataDir);
  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) return false;
  const account = serverAccount();
  const binDir = binDirForCluster(dataDir, null);
  if (!(await isRunning(files, account, binDir))) return false;
  const pgCtl = path.join(binDir, 'pg_ctl');
  const fast = await asServer(account, files, pgCtl, [
    'stop',
    '-m',
    'fast',
    '-w',
    '-t',
    '60',
    '-D',
    dataDir,
  ]);
  if (fast.code !== 0) {
    warn(`pg_ctl stop -m fast failed, stopping immediately instead:\n${fast.output.trim()}`);
    const immediate = await asServer(account, files, pgCtl, [
      'stop',
      '-m',
      'immediate',
      '-w',
      '-D',
      dataDir,
    ]);
    if (immediate.code !== 0)
      throw new StepError(`could not stop PostgreSQL in ${dataDir}:\n${immediate.output.trim()}`);
  }
  return true;
}

/** Stops the cluster and deletes its directory (data, log and credentials). */
export async function removeCluster(dataDir) {
  try {
    await stopCluster(dataDir);
  } finally {
    rmSync(path.dirname(dataDir), { recursive: true, force: true });
  }
}

/** DATABASE_URL of a cluster created earlier, from its stored credentials; null if there is none. */
export function storedDatabaseUrl(dataDir, database) {
  const files = clusterFiles(dataDir);
  if (!existsSync(files.credentialsFile)) return null;
  const credentials = readCredentials(files);
  return databaseUrl(credentials, credentials.port, database);
}

/** A TCP port on 127.0.0.1 that nothing listens on right now (the kernel picks it). */
export function findFreePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, HOST, () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

function databaseUrl({ user, password }, port, database) {
  return `postgres://${user}:${encodeURIComponent(password)}@${HOST}:${port}/${database}`;
}

// --- running the server programs -------------------------------------------------

/**
 * The account initdb and pg_ctl run as: ourselves normally, `postgres` when we are root
 * (both programs refuse to run as root, and so does the server).
 */
function serverAccount() {
  if (process.getuid?.() !== 0) return null;
  try {
    const uid = Number(execFileSync('id', ['-u', 'postgres'], { encoding: 'utf8' }).trim());
    const gid = Number(execFileSync('id', ['-g', 'postgres'], { encoding: 'utf8' }).trim());
    return { name: 'postgres', uid, gid };
  } catch {
    throw new StepError(
      'running as root, but there is no "postgres" user to run PostgreSQL as (Debian\'s postgresql package creates it)',
    );
  }
}

function asServer(account, files, program, args) {
  // The server's user may not be allowed into our working directory; the cluster's is theirs.
  const options = { cwd: files.clusterDir, capture: true };
  if (!account) return runCommand(program, args, options);
  return runCommand('runuser', ['-u', account.name, '--', program, ...args], options);
}

function giveToServer(account, file) {
  if (account) chownSync(file, account.uid, account.gid);
}

function prepareClusterDir(files, account) {
  // Only the cluster's own directory is private; its parents keep the usual mode.
  mkdirSync(path.dirname(files.clusterDir), { recursive: true });
  mkdirSync(files.clusterDir, { recursive: true, mode: 0o700 });
  if (!account) return;
  giveToServer(account, files.clusterDir);
  grantSearchToAncestors(account, files.clusterDir);
}

/**
 * A checkout under a private directory (say /tmp/tmp.XXXX, mode 700, owned by root)
 * is out of the postgres user's reach. Adding only the search bit for others lets it
 * pass through to its own cluster directory without being able to list anything.
 */
function grantSearchToAncestors(account, dir) {
  const changed = [];
  for (let current = path.dirname(dir); ; current = path.dirname(current)) {
    const { mode, uid, gid } = statSync(current);
    const searchBit = uid === account.uid ? 0o100 : gid === account.gid ? 0o010 : 0o001;
    if ((mode & searchBit) === 0) {
      chmodSync(current, (mode & 0o7777) | 0o001);
      changed.push(current);
    }
    if (path.dirname(current) === current) break;
  }
  if (changed.length > 0) {
    say(
      `Added o+x (enter, not list) to ${changed.join(', ')} so the postgres user — PostgreSQL will not run as root — can reach ${dir}`,
    );
  }
}

async function isRunning(files, account, binDir) {
  // pg_ctl status: 0 running, 3 not running, 4 no usable data directory.
  const { code } = await asServer(account, files, path.join(binDir, 'pg_ctl'), [
    'status',
    '-D',
    files.dataDir,
  ]);
  return code === 0;
}

function runningPort(dataDir) {
  // postmaster.pid, line 4: the port the running server listens on.
  try {
    const port = Number(readFileSync(path.join(dataDir, 'postmaster.pid'), 'utf8').split('\n')[3]);
    return Number.isInteger(port) && port > 0 ? port : null;
  } catch {
    return null;
  }
}

function binDirForCluster(dataDir, newestBinDir) {
  const version = readFileSync(path.join(dataDir, 'PG_VERSION'), 'utf8').trim();
  const binDir = postgresBinDir(version);
  if (binDir) return binDir;
  throw new StepError(
    `the cluster in ${dataDir} was made by PostgreSQL ${version}, whose server is not installed` +
      (newestBinDir ? ` (found ${newestBinDir})` : '') +
      `. Install postgresql-${version}, or delete ${path.dirname(dataDir)} to start over with an empty database.`,
  );
}

// --- creating the cluster ------------------------------------------------------------

async function initCluster(files, account, binDir) {
  const credentials = { user: SUPERUSER, password: randomBytes(24).toString('hex') };
  writeCredentials(files, credentials);
  const pwFile = path.join(files.clusterDir, 'initdb-password');
  writeFileSync(pwFile, `${credentials.password}\n`, { mode: 0o600 });
  giveToServer(account, pwFile);

  say(
    `Creating a PostgreSQL cluster in ${path.relative(process.cwd(), files.dataDir) || files.dataDir}`,
  );
  const startedAt = performance.now();
  try {
    const { code, output } = await asServer(account, files, path.join(binDir, 'initdb'), [
      '-D',
      files.dataDir,
      '-U',
      SUPERUSER,
      `--pwfile=${pwFile}`,
      '--auth=scram-sha-256',
      '--encoding=UTF8',
      ...localeArgs(),
    ]);
    if (code !== 0)
      throw new StepError(`initdb failed (exit code ${code}):\n${output.trim()}`, code);
  } finally {
    rmSync(pwFile, { force: true });
  }
  // Settings go in a file of our own, rewritten at every start so a changed port applies.
  const conf = path.join(files.dataDir, 'postgresql.conf');
  writeFileSync(conf, `${readFileSync(conf, 'utf8')}\ninclude '${SETTINGS_FILE}'\n`);
  say(`Cluster created in ${seconds(startedAt)}`);
  return credentials;
}

function localeArgs() {
  // C.UTF-8 sorts by code point like C yet knows which characters are letters; every
  // current glibc has it built in, but fall back to C where it is absent.
  try {
    const locales = execFileSync('locale', ['-a'], { encoding: 'utf8' }).toLowerCase().split('\n');
    if (locales.includes('c.utf8') || locales.includes('c.utf-8')) return ['--locale=C.UTF-8'];
  } catch {
    // no `locale` program: take the portable choice below
  }
  return ['--no-locale'];
}

function writeSettings(files, account, { port, throwaway }) {
  const lines = [
    '# Written by scripts/lib/postgres-cluster.mjs at every start; edits are overwritten.',
    `listen_addresses = '${HOST}'`,
    `port = ${port}`,
    "unix_socket_directories = ''",
    'max_connections = 100',
    // JIT costs more to compile than our short queries ever save.
    'jit = off',
    // The data sits on SSD or in page cache: random reads cost little more than sequential.
    'random_page_cost = 1.1',
  ];
  if (throwaway) lines.push('fsync = off', 'synchronous_commit = off', 'full_page_writes = off');
  const file = path.join(files.dataDir, SETTINGS_FILE);
  writeFileSync(file, `${lines.join('\n')}\n`, { mode: 0o600 });
  giveToServer(account, file);
}

// --- credentials and databases -----------------------------------------------------

function writeCredentials(files, credentials) {
  writeFileSync(files.credentialsFile, `${JSON.stringify(credentials, null, 2)}\n`, {
    mode: 0o600,
  });
}

function readCredentials(files) {
  let credentials;
  try {
    credentials = JSON.parse(readFileSync(files.credentialsFile, 'utf8'));
  } catch (error) {
    throw new StepError(
      `cannot read the cluster's password from ${files.credentialsFile} (${error.message}). ` +
        `Delete ${files.clusterDir} to start over with an empty database.`,
    );
  }
  if (typeof credentials?.user !== 'string' || typeof credentials?.password !== 'string') {
    throw new StepError(
      `${files.credentialsFile}: expected fields "user" and "password" (strings)`,
    );
  }
  return credentials;
}

async function ensureDatabase(binDir, { user, password, port }, database) {
  const psql = (sql) =>
    runCommand(
      path.join(binDir, 'psql'),
      [
        '-X',
        '-q',
        '-t',
        '-A',
        '-v',
        'ON_ERROR_STOP=1',
        '-h',
        HOST,
        '-p',
        String(port),
        '-U',
        user,
        '-d',
        'postgres',
        '-c',
        sql,
      ],
      { capture: true, env: { ...process.env, PGPASSWORD: password, PGCONNECT_TIMEOUT: '10' } },
    );
  const exists = await psql(`SELECT 1 FROM pg_database WHERE datname = '${database}'`);
  if (exists.code !== 0)
    throw new StepError(
      `cannot connect to PostgreSQL on ${HOST}:${port}:\n${exists.output.trim()}`,
    );
  if (exists.output.trim() === '1') return;
  const created = await psql(`CREATE DATABASE "${database}"`);
  if (created.code !== 0)
    throw new StepError(`CREATE DATABASE ${database} failed:\n${created.output.trim()}`);
  say(`Created database ${database}`);
}

function logTail(files, lines = 20) {
  try {
    const tail = readFileSync(files.logFile, 'utf8').trimEnd().split('\n').slice(-lines).join('\n');
    return `Last lines of ${files.logFile}:\n${tail}`;
  } catch {
    return `(no log at ${files.logFile})`;
  }
}
