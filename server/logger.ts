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
type WithHeaders = { headers?: Headers };

function withoutSecrets(headers: Headers): Headers {
  if (!headers) return headers;
  const copy = { ...headers };
  for (const name of SECRET_HEADERS) if (name in copy) copy[name] = REDACTED;
  return copy;
}

/**
 * pino-http's request and response serializers, censoring credentials themselves so a request log stays clean
 * even under a logger made without `createLogger` (tests, embedding). The headers are copied, never edited: the
 * serialized request shares its headers object with the live request.
 */
export const httpLogSerializers = {
  req: <T extends WithHeaders>(req: T): T => ({ ...req, headers: withoutSecrets(req.headers) }),
  res: <T extends WithHeaders>(res: T): T => ({ ...res, headers: withoutSecrets(res.headers) }),
};
