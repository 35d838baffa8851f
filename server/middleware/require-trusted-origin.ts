import type { IncomingHttpHeaders } from 'node:http';
import type { RequestHandler } from 'express';
import { HttpError } from '../errors';

const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** Where a request says it was sent from: its Origin, or failing that its Referer's origin. */
export function senderOrigin(headers: IncomingHttpHeaders): string | undefined {
  const origin = headers.origin;
  // Browsers send the literal "null" from sandboxed frames, files and some redirects: no origin to trust.
  if (origin) return origin === 'null' ? undefined : origin;
  const referer = headers.referer;
  if (!referer) return undefined;
  try {
    return new URL(referer).origin;
  } catch {
    return undefined;
  }
}

/**
 * Refuses a change (POST, PUT, PATCH, DELETE) unless it says it comes from one of the trusted origins. Cookies are
 * sent with requests from any page of the same site (another port on the same host included), so a cookie alone
 * never proves the user's own page asked for the change. Reads are left alone.
 */
export function requireTrustedOrigin(trusted: readonly string[], publicUrl: string): RequestHandler {
  const allowed = new Set(trusted);
  return (req, _res, next) => {
    if (!STATE_CHANGING.has(req.method)) return next();
    const origin = senderOrigin(req.headers);
    if (origin && allowed.has(origin)) return next();
    const from = origin ? `a page at ${origin}` : 'a page that did not say where it was';
    next(
      new HttpError(
        403,
        'forbidden_origin',
        `This change was sent from ${from}, not from Trailtally, so it was refused. Open ${publicUrl} and try again there.`,
      ),
    );
  };
}
