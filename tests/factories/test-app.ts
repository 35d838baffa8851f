import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { openDatabase, type Db } from '@/db/client';
import { runMigrations } from '@/db/migrate';
import { createApp, type AppConfig, type TrailtallyApp } from '@/server/app';
import type { BudgetRunner } from '@/server/budget/budget-pool';
import type { Mailer } from '@/server/mail/mailer';
import { createMemoryMailer } from './memory-mailer';

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
    authAttemptsPerMinute?: number;
    now?: () => Date;
    mailer?: Mailer;
    budget?: AppConfig['budget'];
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
    config: {
      ...(options.budget ? { budget: options.budget } : {}),
      authSecret: 'test-secret-that-is-long-enough-for-better-auth-0123456789',
      publicUrl: 'http://localhost:8080',
      authRateLimit: { windowMs: 60_000, limit: options.authAttemptsPerMinute ?? 1000 },
    },
  });
  return {
    app,
    db,
    mailer,
    close: () => {
      void app.locals.budgets.close();
      db.$client.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

let counter = 0;

/** Signs up a new user through the real auth routes; the agent then carries the session cookie. */
export async function signUpAgent(app: TrailtallyApp, name = 'Test Traveller', chosenEmail?: string) {
  counter += 1;
  const email = chosenEmail ?? `traveller${counter}-${Date.now()}@example.test`;
  const agent = request.agent(app);
  const response = await agent
    .post('/api/auth/sign-up/email')
    .set('Origin', 'http://localhost:8080')
    .send({ name, email, password: 'correct-horse-battery' });
  if (response.status !== 200) throw new Error(`sign-up failed: ${response.status} ${response.text}`);
  return { agent, email, userId: (response.body as { user: { id: string } }).user.id };
}
