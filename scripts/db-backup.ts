import path from 'node:path';
import { backupDatabase } from '../db/backup';
import { loadEnv } from '../server/env';
import { runCommand } from './run-command';

// `npm run db:backup`: an online copy of the database (safe while the server runs) and the generated auth secret.
runCommand(async () => {
  const env = loadEnv();
  const files = await backupDatabase(env.DATABASE_PATH, path.join(env.DATA_DIR, 'backups'), {
    authSecretFile: env.AUTH_SECRET_FILE,
  });
  console.log(`Backed up ${env.DATABASE_PATH} to ${files.database}`);
  console.log(
    files.authSecret
      ? `and the auth secret to ${files.authSecret}, so sessions survive a restore. Keep both private.`
      : 'BETTER_AUTH_SECRET is configured, so no secret was copied: keep it with your other settings.',
  );
});
