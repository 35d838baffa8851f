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

/** Lets a request through only with a valid session; the user is then in res.locals.user. */
export function requireSession(auth: Auth) {
  return async (req: Request, res: Response, next: NextFunction) => {
    const { headers, response: found } = await auth.api.getSession({
      headers: fromNodeHeaders(req.headers),
      returnHeaders: true,
    });
    // A renewed (or dropped) cached copy of the session goes back to the browser with the answer.
    const cookies = headers.getSetCookie();
    if (cookies.length > 0) res.append('Set-Cookie', cookies);
    if (!found) throw unauthorized();
    res.locals.user = { id: found.user.id, email: found.user.email, name: found.user.name };
    next();
  };
}

/** The signed-in user of a route behind requireSession. */
export function currentUser(res: Response): SessionUser {
  const user = res.locals.user;
  if (!user) throw unauthorized();
  return user;
}
