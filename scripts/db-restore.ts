import path from 'node:path';
import { restoreDatabase } from '../db/backup';
import { loadEnv } from '../server/env';
import { runCommand } from './run-command';

// `npm run db:restore -- <backup file>`: put a backup in place of the database while the server is stopped.
runCommand(() => {
  const backupFile = process.argv[2];
  if (!backupFile) throw new Error('Name the backup to restore: npm run db:restore -- data/backups/trailtally-….db');
  const env = loadEnv();
  const result = restoreDatabase({
    backupFile,
    databasePath: env.DATABASE_PATH,
    backupDir: path.join(env.DATA_DIR, 'backups'),
    authSecretFile: env.AUTH_SECRET_FILE,
  });
  console.log(`Restored ${backupFile} to ${env.DATABASE_PATH}.`);
  if (result.movedAside.length > 0) console.log(`The replaced files are kept as ${result.movedAside.join(', ')}.`);
  if (result.restoredSecret) console.log('The auth secret saved with the backup is back too: sessions carry on.');
  else if (env.AUTH_SECRET_FILE) console.log('No auth secret was saved with this backup: everyone signs in again.');
  console.log('Start the server again; migrations newer than the backup are applied on start.');
});
