import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { OWNER_ONLY_FILE } from './private-files';

/** The file a running server keeps beside its database, naming its process. */
export const holderFile = (databasePath: string): string => `${path.resolve(databasePath)}.pid`;

/** Whether a process with this id is running (one owned by another user counts). */
export function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Marks the database as held by this process until the returned release is called. Release removes the mark only
 * while it still names this process, so a second server's mark is never removed by the first one's exit.
 */
export function claimDatabase(databasePath: string, pid = process.pid): () => void {
  const file = holderFile(databasePath);
  fs.writeFileSync(file, `${pid}\n`, { mode: OWNER_ONLY_FILE });
  return () => {
    try {
      if (fs.readFileSync(file, 'utf8').trim() === String(pid)) fs.rmSync(file);
    } catch {
      // Already gone: nothing to release.
    }
  };
}

/** The id of a live process that says it holds the database; a mark left by a process that died is ignored. */
export function databaseHolder(databasePath: string, isAlive = processAlive): number | undefined {
  let text: string;
  try {
    text = fs.readFileSync(holderFile(databasePath), 'utf8');
  } catch {
    return undefined;
  }
  const pid = Number.parseInt(text.trim(), 10);
  return Number.isInteger(pid) && pid > 0 && isAlive(pid) ? pid : undefined;
}

export class DatabaseInUseError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'DatabaseInUseError';
  }
}

/**
 * Refuses while anything has the database open, then leaves it as one self-contained file. The server's mark
 * names it; anything else (a server without the mark, a seed run) is caught by SQLite itself: leaving WAL mode
 * needs the only connection, and doing so folds the write-ahead log into the database file.
 */
export function takeDatabaseOffline(databasePath: string): void {
  const pid = databaseHolder(databasePath);
  if (pid !== undefined) {
    throw new DatabaseInUseError(
      `The Trailtally server (process ${pid}) is using ${databasePath}. Stop it first, then run this again. ` +
        `(If no Trailtally server is running, delete ${holderFile(databasePath)}.)`,
    );
  }
  if (!fs.existsSync(databasePath)) return;
  const sqlite = new Database(databasePath, { fileMustExist: true, timeout: 0 });
  try {
    sqlite.pragma('journal_mode = DELETE');
  } catch (error) {
    if ((error as { code?: string }).code === 'SQLITE_BUSY') {
      throw new DatabaseInUseError(
        `Something still has ${databasePath} open (a server or another command). Stop it first, then run this again.`,
      );
    }
    throw error;
  } finally {
    sqlite.close();
  }
}
