// POST /api/trips/:tripId/undo-fix: puts back the one record an applied fix changed (or the records an accepted
// calibration changed), as it was (content and version), if nobody changed it since. The same rules as an edit of that record apply, and the same rights.
import { Router } from 'express';
import type { z } from 'zod';
import type { Db } from '@/db/client';
import { updateAppliance } from '@/db/queries/appliances';
import { rigRecord, stopRecord } from '@/db/queries/mappers';
import { updateRigRow } from '@/db/queries/rigs';
import { findStopRow, updateStop } from '@/db/queries/stops';
import { writeCalibration } from '@/db/queries/calibration';
import { findTrip, findTripRig, loadTripDetail, logActivity, touchTrip } from '@/db/queries/trips';
import { setRecordVersion } from '@/db/queries/undo';
import { undoFixRequestSchema, type TripDetail } from '@/shared/schemas/api';
import { can, type Role } from '@/shared/schemas/roles';
import { checkGeneratorInTrip } from '@/shared/trip-rules';
import { conflict, HttpError, notFound, unprocessable } from '../errors';
import { tripAccess } from '../middleware/trip-access';
import { assertScheduleInTrip } from './appliances';
import { assertFits } from './stops';
import { unwrapWrite } from './write-result';

type UndoCalibration = Extract<z.infer<typeof undoFixRequestSchema>, { kind: 'calibration' }>;

/** Puts back a calibration: the stop's exposure and every appliance's draws, versions included, all or none. */
function undoCalibration(
  db: Db,
  who: { tripId: string; userId: string; role: Role; now: Date },
  body: UndoCalibration,
): TripDetail | undefined {
  const { tripId, userId, role, now } = who;
  const records = [body.stop, ...body.appliances];
  if (records.some((r) => r.restore.version >= r.version))
    throw unprocessable('restore.version', 'An undo can only go back to an earlier version.');
  db.transaction((tx) => {
    const written = writeCalibration(tx, tripId, {
      stop: { id: body.stop.stopId, version: body.stop.version, exposure: body.stop.restore.exposure },
      appliances: body.appliances.map((a) => ({
        id: a.applianceId,
        version: a.version,
        runningW: a.restore.runningW,
        standbyW: a.restore.standbyW,
      })),
    });
    if (written === 'missing') throw notFound('Something this calibration changed has since been removed.');
    if (written === 'stale') throw conflict(loadTripDetail(tx, tripId, role));
    setRecordVersion(tx, 'stop', body.stop.stopId, body.stop.restore.version);
    for (const a of body.appliances) setRecordVersion(tx, 'appliance', a.applianceId, a.restore.version);
    touchTrip(tx, tripId, now);
    const name = findStopRow(tx, tripId, body.stop.stopId)?.name ?? 'a stop';
    logActivity(tx, { tripId, userId, summary: `undid the calibration of ${name}`, at: now });
  });
  return loadTripDetail(db, tripId, role);
}

export function tripUndoRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });

  router.post('/undo-fix', (req, res) => {
    const { tripId, userId, role } = tripAccess(res);
    const body = undoFixRequestSchema.parse(req.body);
    if (!can(role, body.kind === 'appliance' ? 'editLoads' : 'editTrip'))
      throw new HttpError(403, 'forbidden', 'Your role on this trip cannot change that.');
    if (body.kind === 'calibration') {
      res.json(undoCalibration(db, { tripId, userId, role, now: now() }, body));
      return;
    }
    if (body.restore.version >= body.version)
      throw unprocessable('restore.version', 'An undo can only go back to an earlier version.');
    const record = db.transaction((tx) => {
      if (body.kind === 'rig') {
        const trip = findTrip(tx, tripId);
        if (!trip) throw notFound('That trip was not found.');
        const breach = checkGeneratorInTrip(trip, body.restore.rig.generator?.mode, 'restore.rig.generator.mode');
        if (breach) throw unprocessable(breach.field, breach.message);
        const current = findTripRig(tx, tripId);
        const updated = unwrapWrite(updateRigRow(tx, current, body.version, body.restore.rig, now()), rigRecord, 'rig');
        setRecordVersion(tx, 'rig', updated.id, body.restore.version);
        touchTrip(tx, tripId, now());
        logActivity(tx, { tripId, userId, summary: `undid a change to the rig ${body.restore.rig.name}`, at: now() });
        return { ...updated, version: body.restore.version };
      }
      if (body.kind === 'stop') {
        if (!findStopRow(tx, tripId, body.stopId)) throw notFound('That stop was not found.');
        const result = updateStop(tx, tripId, body.stopId, body.version, body.restore.stop, body.restore.notes);
        if (result.status === 'ok') assertFits(tx, tripId, body.restore.stop, body.stopId);
        const updated = unwrapWrite(result, stopRecord, 'stop');
        setRecordVersion(tx, 'stop', body.stopId, body.restore.version);
        touchTrip(tx, tripId, now(), { routeChanged: true });
        logActivity(tx, { tripId, userId, summary: `undid a change to the stop ${body.restore.stop.name}`, at: now() });
        return { ...updated, version: body.restore.version };
      }
      assertScheduleInTrip(tx, tripId, body.restore.schedule, 'restore.schedule');
      const updated = unwrapWrite(
        updateAppliance(tx, tripId, body.applianceId, body.version, { schedule: body.restore.schedule }),
        (row) => row,
        'appliance',
      );
      setRecordVersion(tx, 'appliance', body.applianceId, body.restore.version);
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: `undid a change to when ${updated.appliance.name} runs`, at: now() });
      return { ...updated, version: body.restore.version };
    });
    res.json(record);
  });

  return router;
}
