import path from 'node:path';
import Database from 'better-sqlite3';
import { ensureOwnFolder, ensurePrivateFile } from './private-files';

/**
 * Copies a live database with SQLite's online backup API, which is safe while the server is
 * writing (a plain file copy of a WAL database can miss committed pages).
 */
export async function backupDatabase(sourcePath: string, backupDir: string, now = new Date()): Promise<string> {
  ensureOwnFolder(backupDir);
  const stamp = now.toISOString().replace(/[:.]/g, '-');
  const target = path.join(backupDir, `trailtally-${stamp}.db`);
  // Created owner-only before SQLite writes a page into it: a backup holds every session and password hash.
  ensurePrivateFile(target);
  const sqlite = new Database(sourcePath, { readonly: true, fileMustExist: true });
  try {
    await sqlite.backup(target);
  } finally {
    sqlite.close();
  }
  return target;
}

if (require.main === module) {
  void (async () => {
    const { loadEnv } = await import('../server/env');
    const env = loadEnv();
    const target = await backupDatabase(env.DATABASE_PATH, path.join(env.DATA_DIR, 'backups'));
    console.log(`Backed up ${env.DATABASE_PATH} to ${target}`);
  })();
}
