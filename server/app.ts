import { toNodeHandler } from 'better-auth/node';
import compression from 'compression';
import cors from 'cors';
import express from 'express';
import type { Express } from 'express';
import helmet from 'helmet';
import type { Logger } from 'pino';
import type { Db } from '../db/client';
import { createAuth } from './auth';
import '../shared/schemas/plain-errors';
import type { Auth } from './auth';
import { HttpError } from './errors';
import type { CapturedMail } from './mail/local-smtp';
import type { Mailer } from './mail/mailer';
import { accessLog } from './middleware/access-log';
import { authGuards, DEFAULT_AUTH_LIMITS, type AuthLimits } from './middleware/auth-guards';
import { errorHandler } from './middleware/error-handler';
import { loopbackOnly } from './middleware/loopback-only';
import { requireSession } from './middleware/require-session';
import { requireTrustedOrigin } from './middleware/require-trusted-origin';
import { loadTripAccess } from './middleware/trip-access';
import { budgetReadRoutes } from './routes/trip-items';
import { healthRouter } from './routes/health';
import { preferencesRouter } from './routes/preferences';
import { rigPresetsRouter, rigsRouter } from './routes/rigs';
import { tripsRouter } from './routes/trips';
import { inviteLinksRouter } from './routes/invite-links';
import { clubInviteLinksRouter } from './routes/club-invite-links';
import { clubsRouter } from './routes/clubs';
import { outboxRouter } from './routes/outbox';
import { createBudgetPool, type BudgetRunner } from './budget/budget-pool';
import { createBudgetService, type BudgetService } from './budget/budget-service';
import { INVITES_PER_HOUR } from '../shared/schemas/sharing';
import type { TrustProxy } from './trust-proxy';
import { trustedOrigins } from './trusted-origins';
import { placesRouter } from './routes/places';
import { calendarFeedRouter } from './routes/calendar-feed';
import { HYDRATE_FLAG_SCRIPT_HASH } from './web-pages';
import { webStatic } from './web-static';
import { createWeatherQueue, type WeatherQueue, type WeatherQueueOptions } from './weather/weather-queue';

type QueueTuning =
  | 'requestsPerSecond'
  | 'concurrency'
  | 'timeoutMs'
  | 'maxAttempts'
  | 'backoffMs'
  | 'maxBackoffMs'
  | 'restAfterGiveUpMs';

/** Past years fetched per stop when the configuration says nothing. */
const DEFAULT_WEATHER_YEARS = 20;
import packageJson from '../package.json';

export type AppConfig = {
  authSecret: string;
  publicUrl: string;
  /** Extra origins allowed to call the API with cookies (the Expo dev server in `npm run dev`). */
  devWebOrigin?: string;
  webDir?: string;
  /** Attempt limits on the auth routes; tests lower or raise them. */
  authLimits?: Partial<AuthLimits>;
  /** Proxies whose X-Forwarded-For is believed (TRUST_PROXY); none when left out. */
  trustProxy?: TrustProxy;
  requireEmailVerification?: boolean;
  /** Hides development-only routes (the Outbox). */
  production?: boolean;
  /** Budgets run in worker threads; one that computes longer than timeLimitMs answers "too large to compute". */
  budget?: { timeLimitMs?: number; threads?: number; memoryMb?: number };
  /**
   * Weather endpoints (null: that kind is not fetched) and the past years wanted per stop. Left out, no weather is
   * fetched and every stop plans with its preset sky.
   */
  weather?: {
    archiveUrl: string | null;
    forecastUrl: string | null;
    years?: number;
    /** The fetcher's pace, retries and time limit (tests shorten them). */
    queue?: Partial<Pick<WeatherQueueOptions, QueueTuning>>;
  };
  /** Invite e-mails one person may send per hour (trip and club together); tests lower it. */
  invitesPerHour?: number;
};

export type AppDeps = {
  db: Db;
  mailer: Mailer;
  now: () => Date;
  config: AppConfig;
  logger?: Logger;
  /** The local SMTP fake's captured mail, shown by the development Outbox. */
  outbox?: { messages: () => CapturedMail[] };
  /** Runs budgets; by default a worker pool built from config.budget. */
  budgetRunner?: BudgetRunner;
};

/** `budgets.close()` stops the budget workers and `weather.close()` the weather fetcher: call it when the app is done with. */
export type TrailtallyApp = Express & { locals: { auth: Auth; budgets: BudgetService; weather: WeatherQueue } };

const JSON_BODY_LIMIT = '100kb';
/** The reads answered with a body made ready in every encoding (`server/budget/ready-body.ts`). */
const READY_BODY_PATH = /^\/api\/trips\/[^/]+\/(?:budget|ledger|budget\/fixes)$/;

/** Budget workers open the database file themselves: a database only in this thread's memory cannot be shared. */
function databaseFileOf(db: Db): string {
  if (db.$client.memory)
    throw new Error('Budgets are computed in worker threads that read the database file: open a file.');
  return db.$client.name;
}

/** Builds the whole HTTP app without listening, so tests can drive it through supertest. */
export function createApp(deps: AppDeps): TrailtallyApp {
  const { db, config } = deps;
  const origins = trustedOrigins(config);
  const auth = createAuth(db, {
    secret: config.authSecret,
    baseUrl: config.publicUrl,
    trustedOrigins: origins,
    mailer: deps.mailer,
    requireEmailVerification: config.requireEmailVerification ?? false,
  });

  const app = express() as TrailtallyApp;
  app.locals.auth = auth;
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy ?? false);

  const budgetRunner =
    deps.budgetRunner ??
    createBudgetPool({
      databasePath: databaseFileOf(db),
      ...(config.budget?.timeLimitMs ? { timeLimitMs: config.budget.timeLimitMs } : {}),
      ...(config.budget?.threads ? { threads: config.budget.threads } : {}),
      ...(config.budget?.memoryMb ? { memoryMb: config.budget.memoryMb } : {}),
    });
  const budgets = createBudgetService(db, budgetRunner, (err, tripId) =>
    deps.logger?.error({ err, tripId }, 'budget failed'),
  );
  app.locals.budgets = budgets;
  const weather = createWeatherQueue({
    db,
    endpoints: { archiveUrl: config.weather?.archiveUrl ?? null, forecastUrl: config.weather?.forecastUrl ?? null },
    years: config.weather?.years ?? DEFAULT_WEATHER_YEARS,
    today: deps.now,
    ...config.weather?.queue,
    onError: (err) => deps.logger?.warn({ err }, 'weather fetch failed'),
  });
  app.locals.weather = weather;
  const signedIn = requireSession(auth);
  const invites = {
    mailer: deps.mailer,
    publicUrl: config.publicUrl,
    invitesPerHour: config.invitesPerHour ?? INVITES_PER_HOUR,
  };

  if (deps.logger) app.use(accessLog(deps.logger));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Skia's chart renderer compiles WebAssembly; nothing else needs eval. The one inline script allowed is
          // the prerendered pages' flag, by its hash.
          'script-src': ["'self'", "'wasm-unsafe-eval'", HYDRATE_FLAG_SCRIPT_HASH],
          'connect-src': ["'self'", ...(config.devWebOrigin ? [config.devWebOrigin] : [])],
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  // Static scripts, fonts and the wasm were compressed at build time (web-static.ts marks them); never again here.
  const compress = compression({ filter: (req, res) => !res.locals.precompressed && compression.filter(req, res) });
  // A trip's budget, ledger and fixes are kept ready in each encoding: those reads skip compression's hooks too.
  app.use((req, res, next) =>
    req.method === 'GET' && READY_BODY_PATH.test(req.path) ? next() : compress(req, res, next),
  );
  if (config.devWebOrigin) app.use('/api', cors({ origin: config.devWebOrigin, credentials: true }));
  app.use('/api', requireTrustedOrigin(origins, config.publicUrl));

  // A trip's budget, ledger and fixes, the reads repeated most, are matched here rather than after the auth, health
  // and trip routers, behind the same session and trip-access checks.
  const tripReadGuards = [signedIn, loadTripAccess(db)];
  for (const [path, handler] of Object.entries(budgetReadRoutes(budgets)))
    app.get(`/api/trips/:tripId${path}`, ...tripReadGuards, handler);

  app.use('/api/auth', authGuards({ ...DEFAULT_AUTH_LIMITS, ...config.authLimits }));
  // better-auth reads the body itself (here the text authGuards read): its handler comes before express.json().
  app.all('/api/auth/*splat', toNodeHandler(auth));

  app.use(express.json({ limit: JSON_BODY_LIMIT }));
  app.use('/api/health', healthRouter({ db, version: packageJson.version }));
  app.use('/api/trips', signedIn, tripsRouter({ db, now: deps.now, budgets, weather, ...invites }));
  app.use('/api/invites', inviteLinksRouter({ db, now: deps.now, auth }));
  app.use('/api/clubs', signedIn, clubsRouter({ db, now: deps.now, ...invites }));
  app.use('/api/club-invites', clubInviteLinksRouter({ db, now: deps.now, auth }));
  // The Outbox shows every password-reset link: only someone at this machine may read it.
  if (deps.outbox && !config.production) app.use('/api/dev/outbox', loopbackOnly(), outboxRouter(deps.outbox));
  app.use('/api/rigs', signedIn, rigsRouter({ db, now: deps.now }));
  app.use('/api/rig-presets', signedIn, rigPresetsRouter());
  app.use('/api/me/preferences', signedIn, preferencesRouter({ db }));
  app.use('/api/places', signedIn, placesRouter());
  app.use('/api/calendar', calendarFeedRouter({ db, budgets, now: deps.now, publicUrl: config.publicUrl }));
  app.use('/api', (req, _res, next) =>
    next(new HttpError(404, 'not_found', `No API route for ${req.method} ${req.baseUrl}${req.path}.`)),
  );

  app.use('/outbox', loopbackOnly());
  const web = config.webDir ? webStatic(config.webDir) : undefined;
  if (web) app.use(web);

  app.use(errorHandler);
  return app;
}
