import path from 'node:path';
import { fileURLToPath } from 'node:url';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, uniqueSlug, type TestApp } from '../support/test-app';

const here = path.dirname(fileURLToPath(import.meta.url));
let t: TestApp;
let app: string;
const slug = uniqueSlug('read');

beforeAll(async () => {
  t = await createTestApp();
  app = t.baseUrl;
  const admin = await t.agentAs('admin');
  const res = await admin
    .post(`/api/boards/${slug}/imports?wait=true`)
    .field('board', JSON.stringify({ title: 'Read API board', deviceFamily: 'Test family', batteryVoltage: 3.85 }))
    .attach('netlist', path.join(here, 'fixtures/sample-356a.ipc'));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
});
afterAll(() => t.close());

describe('read API', () => {
  it('lists the board with its counts', async () => {
    const res = await request(app).get('/api/boards');
    expect(res.status).toBe(200);
    const board = res.body.boards.find((b: { slug: string }) => b.slug === slug);
    expect(board).toMatchObject({ title: 'Read API board', deviceFamily: 'Test family', batteryVoltage: 3.85, netCount: 5, componentCount: 4, pinCount: 6 });
  });

  it('gives a board with counts by net kind and component kind', async () => {
    const res = await request(app).get(`/api/boards/${slug}`);
    expect(res.status).toBe(200);
    expect(res.body.netKindCounts.ground).toBe(1);
    expect(res.body.componentKindCounts).toMatchObject({ connector: 1, ic: 1, capacitor: 1, resistor: 1 });
  });

  it('lists nets with component counts', async () => {
    const res = await request(app).get(`/api/boards/${slug}/nets`);
    const vbat = res.body.nets.find((n: { name: string }) => n.name === 'VBAT');
    expect(vbat).toMatchObject({ componentCount: 2, pinCount: 2, normalizedName: 'VBAT' });
  });

  it('lists the components on a net, each with all its pins', async () => {
    const res = await request(app).get(`/api/boards/${slug}/components?net=VBAT`);
    expect(res.status).toBe(200);
    expect(res.body.net).toBe('VBAT');
    expect(res.body.components.map((c: { refdes: string }) => c.refdes)).toEqual(['J1', 'U1']);
    const u1 = res.body.components[1];
    expect(u1.pins.map((p: { pin: string; net: string }) => `${p.pin}:${p.net}`)).toEqual(['1:VBAT', '4:VSYS']);
    expect(u1.side).toBe('top');
  });

  it('answers 404 with a JSON error naming the unknown board or net', async () => {
    const board = await request(app).get('/api/boards/no-such-board');
    expect(board.status).toBe(404);
    expect(board.body.error).toMatchObject({ code: 'not_found', message: 'Board "no-such-board" was not found' });
    const net = await request(app).get(`/api/boards/${slug}/components?net=NOPE`);
    expect(net.status).toBe(404);
    expect(net.body.error.message).toContain('Net "NOPE"');
  });

  it('answers 400 for a malformed slug or an unknown query parameter', async () => {
    expect((await request(app).get('/api/boards/Bad_Slug!')).status).toBe(400);
    const res = await request(app).get(`/api/boards/${slug}/components?colour=red`);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_request');
  });

  it('answers unknown API routes with a JSON 404', async () => {
    const res = await request(app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
