import path from 'node:path';
import Database from 'better-sqlite3';
import { drizzle } from 'drizzle-orm/better-sqlite3';
import type { BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import type { BaseSQLiteDatabase } from 'drizzle-orm/sqlite-core';
import type { RunResult } from 'better-sqlite3';
import { ensurePrivateFile, ensurePrivateFolder, tightenIfPresent } from './private-files';
import * as schema from './schema';

export type Db = BetterSQLite3Database<typeof schema> & { $client: Database.Database };

/** The database or a transaction on it: what query functions take, so they compose inside transactions. */
export type DbExecutor = BaseSQLiteDatabase<'sync', RunResult, typeof schema>;

/** The files SQLite keeps beside a database in WAL mode while it is open. */
export const WAL_COMPANIONS = ['-wal', '-shm'] as const;

/** Opens (creating if needed) the SQLite file with the pragmas every connection needs. */
export function openDatabase(filePath: string): Db {
  if (filePath !== ':memory:') {
    ensurePrivateFolder(path.dirname(path.resolve(filePath)));
    // SQLite gives the -wal and -shm files it creates the database file's mode, so an owner-only database
    // keeps its companions owner-only too; ones left by an older install are tightened here.
    ensurePrivateFile(filePath);
    for (const companion of WAL_COMPANIONS) tightenIfPresent(`${filePath}${companion}`);
  }
  const sqlite = new Database(filePath);
  // WAL lets readers continue while a write is in flight; the busy timeout makes a second
  // writer wait instead of failing at once with SQLITE_BUSY.
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  sqlite.pragma('synchronous = NORMAL');
  return drizzle(sqlite, { schema });
}

/**
 * A second, read-only connection to a database another connection keeps (a budget worker's): WAL lets it read
 * while the server writes.
 */
export function openReadOnlyDatabase(filePath: string): Db {
  const sqlite = new Database(filePath, { readonly: true, fileMustExist: true });
  sqlite.pragma('busy_timeout = 5000');
  return drizzle(sqlite, { schema });
}

export { schema };
