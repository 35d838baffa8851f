import { isIP } from 'node:net';
import type { IncomingMessage } from 'node:http';
import type { RequestHandler } from 'express';
import { notFound } from '../errors';

/** 127.0.0.0/8 and ::1, also when an IPv4 address arrives written as IPv4-mapped IPv6 (`::ffff:127.0.0.1`). */
export function isLoopbackAddress(address: string | undefined): boolean {
  if (!address) return false;
  const v4 = address.toLowerCase().startsWith('::ffff:') ? address.slice('::ffff:'.length) : address;
  if (isIP(v4) === 4) return v4.startsWith('127.');
  return address === '::1';
}

/**
 * Whether a request came in on the loopback interface, judged by the connection's own addresses (which a client
 * cannot choose) and never by headers it could write. A request that says it was relayed (`X-Forwarded-For`,
 * `Forwarded`) is refused too: a proxy on this machine connects from loopback on behalf of someone elsewhere.
 */
export function arrivedOnLoopback(req: Pick<IncomingMessage, 'socket' | 'headers'>): boolean {
  const relayed = req.headers['x-forwarded-for'] !== undefined || req.headers.forwarded !== undefined;
  return !relayed && isLoopbackAddress(req.socket.localAddress) && isLoopbackAddress(req.socket.remoteAddress);
}

/** Development tools (the Outbox) exist only for someone at this machine; anyone else is told there is nothing. */
export function loopbackOnly(): RequestHandler {
  return (req, _res, next) => next(arrivedOnLoopback(req) ? undefined : notFound());
}
