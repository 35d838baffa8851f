// API benchmark: a real server on loopback (a child process with the demo data) under autocannon. Prints the cached
// budget's latency and throughput at 10 and 50 connections, the 304 path's, and the server's memory (RSS) idle and
// at its peak during the bursts. Targets are reported, not asserted (see README, "Speed").
import fs from 'node:fs';
import autocannon from 'autocannon';
import { DEMO_ACCOUNT } from '../db/seed';
import { startServer } from '../tests/e2e/server-process';
import { loadAverage } from './load-average';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
/** `--cpu-prof <dir>`: the server writes a CPU profile of the whole run there when it stops (open it in DevTools). */
const profileAt = process.argv.indexOf('--cpu-prof');
const PROFILE_DIR = profileAt >= 0 ? (process.argv[profileAt + 1] ?? 'bench-profiles') : null;
/** `BENCH_NODE_ARGS="--max-old-space-size=320"`: Node options for the server, to try a heap setting under load. */
const SERVER_NODE_ARGS = process.env.BENCH_NODE_ARGS?.split(' ').filter(Boolean) ?? [];

/** A process and everything it started, by id. */
function processTree(pid: number): number[] {
  const children = fs
    .readdirSync(`/proc/${pid}/task`)
    .flatMap((task) => fs.readFileSync(`/proc/${pid}/task/${task}/children`, 'utf8').trim().split(/\s+/))
    .filter(Boolean)
    .map(Number);
  return [pid, ...children.flatMap(processTree)];
}

const isNode = (pid: number): boolean => fs.readFileSync(`/proc/${pid}/comm`, 'utf8').trim() === 'node';

/**
 * The server's resident memory, MB, from /proc (Linux): the Node process (its budget workers are threads in it), or
 * the Node processes a launcher started, not the launcher itself nor esbuild's service.
 */
function rssMb(pid: number): number {
  const servers = processTree(pid).slice(1).filter(isNode);
  let kb = 0;
  for (const id of servers.length > 0 ? servers : [pid]) {
    const status = fs.readFileSync(`/proc/${id}/status`, 'utf8');
    kb += Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0);
  }
  return kb / 1024;
}

async function signIn(url: string): Promise<string> {
  const response = await fetch(`${url}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Origin: url },
    body: JSON.stringify({ email: DEMO_ACCOUNT.email, password: DEMO_ACCOUNT.password }),
  });
  if (!response.ok) throw new Error(`sign-in failed: ${response.status}`);
  return response.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

type Burst = { name: string; p50: number; p95: number; p99: number; rps: number; peakRssMb: number; non2xx: number };

async function burst(
  name: string,
  url: string,
  connections: number,
  headers: Record<string, string>,
  pid: number,
): Promise<Burst> {
  let peak = rssMb(pid);
  const sampler = setInterval(() => (peak = Math.max(peak, rssMb(pid))), 100);
  // Every response's time, for exact percentiles (autocannon's summary has no 95th).
  const times: number[] = [];
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon({ url, connections, duration: SECONDS, headers }, (error, done) =>
      error ? reject(error instanceof Error ? error : new Error(String(error))) : resolve(done),
    );
    instance.on('response', (_client, _status, _bytes, responseTime) => times.push(responseTime));
  });
  clearInterval(sampler);
  times.sort((a, b) => a - b);
  const at = (p: number): number => times[Math.min(times.length - 1, Math.floor(p * times.length))] ?? Number.NaN;
  return {
    name,
    p50: at(0.5),
    p95: at(0.95),
    p99: at(0.99),
    rps: times.length / SECONDS,
    peakRssMb: peak,
    non2xx: result.non2xx,
  };
}

async function main(): Promise<void> {
  console.log(`load average before: ${loadAverage()}; ${SECONDS} s per burst`);
  const server = await startServer({}, [
    ...SERVER_NODE_ARGS,
    ...(PROFILE_DIR ? ['--cpu-prof', '--cpu-prof-dir', PROFILE_DIR] : []),
  ]);
  try {
    const cookie = await signIn(server.url);
    const trips = (await (await fetch(`${server.url}/api/trips`, { headers: { Cookie: cookie } })).json()) as {
      trips: { id: string; name: string }[];
    };
    const trip = trips.trips.find((t) => t.name === 'Highland loop') ?? trips.trips[0];
    if (!trip) throw new Error('no demo trip');
    const budgetUrl = `${server.url}/api/trips/${trip.id}/budget`;
    // Computed once (in a worker) before the bursts: they measure the kept answer.
    const first = await fetch(budgetUrl, { headers: { Cookie: cookie, 'Accept-Encoding': 'br, gzip' } });
    const etag = first.headers.get('etag') ?? '';
    const body = Buffer.from(await first.arrayBuffer());
    const identity = await fetch(budgetUrl, { headers: { Cookie: cookie, 'Accept-Encoding': 'identity' } });
    const rawBytes = (await identity.arrayBuffer()).byteLength;
    console.log(`budget of "${trip.name}": ${rawBytes} bytes plain (decoded ${body.length}), ETag ${etag}`);
    await new Promise((resolve) => setTimeout(resolve, 1000));
    const idle = rssMb(server.pid);
    const browserLike = { Cookie: cookie, 'Accept-Encoding': 'gzip, deflate, br, zstd' };
    const runs = [
      await burst('cached budget, c = 10', budgetUrl, 10, browserLike, server.pid),
      await burst('cached budget, c = 50', budgetUrl, 50, browserLike, server.pid),
      await burst('304 (If-None-Match), c = 10', budgetUrl, 10, { ...browserLike, 'If-None-Match': etag }, server.pid),
    ];
    console.log(`\nserver RSS idle (after sign-in and one budget): ${idle.toFixed(0)} MB`);
    console.log('| burst | p50 ms | p95 ms | p99 ms | requests/s | peak RSS MB | non-2xx |');
    console.log('|---|---|---|---|---|---|---|');
    for (const r of runs)
      console.log(
        `| ${r.name} | ${r.p50.toFixed(1)} | ${r.p95.toFixed(1)} | ${r.p99.toFixed(1)} | ${r.rps.toFixed(0)} | ${r.peakRssMb.toFixed(0)} | ${r.non2xx} |`,
      );
    const [c10, , notModified] = runs;
    if (c10 && notModified)
      console.log(`cached budget median / 304 median at c = 10: ${(c10.p50 / notModified.p50).toFixed(2)}x`);
    console.log(`load average after: ${loadAverage()}`);
  } finally {
    await server.stop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
