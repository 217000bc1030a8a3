import { readdirSync, readFileSync, existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { boardRowCounts, createTestApp, uniqueSlug, type TestApp } from '../support/test-app';

const here = path.dirname(fileURLToPath(import.meta.url));
const sample = path.join(here, 'fixtures/sample-356a.ipc');
const seedBoards = path.join(here, '../../seed/boards');
const demoDir = () =>
  readdirSync(seedBoards)
    .map((d) => path.join(seedBoards, d))
    .find((d) => existsSync(path.join(d, 'netlist.ipc')))!;

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['agentAs']>>;
beforeAll(async () => {
  t = await createTestApp();
  admin = await t.agentAs('admin');
});
afterAll(() => t.close());

/**
 * Counts read straight off the fixed columns of the IPC-D-356A record layout (net name in columns 4–17,
 * refdes in 21–26, pin in 28–31), independently of the project's reader: test records 317/327 whose
 * refdes is not VIA are pins; NNAME<n> tokens stand for the long names of the P NNAME records.
 */
function countIpcRecords(text: string) {
  const longNames = new Map<string, string>();
  const nets = new Set<string>();
  let pins = 0;
  const refdes = new Set<string>();
  for (const line of text.split(/\r?\n/)) {
    const alias = /^P\s+(NNAME\d+)\s+(\S+)/.exec(line);
    if (alias) longNames.set(alias[1]!, alias[2]!);
    if (!/^3[12]7/.test(line)) continue;
    const ref = line.slice(20, 26).trim();
    if (ref === 'VIA') continue;
    pins++;
    refdes.add(ref);
    const net = line.slice(3, 17).trim();
    if (net !== 'N/C') nets.add(longNames.get(net) ?? net);
  }
  return { nets: nets.size, pins, components: refdes.size };
}

function upload(slug: string, files: Record<string, string | Buffer>, fields: Record<string, string> = {}, wait = true) {
  let req = admin.post(`/api/boards/${slug}/imports${wait ? '?wait=true' : ''}`);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  for (const [k, v] of Object.entries(files)) {
    req = typeof v === 'string' && existsSync(v) ? req.attach(k, v) : req.attach(k, Buffer.from(v), `${k}.txt`);
  }
  return req;
}

describe('POST /api/boards/:slug/imports', () => {
  it('imports an IPC-D-356A netlist and reads back the nets and pins the file holds', async () => {
    const slug = uniqueSlug('sample');
    const res = await upload(slug, { netlist: sample }, { board: JSON.stringify({ title: 'Sample board' }) });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const expected = countIpcRecords(readFileSync(sample, 'utf8'));
    // FACTS §11: GND, VBAT, VSYS, 3V3, 3V3_LDO_FEEDBACK_DIVIDER; J1, U1, C5, R7; 6 pins
    expect(expected).toEqual({ nets: 5, pins: 6, components: 4 });
    expect(res.body.job.summary).toMatchObject({ nets: expected.nets, pins: expected.pins, components: expected.components });

    const nets = await request(t.baseUrl).get(`/api/boards/${slug}/nets`);
    expect(nets.status).toBe(200);
    expect(nets.body.nets.map((n: { name: string }) => n.name).sort()).toEqual(
      ['3V3', '3V3_LDO_FEEDBACK_DIVIDER', 'GND', 'VBAT', 'VSYS'].sort(),
    );
    const gnd = nets.body.nets.find((n: { name: string }) => n.name === 'GND');
    expect(gnd.kind).toBe('ground');

    const j1 = await request(t.baseUrl).get(`/api/boards/${slug}/components`).query({ net: 'GND' });
    expect(j1.status).toBe(200);
    const connector = j1.body.components.find((c: { refdes: string }) => c.refdes === 'J1');
    // IPC-D-356A CUST 0: one unit is 0.0001 in = 2.54 µm, so X+001000 Y+002000 is (2.54 mm, 5.08 mm)
    const pin1 = connector.pins.find((p: { pin: string }) => p.pin === '1');
    expect(pin1.x).toBeCloseTo(2.54, 6);
    expect(pin1.y).toBeCloseTo(5.08, 6);
  });

  it('imports the demo phone board with its parts and annotations, counts matching the file', async () => {
    const slug = uniqueSlug('phone');
    const dir = demoDir();
    const netlist = path.join(dir, 'netlist.ipc');
    const res = await upload(slug, {
      netlist,
      parts: path.join(dir, 'parts.csv'),
      annotations: path.join(dir, 'annotations.json'),
    });
    expect(res.status, JSON.stringify(res.body).slice(0, 2000)).toBe(201);
    const expected = countIpcRecords(readFileSync(netlist, 'utf8'));
    const counts = await boardRowCounts(t.pool, slug);
    expect(counts.pins).toBe(expected.pins);
    expect(counts.components).toBe(expected.components);
    expect(counts.nets).toBe(expected.nets);
    expect(res.body.job.summary.rootNet).toBe('VBAT');
    expect(counts.links).toBeGreaterThan(6);
  });

  it('answers 202 at once and reports real progress until the job succeeds', async () => {
    const slug = uniqueSlug('progress');
    const res = await upload(slug, { netlist: sample }, {}, false);
    expect(res.status).toBe(202);
    expect(res.headers.location).toBe(`/api/imports/${res.body.job.id}`);
    let job = res.body.job;
    const seen: number[] = [job.progress];
    for (let i = 0; i < 100 && job.status === 'running'; i++) {
      await new Promise((r) => setTimeout(r, 20));
      job = (await request(t.baseUrl).get(`/api/imports/${job.id}`)).body.job;
      seen.push(job.progress);
    }
    expect(job.status).toBe('succeeded');
    expect(job.progress).toBe(1);
    expect(seen).toEqual([...seen].sort((a, b) => a - b));
  });

  it('answers 400 naming the line and field when a record is malformed, and stores nothing', async () => {
    const slug = uniqueSlug('bad');
    const text = readFileSync(sample, 'utf8').replace('X+008500Y+002500', 'X+00A500Y+002500');
    const res = await upload(slug, { netlist: Buffer.from(text) }, { format: 'ipc-d-356' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('import_invalid');
    const lineNo = text.split('\n').findIndex((l) => l.includes('X+00A500')) + 1;
    expect(res.body.error.details.errors).toContainEqual(
      expect.objectContaining({ line: lineNo, field: expect.stringMatching(/x/i) }),
    );
    expect(await boardRowCounts(t.pool, slug)).toMatchObject({ boards: 0, nets: 0, pins: 0 });
  });

  it('answers 400 naming line 1 when a CSV is sent as IPC-D-356', async () => {
    const res = await upload(uniqueSlug('wrong'), { netlist: Buffer.from('refdes,pin,net\nC1,1,GND\n') }, { format: 'ipc-d-356' });
    expect(res.status).toBe(400);
    const lines = res.body.error.details.errors.map((e: { line: number | null }) => e.line);
    expect(lines).toContain(1);
  });

  it('answers 400 when the format cannot be told from the file', async () => {
    const res = await upload(uniqueSlug('unknown'), { netlist: Buffer.from('hello world\n') });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unknown_format');
  });

  it('answers 413 for an upload over the size limit', async () => {
    const small = await createTestApp({ IMPORT_MAX_BYTES: 1024 });
    try {
      const smallAdmin = await small.agentAs('admin');
      const res = await smallAdmin
        .post(`/api/boards/${uniqueSlug('big')}/imports`)
        .attach('netlist', Buffer.alloc(4096, 'C  padding\n'), 'big.ipc');
      expect(res.status).toBe(413);
      expect(res.body.error.code).toBe('file_too_large');
    } finally {
      await small.close();
    }
  });

  it('answers 400 without a netlist file and for bad board details', async () => {
    const slug = uniqueSlug('nofile');
    const none = await admin.post(`/api/boards/${slug}/imports`).field('format', 'csv');
    expect(none.status).toBe(400);
    expect(none.body.error.code).toBe('missing_file');
    const bad = await upload(slug, { netlist: sample }, { board: JSON.stringify({ title: '' }) });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.issues[0].field).toBe('board.title');
  });

  it('refuses to overwrite an existing board unless replace is asked (409)', async () => {
    const slug = uniqueSlug('twice');
    expect((await upload(slug, { netlist: sample })).status).toBe(201);
    const again = await upload(slug, { netlist: sample });
    expect(again.status).toBe(409);
  });

  it('leaves a board exactly as it was when a replacing import has errors', async () => {
    const slug = uniqueSlug('keep');
    expect((await upload(slug, { netlist: sample })).status).toBe(201);
    const before = await boardRowCounts(t.pool, slug);
    const broken = readFileSync(sample, 'utf8').replace('327VSYS             U1    -4', '327VSYS                   -4');
    const res = await upload(slug, { netlist: Buffer.from(broken) }, { replace: 'true', format: 'ipc-d-356' });
    expect(res.status).toBe(400);
    expect(await boardRowCounts(t.pool, slug)).toEqual(before);
  });

  it('on replace keeps entered links and voltages whose nets still exist and reports what it dropped', async () => {
    const slug = uniqueSlug('replace');
    const csv = ['refdes,pin,net', 'J1,1,GND', 'J1,2,VBAT', 'U1,1,VBAT', 'U1,2,VSYS', 'U1,3,GND', 'U2,1,VSYS', 'U2,2,VCC_1V8', 'U2,3,GND', 'C1,1,VCC_1V8', 'C1,2,GND'].join('\n');
    const annotations = JSON.stringify({
      format: 'railyard-annotations',
      version: 1,
      nets: [
        { name: 'VSYS', nominalVoltage: 3.8 },
        { name: 'VCC_1V8', nominalVoltage: 1.8, description: 'always-on 1.8 V' },
      ],
      powerLinks: [
        { from: 'VBAT', to: 'VSYS', via: 'U1', kind: 'switch' },
        { from: 'VSYS', to: 'VCC_1V8', via: 'U2', kind: 'converter' },
      ],
    });
    const first = await upload(slug, { netlist: Buffer.from(csv), annotations: Buffer.from(annotations) }, { format: 'csv' });
    expect(first.status, JSON.stringify(first.body)).toBe(201);

    // the new netlist renames VCC_1V8 to VCC_1V8_AON: its voltage and link cannot survive
    const next = csv.replaceAll('VCC_1V8', 'VCC_1V8_AON');
    const res = await upload(slug, { netlist: Buffer.from(next) }, { format: 'csv', replace: 'true' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.job.summary.replaced).toBe(true);
    expect(res.body.job.summary.dropped).toEqual(
      expect.arrayContaining([expect.stringContaining('VCC_1V8'), expect.stringContaining('converter link VSYS → VCC_1V8 via U2')]),
    );
    const nets = (await request(t.baseUrl).get(`/api/boards/${slug}/nets`)).body.nets;
    expect(nets.find((n: { name: string }) => n.name === 'VSYS').nominalVoltage).toBe(3.8);
    const { rows } = await t.pool.query(
      `SELECT f.name AS from, t.name AS to, l.via_refdes AS via, l.origin FROM power_links l
       JOIN nets f ON f.id = l.from_net_id JOIN nets t ON t.id = l.to_net_id JOIN boards b ON b.id = l.board_id
       WHERE b.slug = $1 AND l.origin = 'entered'`,
      [slug],
    );
    expect(rows).toEqual([{ from: 'VBAT', to: 'VSYS', via: 'U1', origin: 'entered' }]);
  });
});

describe('GET /api/imports/:id', () => {
  it('answers 404 for an unknown import', async () => {
    expect((await request(t.baseUrl).get('/api/imports/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await request(t.baseUrl).get('/api/imports/not-a-uuid')).status).toBe(404);
  });
});
