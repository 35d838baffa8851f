import { Router, type Request, type RequestHandler, type Response } from 'express';
import type { Db } from '@/db/client';
import { listActivity } from '@/db/queries/trips';
import packageJson from '@/package.json';
import { pickEncoding } from '../accept-encoding';
import { BudgetBusyError } from '../budget/budget-pool';
import type { BudgetAnswer, BudgetService } from '../budget/budget-service';
import { plainBytes, type ReadyBody } from '../budget/ready-body';
import { HttpError, notFound } from '../errors';
import { tripAccess } from '../middleware/trip-access';
import { appliancesRouter } from './appliances';
import { calibrationRouter } from './calibration';
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
import { BUDGET_FORMAT } from '@/shared/budget-result';
import { stopFromRow } from '@/db/queries/mappers';
import { engineWeatherFor } from '@/db/queries/weather-series';

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

/**
 * The trip's budget (or its checked fixes) at its current revision, or the error to answer instead (busy, too large,
 * no such trip).
 */
async function budgetAnswer(
  ask: () => Promise<BudgetAnswer | undefined>,
  res: Response,
): Promise<Exclude<BudgetAnswer, { kind: 'too-large' }>> {
  let answer: BudgetAnswer | undefined;
  try {
    answer = await ask();
  } catch (error) {
    if (!(error instanceof BudgetBusyError)) throw error;
    res.setHeader('Retry-After', '5');
    throw new HttpError(503, 'busy', 'Many budgets are being computed just now. Please try again in a few seconds.');
  }
  if (!answer) throw notFound('That trip was not found.');
  if (answer.kind === 'too-large')
    throw new HttpError(
      422,
      'budget_too_large',
      'This plan is too large to compute in time. Remove some stops, appliances or routine windows, then try again.',
    );
  return answer;
}

/**
 * Sets the ETag and answers 304 when the browser holds this revision already; true when a body is to be sent.
 * The revision changes with every edit to the trip; the app version changes when the engine may compute
 * differently, so a browser never keeps a budget from an older release.
 */
function freshOrNotModified(
  req: Request,
  res: Response,
  part: 'budget' | 'ledger' | 'fixes',
  revision: number,
): boolean {
  const etag = `"${part}-${BUDGET_FORMAT}-${packageJson.version}-${revision}"`;
  res.setHeader('ETag', etag);
  res.setHeader('Cache-Control', 'private, no-cache');
  if (req.headers['if-none-match'] !== etag) return true;
  res.status(304).end();
  return false;
}

/**
 * A body the worker handed over serialised and compressed: sent as it is, never parsed or compressed here; unpacked
 * only for a client that takes no compression.
 */
async function sendReady(req: Request, res: Response, body: ReadyBody): Promise<void> {
  const encoding = pickEncoding(req.headers['accept-encoding'], ['br', 'gzip']);
  const bytes = encoding ? body[encoding] : await plainBytes(body);
  res.locals.precompressed = true;
  res.setHeader('Vary', 'Accept-Encoding');
  if (encoding) res.setHeader('Content-Encoding', encoding);
  res.setHeader('Content-Type', 'application/json; charset=utf-8');
  res.setHeader('Content-Length', String(bytes.byteLength));
  res.end(bytes);
}

/**
 * The budget, its ledger and its fixes by path under /api/trips/:tripId: the reads a trip's screens repeat most. The
 * app matches them before its other routers (each router passed on the way costs every request a look at its
 * routes), behind the same session and trip-access checks as the trip's other routes.
 */
export function budgetReadRoutes(
  budgets: BudgetService,
): Record<'/budget' | '/ledger' | '/budget/fixes', RequestHandler> {
  return {
    '/budget': async (req, res) => {
      const answer = await budgetAnswer(() => budgets.forTrip(tripAccess(res).tripId), res);
      if (answer.kind === 'none') {
        if (!freshOrNotModified(req, res, 'budget', answer.revision)) return;
        res.json({ version: answer.revision, result: null, reason: answer.reason });
        return;
      }
      if (freshOrNotModified(req, res, 'budget', answer.revision)) await sendReady(req, res, answer.body);
    },

    // The hourly ledger as columns, for the screens that show it; kept and sent like the budget, under its own ETag.
    '/ledger': async (req, res) => {
      const answer = await budgetAnswer(() => budgets.forTrip(tripAccess(res).tripId), res);
      if (answer.kind === 'none' || !answer.ledgerBody) {
        if (!freshOrNotModified(req, res, 'ledger', answer.revision)) return;
        const reason = answer.kind === 'none' ? answer.reason : 'The budget has no hourly ledger.';
        res.json({ version: answer.revision, ledger: null, reason });
        return;
      }
      if (freshOrNotModified(req, res, 'ledger', answer.revision)) await sendReady(req, res, answer.ledgerBody);
    },

    // The budget's flags with their fixes, each checked by walking the trip again: asked for apart from the budget
    // (only when someone looks at the flags), computed in the same workers and kept per revision the same way.
    '/budget/fixes': async (req, res) => {
      const answer = await budgetAnswer(() => budgets.fixesForTrip(tripAccess(res).tripId), res);
      if (answer.kind === 'none') {
        if (!freshOrNotModified(req, res, 'fixes', answer.revision)) return;
        res.json({ version: answer.revision, fixes: [], reason: answer.reason });
        return;
      }
      if (freshOrNotModified(req, res, 'fixes', answer.revision)) await sendReady(req, res, answer.body);
    },
  };
}

/** The rest of /api/trips/:tripId/…; the budget reads are in `budgetReadRoutes`. */
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
  router.use(calibrationRouter(deps));

  // Where each stop's weather record stands; asking also queues whatever is missing.
  router.get('/weather', (_req, res) => {
    const stops = listStopRows(deps.db, tripAccess(res).tripId);
    res.setHeader('Cache-Control', 'private, no-store');
    res.json({ stops: deps.weather.statusFor(stops) });
  });

  // The recorded years and forecast the budget runs on, for the browser's what-ifs to run on the same years.
  router.get('/weather/record', (_req, res) => {
    const stops = listStopRows(deps.db, tripAccess(res).tripId).map(stopFromRow);
    res.setHeader('Cache-Control', 'private, no-cache');
    res.json({ weather: engineWeatherFor(deps.db, stops) });
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
