import { Router } from 'express';
import type { Db } from '@/db/client';
import { stopFromRow, stopRecord } from '@/db/queries/mappers';
import { deleteStop, findStopRow, insertStop, listStopRows, reorderStops, updateStop } from '@/db/queries/stops';
import { findTrip, loadTripDetail, logActivity, touchTrip } from '@/db/queries/trips';
import { createStopRequestSchema, reorderStopsRequestSchema, updateStopRequestSchema } from '@/shared/schemas/api';
import type { Stop } from '@/shared/schemas/trip';
import { checkStopFits } from '@/shared/trip-rules';
import type { DbExecutor } from '@/db/client';
import { LIMITS } from '@/shared/schemas/limits';
import { conflict, HttpError, limitReached, notFound, unprocessable } from '../errors';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';
import { unwrapWrite } from './write-result';
import type { WeatherQueue } from '../weather/weather-queue';

type Deps = { db: Db; now: () => Date; weather: WeatherQueue };

export function assertFits(db: DbExecutor, tripId: string, stop: Stop, exceptStopId?: string): void {
  const trip = findTrip(db, tripId);
  if (!trip) throw notFound('That trip was not found.');
  const others = listStopRows(db, tripId).filter((row) => row.id !== exceptStopId);
  const breach = checkStopFits(trip, stop, others);
  if (breach) throw unprocessable(breach.field, breach.message);
}

export function stopsRouter({ db, now, weather }: Deps): Router {
  const router = Router({ mergeParams: true });
  router.use(requirePermission('editTrip'));
  // A saved stop's weather is fetched in the background; it never holds up the save.
  const queueWeather = (tripId: string) => weather.want(listStopRows(db, tripId));

  router.post('/', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { stop, notes } = createStopRequestSchema.parse(req.body);
    const row = db.transaction((tx) => {
      if (listStopRows(tx, tripId).length >= LIMITS.stopsPerTrip)
        throw limitReached('stops', `A trip holds at most ${LIMITS.stopsPerTrip} stops. Remove one first.`);
      assertFits(tx, tripId, stop);
      const inserted = insertStop(tx, tripId, stop, notes);
      touchTrip(tx, tripId, now(), { routeChanged: true });
      logActivity(tx, { tripId, userId, summary: `added the stop ${stop.name}`, at: now() });
      return inserted;
    });
    res.status(201).json(stopRecord(row));
    queueWeather(tripId);
  });

  router.post('/reorder', (req, res) => {
    const { tripId, userId, role } = tripAccess(res);
    const { tripVersion, stopIds } = reorderStopsRequestSchema.parse(req.body);
    db.transaction((tx) => {
      const trip = findTrip(tx, tripId);
      if (!trip) throw notFound('That trip was not found.');
      if (trip.version !== tripVersion) throw conflict(loadTripDetail(tx, tripId, role));
      const outcome = reorderStops(tx, tripId, stopIds);
      if (outcome === 'mismatch')
        throw new HttpError(
          409,
          'conflict',
          'The stops changed since you opened the route; reload and try again.',
          undefined,
          { current: loadTripDetail(tx, tripId, role) },
        );
      const breach = listStopRows(tx, tripId)
        .map((row) => checkStopFits(trip, stopFromRow(row), []))
        .find((found) => found !== null);
      // Rolls back the whole reorder: the new layout would run past the trip's last day.
      if (breach) throw unprocessable('stopIds', `That order does not fit inside the trip's dates: ${breach.message}`);
      touchTrip(tx, tripId, now(), { bumpVersion: true, routeChanged: true });
      logActivity(tx, { tripId, userId, summary: 'reordered the stops', at: now() });
    });
    res.json(loadTripDetail(db, tripId, role));
    queueWeather(tripId);
  });

  router.patch('/:stopId', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const stopId = idParam.parse(req.params.stopId);
    const { version, stop, notes } = updateStopRequestSchema.parse(req.body);
    const record = db.transaction((tx) => {
      if (!findStopRow(tx, tripId, stopId)) throw notFound('That stop was not found.');
      const result = updateStop(tx, tripId, stopId, version, stop, notes);
      if (result.status === 'ok') assertFits(tx, tripId, stop, stopId);
      const updated = unwrapWrite(result, stopRecord, 'stop');
      touchTrip(tx, tripId, now(), { routeChanged: true });
      logActivity(tx, { tripId, userId, summary: `changed the stop ${stop.name}`, at: now() });
      return updated;
    });
    res.json(record);
    queueWeather(tripId);
  });

  router.delete('/:stopId', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const stopId = idParam.parse(req.params.stopId);
    db.transaction((tx) => {
      const row = findStopRow(tx, tripId, stopId);
      if (!row || !deleteStop(tx, tripId, stopId)) throw notFound('That stop was not found.');
      touchTrip(tx, tripId, now(), { routeChanged: true });
      logActivity(tx, { tripId, userId, summary: `removed the stop ${row.name}`, at: now() });
    });
    res.status(204).end();
  });

  return router;
}
