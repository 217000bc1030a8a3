// Where the parts sit: GET /api/boards/:slug/placement, on the small pin-list board of
// tests/support/placed-board.ts, whose positions are worked by hand.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { boardPlacementSchema, type BoardPlacement } from '@railyard/shared';
import { importPlacedBoard } from '../support/placed-board';
import { createTestApp, uniqueSlug, type TestApp } from '../support/test-app';

let t: TestApp;
const slug = uniqueSlug('placed');

beforeAll(async () => {
  t = await createTestApp();
  await importPlacedBoard(t, slug);
});
afterAll(() => t.close());

async function placement(): Promise<BoardPlacement> {
  const res = await request(t.baseUrl).get(`/api/boards/${slug}/placement`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return boardPlacementSchema.parse(res.body);
}

describe('GET /api/boards/:slug/placement', () => {
  it('draws each part as the box around its pins, half a pad (0.25 mm) wider on every side', async () => {
    const { parts, units } = await placement();
    const byRefdes = Object.fromEntries(parts.map(({ refdes, ...rest }) => [refdes, rest]));

    expect(units).toBe('mm');
    // worked by hand: min/max of the pin centres, ∓ 0.25 mm
    expect(byRefdes.J1).toMatchObject({ side: 'top', x0: -0.25, y0: -0.25, x1: 0.25, y1: 2.75 });
    expect(byRefdes.U1).toMatchObject({ side: 'top', x0: 19.75, y0: 9.75, x1: 24.25, y1: 14.25 });
    expect(byRefdes.C1).toMatchObject({
      side: 'bottom',
      kind: 'capacitor',
      x0: 38.75,
      y0: 18.75,
      x1: 40.25,
      y1: 19.25,
    });
  });

  it('outlines the board around every placed part and names the parts without a position', async () => {
    const { outline, parts, unplaced } = await placement();

    expect(outline).toEqual({ x0: -0.25, y0: -0.25, x1: 40.25, y1: 19.25 });
    expect(parts.map((p) => p.refdes).sort()).toEqual(['C1', 'J1', 'U1']);
    expect(unplaced).toEqual(['H1']);
  });

  it('answers 404 naming an unknown board and 400 for a slug no board can have', async () => {
    const missing = await request(t.baseUrl).get('/api/boards/no-such-board-here/placement');
    expect(missing.status).toBe(404);
    expect(missing.body.error.message).toContain('no-such-board-here');

    const bad = await request(t.baseUrl).get('/api/boards/Not%20A%20Slug/placement');
    expect(bad.status).toBe(400);
  });
});
