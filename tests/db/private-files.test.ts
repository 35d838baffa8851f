import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { backupDatabase } from '@/db/backup';
import { openDatabase } from '@/db/client';
import { loadEnv } from '@/server/env';

const modeOf = (file: string) => fs.statSync(file).mode & 0o777;

let root: string;
afterEach(() => fs.rmSync(root, { recursive: true, force: true }));

function freshRoot(): string {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-modes-'));
  return root;
}

// POSIX file modes; Windows has no such bits.
describe.skipIf(process.platform === 'win32')('owner-only data files', () => {
  it('when the database is created, then its folder is 0700 and it, its WAL and its SHM are 0600', () => {
    const dataDir = path.join(freshRoot(), 'data');
    const dbPath = path.join(dataDir, 'trailtally.db');
    const db = openDatabase(dbPath);
    db.$client.exec('CREATE TABLE note (body TEXT); INSERT INTO note VALUES (1);');
    expect(modeOf(dataDir)).toBe(0o700);
    expect(modeOf(dbPath)).toBe(0o600);
    expect(modeOf(`${dbPath}-wal`)).toBe(0o600);
    expect(modeOf(`${dbPath}-shm`)).toBe(0o600);
    db.$client.close();
  });

  it('when an older install left a world-readable database, then opening it makes it 0600', () => {
    const dbPath = path.join(freshRoot(), 'old.db');
    openDatabase(dbPath).$client.close();
    fs.chmodSync(dbPath, 0o644);
    const db = openDatabase(dbPath);
    expect(modeOf(dbPath)).toBe(0o600);
    db.$client.close();
  });

  it('when a backup is written, then the backups folder is 0700 and the backup 0600', async () => {
    const dbPath = path.join(freshRoot(), 'data', 'trailtally.db');
    const db = openDatabase(dbPath);
    db.$client.exec('CREATE TABLE note (body TEXT); INSERT INTO note VALUES (1);');
    const backups = path.join(root, 'data', 'backups');
    const { database: target } = await backupDatabase(dbPath, backups);
    db.$client.close();
    expect(modeOf(backups)).toBe(0o700);
    expect(modeOf(target)).toBe(0o600);
  });

  it('when the auth secret is generated, then it is 0600 in a 0700 folder', () => {
    const dataDir = path.join(freshRoot(), 'fresh-data');
    loadEnv({ NODE_ENV: 'test', DATABASE_PATH: path.join(dataDir, 'trailtally.db') });
    expect(modeOf(dataDir)).toBe(0o700);
    expect(modeOf(path.join(dataDir, 'auth-secret'))).toBe(0o600);
  });

  it('when an existing auth secret is readable by others, then loading it makes it 0600', () => {
    const dataDir = freshRoot();
    const secretFile = path.join(dataDir, 'auth-secret');
    fs.writeFileSync(secretFile, `${'s'.repeat(40)}\n`, { mode: 0o644 });
    fs.chmodSync(secretFile, 0o644);
    const env = loadEnv({ NODE_ENV: 'test', DATABASE_PATH: path.join(dataDir, 'trailtally.db') });
    expect(env.BETTER_AUTH_SECRET).toBe('s'.repeat(40));
    expect(modeOf(secretFile)).toBe(0o600);
  });
});
