import { Router } from 'express';
import type { Db } from '@/db/client';
import { rigFromRow, rigRecord, savedRigRecord } from '@/db/queries/mappers';
import { findSavedRig, updateRigRow } from '@/db/queries/rigs';
import { findTrip, findTripRig, insertRig, loadTripDetail, logActivity, touchTrip } from '@/db/queries/trips';
import { checkGeneratorInTrip } from '@/shared/trip-rules';
import { replaceTripRigRequestSchema, saveTripRigRequestSchema, updateRigRequestSchema } from '@/shared/schemas/api';
import { notFound, unprocessable } from '../errors';
import { requirePermission, tripAccess } from '../middleware/trip-access';
import { unwrapWrite } from './write-result';
import { ensureRoomForSavedRig } from '../owner-limits';

export function tripRigRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });

  router.put('/', requirePermission('editTrip'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { version, rig } = updateRigRequestSchema.parse(req.body);
    const record = db.transaction((tx) => {
      const trip = findTrip(tx, tripId);
      if (!trip) throw notFound('That trip was not found.');
      const breach = checkGeneratorInTrip(trip, rig.generator?.mode, 'rig.generator.mode');
      if (breach) throw unprocessable(breach.field, breach.message);
      const updated = unwrapWrite(updateRigRow(tx, findTripRig(tx, tripId), version, rig, now()), rigRecord, 'rig');
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: `changed the rig ${rig.name}`, at: now() });
      return updated;
    });
    res.json(record);
  });

  // "Replace with one of My rigs": the trip's copy takes the saved rig's parts; the saved rig is untouched.
  router.post('/replace', requirePermission('editTrip'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { version, rigId } = replaceTripRigRequestSchema.parse(req.body);
    const record = db.transaction((tx) => {
      const saved = findSavedRig(tx, userId, rigId);
      if (!saved) throw unprocessable('rigId', 'That rig is not among your saved rigs.');
      const updated = unwrapWrite(
        updateRigRow(tx, findTripRig(tx, tripId), version, rigFromRow(saved), now()),
        rigRecord,
        'rig',
      );
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: `switched the trip to the rig ${saved.name}`, at: now() });
      return updated;
    });
    res.json(record);
  });

  // "Save this rig to My rigs": any member may keep a copy of the trip's rig for their own trips.
  router.post('/save', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { name } = saveTripRigRequestSchema.parse(req.body);
    const tripRig = findTripRig(db, tripId);
    if (!tripRig) throw notFound('That trip has no rig.');
    // The trip's appliances become the saved rig's usual loads (who looks after each stays with the trip).
    const loads = (loadTripDetail(db, tripId, 'viewer')?.appliances ?? []).map(({ appliance }) => {
      const { id: _id, ...fields } = appliance;
      return fields;
    });
    const row = db.transaction((tx) => {
      ensureRoomForSavedRig(tx, userId);
      return insertRig(tx, { ownerId: userId, tripId: null }, { ...rigFromRow(tripRig), name }, now(), loads);
    });
    res.status(201).json({ rig: savedRigRecord(row) });
  });

  return router;
}
