import { Router } from 'express';
import type { Db } from '@/db/client';
import { savedRigRecord } from '@/db/queries/mappers';
import { deleteSavedRig, findSavedRig, listSavedRigs, updateRigLoads, updateRigRow } from '@/db/queries/rigs';
import { insertRig } from '@/db/queries/trips';
import { RIG_PRESETS } from '@/shared/rig-presets';
import { createRigRequestSchema, updateRigLoadsRequestSchema, updateRigRequestSchema } from '@/shared/schemas/api';
import { notFound } from '../errors';
import { idParam } from '../middleware/trip-access';
import { currentUser } from '../middleware/require-session';
import { unwrapWrite } from './write-result';
import { ensureRoomForSavedRig } from '../owner-limits';

/** "My rigs": each user's saved rigs. A trip runs on its own copy, edited under /trips/:id/rig. */
export function rigsRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router();

  router.get('/', (_req, res) => {
    res.json({ rigs: listSavedRigs(db, currentUser(res).id).map(savedRigRecord) });
  });

  router.post('/', (req, res) => {
    const { rig, loads } = createRigRequestSchema.parse(req.body);
    const ownerId = currentUser(res).id;
    const row = db.transaction((tx) => {
      ensureRoomForSavedRig(tx, ownerId);
      return insertRig(tx, { ownerId, tripId: null }, rig, now(), loads);
    });
    res.status(201).json(savedRigRecord(row));
  });

  router.get('/:rigId', (req, res) => {
    const row = findSavedRig(db, currentUser(res).id, idParam.parse(req.params.rigId));
    if (!row) throw notFound('That rig was not found.');
    res.json(savedRigRecord(row));
  });

  router.put('/:rigId', (req, res) => {
    const userId = currentUser(res).id;
    const { version, rig } = updateRigRequestSchema.parse(req.body);
    const current = findSavedRig(db, userId, idParam.parse(req.params.rigId));
    res.json(unwrapWrite(updateRigRow(db, current, version, rig, now()), savedRigRecord, 'rig'));
  });

  // The rig's usual loads, replaced as a whole: they come along on every trip made on this rig.
  router.put('/:rigId/loads', (req, res) => {
    const userId = currentUser(res).id;
    const { version, loads } = updateRigLoadsRequestSchema.parse(req.body);
    const current = findSavedRig(db, userId, idParam.parse(req.params.rigId));
    res.json(unwrapWrite(updateRigLoads(db, current, version, loads, now()), savedRigRecord, 'rig'));
  });

  router.delete('/:rigId', (req, res) => {
    if (!deleteSavedRig(db, currentUser(res).id, idParam.parse(req.params.rigId)))
      throw notFound('That rig was not found.');
    res.status(204).end();
  });

  return router;
}

export function rigPresetsRouter(): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    res.json({ presets: RIG_PRESETS });
  });
  return router;
}
