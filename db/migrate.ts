import path from 'node:path';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import type { Db } from './client';

const MIGRATIONS_FOLDER = path.resolve(__dirname, '..', 'drizzle');

/** Applies the drizzle-kit migrations in `drizzle/` that this database has not seen yet. */
export function runMigrations(db: Db): void {
  migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
}
