import { openDatabase } from '../db/client';
import { runMigrations } from '../db/migrate';
import { loadEnv } from '../server/env';
import { runCommand } from './run-command';

// `npm run db:migrate`: apply the migrations in drizzle/ that DATABASE_PATH has not seen yet.
runCommand(() => {
  const env = loadEnv();
  const db = openDatabase(env.DATABASE_PATH);
  try {
    runMigrations(db);
  } finally {
    db.$client.close();
  }
  console.log(`Migrated ${env.DATABASE_PATH}`);
});
