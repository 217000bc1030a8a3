// For comparison in the tree endpoint's benchmark: a bare Express app, nothing but one route, served the
// usual way (`app.listen`, so Express changes each request's prototype; see apps/api/src/lib/http-server.ts),
// sending the same JSON bytes the API sent for the trace (read from the file named on the command line).
// Prints "listening <port>".
import { readFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import express from 'express';

const text = readFileSync(process.argv[2]!, 'utf8');
const app = express();
app.disable('x-powered-by');
app.get('/tree', (_req, res) => {
  res.type('json').send(text);
});
const server = app.listen(0, '127.0.0.1', () => {
  console.log(`listening ${(server.address() as AddressInfo).port}`);
});
process.on('SIGTERM', () => server.close());
