import express, { Router, type Request } from 'express';
import { ipKeyGenerator, rateLimit, type Options, type RateLimitInfo } from 'express-rate-limit';
import { HttpError } from '../errors';

/**
 * The largest body an auth route reads. Sign-up is the biggest legitimate one (a name of 80 characters, an
 * address of at most 254, a password of at most 128 and a callback URL), well under 2 kB.
 */
export const AUTH_BODY_LIMIT = '16kb';

export type AuthLimits = {
  /** How long a count lasts, from the first counted request. */
  windowMs: number;
  /** Wrong passwords for one account, from anywhere: slows guessing at one person's password. */
  failedSignInsPerAccount: number;
  /** Failed sign-ins from one client, over any accounts: slows trying one password against many accounts. */
  failedSignInsPerClient: number;
  /** Sign-ups, reset and verification mails and resets from one client: each one writes or sends mail. */
  accountActionsPerClient: number;
};

export const DEFAULT_AUTH_LIMITS: AuthLimits = {
  windowMs: 15 * 60 * 1000,
  failedSignInsPerAccount: 10,
  failedSignInsPerClient: 50,
  accountActionsPerClient: 30,
};

const ACCOUNT_ACTIONS = ['/sign-up/email', '/request-password-reset', '/send-verification-email', '/reset-password'];

/** "3 minutes" or "40 seconds" until `resetTime`. */
export function waitText(resetTime: Date | undefined, now = Date.now()): string {
  const seconds = Math.max(1, Math.ceil(((resetTime?.getTime() ?? now) - now) / 1000));
  if (seconds < 60) return `${seconds} second${seconds === 1 ? '' : 's'}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? '' : 's'}`;
}

/** The client's address (or, for IPv6, its /56 network, as one household gets), as Express resolved it. */
const clientKey = (req: Request) => ipKeyGenerator(req.ip ?? req.socket.remoteAddress ?? 'unknown');

/** The lower-cased e-mail address a sign-in names, read from the body the size limit already read. */
function accountOf(req: Request): string | undefined {
  if (typeof req.body !== 'string') return undefined;
  try {
    const email: unknown = (JSON.parse(req.body) as { email?: unknown } | null)?.email;
    return typeof email === 'string' ? email.trim().toLowerCase() : undefined;
  } catch {
    return undefined;
  }
}

// express-rate-limit puts the count it just made on the request (its default property name, `rateLimit`).
const resetTimeOf = (req: Request) => (req as Request & { rateLimit?: RateLimitInfo }).rateLimit?.resetTime;

function limiter(
  name: string,
  limit: number,
  windowMs: number,
  refusal: (wait: string) => string,
  extra: Partial<Options> = {},
) {
  return rateLimit({
    windowMs,
    limit,
    identifier: name,
    keyGenerator: clientKey,
    // draft-8 RateLimit headers, and Retry-After on a refusal.
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // X-Forwarded-For is ignored on purpose unless TRUST_PROXY names the proxy: no need to warn about it.
    validate: { xForwardedForHeader: false },
    handler: (req, _res, next) => next(new HttpError(429, 'rate_limited', refusal(waitText(resetTimeOf(req))))),
    ...extra,
  });
}

/**
 * What stands in front of better-auth's handler: a size limit on every auth body (better-auth reads bodies
 * itself, with no limit), then the attempt limits. Session reads (get-session) are never limited.
 *
 * The body is read as text so better-auth receives it unchanged, whatever its content type.
 */
export function authGuards(limits: AuthLimits): Router {
  const router = Router();
  router.use(express.text({ type: () => true, limit: AUTH_BODY_LIMIT }));

  const failedOnly: Partial<Options> = { skipSuccessfulRequests: true };
  router.post(
    '/sign-in/email',
    limiter(
      'failed-sign-ins-per-client',
      limits.failedSignInsPerClient,
      limits.windowMs,
      (wait) => `Too many failed sign-ins from this device or network. Try again in ${wait}.`,
      failedOnly,
    ),
    limiter(
      'failed-sign-ins-per-account',
      limits.failedSignInsPerAccount,
      limits.windowMs,
      (wait) =>
        `Too many wrong passwords for this account. Try again in ${wait}, or reset the password with “Forgot your password?”.`,
      {
        ...failedOnly,
        skip: (req) => accountOf(req) === undefined,
        keyGenerator: (req) => `account:${accountOf(req) ?? ''}`,
      },
    ),
  );
  router.post(
    ACCOUNT_ACTIONS,
    limiter(
      'account-actions-per-client',
      limits.accountActionsPerClient,
      limits.windowMs,
      (wait) => `Too many account requests from this device or network. Try again in ${wait}.`,
    ),
  );
  return router;
}
