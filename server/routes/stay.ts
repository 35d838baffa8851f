// POST …/stops/:stopId/stay — stay longer or leave early: one stop's nights change and the rest of the route gives
// way as the traveller chose, all in one transaction (every stop moved, the trip's last day extended) or none.
import { Router } from 'express';
import type { Db } from '@/db/client';
import { stopFromRow } from '@/db/queries/mappers';
import { listStopRows, updateStop } from '@/db/queries/stops';
import { findTrip, loadTripDetail, logActivity, touchTrip } from '@/db/queries/trips';
import { trips } from '@/db/schema/trips';
import { LIMITS, tripDayCount } from '@/shared/schemas/limits';
import { changeStayRequestSchema } from '@/shared/schemas/stay';
import { changeStay, lastDayOf } from '@/shared/stay-change';
import { checkStopFits } from '@/shared/trip-rules';
import { eq } from 'drizzle-orm';
import { conflict, limitReached, notFound, unprocessable } from '../errors';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';

export function stayRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });

  router.post('/:stopId/stay', requirePermission('editTrip'), (req, res) => {
    const { tripId, userId, role } = tripAccess(res);
    const stopId = idParam.parse(req.params.stopId);
    const { tripVersion, nights, mode } = changeStayRequestSchema.parse(req.body);
    db.transaction((tx) => {
      const trip = findTrip(tx, tripId);
      if (!trip) throw notFound('That trip was not found.');
      if (trip.version !== tripVersion) throw conflict(loadTripDetail(tx, tripId, role));
      const rows = listStopRows(tx, tripId);
      const index = rows.findIndex((row) => row.id === stopId);
      if (index < 0) throw notFound('That stop was not found.');
      const changed = changeStay(
        rows.map((row) => stopFromRow(row)),
        index,
        nights,
        mode,
      );
      if (!changed.ok) throw unprocessable(changed.breach.field, changed.breach.message);
      const last = changed.stops[changed.stops.length - 1];
      // The trip grows to hold a later last departure; it keeps its dates when it ends earlier.
      const endDate = last
        ? ([trip.endDate, lastDayOf(last.departAt, trip.timeZone)].sort().at(-1) ?? trip.endDate)
        : trip.endDate;
      if (tripDayCount(trip.startDate, endDate) > LIMITS.tripDays)
        throw limitReached('nights', `A trip lasts at most ${LIMITS.tripDays} days.`);
      const dates = { startDate: trip.startDate, endDate, timeZone: trip.timeZone };
      changed.stops.forEach((stop, i) => {
        const others = changed.stops.filter((_, k) => k !== i);
        const breach = checkStopFits(dates, stop, others);
        if (breach) throw unprocessable('nights', breach.message);
      });
      if (endDate !== trip.endDate) tx.update(trips).set({ endDate }).where(eq(trips.id, tripId)).run();
      changed.stops.forEach((stop, i) => {
        const row = rows[i];
        if (row && (stop.arriveAt !== row.arriveAt || stop.departAt !== row.departAt))
          updateStop(tx, tripId, row.id, row.version, stop);
      });
      touchTrip(tx, tripId, now(), { bumpVersion: true, routeChanged: true });
      const name = rows[index]?.name ?? 'a stop';
      const count = `${Math.abs(nights)} night${Math.abs(nights) === 1 ? '' : 's'}`;
      logActivity(tx, {
        tripId,
        userId,
        summary: nights > 0 ? `stays ${count} longer at ${name}` : `leaves ${name} ${count} early`,
        at: now(),
      });
    });
    res.json(loadTripDetail(db, tripId, role));
  });

  return router;
}
