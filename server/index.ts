import { openDatabase } from '../db/client';
import { claimDatabase } from '../db/holder';
import { runMigrations } from '../db/migrate';
import { demoSignInText, isDatabaseEmpty, seedDemo } from '../db/seed';
import { createApp } from './app';
import { loadEnv } from './env';
import { createLogger } from './logger';
import { startLocalSmtp, type LocalSmtp } from './mail/local-smtp';
import { createSmtpMailer } from './mail/mailer';
import { warmBasemap } from './places/basemap';
import { warmGazetteer } from './places/gazetteer';
import { needsLocalWeather, weatherEndpoints } from './weather/endpoints';
import { startLocalWeather, type LocalWeather } from './weather/local-weather';

/** Starts the server: migrate, seed demo data on a first start, listen, and close cleanly on signals. */
export async function main(): Promise<void> {
  const env = loadEnv();
  const logger = createLogger(env.LOG_LEVEL);
  const db = openDatabase(env.DATABASE_PATH);
  // Says that this process holds the database, so `npm run db:restore` refuses until it stops.
  process.on('exit', claimDatabase(env.DATABASE_PATH));
  runMigrations(db);

  // Without a provider configured, mail goes to a local SMTP fake that the Outbox shows.
  let localSmtp: LocalSmtp | undefined;
  if (!env.SMTP_URL) {
    localSmtp = await startLocalSmtp(env.SMTP_FAKE_PORT);
    console.log(
      `No SMTP_URL set: e-mail is kept by a local SMTP fake on ${localSmtp.url}${env.NODE_ENV === 'production' ? '' : ' (see /outbox)'}`,
    );
  }
  // Likewise weather: without the services configured, development runs a local fake with synthetic weather.
  const production = env.NODE_ENV === 'production';
  let localWeather: LocalWeather | undefined;
  if (needsLocalWeather(env, production)) {
    localWeather = await startLocalWeather(env.WEATHER_FAKE_PORT);
    console.log(`No WEATHER_API_URL set: synthetic weather from a local fake at ${localWeather.archiveUrl}`);
  }
  const weather = weatherEndpoints(env, production, localWeather);
  const app = createApp({
    db,
    mailer: createSmtpMailer(env.SMTP_URL ?? localSmtp?.url ?? ''),
    ...(localSmtp ? { outbox: localSmtp } : {}),
    now: () => new Date(),
    logger,
    config: {
      authSecret: env.BETTER_AUTH_SECRET,
      publicUrl: env.PUBLIC_URL,
      devWebOrigin: env.DEV_WEB_ORIGIN,
      webDir: env.WEB_DIR,
      requireEmailVerification: env.REQUIRE_EMAIL_VERIFICATION,
      production,
      weather: { ...weather, years: env.WEATHER_YEARS },
      budget: {
        timeLimitMs: env.BUDGET_TIME_LIMIT_MS,
        threads: env.BUDGET_WORKERS,
        memoryMb: env.BUDGET_WORKER_MEMORY_MB,
      },
      trustProxy: env.TRUST_PROXY,
    },
  });
  // Budget workers load the engine once at start, so the first budget asked for does not wait for them.
  app.locals.budgets.warmUp();

  if (env.NODE_ENV !== 'production' && env.SEED_DEMO === 'auto' && isDatabaseEmpty(db)) {
    await seedDemo(db, app.locals.auth, new Date());
    console.log(`Demo data added. ${demoSignInText()}`);
  }

  const server = app.listen(env.PORT, env.HOST, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : env.PORT;
    console.log(`Trailtally is ready at http://localhost:${port}`);
    // Place search and the map's background are indexed once, right after start-up, not on the first search.
    setImmediate(() => {
      warmGazetteer();
      warmBasemap();
    });
  });
  // A client that reuses an idle kept-alive connection just as the server closes it gets a reset (a request lost,
  // not retried by every client). Node closes idle connections after 5 s; clients and proxies keep them for up to a
  // minute, so the server keeps them a little longer than that (common practice), and waits for headers past it.
  server.keepAliveTimeout = 65_000;
  server.headersTimeout = 66_000;

  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    console.log(`${signal} received, closing…`);
    server.close(() => {
      void localSmtp?.close();
      void localWeather?.close();
      void app.locals.budgets.close();
      app.locals.weather.close();
      db.$client.close();
      process.exit(0);
    });
    // Keep-alive connections can hold close() open; do not wait for them forever.
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));
}

if (require.main === module) {
  main().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
