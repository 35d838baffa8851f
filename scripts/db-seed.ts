import { openDatabase } from '../db/client';
import { runMigrations } from '../db/migrate';
import { demoSignInText, isDatabaseEmpty, seedDemo } from '../db/seed';
import { createAuth } from '../server/auth';
import { loadEnv } from '../server/env';
import { runCommand } from './run-command';

// `npm run db:seed`: the demo accounts and trips, only into a database without accounts.
runCommand(async () => {
  const env = loadEnv();
  const db = openDatabase(env.DATABASE_PATH);
  try {
    runMigrations(db);
    if (!isDatabaseEmpty(db)) {
      console.log('The database already has accounts; the demo data was not added.');
      return;
    }
    // The demo addresses are not real: their sign-up e-mails go nowhere.
    const auth = createAuth(db, {
      secret: env.BETTER_AUTH_SECRET,
      baseUrl: env.PUBLIC_URL,
      trustedOrigins: [env.PUBLIC_URL],
      mailer: { send: async () => undefined },
      requireEmailVerification: false,
    });
    await seedDemo(db, auth, new Date());
    console.log(`Demo data added. ${demoSignInText()}`);
  } finally {
    db.$client.close();
  }
});
