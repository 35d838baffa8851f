import { Router } from 'express';
import type { Db } from '@/db/client';
import { listActivity } from '@/db/queries/trips';
import packageJson from '@/package.json';
import type { BudgetService } from '../budget-service';
import { notFound } from '../errors';
import { tripAccess } from '../middleware/trip-access';
import { appliancesRouter } from './appliances';
import { drivesRouter } from './drives';
import { membersRouter } from './members';
import { stopsRouter } from './stops';
import { tripRigRouter } from './trip-rig';
import { tripInvitesRouter } from './trip-invites';
import { tripExportsRouter } from './trip-exports';
import type { Mailer } from '../mail/mailer';

/** Everything under /api/trips/:tripId/… once the caller's role is known. */
export type TripItemsDeps = { db: Db; now: () => Date; budgets: BudgetService; mailer: Mailer; publicUrl: string };

export function tripItemsRouter(deps: TripItemsDeps): Router {
  const router = Router({ mergeParams: true });
  router.use('/stops', stopsRouter(deps));
  router.use('/drives', drivesRouter(deps));
  router.use('/appliances', appliancesRouter(deps));
  router.use('/rig', tripRigRouter(deps));
  router.use('/members', membersRouter(deps));
  router.use('/invites', tripInvitesRouter(deps));
  router.use(tripExportsRouter(deps));

  router.get('/budget', (req, res) => {
    const answer = deps.budgets.forTrip(tripAccess(res).tripId);
    if (!answer) throw notFound('That trip was not found.');
    // The revision changes with every edit to the trip; the app version changes when the engine
    // may compute differently, so a browser never keeps a budget from an older release.
    const etag = `"budget-${packageJson.version}-${answer.revision}"`;
    res.setHeader('ETag', etag);
    res.setHeader('Cache-Control', 'private, no-cache');
    if (req.headers['if-none-match'] === etag) {
      res.status(304).end();
      return;
    }
    res.json({ version: answer.revision, result: answer.result, ...(answer.reason ? { reason: answer.reason } : {}) });
  });

  router.get('/activity', (_req, res) => {
    const entries = listActivity(deps.db, tripAccess(res).tripId).map((entry) => ({
      ...entry,
      id: String(entry.id),
      at: entry.at.toISOString(),
    }));
    res.json({ entries });
  });

  return router;
}
