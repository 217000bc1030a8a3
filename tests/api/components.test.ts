// A part's own page: GET /api/boards/:slug/components/:refdes, on a small pin-list board made here.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ComponentDetail, NetRow } from '@railyard/shared';
import { importPinList } from '../support/pin-list-board';
import { createTestApp, uniqueSlug, type TestApp } from '../support/test-app';
import { writeCase } from './casebook-fixtures';

// Natural order by ICU's numeric collation (ECMA-402 Intl.Collator, `numeric: true`): the reference
// the API's own pin order is checked against.
const naturalOrder = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

// Rows deliberately out of order: text order would put U1's pin 10 before 2 and U2's A10 before A2.
const pinRows: [refdes: string, pin: string, net: string][] = [
  ['J1', '1', 'GND'],
  ['J1', '2', 'VBAT'],
  ['U1', '10', 'VSYS'],
  ['U1', '2', 'VBAT'],
  ['U1', '1', 'VBAT'],
  ['U1', '11', 'I2C_SDA'],
  ['U1', '3', 'GND'],
  ['U1', '12', 'N/C'],
  ['U1', '9', 'VCC_1V8'],
  ['U1', 'EP', 'GND'],
  ['U1', '4', 'VSYS'],
  ['U1', '20', 'I2C_SCL'],
  ['U2', 'B1', 'I2C_SDA'],
  ['U2', 'A10', 'VCC_1V8'],
  ['U2', 'A2', 'VCC_1V8'],
  ['U2', 'AA1', 'GND'],
  ['U2', 'A1', 'GND'],
  ['U2', 'B10', 'I2C_SCL'],
  ['U2', 'B2', 'GND'],
  ['C1', '1', 'VSYS'],
  ['C1', '2', 'GND'],
  ['C2', '1', 'VSYS'],
  ['C2', '2', 'GND'],
  ['R1', '1', 'VCC_1V8'],
  ['R1', '2', 'I2C_SDA'],
];
const nominal: Record<string, number> = { VSYS: 3.85, VCC_1V8: 1.8 };

let t: TestApp;
let app: string;
const slug = uniqueSlug('part');

beforeAll(async () => {
  t = await createTestApp();
  app = t.baseUrl;
  const admin = await t.agentAs('admin');
  const csv = ['refdes,pin,net', ...pinRows.map((row) => row.join(','))].join('\n');
  const annotations = JSON.stringify({
    format: 'railyard-annotations',
    version: 1,
    rootNet: 'VBAT',
    nets: Object.entries(nominal).map(([name, nominalVoltage]) => ({
      name,
      kind: 'power',
      nominalVoltage,
    })),
    powerLinks: [{ from: 'VSYS', to: 'VCC_1V8', via: 'U1', kind: 'converter' }],
  });
  await importPinList(admin, slug, csv, { annotations });
});
afterAll(() => t.close());

async function part(refdes: string): Promise<ComponentDetail> {
  const res = await request(app).get(
    `/api/boards/${slug}/components/${encodeURIComponent(refdes)}`,
  );
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as ComponentDetail;
}

describe('GET /api/boards/:slug/components/:refdes', () => {
  it('gives the part with its pins in natural order, each with the net the pin list puts it on', async () => {
    const found = await part('U1');
    expect(found.board).toBe(slug);
    expect(found.component).toMatchObject({ refdes: 'U1', kind: 'ic', value: '', package: '' });
    const written = pinRows.filter(([refdes]) => refdes === 'U1');
    expect(found.component.pins.map((p) => p.pin)).toEqual(
      written.map(([, pin]) => pin).sort(naturalOrder.compare),
    );
    for (const [, pin, net] of written) {
      expect(found.component.pins.find((p) => p.pin === pin)?.net).toBe(net === 'N/C' ? null : net);
    }
  });

  it('marks ground pins and gives each net’s kind and nominal voltage as the net list has them', async () => {
    const nets = (await request(app).get(`/api/boards/${slug}/nets`)).body.nets as NetRow[];
    const netByName = new Map(nets.map((n) => [n.name, n]));
    const { component } = await part('U1');
    for (const pin of component.pins) {
      if (pin.net === null) {
        expect(pin).toMatchObject({ netKind: null, ground: false, nominalVoltage: null });
        continue;
      }
      const net = netByName.get(pin.net)!;
      expect(pin).toMatchObject({
        netKind: net.kind,
        ground: net.kind === 'ground',
        nominalVoltage: net.nominalVoltage,
      });
    }
    expect(component.pins.filter((p) => p.ground).map((p) => p.pin)).toEqual(['3', 'EP']);
    expect(component.pins.find((p) => p.pin === '10')?.nominalVoltage).toBe(nominal.VSYS);
  });

  it('orders ball-grid pins by row letters, then by number', async () => {
    const { component } = await part('U2');
    const written = pinRows.filter(([refdes]) => refdes === 'U2').map(([, pin]) => pin);
    const expected = [...written].sort(naturalOrder.compare);
    expect(component.pins.map((p) => p.pin)).toEqual(expected);
    expect(expected.slice(0, 3)).toEqual(['A1', 'A2', 'A10']);
  });

  it('gives the power links that pass through the part, and none for a part no link passes through', async () => {
    // the annotations above enter one link: VSYS → VCC_1V8 through the converter U1
    expect((await part('U1')).powerLinks).toEqual([{ from: 'VSYS', to: 'VCC_1V8', kind: 'converter', origin: 'entered' }]);
    expect((await part('C1')).powerLinks).toEqual([]);
  });

  it('finds the part whatever the letter case of the refdes asked for, and answers with its own spelling', async () => {
    const lower = await part('u2');
    expect(lower.component.refdes).toBe('U2');
    expect(lower.component.pins).toEqual((await part('U2')).component.pins);
  });

  it('counts the published cases that name the part and the solved ones that blame it, as the case list does', async () => {
    const member = await t.agentAs('member');
    const moderator = await t.agentAs('moderator');
    const names = (components: { refdes: string; culprit: boolean }[]) => ({ components });
    await writeCase(member, slug, {
      title: 'U1 cooked by a VSYS short',
      ...names([{ refdes: 'U1', culprit: true }]),
    });
    await writeCase(member, slug, {
      title: 'No 1V8 rail, U1 suspected',
      outcome: 'not_solved',
      ...names([{ refdes: 'U1', culprit: false }]),
    });
    await writeCase(member, slug, {
      title: 'C1 shorted; U1 was fine',
      ...names([
        { refdes: 'C1', culprit: true },
        { refdes: 'U1', culprit: false },
      ]),
    });
    await writeCase(member, slug, {
      title: 'Draft about U1',
      status: 'draft',
      ...names([{ refdes: 'U1', culprit: true }]),
    });
    const hidden = await writeCase(member, slug, {
      title: 'Spam naming U1',
      outcome: 'partly',
      ...names([{ refdes: 'U1', culprit: false }]),
    });
    const hide = await moderator
      .post(`/api/cases/${hidden.id}/hide`)
      .send({ reason: 'not a repair' });
    expect(hide.status, JSON.stringify(hide.body)).toBe(200);

    const { casebook } = await part('U1');
    // three published and visible cases name U1; one of them, solved, blames it
    expect(casebook).toEqual({ cases: 3, solvedAsCulprit: 1 });
    const list = await request(app).get(`/api/boards/${slug}/components/U1/cases`);
    expect(list.status).toBe(200);
    expect(casebook).toEqual({
      cases: list.body.total,
      solvedAsCulprit: list.body.solvedAsCulprit,
    });
    expect((await part('C1')).casebook).toEqual({ cases: 1, solvedAsCulprit: 1 });
    expect((await part('R1')).casebook).toEqual({ cases: 0, solvedAsCulprit: 0 });
  });

  it('answers 404 naming the part and the board when either is unknown', async () => {
    const missingPart = await request(app).get(`/api/boards/${slug}/components/U99`);
    expect(missingPart.status).toBe(404);
    expect(missingPart.body.error).toMatchObject({
      code: 'not_found',
      message: `Component "U99" on board "${slug}" was not found`,
    });
    const missingBoard = await request(app).get('/api/boards/no-such-board/components/U1');
    expect(missingBoard.status).toBe(404);
    expect(missingBoard.body.error.message).toBe('Board "no-such-board" was not found');
  });

  it('answers 400 naming the refdes for one no netlist can hold', async () => {
    for (const bad of ['%20U1', 'U1%20', 'U%0A1', 'U'.repeat(201)]) {
      const res = await request(app).get(`/api/boards/${slug}/components/${bad}`);
      expect(res.status, bad).toBe(400);
      expect(res.body.error.code).toBe('invalid_request');
      expect(res.body.error.details.issues).toEqual([expect.objectContaining({ field: 'refdes' })]);
    }
  });
});
