// Sign-in, sessions and the security baseline, named after the OWASP ASVS 5.0 requirements they check.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, createUser, signIn, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

function pathOf(location: string) {
  const url = new URL(location, t.baseUrl);
  return url.pathname + url.search;
}

function sessionCookie(res: request.Response): string | undefined {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.find((c) => c.startsWith('railyard.sid='))?.split(';')[0];
}

/** Runs our redirect and the fake's consent, returning the callback URL (code and state) without following it. */
async function consent(agent: ReturnType<TestApp['agent']>, login: string) {
  const start = await agent.get('/auth/github').redirects(0);
  const page = await agent.get(pathOf(start.headers.location!));
  const requestId = /name="request_id" value="([^"]+)"/.exec(page.text)![1]!;
  const account = t.app.fakeGitHub!.accounts.findByLogin(login)!;
  const decision = await agent
    .post('/fake-github/login/oauth/authorize')
    .type('form')
    .send({ request_id: requestId, account_id: String(account.id) })
    .redirects(0);
  return new URL(decision.headers.location!);
}

const tokenCalls = () => t.app.fakeGitHub!.accounts.calls.filter((c) => c.endpoint === 'access_token').length;

describe('sign-in through the real passport-github2 strategy and the fake GitHub', () => {
  it('signs in a member keyed on the GitHub numeric id (ASVS V6.8: identity from the provider)', async () => {
    const user = await createUser(t, 'member');
    const agent = t.agent();
    await signIn(t, agent, user.login);
    const me = await agent.get('/api/me');
    expect(me.body.user).toMatchObject({ id: user.id, login: user.login, role: 'member' });
  });

  it('sends PKCE S256 and a state with the authorization request (RFC 7636 §4.3, RFC 6749 §10.12)', async () => {
    const start = await t.agent().get('/auth/github').redirects(0);
    const url = new URL(start.headers.location!);
    expect(url.searchParams.get('code_challenge_method')).toBe('S256');
    expect(url.searchParams.get('code_challenge')).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(url.searchParams.get('state')).toBeTruthy();
    expect(url.searchParams.get('scope')).toBe('read:user,user:email');
  });

  it('issues a new session id at sign-in (ASVS V7.2.4, session fixation)', async () => {
    const user = await createUser(t, 'member');
    const agent = t.agent();
    const before = sessionCookie(await agent.get('/auth/github').redirects(0));
    expect(before).toBeDefined();
    const callback = await consent(agent, user.login);
    const after = await agent.get(callback.pathname + callback.search).redirects(0);
    expect(after.status).toBe(303);
    const issued = sessionCookie(after);
    expect(issued).toBeDefined();
    expect(issued).not.toBe(before);
  });

  it('refuses a forged state without exchanging the code (ASVS V10.1.2, CSRF on the callback)', async () => {
    const user = await createUser(t, 'member');
    const agent = t.agent();
    const callback = await consent(agent, user.login);
    const calls = tokenCalls();
    callback.searchParams.set('state', 'forged-state-value');
    const res = await agent.get(callback.pathname + callback.search).redirects(0);
    expect(res.headers.location).not.toBe('/');
    expect((await agent.get('/api/me')).body.user).toBeNull();
    expect(tokenCalls()).toBe(calls);
  });

  it('refuses a callback with no state without exchanging the code', async () => {
    const user = await createUser(t, 'member');
    const agent = t.agent();
    const callback = await consent(agent, user.login);
    const calls = tokenCalls();
    callback.searchParams.delete('state');
    await agent.get(callback.pathname + callback.search).redirects(0);
    expect((await agent.get('/api/me')).body.user).toBeNull();
    expect(tokenCalls()).toBe(calls);
  });

  it('fails when the code was issued for another PKCE challenge (wrong verifier, RFC 7636 §4.6)', async () => {
    const user = await createUser(t, 'member');
    const victim = t.agent();
    const attacker = t.agent();
    const victimCallback = await consent(victim, user.login);
    const attackerCallback = await consent(attacker, user.login);
    // the attacker's code, delivered with the victim's own state: passport sends the victim's verifier
    const mixed = new URL(victimCallback);
    mixed.searchParams.set('code', attackerCallback.searchParams.get('code')!);
    const res = await victim.get(mixed.pathname + mixed.search).redirects(0);
    expect(res.headers.location, `${res.status} ${res.text.slice(0, 300)}`).toBe('/?signin=failed');
    expect((await victim.get('/api/me')).body.user).toBeNull();
    const last = t.app.fakeGitHub!.accounts.calls.filter((c) => c.endpoint === 'access_token').at(-1)!;
    expect(last.outcome).toBe('bad_verification_code');
  });

  it('rejects the old cookie after sign-out (ASVS V7.4.1)', async () => {
    const user = await createUser(t, 'moderator');
    const agent = t.agent();
    const callback = await signIn(t, agent, user.login);
    const cookie = sessionCookie(callback)!;
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    const replay = await request(t.baseUrl).get('/api/me').set('Cookie', cookie);
    expect(replay.body.user).toBeNull();
    const write = await request(t.baseUrl)
      .patch('/api/boards/any-board/nets/VBAT')
      .set('Cookie', cookie)
      .set('Origin', t.baseUrl)
      .send({ description: 'x' });
    expect(write.status).toBe(401);
  });

  it("refuses a banned user's very next request (ASVS V8.3.1, authorization at each request)", async () => {
    const admin = await t.agentAs('admin');
    const member = await t.agentAs('member');
    expect((await member.get('/api/me')).body.user.login).toBe(member.user.login);
    const ban = await admin.patch(`/api/admin/users/${member.user.id}`).send({ banned: true, reason: 'spam write-ups' });
    expect(ban.status, JSON.stringify(ban.body)).toBe(200);
    const next = await member.get('/api/me');
    expect(next.status).toBe(403);
    expect(next.body.error.code).toBe('banned');
    // and the session is gone: signed out afterwards
    expect((await member.get('/api/me')).body.user).toBeNull();
  });

  it('refuses a demoted moderator on the very next request', async () => {
    const admin = await t.agentAs('admin');
    const moderator = await t.agentAs('moderator');
    const before = await moderator.put('/api/boards/no-such-board/root').send({ net: 'VBAT' });
    expect(before.status).toBe(404); // allowed through the guard; the board does not exist
    await admin.patch(`/api/admin/users/${moderator.user.id}`).send({ role: 'member', reason: 'stepped down' });
    const after = await moderator.put('/api/boards/no-such-board/root').send({ net: 'VBAT' });
    expect(after.status).toBe(403);
  });

  it('writes an audit row for every role change and ban, with who and why', async () => {
    const admin = await t.agentAs('admin');
    const member = await t.agentAs('member');
    await admin.patch(`/api/admin/users/${member.user.id}`).send({ role: 'moderator', reason: 'trusted bench lead' });
    const audit = await admin.get('/api/admin/audit?limit=20');
    const entry = audit.body.entries.find((e: { targetId: string; action: string }) => e.targetId === String(member.user.id) && e.action === 'user.role');
    expect(entry).toMatchObject({ actor: { id: admin.user.id }, reason: 'trusted bench lead', details: { from: 'member', to: 'moderator' } });
  });

  it('names the first admin through RAILYARD_ADMINS at sign-in', async () => {
    const named = await createTestApp({ RAILYARD_ADMINS: 'someone-else, first-admin-login' });
    try {
      named.app.fakeGitHub!.accounts.add({
        id: 777_000_001 + Math.floor(Math.random() * 1000),
        login: 'first-admin-login',
        name: 'First Admin',
        emails: [{ email: 'first@example.com', primary: true, verified: true, visibility: 'private' }],
      });
      await named.pool.query("DELETE FROM users WHERE login = 'first-admin-login'");
      const agent = named.agent();
      await signIn(named, agent, 'first-admin-login');
      expect((await agent.get('/api/me')).body.user.role).toBe('admin');
    } finally {
      await named.close();
    }
  });
});

describe('the security baseline', () => {
  it('refuses a cross-site POST by Fetch Metadata (ASVS V3.5.1)', async () => {
    const moderator = await t.agentAs('moderator');
    const res = await moderator.put('/api/boards/any/root').set('Sec-Fetch-Site', 'cross-site').send({ net: 'VBAT' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_site_request');
    const sameSite = await moderator.put('/api/boards/any/root').set('Sec-Fetch-Site', 'same-site').send({ net: 'VBAT' });
    expect(sameSite.status).toBe(403);
  });

  it('refuses a write without Fetch Metadata from a foreign Origin or with no Origin', async () => {
    const foreign = await request(t.baseUrl).post('/api/auth/logout').set('Origin', 'https://elsewhere.example');
    expect(foreign.status).toBe(403);
    const none = await request(t.baseUrl).post('/api/auth/logout');
    expect(none.status).toBe(403);
  });

  it('takes JSON bodies only as application/json (415 otherwise)', async () => {
    const moderator = await t.agentAs('moderator');
    const res = await moderator.put('/api/boards/any/root').type('form').send({ net: 'VBAT' });
    expect(res.status).toBe(415);
  });

  it('never takes a role from a profile update (ASVS V8.2.2, mass assignment)', async () => {
    const member = await t.agentAs('member');
    const res = await member.put('/api/me/notifications').send({ mode: 'off', role: 'admin' });
    expect(res.status).toBe(400);
    const ok = await member.put('/api/me/notifications').send({ mode: 'off' });
    expect(ok.status).toBe(200);
    expect((await member.get('/api/me')).body.user.role).toBe('member');
    const { rows } = await t.pool.query('SELECT role FROM users WHERE id = $1', [member.user.id]);
    expect(rows[0].role).toBe('member');
  });

  it('rejects unknown fields in a request body', async () => {
    const admin = await t.agentAs('admin');
    const member = await t.agentAs('member');
    const res = await admin.patch(`/api/admin/users/${member.user.id}`).send({ role: 'moderator', reason: 'ok then', karma: 9000 });
    expect(res.status).toBe(400);
  });

  it('answers 429 past a rate limit, counted in PostgreSQL', async () => {
    const limited = await createTestApp({ RATE_WRITES_PER_MIN: 2 });
    try {
      const moderator = await limited.agentAs('moderator');
      const statuses = [];
      for (let i = 0; i < 3; i++) statuses.push((await moderator.put('/api/boards/no-such-board/root').send({ net: 'VBAT' })).status);
      expect(statuses).toEqual([404, 404, 429]);
      const { rows } = await limited.pool.query('SELECT hits FROM rate_limit_hits WHERE key = $1', [`writes:user:${moderator.user.id}`]);
      expect(rows[0].hits).toBe(3);
    } finally {
      await limited.close();
    }
  });

  it('sends a Content Security Policy and the usual hardening headers', async () => {
    const res = await request(t.baseUrl).get('/api/health/live');
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).not.toContain("'unsafe-inline'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});
