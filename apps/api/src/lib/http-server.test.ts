import type { IncomingMessage, Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
import { afterEach, describe, expect, it } from 'vitest';
import { createHttpServer } from './http-server';

let server: Server | null = null;
afterEach(async () => {
  await new Promise((resolve) => server?.close(resolve) ?? resolve(null));
  server = null;
});

/** A small app whose route reports what Express gave it, served by createHttpServer. */
async function served() {
  const app = express();
  app.set('query parser', 'simple');
  app.get('/echo', (req, res) => {
    res.locals.seen = true;
    res
      .status(201)
      .json({
        q: req.query.q,
        host: req.hostname,
        sameApp: req.app === app,
        locals: res.locals.seen,
      });
  });
  server = createHttpServer(app);
  // what each request's prototype is before Express has touched it
  const arrived: unknown[] = [];
  server.prependListener('request', (req: IncomingMessage) =>
    arrived.push(Object.getPrototypeOf(req)),
  );
  await new Promise<void>((resolve) => server!.listen(0, '127.0.0.1', resolve));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return { app, url, arrived };
}

describe('createHttpServer', () => {
  it('builds each request on the app’s own request prototype, so Express has none to change', async () => {
    const { app, url, arrived } = await served();

    await fetch(`${url}/echo`);
    await fetch(`${url}/echo`);

    expect(arrived).toHaveLength(2);
    for (const proto of arrived) expect(proto).toBe(app.request);
  });

  it('keeps Express’s request and response helpers working', async () => {
    const { url } = await served();

    const response = await fetch(`${url}/echo?q=vsys`);

    expect(response.status).toBe(201);
    expect(response.headers.get('content-type')).toBe('application/json; charset=utf-8');
    expect(response.headers.get('etag')).toMatch(/^W\/"/);
    expect(await response.json()).toEqual({
      q: 'vsys',
      host: '127.0.0.1',
      sameApp: true,
      locals: true,
    });
  });

  it('can serve the same app twice without stacking prototypes', async () => {
    const app = express();
    app.get('/', (_req, res) => res.send('ok'));

    createHttpServer(app);
    const requestPrototype = app.request;
    createHttpServer(app);

    expect(app.request).toBe(requestPrototype);
  });

  it('still answers through a plain server that Express itself re-prototypes', async () => {
    // supertest and app.listen() make a plain http server: the app must not depend on ours
    const { app } = await served();
    const plain = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => plain.once('listening', resolve));
    try {
      const response = await fetch(
        `http://127.0.0.1:${(plain.address() as AddressInfo).port}/echo?q=vbat`,
      );
      expect(await response.json()).toMatchObject({ q: 'vbat', sameApp: true });
    } finally {
      await new Promise((resolve) => plain.close(resolve));
    }
  });
});
