import type { NextFunction, Request, Response } from 'express';
import type { Logger } from 'pino';
import { pathForLog, requestForLog } from '../logger';

declare module 'http' {
  // Only an interface can add fields to Node's own request type.
  // eslint-disable-next-line @typescript-eslint/consistent-type-definitions
  interface IncomingMessage {
    /** This request's number in the server's log (`reqId` on its lines). */
    id?: number;
    /** The server's logger; lines about this request carry `reqId`. */
    log?: Logger;
  }
}

/**
 * One line per finished API request — reqId, method, path, status, time in ms — built only when it is written. The
 * whole request (headers censored) goes only on the lines of requests that failed with a 5xx, where it helps; a
 * line for every request costs a fixed few fields, never a serialised request and a child logger.
 */
export function accessLog(logger: Logger) {
  let lastId = 0;
  return (req: Request, res: Response, next: NextFunction) => {
    req.id = ++lastId;
    req.log = logger;
    if (!req.url.startsWith('/api')) return next();
    const startedAt = performance.now();
    // 'close' follows 'finish', and also comes alone when the client went away first.
    res.once('close', () => {
      const status = res.statusCode;
      const failed = status >= 500;
      if (!logger.isLevelEnabled(failed ? 'error' : 'info')) return;
      const line = {
        reqId: req.id,
        method: req.method,
        path: pathForLog(req.originalUrl),
        status,
        responseTime: Math.round((performance.now() - startedAt) * 10) / 10,
        ...(res.writableFinished ? {} : { aborted: true }),
      };
      if (failed) logger.error({ ...line, req: requestForLog(req) }, 'request errored');
      else logger.info(line, 'request completed');
    });
    next();
  };
}
