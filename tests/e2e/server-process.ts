import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { buildServer, SERVER_BUNDLE } from '@/scripts/build-server';

// The real server as a child process, for the browser tests and the benchmarks (no test runner needed here).

/**
 * The Node options `npm start` runs the compiled server with (its heap bound, say), read from package.json so the
 * browser tests and the benchmarks run the server as it is run for real. The start script prepares (builds what is
 * stale) and then runs `node <options> build/server.cjs`.
 */
export function startScriptNodeArgs(): string[] {
  const start = (JSON.parse(fs.readFileSync('package.json', 'utf8')) as { scripts: { start: string } }).scripts.start;
  const [command, ...words] = (start.split('&&').at(-1) ?? '').trim().split(/\s+/);
  const script = words.at(-1) ?? '';
  if (command !== 'node' || path.resolve(script) !== SERVER_BUNDLE)
    throw new Error(`npm start is expected to end by running node on ${SERVER_BUNDLE}, not: ${start}`);
  return words.slice(0, -1);
}

export type RunningServer = { url: string; dbPath: string; pid: number; stop: () => Promise<void> };

/** A port nobody is listening on, so the server's public URL (checked by better-auth's origin test) is known up front. */
async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

/**
 * Starts the real server (built web app, fresh database with demo data) on a free port; `env` adds or overrides
 * settings (a mail server of the test's own, say); `nodeArgs` go to Node (a benchmark's `--cpu-prof`, say).
 */
export async function startServer(env: Record<string, string> = {}, nodeArgs: string[] = []): Promise<RunningServer> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-e2e-'));
  const port = await freePort();
  const dbPath = path.join(dir, 'e2e.db');
  // Compiled as `npm start` compiles it (a second or so; unchanged files are left alone), then run the same way.
  await buildServer();
  const child: ChildProcess = spawn(process.execPath, [...startScriptNodeArgs(), ...nodeArgs, SERVER_BUNDLE], {
    env: {
      ...process.env,
      PORT: String(port),
      PUBLIC_URL: `http://127.0.0.1:${port}`,
      HOST: '127.0.0.1',
      DATABASE_PATH: dbPath,
      LOG_LEVEL: 'warn',
      NODE_ENV: 'development',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${output}`)), 60_000);
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      if (/ready at http/.test(output)) {
        clearTimeout(timer);
        resolve(`http://127.0.0.1:${port}`);
      }
    };
    child.stdout?.on('data', onData);
    child.stderr?.on('data', onData);
    child.on('exit', (code) => reject(new Error(`server exited with ${code}:\n${output}`)));
  });
  // A server that dies under a test shows why, instead of the test's next page load failing with "connection refused".
  let stopping = false;
  child.on('exit', (code, signal) => {
    if (!stopping)
      console.error(`The server exited during the tests (${code ?? signal}); its last words:\n${output.slice(-4000)}`);
  });
  return {
    url,
    dbPath,
    pid: child.pid ?? 0,
    stop: () =>
      new Promise<void>((resolve) => {
        stopping = true;
        child.once('exit', () => {
          fs.rmSync(dir, { recursive: true, force: true });
          resolve();
        });
        child.kill('SIGTERM');
      }),
  };
}
