import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Logger } from 'pino';
import request from 'supertest';
import { openDatabase, type Db } from '@/db/client';
import { runMigrations } from '@/db/migrate';
import { createApp, type AppConfig, type AppDeps, type TrailtallyApp } from '@/server/app';
import type { BudgetRunner } from '@/server/budget/budget-pool';
import type { Mailer } from '@/server/mail/mailer';
import type { AuthLimits } from '@/server/middleware/auth-guards';
import type { TrustProxy } from '@/server/trust-proxy';
import { createMemoryMailer } from './memory-mailer';

/** The test app's public URL: requests that change data carry it as their Origin. */
export const TEST_ORIGIN = 'http://localhost:8080';

export type TestContext = {
  app: TrailtallyApp;
  db: Db;
  /** Messages sent when no mailer was passed in. */
  mailer: ReturnType<typeof createMemoryMailer>;
  close: () => void;
};

/** A real app on a fresh temporary SQLite file with the real migrations. */
export function createTestApp(
  options: {
    authLimits?: Partial<AuthLimits>;
    trustProxy?: TrustProxy;
    now?: () => Date;
    mailer?: Mailer;
    /** Any other app setting (production mode, another PUBLIC_URL…). */
    config?: Partial<AppConfig>;
    invitesPerHour?: number;
    logger?: Logger;
    outbox?: AppDeps['outbox'];
    /** A folder with an index.html, to serve as the web app. */
    webDir?: string;
    /** Runs budgets in place of the worker pool (a test that holds them, or one that must start no thread). */
    budgetRunner?: BudgetRunner;
  } = {},
): TestContext {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-test-'));
  const db = openDatabase(path.join(dir, 'test.db'));
  runMigrations(db);
  const mailer = createMemoryMailer();
  const app = createApp({
    db,
    mailer: options.mailer ?? mailer,
    now: options.now ?? (() => new Date('2026-11-20T10:00:00Z')),
    ...(options.budgetRunner ? { budgetRunner: options.budgetRunner } : {}),
    ...(options.logger ? { logger: options.logger } : {}),
    ...(options.outbox ? { outbox: options.outbox } : {}),
    config: {
      authSecret: 'test-secret-that-is-long-enough-for-better-auth-0123456789',
      publicUrl: TEST_ORIGIN,
      ...(options.webDir ? { webDir: options.webDir } : {}),
      ...(options.invitesPerHour !== undefined ? { invitesPerHour: options.invitesPerHour } : {}),
      // High limits unless a test asks for low ones: tests sign many users up and in from one address.
      authLimits: {
        windowMs: 60_000,
        failedSignInsPerAccount: 1000,
        failedSignInsPerClient: 1000,
        accountActionsPerClient: 1000,
        ...options.authLimits,
      },
      ...(options.trustProxy === undefined ? {} : { trustProxy: options.trustProxy }),
      ...options.config,
    },
  });
  return {
    app,
    db,
    mailer,
    close: () => {
      void app.locals.budgets.close();
      app.locals.weather.close();
      db.$client.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

let counter = 0;

/** The password every test user signs up with. */
export const TEST_PASSWORD = 'correct-horse-battery';

/** Signs up a new user through the real auth routes; the agent then carries the session cookie. */
export async function signUpAgent(app: TrailtallyApp, name = 'Test Traveller', chosenEmail?: string) {
  counter += 1;
  const email = chosenEmail ?? `traveller${counter}-${Date.now()}@example.test`;
  // Every change the API accepts must say it comes from the app's own page, as a browser's would.
  const agent = request.agent(app).set('Origin', TEST_ORIGIN);
  const response = await agent.post('/api/auth/sign-up/email').send({ name, email, password: TEST_PASSWORD });
  if (response.status !== 200) throw new Error(`sign-up failed: ${response.status} ${response.text}`);
  return { agent, email, userId: (response.body as { user: { id: string } }).user.id };
}
