import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { backupDatabase, restoreDatabase, secretBeside } from '@/db/backup';
import { openDatabase } from '@/db/client';
import { claimDatabase, DatabaseInUseError, databaseHolder, holderFile } from '@/db/holder';

let root: string;
let dbPath: string;
let backupDir: string;
let secretFile: string;

const notes = (file: string) => {
  const sqlite = new Database(file, { readonly: true });
  try {
    return sqlite.prepare('SELECT body FROM note ORDER BY body').pluck().all();
  } finally {
    sqlite.close();
  }
};

beforeEach(() => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-restore-'));
  dbPath = path.join(root, 'data', 'trailtally.db');
  backupDir = path.join(root, 'data', 'backups');
  secretFile = path.join(root, 'data', 'auth-secret');
  const db = openDatabase(dbPath);
  db.$client.exec("CREATE TABLE note (body TEXT); INSERT INTO note VALUES ('before the backup');");
  db.$client.close();
  fs.writeFileSync(secretFile, 'secret-at-backup\n', { mode: 0o600 });
});
afterEach(() => fs.rmSync(root, { recursive: true, force: true }));

/** A backup, then a change after it (a new note and a new secret), with nothing holding the database. */
async function backupThenChange() {
  const files = await backupDatabase(dbPath, backupDir, {
    now: new Date('2027-01-01T10:00:00Z'),
    authSecretFile: secretFile,
  });
  const db = openDatabase(dbPath);
  db.$client.exec("INSERT INTO note VALUES ('after the backup');");
  db.$client.close();
  fs.writeFileSync(secretFile, 'secret-after-backup\n');
  return files;
}

describe('backup', () => {
  it('when the secret is the generated file, then the backup keeps a copy of it beside the database copy', async () => {
    const files = await backupDatabase(dbPath, backupDir, { authSecretFile: secretFile });
    expect(files.authSecret).toBe(secretBeside(files.database));
    expect(fs.readFileSync(files.authSecret ?? '', 'utf8')).toBe('secret-at-backup\n');
    expect(notes(files.database)).toEqual(['before the backup']);
  });

  it('when the secret is configured (no file), then only the database is copied', async () => {
    const files = await backupDatabase(dbPath, backupDir);
    expect(files.authSecret).toBeUndefined();
  });
});

describe('restore', () => {
  it('when a backup is restored, then its data and secret are back and the replaced files are kept aside', async () => {
    const files = await backupThenChange();
    const result = restoreDatabase({
      backupFile: files.database,
      databasePath: dbPath,
      backupDir,
      authSecretFile: secretFile,
    });

    // No write-ahead log of the replaced database is left to be replayed onto the restored one.
    expect(fs.existsSync(`${dbPath}-wal`)).toBe(false);
    expect(notes(dbPath)).toEqual(['before the backup']);
    expect(fs.readFileSync(secretFile, 'utf8')).toBe('secret-at-backup\n');
    expect(result.restoredSecret).toBe(true);
    const asideDb = result.movedAside.find((file) => file.endsWith('.db'));
    const asideSecret = result.movedAside.find((file) => file.endsWith('.auth-secret'));
    // The replaced database was folded into one file first, so nothing written after the backup is lost.
    expect(notes(asideDb ?? '')).toEqual(['after the backup', 'before the backup']);
    expect(fs.readFileSync(asideSecret ?? '', 'utf8')).toBe('secret-after-backup\n');
    if (process.platform !== 'win32') expect(fs.statSync(dbPath).mode & 0o777).toBe(0o600);
  });

  it('when the server holds the database, then restore refuses and changes nothing', async () => {
    const files = await backupThenChange();
    const release = claimDatabase(dbPath);
    try {
      expect(() =>
        restoreDatabase({ backupFile: files.database, databasePath: dbPath, backupDir, authSecretFile: secretFile }),
      ).toThrow(DatabaseInUseError);
    } finally {
      release();
    }
    expect(notes(dbPath)).toEqual(['after the backup', 'before the backup']);
    expect(fs.readFileSync(secretFile, 'utf8')).toBe('secret-after-backup\n');
  });

  it('when something has the database open without saying so, then SQLite itself makes restore refuse', async () => {
    const files = await backupThenChange();
    const open = openDatabase(dbPath);
    try {
      expect(() => restoreDatabase({ backupFile: files.database, databasePath: dbPath, backupDir })).toThrow(
        /still has .* open/,
      );
    } finally {
      open.$client.close();
    }
    expect(notes(dbPath)).toEqual(['after the backup', 'before the backup']);
  });

  it('when the server mark names a process that has died, then restore goes ahead', async () => {
    const files = await backupThenChange();
    const deadPid = spawnSync(process.execPath, ['-e', '0']).pid;
    fs.writeFileSync(holderFile(dbPath), `${deadPid}\n`);
    expect(databaseHolder(dbPath)).toBeUndefined();
    restoreDatabase({ backupFile: files.database, databasePath: dbPath, backupDir });
    expect(notes(dbPath)).toEqual(['before the backup']);
  });

  it('when the file named is not a database, then restore refuses before touching anything', () => {
    const bogus = path.join(root, 'not-a-backup.db');
    fs.writeFileSync(bogus, 'just text, no pages');
    expect(() => restoreDatabase({ backupFile: bogus, databasePath: dbPath, backupDir })).toThrow(/not a sound/);
    expect(notes(dbPath)).toEqual(['before the backup']);
    expect(fs.existsSync(backupDir)).toBe(false);
  });

  it('when the server stops, then its mark is released and a later server mark is never removed by it', () => {
    const first = claimDatabase(dbPath, 111);
    const second = claimDatabase(dbPath, 222);
    first();
    expect(fs.readFileSync(holderFile(dbPath), 'utf8').trim()).toBe('222');
    second();
    expect(fs.existsSync(holderFile(dbPath))).toBe(false);
  });
});
