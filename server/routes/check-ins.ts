// Check-ins: readings taken on the road. Members who may change appliances (crew, planners, the owner) add them;
// every reader lists them; only the person who took a reading changes or removes it.
import { Router } from 'express';
import type { Db, DbExecutor } from '@/db/client';
import {
  countCheckIns,
  deleteCheckIn,
  findCheckIn,
  insertCheckIn,
  listCheckIns,
  updateCheckIn,
} from '@/db/queries/check-ins';
import { findTrip, findTripRig, logActivity } from '@/db/queries/trips';
import { createCheckInRequestSchema, updateCheckInRequestSchema, type CheckInFields } from '@/shared/schemas/check-in';
import { LIMITS } from '@/shared/schemas/limits';
import { HttpError, limitReached, notFound, unprocessable } from '../errors';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';
import { unwrapWrite } from './write-result';

const DAY_MS = 86_400_000;

/** A reading must fall on the trip's dates; a day either side allows for any time zone on the route. */
function assertReadingFitsTrip(db: DbExecutor, tripId: string, fields: CheckInFields, at: string): void {
  const trip = findTrip(db, tripId);
  const rig = findTripRig(db, tripId);
  if (!trip || !rig) throw notFound('That trip was not found.');
  const atMs = Date.parse(at);
  const from = Date.parse(`${trip.startDate}T00:00Z`) - DAY_MS;
  const to = Date.parse(`${trip.endDate}T00:00Z`) + 2 * DAY_MS;
  if (atMs < from || atMs >= to)
    throw unprocessable('checkIn.at', `A check-in must fall within the trip (${trip.startDate} to ${trip.endDate}).`);
  const tanks = rig.propaneTanks.length;
  const unknown = fields.propane.findIndex((c) => c.tank >= tanks);
  if (unknown >= 0)
    throw unprocessable(
      `checkIn.propane.${unknown}.tank`,
      tanks === 0 ? 'This rig has no propane cylinders.' : `This rig has ${tanks} cylinder${tanks === 1 ? '' : 's'}.`,
    );
}

const describeReading = (fields: CheckInFields) => `checked in at ${Math.round(fields.socPct)} %`;

export function checkInsRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });

  router.get('/', (_req, res) => {
    res.json({ checkIns: listCheckIns(db, tripAccess(res).tripId) });
  });

  router.post('/', requirePermission('editLoads'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { checkIn } = createCheckInRequestSchema.parse(req.body);
    const at = checkIn.at ?? now().toISOString();
    const record = db.transaction((tx) => {
      if (countCheckIns(tx, tripId) >= LIMITS.checkInsPerTrip)
        throw limitReached(
          'checkIns',
          `A trip keeps at most ${LIMITS.checkInsPerTrip} check-ins. Remove an old one to add another.`,
        );
      assertReadingFitsTrip(tx, tripId, checkIn, at);
      const created = insertCheckIn(tx, tripId, userId, { ...checkIn, at }, now());
      logActivity(tx, { tripId, userId, summary: describeReading(checkIn), at: now() });
      return created;
    });
    res.status(201).json(record);
  });

  /** Only the author changes or removes a reading; others get 403, a missing one 404. */
  const ownReading = (tx: DbExecutor, tripId: string, userId: string, checkInId: string) => {
    const current = findCheckIn(tx, tripId, checkInId);
    if (!current) throw notFound('That check-in was not found.');
    if (current.authorId !== userId)
      throw new HttpError(403, 'forbidden', 'Only the person who took a reading can change or remove it.');
    return current;
  };

  router.patch('/:checkInId', requirePermission('editLoads'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const checkInId = idParam.parse(req.params.checkInId);
    const { version, checkIn } = updateCheckInRequestSchema.parse(req.body);
    const record = db.transaction((tx) => {
      const current = ownReading(tx, tripId, userId, checkInId);
      const at = checkIn.at ?? current.checkIn.at;
      assertReadingFitsTrip(tx, tripId, checkIn, at);
      const updated = unwrapWrite(
        updateCheckIn(tx, tripId, checkInId, version, { ...checkIn, at }),
        (row) => row,
        'check-in',
      );
      logActivity(tx, {
        tripId,
        userId,
        summary: `changed a check-in (now ${Math.round(checkIn.socPct)} %)`,
        at: now(),
      });
      return updated;
    });
    res.json(record);
  });

  router.delete('/:checkInId', requirePermission('editLoads'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const checkInId = idParam.parse(req.params.checkInId);
    db.transaction((tx) => {
      ownReading(tx, tripId, userId, checkInId);
      deleteCheckIn(tx, tripId, checkInId);
      logActivity(tx, { tripId, userId, summary: 'removed a check-in', at: now() });
    });
    res.status(204).end();
  });

  return router;
}
