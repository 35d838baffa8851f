import fs from 'node:fs';

// The data folder holds the sessions' database and the key that signs them: readable by their owner only.
export const OWNER_ONLY_FILE = 0o600;
export const OWNER_ONLY_FOLDER = 0o700;

/**
 * Creates a folder (and any missing parents) owner-only. A folder that already exists keeps its mode: it may be a
 * shared one (the project root when `DATABASE_PATH` names no folder), which is not ours to lock.
 */
export function ensurePrivateFolder(dir: string): void {
  fs.mkdirSync(dir, { recursive: true, mode: OWNER_ONLY_FOLDER });
}

/** A folder only Trailtally writes (the backups): created owner-only, and made so if it was not. */
export function ensureOwnFolder(dir: string): void {
  ensurePrivateFolder(dir);
  fs.chmodSync(dir, OWNER_ONLY_FOLDER);
}

/** Makes a file owner-only, creating it empty when it does not exist yet. */
export function ensurePrivateFile(file: string): void {
  fs.closeSync(fs.openSync(file, 'a', OWNER_ONLY_FILE));
  fs.chmodSync(file, OWNER_ONLY_FILE);
}

/** Makes a file owner-only if it exists (older installs created the database world-readable). */
export function tightenIfPresent(file: string): void {
  try {
    fs.chmodSync(file, OWNER_ONLY_FILE);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
  }
}
