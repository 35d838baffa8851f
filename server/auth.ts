import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import type { Db } from '../db/client';
import { account, session, user, verification } from '../db/schema/auth';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@/shared/schemas/account';
import { authRules } from './auth-rules';
import type { Mailer } from './mail/mailer';
import { resetPasswordMail, verifyEmailMail } from './mail/templates';
import { createSessionEpochs } from './session-epochs';
import { originRefusalAdvice } from './trusted-origins';

export type AuthConfig = {
  secret: string;
  baseUrl: string;
  trustedOrigins: string[];
  mailer: Mailer;
  /** Whether sign-in waits for a verified e-mail address (a deployment setting; see README). */
  requireEmailVerification: boolean;
};

/** How long a browser's signed copy of its session is trusted without asking the database, seconds. */
const SESSION_COOKIE_CACHE_S = 5 * 60;

export function createAuth(db: Db, config: AuthConfig) {
  const epochs = createSessionEpochs();
  const auth = betterAuth({
    appName: 'Trailtally',
    baseURL: config.baseUrl,
    basePath: '/api/auth',
    secret: config.secret,
    trustedOrigins: config.trustedOrigins,
    // better-auth skips its origin check when it guesses it runs under a test runner; the check is part of
    // what the tests prove, so it is always on.
    advanced: { disableOriginCheck: false },
    database: drizzleAdapter(db, {
      provider: 'sqlite',
      schema: { user, session, account, verification },
    }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: PASSWORD_MIN_LENGTH,
      maxPasswordLength: PASSWORD_MAX_LENGTH,
      autoSignIn: !config.requireEmailVerification,
      requireEmailVerification: config.requireEmailVerification,
      resetPasswordTokenExpiresIn: 60 * 60,
      // A reset ends every session: whoever held the account before the reset is signed out.
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user: who, url }) => {
        await config.mailer.send(resetPasswordMail({ to: who.email, name: who.name, url }));
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      autoSignInAfterVerification: true,
      sendVerificationEmail: async ({ user: who, url }) => {
        await config.mailer.send(verifyEmailMail({ to: who.email, name: who.name, url }));
      },
    },
    // Each request's session is read from a signed cookie rather than the database; a session that ends (sign-out,
    // a password change or reset, a removed account) or an account that changes makes every cached copy of that
    // user's sessions stale at once (session-epochs.ts), so ending a session still takes effect on the next request.
    session: {
      cookieCache: {
        enabled: true,
        maxAge: SESSION_COOKIE_CACHE_S,
        version: (_session, who) => epochs.versionOf(who.id),
      },
    },
    databaseHooks: {
      session: { delete: { after: async (ended) => epochs.bump(ended.userId) } },
      user: {
        update: { after: async (who) => epochs.bump(who.id) },
        delete: { after: async (who) => epochs.bump(who.id) },
      },
    },
    // Requests are limited by express-rate-limit in front of this handler, one policy for all.
    rateLimit: { enabled: false },
    hooks: { before: authRules },
    plugins: [originRefusalAdvice(config.baseUrl)],
    telemetry: { enabled: false },
  });
  // The epochs go with the auth, so a server-side copy of a checked session can be refused by the same stamp.
  return Object.assign(auth, { sessionEpochs: epochs });
}

export type Auth = ReturnType<typeof createAuth>;
