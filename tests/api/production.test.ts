// Production mode: configuration checks at start, cookie flags and headers, and no stack in a 500.
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { readEnv } from '../../apps/api/src/config/env';
import { createTestApp } from '../support/test-app';

const production = {
  NODE_ENV: 'production' as const,
  GITHUB_CLIENT_ID: 'real-client-id',
  GITHUB_CLIENT_SECRET: 'real-client-secret',
  SESSION_SECRET: 'a'.repeat(48),
  PUBLIC_URL: 'https://railyard.example',
  TRUST_PROXY: '1',
};

describe('production mode', () => {
  it('refuses to start with OAuth URLs that are not GitHub', () => {
    expect(() =>
      readEnv({ ...process.env, ...production, GITHUB_TOKEN_URL: 'http://127.0.0.1:3000/fake-github/login/oauth/access_token' }),
    ).toThrow(/GITHUB_TOKEN_URL: production only talks to GitHub/);
    expect(() => readEnv({ ...process.env, ...production, GITHUB_CLIENT_ID: undefined })).toThrow(/GITHUB_CLIENT_ID/);
    expect(() => readEnv({ ...process.env, ...production, SESSION_SECRET: undefined })).toThrow(/SESSION_SECRET/);
    expect(() => readEnv({ ...process.env, ...production })).not.toThrow();
  });

  it('mounts no fake GitHub and sends sign-in to GitHub itself', async () => {
    const t = await createTestApp(production);
    try {
      expect(t.app.fakeGitHub).toBeNull();
      expect((await request(t.baseUrl).get('/fake-github/login/oauth/authorize')).status).toBe(404);
      const start = await request(t.baseUrl).get('/auth/github').set('X-Forwarded-Proto', 'https').redirects(0);
      expect(new URL(start.headers.location!).origin).toBe('https://github.com');
      expect(new URL(start.headers.location!).searchParams.get('redirect_uri')).toBe('https://railyard.example/auth/github/callback');
    } finally {
      await t.close();
    }
  });

  it('sets the session cookie with __Host- prefix, Secure, HttpOnly and SameSite=Lax, and the security headers', async () => {
    const t = await createTestApp(production);
    try {
      const res = await request(t.baseUrl).get('/auth/github').set('X-Forwarded-Proto', 'https').redirects(0);
      const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('__Host-railyard.sid='))!;
      const attributes = cookie.split(';').slice(1).map((a) => a.trim().split('=')[0]!.toLowerCase()).sort();
      expect(attributes).toEqual(['expires', 'httponly', 'path', 'samesite', 'secure']);
      expect(cookie).toMatch(/; Path=\//);
      expect(cookie).toMatch(/; SameSite=Lax/);
      expect(cookie).not.toMatch(/Domain=/i);
      const headers = await request(t.baseUrl).get('/api/health/live');
      expect({
        hsts: headers.headers['strict-transport-security'],
        frame: headers.headers['x-frame-options'],
        nosniff: headers.headers['x-content-type-options'],
        referrer: headers.headers['referrer-policy'],
        corp: headers.headers['cross-origin-resource-policy'],
      }).toEqual({
        hsts: 'max-age=31536000; includeSubDomains',
        frame: 'SAMEORIGIN',
        nosniff: 'nosniff',
        referrer: 'same-origin',
        corp: 'same-origin',
      });
      expect(headers.headers['content-security-policy']).toContain('upgrade-insecure-requests');
    } finally {
      await t.close();
    }
  });

  it('answers a server fault with a plain 500 and no stack trace (ASVS V16.5.1)', async () => {
    const broken = process.env.DATABASE_URL!.replace(/\/[^/]*$/, '/railyard_no_such_database');
    const t = await createTestApp({ ...production, DATABASE_URL: broken });
    try {
      const res = await request(t.baseUrl).get('/api/boards');
      expect(res.status).toBe(500);
      expect(res.body).toEqual({ error: { code: 'internal', message: 'Something went wrong on the server' } });
      expect(res.text).not.toMatch(/at .+:\d+:\d+|railyard_no_such_database/);
    } finally {
      await t.close();
    }
  });
});
