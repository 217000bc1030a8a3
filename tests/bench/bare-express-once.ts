// The floor for the tree endpoint's benchmark: a bare Express app, nothing but one route, sending the same
// JSON bytes the API sent for the trace (read from the file named on the command line). Whatever latency
// this shows at 50 connections is the machine's and Express's, not Railyard's. Prints "listening <port>".
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
