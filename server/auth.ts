import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import type { Db } from '../db/client';
import { account, session, user, verification } from '../db/schema/auth';
import { accountBodyRules } from './auth-body-rules';
import type { Mailer } from './mail/mailer';
import { resetPasswordMail, verifyEmailMail } from './mail/templates';

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
    database: drizzleAdapter(db, {
      provider: 'sqlite',
      schema: { user, session, account, verification },
    }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: 8,
      maxPasswordLength: 128,
      autoSignIn: !config.requireEmailVerification,
      requireEmailVerification: config.requireEmailVerification,
      resetPasswordTokenExpiresIn: 60 * 60,
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
    hooks: { before: accountBodyRules },
    // Requests are limited by express-rate-limit in front of this handler, one policy for all.
    rateLimit: { enabled: false },
    telemetry: { enabled: false },
  });
}

export type Auth = ReturnType<typeof createAuth>;
