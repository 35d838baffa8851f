import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import type { Db } from '../db/client';
import { account, session, user, verification } from '../db/schema/auth';

export type AuthConfig = {
  secret: string;
  baseUrl: string;
  trustedOrigins: string[];
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
      autoSignIn: true,
    },
    // Requests are limited by express-rate-limit in front of this handler, one policy for all.
    rateLimit: { enabled: false },
    telemetry: { enabled: false },
  });
}

export type Auth = ReturnType<typeof createAuth>;
