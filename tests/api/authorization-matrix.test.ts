// The authorization matrix (OWASP ASVS 5.0 V8.2.1: every function checks the caller's rights), generated
// from the app's own route table: each state-changing route must carry a role guard, and each is called
// as anonymous, member, moderator and admin, expecting 401 / 403 exactly where the guard says so.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { userRoles, type UserRole } from '@railyard/shared';
import type { Access } from '../../apps/api/src/middleware/require-role';
import { importPinList } from '../support/pin-list-board';
import { createTestApp, uniqueSlug, type TestApp } from '../support/test-app';

interface RouteEntry {
  method: string;
  path: string;
  access: Access | null;
}

interface StackLayer {
  rawPath?: string;
  route?: { path: string; methods: Record<string, boolean>; stack: { handle: unknown }[] };
  handle: { stack?: StackLayer[] } & Partial<{ access: Access }>;
}

const mutating = new Set(['post', 'put', 'patch', 'delete']);

function collectRoutes(stack: StackLayer[], prefix: string, skip: unknown[]): RouteEntry[] {
  const found: RouteEntry[] = [];
  for (const layer of stack) {
    if (layer.route) {
      const guard = layer.route.stack.map((l) => l.handle as Partial<{ access: Access }>).find((h) => h.access !== undefined);
      for (const method of Object.keys(layer.route.methods)) {
        found.push({ method, path: prefix + layer.route.path, access: guard?.access ?? null });
      }
    } else if (layer.handle.stack && !skip.includes(layer.handle)) {
      const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
      found.push(...collectRoutes(layer.handle.stack, prefix + mount, skip));
    }
  }
  return found;
}

let t: TestApp;
let routes: RouteEntry[];
const slug = uniqueSlug('matrix');
const samples: Record<string, string> = {};

beforeAll(async () => {
  t = await createTestApp();
  const admin = await t.agentAs('admin');
  const csv = ['refdes,pin,net', 'J1,1,GND', 'J1,2,VBAT', 'U1,1,VBAT', 'U1,2,VSYS', 'U1,3,GND'].join('\n');
  const links = JSON.stringify({ format: 'railyard-annotations', version: 1, powerLinks: [{ from: 'VBAT', to: 'VSYS', via: 'U1', kind: 'switch' }] });
  await importPinList(admin, slug, csv, { annotations: links });
  const link = await t.pool.query('SELECT l.id FROM power_links l JOIN boards b ON b.id = l.board_id WHERE b.slug = $1', [slug]);
  samples[':slug'] = slug;
  samples[':net'] = 'VBAT';
  samples[':refdes'] = 'U1';
  samples[':id'] = String(link.rows[0].id);
  const fake = t.app.fakeGitHub?.router;
  routes = collectRoutes((t.app as unknown as { router: { stack: StackLayer[] } }).router.stack, '', [fake]);
});
afterAll(() => t.close());

// An id that matches no case, comment or attachment: the guard decides first, then the route answers 404.
// (A real row of someone else's would be refused by the ownership check, which is not what this measures.)
const unusedId = '2147483000';

function concrete(routePath: string, role: UserRole | 'anonymous', forUser: number): string {
  return routePath.replace(/:\w+/g, (param) => {
    if (param !== ':id') return samples[param]!;
    if (routePath.startsWith('/api/admin/users')) return String(forUser);
    if (routePath.includes('/power-links/')) return samples[':id']!;
    return unusedId;
  });
}

function expected(access: Access, role: UserRole | 'anonymous'): 'refused-401' | 'refused-403' | 'allowed' {
  if (access === 'public') return 'allowed';
  if (role === 'anonymous') return 'refused-401';
  return userRoles.indexOf(role) >= userRoles.indexOf(access) ? 'allowed' : 'refused-403';
}

describe('authorization matrix', () => {
  it('finds the state-changing routes of the API', () => {
    const writes = routes.filter((r) => mutating.has(r.method));
    expect(writes.length).toBeGreaterThanOrEqual(7);
    expect(writes.map((r) => `${r.method} ${r.path}`)).toContain('post /api/boards/:slug/imports');
  });

  it('gives every state-changing route a role guard', () => {
    const unguarded = routes.filter((r) => mutating.has(r.method) && r.access === null).map((r) => `${r.method.toUpperCase()} ${r.path}`);
    expect(unguarded).toEqual([]);
  });

  it('answers each role on each state-changing route as its guard says', async () => {
    const table: string[] = [];
    const wrong: string[] = [];
    for (const route of routes.filter((r) => mutating.has(r.method) && r.access !== null)) {
      for (const role of ['anonymous', ...userRoles] as const) {
        // a fresh session each time: a sign-out or a self-edit must not change the next row
        const agent = role === 'anonymous' ? t.agent() : await t.agentAs(role);
        const target = await t.agentAs('member');
        const url = concrete(route.path, role, target.user.id);
        const res = await (agent as unknown as Record<string, (u: string) => { send(b: unknown): Promise<{ status: number }> }>)
          [route.method]!(url)
          .send({});
        const want = expected(route.access!, role);
        const got = res.status === 401 ? 'refused-401' : res.status === 403 ? 'refused-403' : 'allowed';
        table.push(`${route.method.toUpperCase()} ${route.path} as ${role}: ${res.status}`);
        if (got !== want || res.status >= 500) wrong.push(`${route.method.toUpperCase()} ${route.path} as ${role}: ${res.status}, expected ${want}`);
      }
    }
    expect(wrong, table.join('\n')).toEqual([]);
  });
});
