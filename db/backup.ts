import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { WAL_COMPANIONS } from './client';
import { takeDatabaseOffline } from './holder';
import { OWNER_ONLY_FILE, ensureOwnFolder, ensurePrivateFile } from './private-files';

export type BackupFiles = {
  database: string;
  /** A copy of the generated auth secret, so sessions survive a restore; absent when the secret is configured. */
  authSecret?: string;
};

/** The auth secret's copy that goes with a backup: `trailtally-<time>.db` → `trailtally-<time>.auth-secret`. */
export const secretBeside = (backupFile: string): string => backupFile.replace(/(\.db)?$/, '.auth-secret');

const stampOf = (now: Date) => now.toISOString().replace(/[:.]/g, '-');

function copyPrivately(from: string, to: string): void {
  ensurePrivateFile(to);
  fs.copyFileSync(from, to);
  fs.chmodSync(to, OWNER_ONLY_FILE);
}

/**
 * Copies a live database with SQLite's online backup API, which is safe while the server is writing (a plain file
 * copy of a WAL database can miss committed pages), and the generated auth secret beside it when there is one.
 */
export async function backupDatabase(
  sourcePath: string,
  backupDir: string,
  options: { now?: Date; authSecretFile?: string } = {},
): Promise<BackupFiles> {
  ensureOwnFolder(backupDir);
  const database = path.join(backupDir, `trailtally-${stampOf(options.now ?? new Date())}.db`);
  // Created owner-only before SQLite writes a page into it: a backup holds every session and password hash.
  ensurePrivateFile(database);
  const sqlite = new Database(sourcePath, { readonly: true, fileMustExist: true });
  try {
    await sqlite.backup(database);
  } finally {
    sqlite.close();
  }
  fs.chmodSync(database, OWNER_ONLY_FILE);
  const secret = options.authSecretFile;
  if (!secret || !fs.existsSync(secret)) return { database };
  const authSecret = secretBeside(database);
  copyPrivately(secret, authSecret);
  return { database, authSecret };
}

/** Refuses anything that is not a sound SQLite database, before the current one is touched. */
function checkBackup(backupFile: string): void {
  let sqlite: Database.Database | undefined;
  try {
    sqlite = new Database(backupFile, { readonly: true, fileMustExist: true });
    const result = sqlite.pragma('quick_check', { simple: true });
    if (result !== 'ok') throw new Error(String(result));
  } catch (error) {
    throw new Error(
      `${backupFile} is not a sound Trailtally backup (${(error as Error).message}); nothing was changed.`,
    );
  } finally {
    sqlite?.close();
  }
}

export type RestoreResult = {
  /** Where the files that were replaced now are. */
  movedAside: string[];
  /** Whether the backup's auth secret was put back (sessions in the backup stay valid). */
  restoredSecret: boolean;
};

/**
 * Puts a backup in place of the database: refuses while the database is open, moves the current database (and any
 * WAL/SHM left behind) aside into the backups folder, copies the backup in owner-only, and brings back the auth
 * secret saved with it when the secret is the generated file. Migrations newer than the backup run on next start.
 */
export function restoreDatabase(options: {
  backupFile: string;
  databasePath: string;
  backupDir: string;
  authSecretFile?: string;
  now?: Date;
}): RestoreResult {
  const { backupFile, databasePath, backupDir, authSecretFile } = options;
  if (path.resolve(backupFile) === path.resolve(databasePath)) {
    throw new Error(`${backupFile} is the database itself; name a backup from ${backupDir}.`);
  }
  checkBackup(backupFile);
  takeDatabaseOffline(databasePath);
  ensureOwnFolder(backupDir);
  const asidePrefix = path.join(backupDir, `before-restore-${stampOf(options.now ?? new Date())}`);
  const movedAside: string[] = [];
  const moveAside = (file: string, suffix: string) => {
    if (!fs.existsSync(file)) return;
    const target = `${asidePrefix}${suffix}`;
    fs.renameSync(file, target);
    movedAside.push(target);
  };
  moveAside(databasePath, '.db');
  for (const companion of WAL_COMPANIONS) moveAside(`${databasePath}${companion}`, `.db${companion}`);
  copyPrivately(backupFile, databasePath);

  const savedSecret = secretBeside(backupFile);
  if (!authSecretFile || !fs.existsSync(savedSecret)) return { movedAside, restoredSecret: false };
  moveAside(authSecretFile, '.auth-secret');
  copyPrivately(savedSecret, authSecretFile);
  return { movedAside, restoredSecret: true };
}
