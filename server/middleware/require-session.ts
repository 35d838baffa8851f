import { fromNodeHeaders } from 'better-auth/node';
import type { NextFunction, Request, Response } from 'express';
import type { Auth } from '../auth';
import { unauthorized } from '../errors';

export type SessionUser = { id: string; email: string; name: string };

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/consistent-type-definitions -- declaration merging needs an interface
    interface Locals {
      user?: SessionUser;
    }
  }
}

/** How long a checked session is trusted again for the same cookies without checking its signature anew. */
const SESSION_MEMO_MS = 10_000;
/** Browsers remembered at once; past it the oldest is forgotten (it is only checked again). */
const SESSION_MEMO_ENTRIES = 2_000;
/** Longer cookie headers are never remembered, so the memo's memory stays small whatever a client sends. */
const SESSION_MEMO_KEY_MAX = 4_096;

type Remembered = { user: SessionUser; until: number; version: string };

/**
 * Lets a request through only with a valid session; the user is then in res.locals.user.
 * A session better-auth has just accepted for these exact cookies is remembered for a few seconds, so a burst of
 * reads skips verifying the signed cookie each time. A remembered session is refused as soon as the user's session
 * epoch moves (sign-out, a password change), exactly like the signed copy itself.
 */
export function requireSession(auth: Auth) {
  const remembered = new Map<string, Remembered>();

  function recall(cookie: string | undefined): SessionUser | undefined {
    if (!cookie) return undefined;
    const hit = remembered.get(cookie);
    if (!hit) return undefined;
    if (hit.until > Date.now() && hit.version === auth.sessionEpochs.versionOf(hit.user.id)) return hit.user;
    remembered.delete(cookie);
    return undefined;
  }

  function remember(cookie: string | undefined, user: SessionUser, expiresAt: Date): void {
    if (!cookie || cookie.length > SESSION_MEMO_KEY_MAX) return;
    const until = Math.min(Date.now() + SESSION_MEMO_MS, expiresAt.getTime());
    remembered.set(cookie, { user, until, version: auth.sessionEpochs.versionOf(user.id) });
    if (remembered.size > SESSION_MEMO_ENTRIES) {
      const oldest = remembered.keys().next().value;
      if (oldest !== undefined) remembered.delete(oldest);
    }
  }

  return async (req: Request, res: Response, next: NextFunction) => {
    const cookie = req.headers.cookie;
    const known = recall(cookie);
    if (known) {
      res.locals.user = known;
      next();
      return;
    }
    const { headers, response: found } = await auth.api.getSession({
      headers: fromNodeHeaders(req.headers),
      returnHeaders: true,
    });
    // A renewed (or dropped) cached copy of the session goes back to the browser with the answer.
    const cookies = headers.getSetCookie();
    if (cookies.length > 0) res.append('Set-Cookie', cookies);
    if (!found) throw unauthorized();
    const user = { id: found.user.id, email: found.user.email, name: found.user.name };
    // Only when nothing was renewed: the browser keeps sending these cookies, and they are the ones checked.
    if (cookies.length === 0) remember(cookie, user, new Date(found.session.expiresAt));
    res.locals.user = user;
    next();
  };
}

/** The signed-in user of a route behind requireSession. */
export function currentUser(res: Response): SessionUser {
  const user = res.locals.user;
  if (!user) throw unauthorized();
  return user;
}
