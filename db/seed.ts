import { count } from 'drizzle-orm';
import type { Auth } from '../server/auth';
import type { Db } from './client';
import { insertTrip } from './queries/trips';
import { user } from './schema/auth';

// Invented account for trying the app locally; never created when NODE_ENV=production.
export const DEMO_ACCOUNT = {
  name: 'Demo Planner',
  email: 'demo@trailtally.test',
  password: 'demo-trailtally',
} as const;

export const DEMO_TRIPS = [
  { name: 'Highland loop', startDate: '2027-09-12', endDate: '2027-09-19', timeZone: 'Europe/London' },
  { name: 'Desert spring loop', startDate: '2027-04-09', endDate: '2027-04-16', timeZone: 'America/Phoenix' },
] as const;

export function isDatabaseEmpty(db: Db): boolean {
  const row = db.select({ users: count() }).from(user).get();
  return (row?.users ?? 0) === 0;
}

/** Creates the demo account (through better-auth, so its password hash is real) and its trips. */
export async function seedDemo(db: Db, auth: Auth, now: Date): Promise<void> {
  const created = await auth.api.signUpEmail({ body: { ...DEMO_ACCOUNT } });
  db.transaction((tx) => {
    for (const trip of DEMO_TRIPS) insertTrip(tx, { ownerId: created.user.id, ...trip }, now);
  });
}

if (require.main === module) {
  void (async () => {
    const { loadEnv } = await import('../server/env');
    const { openDatabase } = await import('./client');
    const { runMigrations } = await import('./migrate');
    const { createAuth } = await import('../server/auth');
    const env = loadEnv();
    const db = openDatabase(env.DATABASE_PATH);
    runMigrations(db);
    if (!isDatabaseEmpty(db)) {
      console.log('The database already has accounts; the demo data was not added.');
    } else {
      const auth = createAuth(db, { secret: env.BETTER_AUTH_SECRET, baseUrl: env.PUBLIC_URL, trustedOrigins: [env.PUBLIC_URL] });
      await seedDemo(db, auth, new Date());
      console.log(`Demo data added. Sign in as ${DEMO_ACCOUNT.email} / ${DEMO_ACCOUNT.password}`);
    }
    db.$client.close();
  })();
}
