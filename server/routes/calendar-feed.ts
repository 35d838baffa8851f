// GET /api/calendar/:token.ics — a trip's calendar for a phone or desktop calendar that subscribed to it. No
// session: the secret token is the key. It stops working when revoked or when its member leaves the trip.
import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { Db } from '@/db/client';
import { findFeedByHash, markFeedFetched } from '@/db/queries/calendar-feeds';
import { findMembership, loadTripDetail } from '@/db/queries/trips';
import type { BudgetService } from '../budget/budget-service';
import { HttpError } from '../errors';
import { hashInviteToken } from '../invite-tokens';
import { tripToCalendar } from '../places/trip-calendar';

const notFeed = () =>
  new HttpError(404, 'not_found', 'This calendar address does not work any more. Make a new one from the trip.');

/** Calendars poll every hour or so; this leaves plenty of room and stops anyone trying tokens in bulk. */
const FETCHES_PER_MINUTE = 60;

export function calendarFeedRouter({
  db,
  budgets,
  now,
  publicUrl,
}: {
  db: Db;
  budgets: BudgetService;
  now: () => Date;
  publicUrl: string;
}): Router {
  const router = Router();
  router.use(
    rateLimit({
      windowMs: 60_000,
      limit: FETCHES_PER_MINUTE,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: (_req, _res, next) => next(new HttpError(429, 'rate_limited', 'Too many requests. Try again soon.')),
    }),
  );

  router.get('/:file', async (req, res) => {
    const match = /^([A-Za-z0-9_-]{20,100})\.ics$/.exec(req.params.file ?? '');
    const feed = match?.[1] ? findFeedByHash(db, hashInviteToken(match[1])) : undefined;
    if (!feed || feed.revokedAt || !findMembership(db, feed.tripId, feed.userId)) throw notFeed();
    const detail = loadTripDetail(db, feed.tripId, 'viewer');
    if (!detail) throw notFeed();
    markFeedFetched(db, feed.id, now());
    res.setHeader('Content-Type', 'text/calendar; charset=utf-8');
    res.setHeader('Cache-Control', 'private, no-cache');
    res.send(tripToCalendar(detail, await budgets.resultForFile(feed.tripId), publicUrl));
  });

  return router;
}
