import { execFile } from 'node:child_process';
import { readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { boardRowCounts, uniqueSlug } from '../support/test-app';
import pg from 'pg';

const run = promisify(execFile);
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const fixture = path.join(root, 'tests/api/fixtures/sample-356a.ipc');
const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 2 });
afterAll(() => pool.end());

function cli(...args: string[]) {
  return run(path.join(root, 'node_modules/.bin/tsx'), ['apps/api/src/cli.ts', ...args], {
    cwd: root,
    env: process.env,
  }).then(
    (r) => ({ code: 0, ...r }),
    (e: { code: number; stdout: string; stderr: string }) => ({ code: e.code, stdout: e.stdout, stderr: e.stderr }),
  );
}

describe('railyard import (CLI)', () => {
  it('imports a netlist and prints what it stored', async () => {
    const slug = uniqueSlug('cli');
    const result = await cli('import', fixture, '--board', slug, '--title', 'CLI board');
    expect(result.code, result.stderr).toBe(0);
    expect(result.stdout).toContain(`Imported ${slug}: 5 nets, 4 components, 6 pins`);
    expect(await boardRowCounts(pool, slug)).toMatchObject({ boards: 1, nets: 5, components: 4, pins: 6 });
  });

  it('exits 1 listing each error with its line and stores nothing', async () => {
    const slug = uniqueSlug('cli-bad');
    const dir = mkdtempSync(path.join(os.tmpdir(), 'railyard-cli-'));
    const file = path.join(dir, 'broken.ipc');
    writeFileSync(file, readFileSync(fixture, 'utf8').replace('X+009500', 'X+0095Z0'));
    const result = await cli('import', file, '--board', slug, '--format', 'ipc-d-356');
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/error \(broken\.ipc, line 14, field x\): X coordinate/);
    expect(await boardRowCounts(pool, slug)).toMatchObject({ boards: 0 });
  });

  it('refuses to replace an existing board without --replace, and replaces with it', async () => {
    const slug = uniqueSlug('cli-twice');
    expect((await cli('import', fixture, '--board', slug)).code).toBe(0);
    const again = await cli('import', fixture, '--board', slug);
    expect(again.code).toBe(1);
    expect(again.stderr).toContain('already has a netlist');
    const replaced = await cli('import', fixture, '--board', slug, '--replace');
    expect(replaced.code, replaced.stderr).toBe(0);
    expect(replaced.stdout).toContain(`Replaced ${slug}`);
  });
});

describe('railyard role (CLI)', () => {
  it("sets a signed-in user's role and writes an audit row", async () => {
    const login = `cli-${uniqueSlug('user')}`;
    const { rows } = await pool.query<{ id: number }>(
      "INSERT INTO users (github_id, login) VALUES ((random() * 1e9)::bigint + 3e9, $1) RETURNING id",
      [login],
    );
    const result = await cli('role', login, 'admin', '--reason', 'first admin of the shop');
    expect(result.code, result.stderr).toBe(0);
    expect(result.stdout).toContain(`${login} is now admin`);
    const user = await pool.query('SELECT role FROM users WHERE id = $1', [rows[0]!.id]);
    expect(user.rows[0].role).toBe('admin');
    const audit = await pool.query("SELECT reason FROM audit_log WHERE action = 'user.role' AND target_id = $1", [String(rows[0]!.id)]);
    expect(audit.rows).toEqual([{ reason: 'first admin of the shop' }]);
  });

  it('exits 1 for someone who never signed in and 2 for an unknown role', async () => {
    expect((await cli('role', 'nobody-here-ever', 'admin')).code).toBe(1);
    expect((await cli('role', 'nobody-here-ever', 'overlord')).code).toBe(2);
  });
});
