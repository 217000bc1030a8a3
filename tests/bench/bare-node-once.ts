// The machine's floor for the tree endpoint's benchmark: Node's own http server, no framework, sending the
// same JSON bytes the API sent for the trace (read from the file named on the command line), with a
// precomputed ETag as the API sends. Whatever latency this shows at 50 connections is the machine's and
// Node's, not Railyard's. Prints "listening <port>".
import { readFileSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import etag from 'etag';

const body = readFileSync(process.argv[2]!);
const headers = {
  'content-type': 'application/json; charset=utf-8',
  'content-length': body.length,
  etag: etag(body, { weak: true }),
};
const server = http.createServer((_req, res) => {
  res.writeHead(200, headers);
  res.end(body);
});
server.listen(0, '127.0.0.1', () => {
  console.log(`listening ${(server.address() as AddressInfo).port}`);
});
process.on('SIGTERM', () => server.close());
