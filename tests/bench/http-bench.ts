// HTTP throughput of the tree endpoint against a static JSON endpoint of the same server, same run.
import { spawn } from 'node:child_process';
import path from 'node:path';
import autocannon from 'autocannon';

export interface HttpResult {
  path: string;
  requestsPerSecond: number;
  p50: number;
  p99: number;
  errors: number;
  non2xx: number;
}

export async function startBenchServer(root: string, env: NodeJS.ProcessEnv) {
  const child = spawn(path.join(root, 'node_modules/.bin/tsx'), ['tests/bench/serve-once.ts'], {
    cwd: root,
    env,
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const port = await new Promise<number>((resolve, reject) => {
    child.once('exit', (code) => reject(new Error(`bench server exited with code ${code}`)));
    child.stdout.on('data', (chunk: Buffer) => {
      const match = /listening (\d+)/.exec(chunk.toString());
      if (match) resolve(Number(match[1]));
    });
  });
  return {
    url: `http://127.0.0.1:${port}`,
    stop: () =>
      new Promise<void>((resolve) => {
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

export async function measure(url: string, connections: number, seconds: number): Promise<HttpResult> {
  const result = await autocannon({ url, connections, duration: seconds });
  return {
    path: new URL(url).pathname + new URL(url).search,
    requestsPerSecond: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    errors: result.errors,
    non2xx: result.non2xx,
  };
}
