import { Router, type Request, type Response } from 'express';
import type { Db } from '@/db/client';
import { listActivity } from '@/db/queries/trips';
import packageJson from '@/package.json';
import { pickEncoding } from '../accept-encoding';
import { BudgetBusyError } from '../budget/budget-pool';
import type { BudgetAnswer, BudgetService } from '../budget/budget-service';
import { HttpError, notFound } from '../errors';
import { tripAccess } from '../middleware/trip-access';
import { appliancesRouter } from './appliances';
import { checkInsRouter } from './check-ins';
import { drivesRouter } from './drives';
import { membersRouter } from './members';
import { stopsRouter } from './stops';
import { stayRouter } from './stay';
import { tripRigRouter } from './trip-rig';
import { tripUndoRouter } from './trip-undo';
import { tripInvitesRouter } from './trip-invites';
import { tripSharesRouter } from './trip-shares';
import { tripExportsRouter } from './trip-exports';
import type { Mailer } from '../mail/mailer';
import type { WeatherQueue } from '../weather/weather-queue';
import { listStopRows } from '@/db/queries/stops';

/** Everything under /api/trips/:tripId/… once the caller's role is known. */
export type TripItemsDeps = {
  db: Db;
  now: () => Date;
  budgets: BudgetService;
  mailer: Mailer;
  publicUrl: string;
  invitesPerHour: number;
  weather: WeatherQueue;
};

/** Anything shaped like an e-mail address: never shown to someone who reads the trip through a club. */
const EMAIL_LIKE = /[^\s@<>"]+@[^\s@<>"]+\.[^\s@<>"]+/;

export function tripItemsRouter(deps: TripItemsDeps): Router {
  const router = Router({ mergeParams: true });
  router.use('/stops', stayRouter(deps));
  router.use('/stops', stopsRouter(deps));
  router.use('/drives', drivesRouter(deps));
  router.use('/appliances', appliancesRouter(deps));
  router.use('/rig', tripRigRouter(deps));
  router.use('/check-ins', checkInsRouter(deps));
  router.use('/members', membersRouter(deps));
  router.use('/invites', tripInvitesRouter(deps));
  router.use('/shares', tripSharesRouter(deps));
  router.use(tripExportsRouter(deps));
  router.use(tripUndoRouter(deps));

  /** Sends a worker's ready answer: an ETag on the trip's revision (304 when it matches), else the body as it is. */
  function sendReady(req: Request, res: Response, answer: BudgetAnswer | undefined, what: 'budget' | 'fixes'): void {
    if (!answer) throw notFound('That trip was not found.');
    if (answer.kind === 'too-large')
      throw new HttpError(
        422,
        'budget_too_large',
        'This plan is too large to compute in time. Remove some stops, appliances or routine windows, then try again.',
      );
    // The revision changes with every edit to the trip; the app version changes when the engine
    // may compute differently, so a browser never keeps a budget from an older release.
    const etag = `"${what}-${packageJson.version}-${answer.revision}"`;
    res.setHeader('ETag', etag);
    res.setHeader('Cache-Control', 'private, no-cache');
    if (req.headers['if-none-match'] === etag) {
      res.status(304).end();
      return;
    }
    if (answer.kind === 'none') {
      const empty = what === 'fixes' ? { fixes: [] } : { result: null };
      res.json({ version: answer.revision, ...empty, reason: answer.reason });
      return;
    }
    // The worker handed the body over serialised and compressed: it is sent as it is, never parsed or compressed here.
    const encoding = pickEncoding(req.headers['accept-encoding'], ['br', 'gzip']);
    const bytes = encoding ? answer.body[encoding] : answer.body.identity;
    res.locals.precompressed = true;
    res.setHeader('Vary', 'Accept-Encoding');
    if (encoding) res.setHeader('Content-Encoding', encoding);
    res.setHeader('Content-Type', 'application/json; charset=utf-8');
    res.setHeader('Content-Length', String(bytes.byteLength));
    res.end(bytes);
  }

  /** Every worker busy: 503 with a time to try again. */
  async function unlessBusy(res: Response, work: Promise<BudgetAnswer | undefined>) {
    try {
      return await work;
    } catch (error) {
      if (!(error instanceof BudgetBusyError)) throw error;
      res.setHeader('Retry-After', '5');
      throw new HttpError(503, 'busy', 'Many budgets are being computed just now. Please try again in a few seconds.');
    }
  }

  router.get('/budget', async (req, res) => {
    sendReady(req, res, await unlessBusy(res, deps.budgets.forTrip(tripAccess(res).tripId)), 'budget');
  });

  // The budget's flags with their fixes, each checked by walking the trip again: asked for apart from the budget
  // (only when someone looks at the flags), computed in the same workers and kept per revision the same way.
  router.get('/budget/fixes', async (req, res) => {
    sendReady(req, res, await unlessBusy(res, deps.budgets.fixesForTrip(tripAccess(res).tripId)), 'fixes');
  });

  // Where each stop's weather record stands; asking also queues whatever is missing.
  router.get('/weather', (_req, res) => {
    const stops = listStopRows(deps.db, tripAccess(res).tripId);
    res.setHeader('Cache-Control', 'private, no-store');
    res.json({ stops: deps.weather.statusFor(stops) });
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
