import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { holderFile } from '@/db/holder';

// The real command-line entry points against a real server process: what `npm run db:backup` and
// `npm run db:restore -- <file>` do on a machine.
const TSX = path.resolve('node_modules/.bin/tsx');
let root: string;
let env: NodeJS.ProcessEnv;

const run = (script: string, ...args: string[]) =>
  spawnSync(TSX, [script, ...args], { env, encoding: 'utf8', timeout: 60_000 });

/** Starts the server on the test's data folder and resolves once it listens. */
function startServer() {
  // Node itself, not the tsx wrapper: the wrapper may exit before the server has let go of the database.
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  const ready = new Promise<void>((resolve, reject) => {
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes('ready at http')) resolve();
    };
    child.stdout.on('data', onData);
    child.stderr.on('data', onData);
    child.once('exit', (code) => reject(new Error(`server exited with ${code}: ${output}`)));
  });
  const stop = () =>
    new Promise<void>((resolve) => {
      child.once('exit', () => resolve());
      child.kill('SIGTERM');
    });
  return { ready, stop };
}

beforeAll(() => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-commands-'));
  env = {
    ...process.env,
    NODE_ENV: 'development',
    PORT: '0',
    HOST: '127.0.0.1',
    DATABASE_PATH: path.join(root, 'data', 'trailtally.db'),
    WEB_DIR: path.join(root, 'no-web-app'),
    SEED_DEMO: 'never',
    LOG_LEVEL: 'silent',
    SMTP_URL: 'smtp://127.0.0.1:9',
  };
  delete env.BETTER_AUTH_SECRET;
});
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

describe('db:backup and db:restore', () => {
  it('when the server is running, then a backup is taken but a restore is refused; once it stops, the restore runs', async () => {
    const server = startServer();
    await server.ready;
    let stopped = false;
    try {
      expect(fs.existsSync(holderFile(env.DATABASE_PATH ?? ''))).toBe(true);

      const backup = run('scripts/db-backup.ts');
      expect(backup.status).toBe(0);
      const backupFile = /to (\S+\.db)/.exec(backup.stdout)?.[1] ?? '';
      expect(fs.existsSync(backupFile)).toBe(true);
      expect(backup.stdout).toMatch(/auth secret to \S+\.auth-secret/);

      const refused = run('scripts/db-restore.ts', backupFile);
      expect(refused.status).toBe(1);
      expect(refused.stderr).toMatch(/server \(process \d+\) is using/);

      await server.stop();
      stopped = true;
      expect(fs.existsSync(holderFile(env.DATABASE_PATH ?? ''))).toBe(false);

      const restored = run('scripts/db-restore.ts', backupFile);
      expect(restored.stderr).toBe('');
      expect(restored.status).toBe(0);
      expect(restored.stdout).toContain('sessions carry on');
    } finally {
      if (!stopped) await server.stop();
    }
  }, 90_000);

  it('when no backup is named, then restore says how to name one', () => {
    const result = run('scripts/db-restore.ts');
    expect(result.status).toBe(1);
    expect(result.stderr).toContain('npm run db:restore -- ');
  }, 30_000);
});
