import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PowerTree } from '@railyard/shared';
import { createTestApp, uniqueSlug, type TestApp } from '../support/test-app';
import { importPinList } from '../support/pin-list-board';

let t: TestApp;
let moderator: Awaited<ReturnType<TestApp['agentAs']>>;

beforeAll(async () => {
  t = await createTestApp();
  moderator = await t.agentAs('moderator');
});
afterAll(() => t.close());

async function smallBoard() {
  const slug = uniqueSlug('edits');
  const admin = await t.agentAs('admin');
  const csv = [
    'refdes,pin,net',
    'J1,1,GND', 'J1,2,VBAT',
    'U1,1,VBAT', 'U1,2,VSYS', 'U1,3,GND',
    'U2,1,VSYS', 'U2,2,VCC_1V8', 'U2,3,GND',
    'C1,1,VCC_1V8', 'C1,2,GND',
  ].join('\n');
  const links = JSON.stringify({ format: 'railyard-annotations', version: 1, rootNet: 'VBAT', powerLinks: [{ from: 'VBAT', to: 'VSYS', via: 'U1', kind: 'switch' }] });
  await importPinList(admin, slug, csv, { annotations: links });
  return slug;
}

const treeNets = async (slug: string) =>
  ((await request(t.baseUrl).get(`/api/boards/${slug}/tree`)).body as PowerTree).nodes.map((n) => n.net);

describe('moderator edits of the power tree', () => {
  it('adds a converter link, which the next trace shows, with an audit row', async () => {
    const slug = await smallBoard();
    expect(await treeNets(slug)).toEqual(['VBAT', 'VSYS']);
    const res = await moderator
      .post(`/api/boards/${slug}/power-links`)
      .send({ from: 'VSYS', to: 'VCC_1V8', via: 'U2', kind: 'converter', reason: 'buck output found on the bench' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.link).toMatchObject({ from: 'VSYS', to: 'VCC_1V8', via: 'U2', origin: 'entered', enteredBy: `user:${moderator.user.id}` });
    await expect.poll(() => treeNets(slug)).toEqual(['VBAT', 'VSYS', 'VCC_1V8']);
    const { rows } = await t.pool.query("SELECT actor_id, reason FROM audit_log WHERE action = 'power-link.add' AND target_id = $1", [String(res.body.link.id)]);
    expect(rows).toEqual([{ actor_id: moderator.user.id, reason: 'buck output found on the bench' }]);
  });

  it('refuses a link to an unknown net or through an unknown part, naming the field', async () => {
    const slug = await smallBoard();
    const net = await moderator.post(`/api/boards/${slug}/power-links`).send({ from: 'VSYS', to: 'VCC_9V9', via: 'U2', kind: 'converter' });
    expect(net.status).toBe(404);
    expect(net.body.error).toMatchObject({ message: `Net "VCC_9V9" on board "${slug}" was not found`, details: { field: 'to' } });
    const part = await moderator.post(`/api/boards/${slug}/power-links`).send({ from: 'VSYS', to: 'VCC_1V8', via: 'U99', kind: 'converter' });
    expect(part.status).toBe(404);
    expect(part.body.error.details.field).toBe('via');
    const same = await moderator.post(`/api/boards/${slug}/power-links`).send({ from: 'VSYS', to: 'VSYS', via: 'U2', kind: 'converter' });
    expect(same.status).toBe(400);
    const twice = await moderator.post(`/api/boards/${slug}/power-links`).send({ from: 'VBAT', to: 'VSYS', via: 'U1', kind: 'switch' });
    expect(twice.status).toBe(409);
  });

  it('removes a link and the trace no longer follows it', async () => {
    const slug = await smallBoard();
    const links = (await request(t.baseUrl).get(`/api/boards/${slug}/power-links?net=VSYS`)).body.links;
    expect(links).toHaveLength(1);
    const res = await moderator.delete(`/api/boards/${slug}/power-links/${links[0].id}?reason=wrong%20part`);
    expect(res.status).toBe(204);
    await expect.poll(() => treeNets(slug)).toEqual(['VBAT']);
    expect((await moderator.delete(`/api/boards/${slug}/power-links/${links[0].id}`)).status).toBe(404);
  });

  it("sets a net's nominal voltage and description, and the board's root", async () => {
    const slug = await smallBoard();
    const res = await moderator.patch(`/api/boards/${slug}/nets/VCC_1V8`).send({ nominalVoltage: 1.8, description: 'always-on 1.8 V' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.net).toMatchObject({ name: 'VCC_1V8', nominalVoltage: 1.8, description: 'always-on 1.8 V' });
    const root = await moderator.put(`/api/boards/${slug}/root`).send({ net: 'VSYS', reason: 'battery connector is on a daughterboard' });
    expect(root.body).toEqual({ rootNet: 'VSYS' });
    expect((await request(t.baseUrl).get(`/api/boards/${slug}`)).body.rootNet).toBe('VSYS');
    const empty = await moderator.patch(`/api/boards/${slug}/nets/VCC_1V8`).send({ reason: 'nothing' });
    expect(empty.status).toBe(400);
  });
});
