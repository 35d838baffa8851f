import { Router } from 'express';
import { z } from 'zod';
import { findTripForOwner, listTripsForOwner, toTripSummary } from '@/db/queries/trips';
import type { TripListResponse, TripResponse } from '@/shared/schemas/trip-summary';
import type { AppDeps } from '../app';
import { notFound } from '../errors';
import { currentUser } from '../middleware/require-session';

const tripParams = z.object({ tripId: z.string().min(1).max(64) });

export function tripsRouter({ db }: Pick<AppDeps, 'db'>): Router {
  const router = Router();

  router.get('/', (_req, res) => {
    const user = currentUser(res);
    const body: TripListResponse = { trips: listTripsForOwner(db, user.id).map(toTripSummary) };
    res.json(body);
  });

  router.get('/:tripId', (req, res) => {
    const user = currentUser(res);
    const { tripId } = tripParams.parse(req.params);
    const row = findTripForOwner(db, user.id, tripId);
    // A trip that is not yours answers exactly like one that does not exist.
    if (!row) throw notFound('That trip was not found.');
    const body: TripResponse = { trip: toTripSummary(row) };
    res.json(body);
  });

  return router;
}
