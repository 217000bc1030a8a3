import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { NetDetail, PowerTree, RailSearchResponse } from '@railyard/shared';
import { demoHandsetAnnotations, importDemoHandset } from '../support/demo-handset';
import { createTestApp, uniqueSlug, type TestApp } from '../support/test-app';

// The demo handset board: its annotations name the converter and switch links; the importer derives the
// series links through inductors, ferrites, fuses and 0-ohm links from the netlist.
const annotations = demoHandsetAnnotations();
let t: TestApp;
let app: string;
let admin: Awaited<ReturnType<TestApp['agentAs']>>;
const slug = uniqueSlug('tree');

beforeAll(async () => {
  t = await createTestApp();
  app = t.baseUrl;
  admin = await importDemoHandset(t, slug);
});
afterAll(() => t.close());

async function tree(url: string): Promise<PowerTree> {
  const res = await request(app).get(url);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}

async function net(name: string): Promise<NetDetail> {
  const res = await request(app).get(`/api/boards/${slug}/nets/${encodeURIComponent(name)}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}

describe('GET /api/boards/:slug/tree', () => {
  it('from the root reaches every regulated rail the battery feeds', async () => {
    const result = await tree(`/api/boards/${slug}/tree`);
    expect(result.start).toBe('VBAT');
    const reached = new Set(result.nodes.map((n) => n.net));
    // Rails fed only from the USB input side are upstream of the charger, not below the battery.
    const usbSide = new Set(['USB_VBUS_CONN', 'USB_VBUS', 'CHG_VIN', 'CHG_DRV']);
    const rails = annotations.nets.filter((n) => (n.nominalVoltage ?? 0) > 0 && !usbSide.has(n.name)).map((n) => n.name);
    expect(rails.length).toBeGreaterThan(20);
    expect(rails.filter((r) => !reached.has(r))).toEqual([]);
    // every converter output named in the annotations below VSYS is in the tree, one level under VSYS or deeper
    const vsys = result.nodes.find((n) => n.net === 'VSYS')!;
    for (const link of annotations.powerLinks.filter((l) => l.from === 'VSYS')) {
      const node = result.nodes.find((n) => n.net === link.to)!;
      expect(node.depth).toBeGreaterThan(vsys.depth);
    }
  });

  it('marks the edge each rail was first reached by and cuts off at the asked depth', async () => {
    const shallow = await tree(`/api/boards/${slug}/tree?depth=1`);
    expect(Math.max(...shallow.nodes.map((n) => n.depth))).toBe(1);
    const vsys = shallow.nodes.find((n) => n.net === 'VSYS')!;
    expect(vsys.truncated).toBe(true);
    expect(vsys.childCount).toBeGreaterThan(5);
    const treeEdges = shallow.edges.filter((e) => e.tree);
    expect(treeEdges).toHaveLength(shallow.nodes.length - 1);
  });

  it('traces upstream from a rail back to the root', async () => {
    const result = await tree(`/api/boards/${slug}/nets/VCC_3V3_SENSOR/tree?direction=up`);
    const names = result.nodes.map((n) => n.net);
    expect(names).toEqual(expect.arrayContaining(['VCC_3V3_SENSOR', 'VCC_3V3', 'VSYS', 'VBAT']));
  });

  it('answers 404 for an unknown net and 400 for a bad direction or depth', async () => {
    expect((await request(app).get(`/api/boards/${slug}/nets/NOPE/tree`)).status).toBe(404);
    expect((await request(app).get(`/api/boards/${slug}/tree?direction=sideways`)).status).toBe(400);
    expect((await request(app).get(`/api/boards/${slug}/tree?depth=0`)).status).toBe(400);
    expect((await request(app).get(`/api/boards/no-such-board/tree`)).status).toBe(404);
  });
});

describe('GET /api/boards/:slug/nets/:net', () => {
  it('puts a rail fed through a fuse from the battery in the root coupled group', async () => {
    const root = await net('VBAT');
    expect(root.isRoot).toBe(true);
    const group = root.coupledGroup.nets.map((n) => n.name);
    expect(group).toContain('VBAT_AMP');
    expect(root.coupledGroup.links.every((l) => l.kind === 'series')).toBe(true);
  });

  it('keeps a rail behind a switch out of the root coupled group', async () => {
    const root = await net('VBAT');
    expect(root.coupledGroup.nets.map((n) => n.name)).not.toContain('VSYS');
    const vsys = await net('VSYS');
    expect(vsys.linksIn).toContainEqual(expect.objectContaining({ from: 'VBAT', via: 'Q1002', kind: 'switch' }));
  });

  it('puts a rail fed through a ferrite in its source rail coupled group', async () => {
    const audio = await net('VCC_1V8_AUDIO');
    expect(audio.coupledGroup.nets.map((n) => n.name)).toContain('VCC_1V8');
    expect(audio.coupledGroup.links.some((l) => l.viaKind === 'ferrite')).toBe(true);
  });

  it('gives the upstream path from the root, loads split by role and the summed capacitance', async () => {
    const sensor = await net('VCC_3V3_SENSOR');
    const path0 = sensor.upstreamPaths[0]!.map((s) => s.net);
    expect(path0[0]).toBe('VBAT');
    expect(path0.at(-1)).toBe('VCC_3V3_SENSOR');
    const parts = sensor.loads.parts;
    const caps = parts.filter((p) => p.kind === 'capacitor' && p.role === 'shunt');
    // sum of the parsed capacitor values, recomputed here from the parts the API lists
    const sum = caps.filter((c) => c.unit === 'F').reduce((s, c) => s + c.magnitude!, 0);
    expect(sensor.loads.capacitance.totalFarads).toBeCloseTo(sum, 12);
    expect(sensor.loads.capacitance.counted + sensor.loads.capacitance.unparsed.length).toBe(caps.length);
    expect(sensor.loads.countsByRole.shunt).toBe(parts.filter((p) => p.role === 'shunt').length);
  });

  it('finds a net by one of its aliases', async () => {
    const aliased = annotations.nets.find((n) => (n.aliases ?? []).length > 0)!;
    const detail = await net(aliased.aliases![0]!);
    expect(detail.net.name).toBe(aliased.name);
  });

  it('answers 404 naming an unknown net', async () => {
    const res = await request(app).get(`/api/boards/${slug}/nets/NOT_A_RAIL`);
    expect(res.status).toBe(404);
    expect(res.body.error.message).toBe(`Net "NOT_A_RAIL" on board "${slug}" was not found`);
  });
});

describe('power graph cache', () => {
  /** Imports (or with `replace` re-imports) a board where the battery feeds one converter's `rail`. */
  const oneConverterBoard = (small: string) => (rail: string, replace: boolean) => {
    const csv = ['refdes,pin,net', 'J1,1,GND', 'J1,2,VBAT', 'U1,1,VBAT', 'U1,2,' + rail, 'U1,3,GND'].join('\n');
    const links = JSON.stringify({
      format: 'railyard-annotations',
      version: 1,
      rootNet: 'VBAT',
      powerLinks: [{ from: 'VBAT', to: rail, via: 'U1', kind: 'converter' }],
    });
    return admin
      .post(`/api/boards/${small}/imports?wait=true`)
      .field('format', 'csv')
      .field('replace', String(replace))
      .attach('netlist', Buffer.from(csv), 'pins.csv')
      .attach('annotations', Buffer.from(links), 'a.json');
  };

  it('is dropped when the board is re-imported, so traces show the new netlist', async () => {
    const small = uniqueSlug('cache');
    const load = oneConverterBoard(small);
    expect((await load('VCC_1V8', false)).status).toBe(201);
    expect((await tree(`/api/boards/${small}/tree`)).nodes.map((n) => n.net)).toEqual(['VBAT', 'VCC_1V8']);
    expect((await load('VCC_1V2', true)).status).toBe(201);
    await expect
      .poll(async () => (await tree(`/api/boards/${small}/tree`)).nodes.map((n) => n.net))
      .toEqual(['VBAT', 'VCC_1V2']);
  });

  // RFC 9110 §8.8.3 (ETag) and §13.1.2 (If-None-Match): a client holding the current tag gets 304 without
  // a body; a changed representation gets a new tag.
  it('tags each trace, answers 304 to the current tag and a new tag after the board changes', async () => {
    const small = uniqueSlug('etag');
    const load = oneConverterBoard(small);
    expect((await load('VCC_1V8', false)).status).toBe(201);
    const url = `/api/boards/${small}/tree`;
    const first = await request(app).get(url);
    const tag = first.headers.etag as string;
    expect(tag).toMatch(/^W\/"[0-9a-f]+-[A-Za-z0-9+/]{27}"$/);
    const again = await request(app).get(url).set('If-None-Match', tag);
    expect(again.status).toBe(304);
    expect(again.text).toBe('');
    expect((await load('VCC_1V2', true)).status).toBe(201);
    await expect.poll(async () => (await request(app).get(url).set('If-None-Match', tag)).status).toBe(200);
    const changed = await request(app).get(url);
    expect(changed.headers.etag).not.toBe(tag);
    expect((changed.body as PowerTree).nodes.map((n) => n.net)).toEqual(['VBAT', 'VCC_1V2']);
  });
});

describe('GET /api/search', () => {
  it('finds VCC_3V3 for "3v3" and VSYS for "vsys", grouped by board', async () => {
    const three = (await request(app).get('/api/search').query({ q: '3v3', limit: 100, board: slug })).body as RailSearchResponse;
    expect(three.groups.map((g) => g.board.slug)).toEqual([slug]);
    expect(three.groups[0]!.nets.map((n) => n.name)).toContain('VCC_3V3');
    const vsys = (await request(app).get('/api/search').query({ q: 'vsys', limit: 100, board: slug })).body as RailSearchResponse;
    expect(vsys.groups[0]!.nets[0]!.name).toBe('VSYS');
  });

  it('searches across boards, grouping hits by board', async () => {
    const res = (await request(app).get('/api/search').query({ q: 'VCC_1V8_AUDIO', limit: 100 })).body as RailSearchResponse;
    const slugs = res.groups.map((g) => g.board.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
    expect(res.groups.every((g) => g.nets.length > 0)).toBe(true);
  });

  it('tolerates a small typo', async () => {
    const res = (await request(app).get('/api/search').query({ q: 'vcc_1v8_audoi', limit: 100, board: slug })).body as RailSearchResponse;
    expect(res.groups[0]?.nets.map((n) => n.name)).toContain('VCC_1V8_AUDIO');
  });

  it('answers 400 for an empty query', async () => {
    const res = await request(app).get('/api/search').query({ q: '  ' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues[0].field).toBe('q');
  });
});
