// The route in and out of the app: GPX import (preview, then one transaction) and export, the calendar file, and
// members' calendar subscription addresses. Mounted under /api/trips/:tripId.
import { and, eq } from 'drizzle-orm';
import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { findFeed, insertCalendarFeed, listActiveFeeds, revokeFeed } from '@/db/queries/calendar-feeds';
import { newDrivePlan } from '@/db/queries/drive-plans';
import { insertStop, listStopRows } from '@/db/queries/stops';
import { findMembership, findTrip, loadTripDetail, logActivity, touchTrip } from '@/db/queries/trips';
import { drives } from '@/db/schema/drives';
import { stops } from '@/db/schema/stops';
import type { DbExecutor } from '@/db/client';
import { MAX_CALENDAR_FEEDS, type CalendarFeed } from '@/shared/schemas/calendar';
import { gpxImportQuerySchema } from '@/shared/schemas/gpx';
import { checkStopFits } from '@/shared/trip-rules';
import { conflict, HttpError, notFound, unprocessable } from '../errors';
import { newInviteToken } from '../invite-tokens';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';
import { previewGpx } from '../places/gpx-pool';
import { GPX_MAX_BYTES } from '../places/gpx-read';
import { tripToGpx } from '../places/gpx-write';
import { tripToCalendar } from '../places/trip-calendar';
import type { TripItemsDeps } from './trip-items';

const GPX_TYPES = ['application/gpx+xml', 'application/xml', 'text/xml', 'text/plain', 'application/octet-stream'];
const parseGpxBody = express.text({ type: GPX_TYPES, limit: GPX_MAX_BYTES });

/** Reads the uploaded file as text, with a message about the file (not "the request") when it is too large. */
function gpxBody(req: Request, res: Response, next: NextFunction): void {
  parseGpxBody(req, res, (error?: unknown) => {
    const type = (error as { type?: string } | undefined)?.type;
    if (type === 'entity.too.large')
      return next(
        new HttpError(
          413,
          'payload_too_large',
          `That GPX file is over ${GPX_MAX_BYTES / 1024 / 1024} MB. Export only this trip's waypoints and track, or a simplified track.`,
        ),
      );
    if (error) return next(error);
    if (typeof req.body !== 'string')
      return next(new HttpError(415, 'bad_request', 'Send the GPX file itself, as application/gpx+xml.'));
    next();
  });
}

/** A name safe for a download: "highland-loop". */
const fileSlug = (name: string) =>
  name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '') || 'trip';

function feedView(row: { id: string; createdAt: Date; lastFetchedAt: Date | null }): CalendarFeed {
  return {
    id: row.id,
    createdAt: row.createdAt.toISOString(),
    lastFetchedAt: row.lastFetchedAt?.toISOString() ?? null,
  };
}

/** Reads and plans the file off the main thread, then checks each stop fits the trip's dates. */
async function previewFor(db: DbExecutor, tripId: string, text: string) {
  const trip = findTrip(db, tripId);
  if (!trip) throw notFound('That trip was not found.');
  const preview = await previewGpx({
    text,
    trip: { startDate: trip.startDate, endDate: trip.endDate, timeZone: trip.timeZone },
    speedKmh: newDrivePlan(db, tripId).averageSpeedKmh,
    replaces: listStopRows(db, tripId).length,
  });
  for (const { stop } of preview.stops) {
    const breach = checkStopFits(trip, stop, []);
    if (breach) throw unprocessable('file', `“${stop.name}” does not fit the trip: ${breach.message}`);
  }
  return preview;
}

export function tripExportsRouter(deps: TripItemsDeps): Router {
  const { db, now, budgets, publicUrl } = deps;
  const router = Router({ mergeParams: true });

  router.get('/export.gpx', (_req, res) => {
    const { tripId, role } = tripAccess(res);
    const detail = loadTripDetail(db, tripId, role);
    if (!detail) throw notFound('That trip was not found.');
    res.setHeader('Content-Type', 'application/gpx+xml; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${fileSlug(detail.trip.name)}.gpx"`);
    res.send(tripToGpx(detail, now()));
  });

  router.post('/gpx/preview', requirePermission('editTrip'), gpxBody, async (req, res) => {
    const { tripId } = tripAccess(res);
    res.json(await previewFor(db, tripId, req.body as string));
  });

  router.post('/gpx/import', requirePermission('editTrip'), gpxBody, async (req, res) => {
    const { tripId, userId, role } = tripAccess(res);
    const { tripVersion, replace } = gpxImportQuerySchema.parse(req.query);
    const preview = await previewFor(db, tripId, req.body as string);
    db.transaction((tx) => {
      const trip = findTrip(tx, tripId);
      if (!trip) throw notFound('That trip was not found.');
      if (trip.version !== tripVersion) throw conflict(loadTripDetail(tx, tripId, role));
      const existing = listStopRows(tx, tripId).length;
      if (existing > 0 && replace !== 'true')
        throw unprocessable(
          'replace',
          `The route already has ${existing} ${existing === 1 ? 'stop' : 'stops'}. Confirm that the file's stops should replace them.`,
        );
      tx.delete(drives).where(eq(drives.tripId, tripId)).run();
      tx.delete(stops).where(eq(stops.tripId, tripId)).run();
      for (const { stop, notes } of preview.stops) insertStop(tx, tripId, stop, notes);
      // insertStop laid out a suggested drive in each gap; the file's own measures replace them.
      preview.drives.forEach((drive, position) =>
        tx
          .update(drives)
          .set(drive)
          .where(and(eq(drives.tripId, tripId), eq(drives.position, position)))
          .run(),
      );
      touchTrip(tx, tripId, now(), { bumpVersion: true, routeChanged: true });
      logActivity(tx, {
        tripId,
        userId,
        summary: `imported ${preview.stops.length} stops from a GPX file`,
        at: now(),
      });
    });
    res.json(loadTripDetail(db, tripId, role));
  });

  router.get('/calendar.ics', async (_req, res) => {
    const { tripId, role } = tripAccess(res);
    const detail = loadTripDetail(db, tripId, role);
    if (!detail) throw notFound('That trip was not found.');
    res.setHeader('Content-Type', 'text/calendar; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${fileSlug(detail.trip.name)}.ics"`);
    res.send(tripToCalendar(detail, await budgets.resultForFile(tripId), publicUrl));
  });

  // Subscription addresses belong to members: a trip only seen through a club's sharing gets none.
  const requireMember = (_req: Request, res: Response, next: NextFunction) => {
    const { tripId, userId } = tripAccess(res);
    if (!findMembership(db, tripId, userId))
      throw new HttpError(403, 'forbidden', 'Only members of the trip can subscribe to its calendar.');
    next();
  };

  router.get('/calendar-feeds', requireMember, (_req, res) => {
    const { tripId, userId } = tripAccess(res);
    res.json({ feeds: listActiveFeeds(db, tripId, userId).map(feedView) });
  });

  router.post('/calendar-feeds', requireMember, (_req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { token, hash } = newInviteToken();
    const row = db.transaction((tx) => {
      if (listActiveFeeds(tx, tripId, userId).length >= MAX_CALENDAR_FEEDS)
        throw unprocessable(
          'feeds',
          `You already have ${MAX_CALENDAR_FEEDS} calendar addresses for this trip. Stop one you no longer use first.`,
        );
      return insertCalendarFeed(tx, { tripId, userId, tokenHash: hash }, now());
    });
    const url = `${publicUrl}/api/calendar/${token}.ics`;
    res.status(201).json({ ...feedView(row), url, webcalUrl: url.replace(/^https?:/, 'webcal:') });
  });

  router.delete('/calendar-feeds/:feedId', requireMember, (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const feed = findFeed(db, tripId, idParam.parse(req.params.feedId));
    if (!feed || feed.userId !== userId || feed.revokedAt) throw notFound('That calendar address was not found.');
    revokeFeed(db, feed.id, now());
    res.status(204).end();
  });

  return router;
}
