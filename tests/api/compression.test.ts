// Answers gzipped for clients that ask (RFC 9110 §8.4 Content-Encoding, §12.5.3 Accept-Encoding), read
// here over raw HTTP so nothing decodes them on the way, and unpacked with node:zlib (RFC 1952).
import http from 'node:http';
import { gunzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { importDemoHandset } from '../support/demo-handset';
import { createTestApp, uniqueSlug, type TestApp } from '../support/test-app';

let t: TestApp;
const slug = uniqueSlug('gzip');

beforeAll(async () => {
  t = await createTestApp();
  await importDemoHandset(t, slug);
});
afterAll(() => t.close());

type Raw = { status: number; headers: http.IncomingHttpHeaders; body: Buffer };

function raw(path: string, headers: Record<string, string> = {}): Promise<Raw> {
  return new Promise((resolve, reject) => {
    http
      .get(`${t.baseUrl}${path}`, { headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () =>
          resolve({
            status: res.statusCode ?? 0,
            headers: res.headers,
            body: Buffer.concat(chunks),
          }),
        );
      })
      .on('error', reject);
  });
}

describe('gzip on request', () => {
  it('sends a power-tree trace gzipped from its cache, the same JSON under the same tag', async () => {
    const plain = await raw(`/api/boards/${slug}/tree`);
    const zipped = await raw(`/api/boards/${slug}/tree`, {
      'Accept-Encoding': 'gzip, deflate, br',
    });

    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(zipped.status).toBe(200);
    expect(zipped.headers['content-encoding']).toBe('gzip');
    expect(zipped.headers.vary).toMatch(/Accept-Encoding/i);
    expect(plain.headers.vary).toMatch(/Accept-Encoding/i);
    expect(Number(zipped.headers['content-length'])).toBe(zipped.body.length);
    expect(zipped.body.length).toBeLessThan(plain.body.length / 3);
    expect(JSON.parse(gunzipSync(zipped.body).toString('utf8'))).toEqual(
      JSON.parse(plain.body.toString('utf8')),
    );
    expect(zipped.headers.etag).toBe(plain.headers.etag);

    const again = await raw(`/api/boards/${slug}/tree`, {
      'Accept-Encoding': 'gzip',
      'If-None-Match': zipped.headers.etag as string,
    });
    expect(again.status).toBe(304);
    expect(again.body.length).toBe(0);
  });

  it('gzips other JSON over 1 KB, and not for a client that refuses gzip', async () => {
    const zipped = await raw(`/api/boards/${slug}/placement`, { 'Accept-Encoding': 'gzip' });
    expect(zipped.headers['content-encoding']).toBe('gzip');
    const placement = JSON.parse(gunzipSync(zipped.body).toString('utf8')) as { board: string };
    expect(placement.board).toBe(slug);

    const refused = await raw(`/api/boards/${slug}/placement`, {
      'Accept-Encoding': 'gzip;q=0, identity',
    });
    expect(refused.headers['content-encoding']).toBeUndefined();
    expect(JSON.parse(refused.body.toString('utf8'))).toEqual(placement);
  });

  it('leaves a small answer as it is', async () => {
    const live = await raw('/api/health/live', { 'Accept-Encoding': 'gzip' });
    expect(live.status).toBe(200);
    expect(live.headers['content-encoding']).toBeUndefined();
  });
});
