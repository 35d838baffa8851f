import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import type { Db } from '../db/client';
import { account, session, user, verification } from '../db/schema/auth';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@/shared/schemas/account';
import { authRules } from './auth-rules';
import type { Mailer } from './mail/mailer';
import { resetPasswordMail, verifyEmailMail } from './mail/templates';
import { originRefusalAdvice } from './trusted-origins';

export type AuthConfig = {
  secret: string;
  baseUrl: string;
  trustedOrigins: string[];
  mailer: Mailer;
  /** Whether sign-in waits for a verified e-mail address (a deployment setting; see README). */
  requireEmailVerification: boolean;
};

export function createAuth(db: Db, config: AuthConfig) {
  return betterAuth({
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
    // Requests are limited by express-rate-limit in front of this handler, one policy for all.
    rateLimit: { enabled: false },
    hooks: { before: authRules },
    plugins: [originRefusalAdvice(config.baseUrl)],
    telemetry: { enabled: false },
  });
}

export type Auth = ReturnType<typeof createAuth>;
