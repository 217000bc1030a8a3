// HTTP throughput of the tree endpoint against a static JSON endpoint of the same server, same run.
import { spawn } from 'node:child_process';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import type { BenchSection } from './bench-section';

export interface HttpResult {
  path: string;
  connections: number;
  requestsPerSecond: number;
  p50: number;
  p99: number;
  errors: number;
  non2xx: number;
}

/** A benchmark server as its own process: the API by default, or another script that prints its port. */
export async function startBenchServer(
  root: string,
  env: NodeJS.ProcessEnv,
  script: readonly string[] = ['tests/bench/serve-once.ts'],
) {
  const child = spawn(path.join(root, 'node_modules/.bin/tsx'), [...script], {
    cwd: root,
    env,
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const port = await new Promise<number>((resolve, reject) => {
    // tsx compiles the whole API on start: slow on a busy machine, but not this slow
    const timer = setTimeout(
      () => reject(new Error('bench server did not listen within 60 s')),
      60_000,
    );
    child.once('exit', (code) => reject(new Error(`bench server exited with code ${code}`)));
    child.stdout.on('data', (chunk: Buffer) => {
      const match = /listening (\d+)/.exec(chunk.toString());
      if (match) {
        clearTimeout(timer);
        resolve(Number(match[1]));
      }
    });
  });
  return {
    url: `http://127.0.0.1:${port}`,
    stop: async () => {
      child.kill('SIGTERM');
      await exited;
    },
  };
}

export async function measure(
  url: string,
  connections: number,
  seconds: number,
): Promise<HttpResult> {
  const result = await autocannon({ url, connections, duration: seconds });
  return {
    path: new URL(url).pathname + new URL(url).search,
    connections,
    requestsPerSecond: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    errors: result.errors,
    non2xx: result.non2xx,
  };
}

const loadedConnections = 50;
// Two rounds of 5 s per URL, alternating: the two URLs see the same drift in what else runs here.
const rounds = 2;
const roundSeconds = 5;
const p99TargetMs = 20;
const ratioTarget = 0.4;

/** Requests/s summed over rounds of equal length, latency percentiles at their worst round. */
function combined(results: HttpResult[]): HttpResult {
  const first = results[0]!;
  return {
    ...first,
    requestsPerSecond: results.reduce((sum, r) => sum + r.requestsPerSecond, 0) / results.length,
    p50: Math.max(...results.map((r) => r.p50)),
    p99: Math.max(...results.map((r) => r.p99)),
    errors: results.reduce((sum, r) => sum + r.errors, 0),
    non2xx: results.reduce((sum, r) => sum + r.non2xx, 0),
  };
}

/** The board's root trace and the liveness endpoint, each warmed up, then loaded in turns. */
export async function treeEndpointBench(
  baseUrl: string,
  slug: string,
  treeSize: { nodes: number; bytes: number },
  /** the same bytes from Node's bare http server (tests/bench/bare-node-once.ts): the machine's floor */
  floorUrl: string,
  /** the same bytes from a bare Express app on app.listen (tests/bench/bare-express-once.ts) */
  expressUrl: string,
): Promise<BenchSection> {
  const tree = `${baseUrl}/api/boards/${slug}/tree`;
  const live = `${baseUrl}/api/health/live`;
  for (const url of [tree, live, floorUrl, expressUrl]) await measure(url, loadedConnections, 3);
  const load = os.loadavg()[0]!;
  const liveRounds: HttpResult[] = [];
  const treeRounds: HttpResult[] = [];
  const floorRounds: HttpResult[] = [];
  const expressRounds: HttpResult[] = [];
  for (let round = 0; round < rounds; round++) {
    liveRounds.push(await measure(live, loadedConnections, roundSeconds));
    treeRounds.push(await measure(tree, loadedConnections, roundSeconds));
    floorRounds.push(await measure(floorUrl, loadedConnections, roundSeconds));
    expressRounds.push(await measure(expressUrl, loadedConnections, roundSeconds));
  }
  const floor = combined(floorRounds);
  const plainExpress = combined(expressRounds);
  // One request at a time: what a request costs when it does not queue behind 49 others.
  const single = [await measure(live, 1, 3), await measure(tree, 1, 3)];
  const liveLoaded = combined(liveRounds);
  const treeLoaded = combined(treeRounds);
  const ratio = treeLoaded.requestsPerSecond / liveLoaded.requestsPerSecond;
  const failures = [liveLoaded, treeLoaded, floor, plainExpress, ...single].reduce(
    (sum, r) => sum + r.errors + r.non2xx,
    0,
  );
  const p99Met = treeLoaded.p99 < p99TargetMs;
  const ratioMet = ratio >= ratioTarget;
  const row = (r: HttpResult, label: string) =>
    `| \`${r.path.replace(slug, '<slug>')}\` | ${label} | ${r.connections} | ${Math.round(r.requestsPerSecond).toLocaleString('en')} | ${r.p50} ms | ${r.p99} ms | ${r.errors + r.non2xx} |`;
  const rows = [
    ...liveRounds.flatMap((r, i) => [
      row(r, `round ${i + 1}`),
      row(treeRounds[i]!, `round ${i + 1}`),
      row(floorRounds[i]!, `round ${i + 1}, bare node:http`),
      row(expressRounds[i]!, `round ${i + 1}, bare Express, app.listen`),
    ]),
    row(single[0]!, 'alone'),
    row(single[1]!, 'alone'),
  ];
  // Little's law: with every connection busy, mean latency is connections ÷ throughput.
  const queued = (r: HttpResult) => Math.round((loadedConnections / r.requestsPerSecond) * 1000);
  const neededRps = Math.round((loadedConnections / p99TargetMs) * 1000);
  return {
    title: 'Tree endpoint under load',
    met: p99Met && ratioMet && failures === 0,
    body: [
      `\`GET /api/boards/<slug>/tree\` of the synthetic laptop board (its root trace: ${treeSize.nodes} rails, ${(treeSize.bytes / 1024).toFixed(1)} KB of JSON)`,
      `against \`GET /api/health/live\` (static JSON, no database), both on one API process in production mode`,
      `(\`tests/bench/serve-once.ts\`), autocannon in the bench process. Each URL was warmed up for 3 s, then loaded with`,
      `${loadedConnections} connections in ${rounds} rounds of ${roundSeconds} s, the URLs taking turns; "alone" is one connection for 3 s.`,
      `"bare node:http" (\`/tree\`) is a separate process with nothing but Node's http server sending the same ${(treeSize.bytes / 1024).toFixed(1)} KB`,
      `(\`tests/bench/bare-node-once.ts\`): the floor this machine and Node set. "bare Express, app.listen" is another with nothing`,
      `but Express 5 and one route sending those bytes, started the usual way (\`tests/bench/bare-express-once.ts\`). The API itself`,
      `listens through \`apps/api/src/lib/http-server.ts\`, whose requests and responses are born on Express's prototypes, so Express`,
      `does not change each request's prototype (a change that takes every request object off V8's optimised paths).`,
      `All are measured in the same rounds.`,
      `Server, autocannon and PostgreSQL share the machine's ${os.cpus().length} cores; the 1-minute load average was ${load.toFixed(1)} when the loaded runs started.`,
      '',
      '| URL | run | connections | requests/s | p50 | p99 | errors |',
      '| --- | --- | --- | --- | --- | --- | --- |',
      ...rows,
      '',
      `Over the rounds the tree endpoint served **${(ratio * 100).toFixed(0)} %** of the static endpoint's requests/s`,
      `(${Math.round(treeLoaded.requestsPerSecond).toLocaleString('en')} against ${Math.round(liveLoaded.requestsPerSecond).toLocaleString('en')}; target at least ${ratioTarget * 100} % — ${ratioMet ? 'met' : '**not met**'}),`,
      `with p99 **${treeLoaded.p99} ms** in its worse round (target under ${p99TargetMs} ms — ${p99Met ? 'met' : '**not met**'});`,
      `Node's bare http server sending the same bytes had p99 ${floor.p99} ms in its worse round at ${Math.round(floor.requestsPerSecond).toLocaleString('en')} requests/s,`,
      `the bare Express app on app.listen p99 ${plainExpress.p99} ms at ${Math.round(plainExpress.requestsPerSecond).toLocaleString('en')} requests/s.`,
      ...(floor.p99 >= p99TargetMs
        ? [
            `Node's bare server itself missed the target in this run: the machine was too busy for the run to say much about the endpoint.`,
          ]
        : []),
      '',
      `With ${loadedConnections} requests always in flight, latency is mostly queueing: ${loadedConnections} ÷ throughput gives a mean of about`,
      `${queued(liveLoaded)} ms for the static endpoint and ${queued(treeLoaded)} ms for the tree. A p99 under ${p99TargetMs} ms at ${loadedConnections} connections needs`,
      `well over ${neededRps.toLocaleString('en')} requests/s${liveLoaded.requestsPerSecond < neededRps ? ', more than even the static endpoint served here' : ''}; the "alone" rows show`,
      `what one request costs without the queue. Once a trace has been asked for, the tree endpoint reads nothing from the`,
      `database: board id, root net, and the trace's JSON come from the power graph cache, dropped with the board's graph.`,
    ].join('\n'),
  };
}
