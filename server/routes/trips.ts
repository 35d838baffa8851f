import { Router } from 'express';
import { can } from '@/shared/schemas/roles';
import { findRigPreset } from '@/shared/rig-presets';
import { createTripRequestSchema, updateTripRequestSchema } from '@/shared/schemas/api';
import { copyTripRequestSchema } from '@/shared/schemas/sharing';
import { tripCopies } from '@/db/schema/clubs';
import { rigSchema } from '@/shared/schemas/rig';
import { checkTripDatesCoverStops } from '@/shared/trip-rules';
import { listSharedClubNames } from '@/db/queries/clubs';
import { findSavedRig } from '@/db/queries/rigs';
import { rigFromRow } from '@/db/queries/mappers';
import { listStopRows } from '@/db/queries/stops';
import {
  findTrip,
  findTripRig,
  insertRig,
  insertTrip,
  listTripsForMember,
  loadTripDetail,
  logActivity,
  toTripSummary,
  touchTrip,
} from '@/db/queries/trips';
import { appliances } from '@/db/schema/appliances';
import { trips } from '@/db/schema/trips';
import { eq } from 'drizzle-orm';
import { LIMITS, tripDayCount } from '@/shared/schemas/limits';
import { conflict, limitReached, notFound, unprocessable } from '../errors';
import { currentUser } from '../middleware/require-session';
import { loadTripAccess, requirePermission, tripAccess } from '../middleware/trip-access';
import { routeForCard } from '../places/route-for-card';
import { ensureRoomForTrip } from '../owner-limits';
import { duplicateTrip } from '../trip-copy';
import { tripItemsRouter, type TripItemsDeps } from './trip-items';

export function tripsRouter(deps: TripItemsDeps): Router {
  const { db, now, budgets } = deps;
  const router = Router();

  router.get('/', (_req, res) => {
    const user = currentUser(res);
    // Cached figures only: a budget that is out of date is started in a worker, and the list says "computing".
    const list = listTripsForMember(db, user.id).map(({ trip, role }) => {
      const rig = findTripRig(db, trip.id);
      const { figures, status } = budgets.glance(trip.id, trip.revision);
      return toTripSummary(trip, {
        role,
        rigName: rig?.name ?? null,
        lowestSocPct: figures?.lowestSocPct ?? null,
        reservePct: figures?.reservePct ?? null,
        flagCount: figures?.flagCount ?? null,
        budgetStatus: status,
        ...(can(role, 'editTrip') ? { sharedWith: listSharedClubNames(db, trip.id) } : {}),
        route: routeForCard(listStopRows(db, trip.id), figures?.lowestByStop ?? null),
      });
    });
    res.json({ trips: list });
  });

  router.post('/', (req, res) => {
    const user = currentUser(res);
    const body = createTripRequestSchema.parse(req.body);
    const source = body.rigSource;
    let rig;
    if (source.kind === 'saved') {
      const saved = findSavedRig(db, user.id, source.rigId);
      if (!saved) throw unprocessable('rigSource.rigId', 'That rig is not among your saved rigs.');
      rig = rigFromRow(saved);
    } else {
      const preset = findRigPreset(source.presetId);
      if (!preset) throw unprocessable('rigSource.presetId', 'There is no rig preset with that id.');
      rig = rigSchema.parse(preset.rig);
    }
    const at = now();
    const tripId = db.transaction((tx) => {
      ensureRoomForTrip(tx, user.id);
      const trip = insertTrip(
        tx,
        {
          ownerId: user.id,
          name: body.name,
          startDate: body.startDate,
          endDate: body.endDate,
          timeZone: body.timeZone,
          notes: body.notes,
        },
        at,
      );
      insertRig(tx, { ownerId: user.id, tripId: trip.id }, rig, at);
      logActivity(tx, { tripId: trip.id, userId: user.id, summary: `created the trip "${trip.name}"`, at });
      return trip.id;
    });
    res.status(201).json(loadTripDetail(db, tripId, 'owner'));
  });

  const trip = Router({ mergeParams: true });
  router.use('/:tripId', loadTripAccess(db), trip);

  trip.get('/', (_req, res) => {
    const { tripId, role } = tripAccess(res);
    const detail = loadTripDetail(db, tripId, role);
    if (!detail) throw notFound('That trip was not found.');
    res.json(detail);
  });

  trip.patch('/', requirePermission('editTrip'), (req, res) => {
    const { tripId, role, userId } = tripAccess(res);
    const body = updateTripRequestSchema.parse(req.body);
    const { version, ...changes } = body;
    db.transaction((tx) => {
      const current = findTrip(tx, tripId);
      if (!current) throw notFound('That trip was not found.');
      if (current.version !== version) throw conflict(loadTripDetail(tx, tripId, role)?.trip);
      const next = {
        startDate: changes.startDate ?? current.startDate,
        endDate: changes.endDate ?? current.endDate,
        timeZone: changes.timeZone ?? current.timeZone,
      };
      if (next.endDate >= next.startDate && tripDayCount(next.startDate, next.endDate) > LIMITS.tripDays)
        throw limitReached(changes.endDate ? 'endDate' : 'startDate', `A trip lasts at most ${LIMITS.tripDays} days.`);
      const breach = checkTripDatesCoverStops(next, listStopRows(tx, tripId));
      if (breach) throw unprocessable(breach.field, breach.message);
      tx.update(trips).set(changes).where(eq(trips.id, tripId)).run();
      touchTrip(tx, tripId, now(), { bumpVersion: true });
      const what = Object.keys(changes).join(', ') || 'nothing';
      logActivity(tx, { tripId, userId, summary: `changed the trip's ${what}`, at: now() });
    });
    res.json(loadTripDetail(db, tripId, role));
  });

  trip.delete('/', requirePermission('deleteTrip'), (_req, res) => {
    const { tripId } = tripAccess(res);
    db.delete(trips).where(eq(trips.id, tripId)).run();
    res.status(204).end();
  });

  trip.post('/duplicate', (_req, res) => {
    const { tripId, userId } = tripAccess(res);
    const copyId = duplicateTrip(db, tripId, userId, now());
    res.status(201).json(loadTripDetail(db, copyId, 'owner'));
  });

  // "Copy onto my rig": anyone who can read the trip (a club's shared plan included) gets their own
  // trip with its stops, drives and routines, running on one of their saved rigs, linked to the original.
  trip.post('/copy', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { rigId, name, sharedApplianceIds } = copyTripRequestSchema.parse(req.body);
    const saved = findSavedRig(db, userId, rigId);
    if (!saved) throw unprocessable('rigId', 'Choose one of your saved rigs (My rigs).');
    const source = findTrip(db, tripId);
    if (!source) throw notFound('That trip was not found.');
    const planIds = new Set(
      db
        .select({ id: appliances.id })
        .from(appliances)
        .where(eq(appliances.tripId, tripId))
        .all()
        .map((a) => a.id),
    );
    if (sharedApplianceIds.some((id) => !planIds.has(id)))
      throw unprocessable('sharedApplianceIds', 'Tick only appliances from this plan.');
    const loads = saved.loads ?? [];
    if (loads.length + new Set(sharedApplianceIds).size > LIMITS.appliancesPerTrip)
      throw unprocessable('sharedApplianceIds', `A trip holds at most ${LIMITS.appliancesPerTrip} appliances.`);
    const at = now();
    const copyId = db.transaction((tx) => {
      const onto = { rig: rigFromRow(saved), loads, sharedApplianceIds };
      const id = duplicateTrip(tx, tripId, userId, at, { name: name ?? source.name, onto });
      tx.insert(tripCopies)
        .values({
          copyTripId: id,
          sourceTripId: tripId,
          userId,
          sourceRouteRevision: source.routeRevision,
          copiedAt: at,
        })
        .run();
      return id;
    });
    res.status(201).json(loadTripDetail(db, copyId, 'owner'));
  });

  // The copy's owner has seen the original's new route: stop saying it changed.
  trip.post('/based-on/seen', requirePermission('editTrip'), (_req, res) => {
    const { tripId, role } = tripAccess(res);
    const link = db.select().from(tripCopies).where(eq(tripCopies.copyTripId, tripId)).get();
    const source = link ? findTrip(db, link.sourceTripId) : undefined;
    if (!link || !source) throw notFound('This trip is not a copy of another.');
    db.update(tripCopies)
      .set({ sourceRouteRevision: source.routeRevision })
      .where(eq(tripCopies.copyTripId, tripId))
      .run();
    res.json(loadTripDetail(db, tripId, role));
  });

  trip.use(tripItemsRouter(deps));
  return router;
}
