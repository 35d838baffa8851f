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
import { tripSharesRouter } from './trip-shares';
import type { Mailer } from '../mail/mailer';

/** Everything under /api/trips/:tripId/… once the caller's role is known. */
export type TripItemsDeps = {
  db: Db;
  now: () => Date;
  budgets: BudgetService;
  mailer: Mailer;
  publicUrl: string;
  invitesPerHour: number;
};

/** Anything shaped like an e-mail address: never shown to someone who reads the trip through a club. */
const EMAIL_LIKE = /[^\s@<>"]+@[^\s@<>"]+\.[^\s@<>"]+/;

export function tripItemsRouter(deps: TripItemsDeps): Router {
  const router = Router({ mergeParams: true });
  router.use('/stops', stopsRouter(deps));
  router.use('/drives', drivesRouter(deps));
  router.use('/appliances', appliancesRouter(deps));
  router.use('/rig', tripRigRouter(deps));
  router.use('/members', membersRouter(deps));
  router.use('/invites', tripInvitesRouter(deps));
  router.use('/shares', tripSharesRouter(deps));

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
    const { tripId, viaClub } = tripAccess(res);
    // A club reader gets the plan's history without the lines about invites and shares; a line
    // holding an address (one written before lines had an audience) is left out as well.
    const entries = listActivity(deps.db, tripId, { everyoneOnly: viaClub })
      .filter((entry) => !viaClub || !EMAIL_LIKE.test(entry.summary))
      .map((entry) => ({ ...entry, id: String(entry.id), at: entry.at.toISOString() }));
    res.json({ entries });
  });

  return router;
}
