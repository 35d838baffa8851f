import { toNodeHandler } from 'better-auth/node';
import compression from 'compression';
import cors from 'cors';
import express from 'express';
import type { Express } from 'express';
import { rateLimit } from 'express-rate-limit';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Logger } from 'pino';
import type { Db } from '../db/client';
import { createAuth } from './auth';
import type { Auth } from './auth';
import { HttpError } from './errors';
import type { CapturedMail } from './mail/local-smtp';
import type { Mailer } from './mail/mailer';
import { errorHandler } from './middleware/error-handler';
import { requireSession } from './middleware/require-session';
import { healthRouter } from './routes/health';
import { preferencesRouter } from './routes/preferences';
import { rigPresetsRouter, rigsRouter } from './routes/rigs';
import { tripsRouter } from './routes/trips';
import { inviteLinksRouter } from './routes/invite-links';
import { clubInviteLinksRouter } from './routes/club-invite-links';
import { clubsRouter } from './routes/clubs';
import { outboxRouter } from './routes/outbox';
import { placesRouter } from './routes/places';
import { calendarFeedRouter } from './routes/calendar-feed';
import { createBudgetService } from './budget-service';
import { webStatic } from './web-static';
import packageJson from '../package.json';

export type AppConfig = {
  authSecret: string;
  publicUrl: string;
  /** Extra origins allowed to call the API with cookies (the Expo dev server in `npm run dev`). */
  devWebOrigin?: string;
  webDir?: string;
  authRateLimit?: { windowMs: number; limit: number };
  requireEmailVerification?: boolean;
  /** Hides development-only routes (the Outbox). */
  production?: boolean;
};

export type AppDeps = {
  db: Db;
  mailer: Mailer;
  now: () => Date;
  config: AppConfig;
  logger?: Logger;
  /** The local SMTP fake's captured mail, shown by the development Outbox. */
  outbox?: { messages: () => CapturedMail[] };
};

export type TrailtallyApp = Express & { locals: { auth: Auth } };

const JSON_BODY_LIMIT = '100kb';

/** Builds the whole HTTP app without listening, so tests can drive it through supertest. */
export function createApp(deps: AppDeps): TrailtallyApp {
  const { db, config } = deps;
  const trustedOrigins = [config.publicUrl, ...(config.devWebOrigin ? [config.devWebOrigin] : [])];
  const auth = createAuth(db, {
    secret: config.authSecret,
    baseUrl: config.publicUrl,
    trustedOrigins,
    mailer: deps.mailer,
    requireEmailVerification: config.requireEmailVerification ?? false,
  });

  const app = express() as TrailtallyApp;
  app.locals.auth = auth;
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  if (deps.logger)
    app.use(pinoHttp({ logger: deps.logger, autoLogging: { ignore: (req) => !req.url?.startsWith('/api') } }));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Skia's chart renderer compiles WebAssembly; nothing else needs eval.
          'script-src': ["'self'", "'wasm-unsafe-eval'"],
          'connect-src': ["'self'", ...(config.devWebOrigin ? [config.devWebOrigin] : [])],
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use(compression());
  if (config.devWebOrigin) app.use('/api', cors({ origin: config.devWebOrigin, credentials: true }));

  const authLimit = config.authRateLimit ?? { windowMs: 15 * 60 * 1000, limit: 100 };
  app.use(
    '/api/auth',
    rateLimit({
      ...authLimit,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: (_req, _res, next) =>
        next(new HttpError(429, 'rate_limited', 'Too many attempts. Please wait a few minutes and try again.')),
    }),
  );
  // better-auth reads the raw body itself: its handler must come before express.json().
  app.all('/api/auth/*splat', toNodeHandler(auth));

  app.use(express.json({ limit: JSON_BODY_LIMIT }));
  app.use('/api/health', healthRouter({ db, version: packageJson.version }));
  const budgets = createBudgetService(db, (err, tripId) => deps.logger?.error({ err, tripId }, 'budget failed'));
  const signedIn = requireSession(auth);
  app.use(
    '/api/trips',
    signedIn,
    tripsRouter({ db, now: deps.now, budgets, mailer: deps.mailer, publicUrl: config.publicUrl }),
  );
  app.use('/api/invites', inviteLinksRouter({ db, now: deps.now, auth }));
  app.use('/api/clubs', signedIn, clubsRouter({ db, now: deps.now, mailer: deps.mailer, publicUrl: config.publicUrl }));
  app.use('/api/club-invites', clubInviteLinksRouter({ db, now: deps.now, auth }));
  if (deps.outbox && !config.production) app.use('/api/dev/outbox', outboxRouter(deps.outbox));
  app.use('/api/rigs', signedIn, rigsRouter({ db, now: deps.now }));
  app.use('/api/rig-presets', signedIn, rigPresetsRouter());
  app.use('/api/me/preferences', signedIn, preferencesRouter({ db }));
  app.use('/api/places', signedIn, placesRouter());
  app.use('/api/calendar', calendarFeedRouter({ db, budgets, now: deps.now, publicUrl: config.publicUrl }));
  app.use('/api', (req, _res, next) =>
    next(new HttpError(404, 'not_found', `No API route for ${req.method} ${req.baseUrl}${req.path}.`)),
  );

  const web = config.webDir ? webStatic(config.webDir) : undefined;
  if (web) app.use(web);

  app.use(errorHandler);
  return app;
}
