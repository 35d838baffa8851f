import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import { OWNER_ONLY_FILE, ensurePrivateFolder, tightenIfPresent } from '../db/private-files';
import { trustProxySchema } from './trust-proxy';

const weatherUrlSchema = z.union([z.literal('off'), z.url({ protocol: /^https?$/ })]).optional();

// The only place that reads process.env: everything else receives a checked Env.
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  /** Unset: every interface in production, loopback only otherwise (a development server is not for the network). */
  HOST: z.string().min(1).optional(),
  DATABASE_PATH: z.string().min(1).default('./data/trailtally.db'),
  PUBLIC_URL: z.url().optional(),
  BETTER_AUTH_SECRET: z.string().min(32, 'BETTER_AUTH_SECRET must be at least 32 characters').optional(),
  WEB_DIR: z.string().default('./dist'),
  DEV_WEB_ORIGIN: z.url().optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SEED_DEMO: z.enum(['auto', 'never']).default('auto'),
  /** A provider's SMTP URL (smtp[s]://user:pass@host:port). Unset: a local SMTP fake on loopback keeps the mail. */
  SMTP_URL: z.url().optional(),
  /** Port for the local SMTP fake; 0 picks a free one. */
  SMTP_FAKE_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  /**
   * The hourly historical-weather archive and the hourly forecast (their full endpoint URLs), or `off` to fetch no
   * weather. Unset: the public services in production, a local weather fake on loopback otherwise.
   */
  WEATHER_API_URL: weatherUrlSchema,
  WEATHER_FORECAST_URL: weatherUrlSchema,
  /** Port for the local weather fake; 0 picks a free one. */
  WEATHER_FAKE_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  /** Past years of weather fetched for each stop. */
  WEATHER_YEARS: z.coerce.number().int().min(1).max(40).default(20),
  /** Longest one budget may compute before it is stopped and answered "too large to compute"; unset, 5 s. */
  BUDGET_TIME_LIMIT_MS: z.coerce.number().int().min(100).max(600_000).optional(),
  /** Worker threads that compute budgets; unset, one fewer than the cores (1 to 4). */
  BUDGET_WORKERS: z.coerce.number().int().min(1).max(64).optional(),
  /** Old-generation heap of each budget worker, MB; a plan needing more is answered "too large"; unset, 128. */
  BUDGET_WORKER_MEMORY_MB: z.coerce.number().int().min(32).max(4096).optional(),
  /** Whether sign-in waits until the e-mail address is verified. Default: on in production, off otherwise. */
  REQUIRE_EMAIL_VERIFICATION: z.enum(['true', 'false']).optional(),
  /** The reverse proxies whose X-Forwarded-For is believed (see server/trust-proxy.ts). Unset: none. */
  TRUST_PROXY: trustProxySchema,
});

export type Env = Omit<z.infer<typeof envSchema>, 'REQUIRE_EMAIL_VERIFICATION' | 'HOST'> & {
  HOST: string;
  REQUIRE_EMAIL_VERIFICATION: boolean;
  DATA_DIR: string;
  PUBLIC_URL: string;
  BETTER_AUTH_SECRET: string;
  /** The generated secret's file in the data folder; undefined when BETTER_AUTH_SECRET is configured. */
  AUTH_SECRET_FILE: string | undefined;
};

export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const env = parsed.data;
  const dataDir = path.dirname(path.resolve(env.DATABASE_PATH));
  return {
    ...env,
    HOST: env.HOST ?? (env.NODE_ENV === 'production' ? '0.0.0.0' : '127.0.0.1'),
    REQUIRE_EMAIL_VERIFICATION: env.REQUIRE_EMAIL_VERIFICATION
      ? env.REQUIRE_EMAIL_VERIFICATION === 'true'
      : env.NODE_ENV === 'production',
    DATA_DIR: dataDir,
    PUBLIC_URL: env.PUBLIC_URL ?? `http://localhost:${env.PORT}`,
    BETTER_AUTH_SECRET: env.BETTER_AUTH_SECRET ?? readOrCreateSecret(dataDir),
    AUTH_SECRET_FILE: env.BETTER_AUTH_SECRET ? undefined : secretFileIn(dataDir),
  };
}

/**
 * Without a configured secret, generate one the first time and keep it beside the database, so
 * sessions survive restarts. The file is readable by its owner only and never printed.
 */
const secretFileIn = (dataDir: string) => path.join(dataDir, 'auth-secret');

function readOrCreateSecret(dataDir: string): string {
  const file = secretFileIn(dataDir);
  if (fs.existsSync(file)) {
    tightenIfPresent(file);
    return fs.readFileSync(file, 'utf8').trim();
  }
  ensurePrivateFolder(dataDir);
  const secret = crypto.randomBytes(48).toString('base64url');
  fs.writeFileSync(file, `${secret}\n`, { mode: OWNER_ONLY_FILE, flag: 'wx' });
  return secret;
}
