import pino, { type DestinationStream, type Level, type Logger } from 'pino';

/** Headers whose values are credentials (the session cookie, bearer tokens): never written to a log. */
const SECRET_HEADERS = ['cookie', 'set-cookie', 'authorization', 'proxy-authorization'] as const;
export const REDACTED = '[redacted]';

// pino's redact paths: headers logged at the top of an object or one level down (req.headers, res.headers, …).
const REDACT_PATHS = SECRET_HEADERS.flatMap((name) => [`headers["${name}"]`, `*.headers["${name}"]`]);

/** The server's logger: JSON lines to stdout (or the given stream), credentials censored wherever they appear. */
export function createLogger(level: Level | 'silent', destination?: DestinationStream): Logger {
  const options = { level, redact: { paths: REDACT_PATHS, censor: REDACTED } };
  return destination ? pino(options, destination) : pino(options);
}

type Headers = Record<string, unknown> | undefined;
function withoutSecrets(headers: Headers): Headers {
  if (!headers) return headers;
  const copy = { ...headers };
  for (const name of SECRET_HEADERS) if (name in copy) copy[name] = REDACTED;
  return copy;
}

/** Paths whose next segment is a secret (an invite token, a calendar feed's unguessable name). */
const SECRET_AFTER = /^(\/api\/(?:invites|club-invites|calendar)\/)[^/]+/;

/** The path a log line shows: no query string (it may hold what a log should not), and no secret segment. */
export function pathForLog(url: string): string {
  return (url.split('?', 1)[0] ?? '').replace(SECRET_AFTER, '$1[redacted]');
}

/**
 * What a log line says about a request that went wrong: its id, method, path, client address and headers, credentials
 * censored even under a logger made without `createLogger` (tests, embedding). The headers are copied, never edited:
 * they are the live request's own.
 */
export function requestForLog(req: {
  id?: number;
  method?: string;
  originalUrl?: string;
  url?: string;
  ip?: string;
  headers?: Headers;
}): Record<string, unknown> {
  return {
    id: req.id,
    method: req.method,
    path: pathForLog(req.originalUrl ?? req.url ?? ''),
    remoteAddress: req.ip,
    headers: withoutSecrets(req.headers),
  };
}
