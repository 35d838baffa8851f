// What a budget worker runs: read the stored plan from the database, check it against the engine's contract,
// simulate it, and hand back the response body already serialised and compressed, so the server's event loop never
// reads, walks, serialises or compresses a large plan or result.
import { openReadOnlyDatabase, type Db, type DbExecutor } from '@/db/client';
import { findTrip, loadTripDetail } from '@/db/queries/trips';
import { engineWeatherFor } from '@/db/queries/weather-series';
import { toBudgetResult } from '@/shared/budget-result';
import { simulateParsed } from '@/shared/engine';
import { toLedgerColumns } from '@/shared/ledger-columns';
import { lowestChargeByStop } from '@/shared/route-charge';
import { engineInputSchema, type EngineInputDraft } from '@/shared/schemas/engine-input';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { readyBody, type ReadyBody } from './ready-body';

/** The figures the trips list shows of a budget, with the lowest charge at each stop for the card's small map. */
export type BudgetFigures = {
  lowestSocPct: number;
  reservePct: number;
  flagCount: number;
  lowestByStop: (number | null)[];
};

export type BudgetOutcome =
  | { kind: 'ok'; resultJson: string; ledgerJson: string; figures: BudgetFigures }
  /** Nothing to simulate yet, or a plan the engine refuses: the reason is shown in place of the budget. */
  | { kind: 'none'; reason: string }
  /** The engine failed: a fault to log, not the user's doing. */
  | { kind: 'failed'; message: string };

/**
 * What the server keeps of a budget, ready in each encoding: the budget's body `{ version, result }` and the
 * ledger's `{ version, ledger }` (the hourly rows as columns, sent only to the screens that show them).
 */
export type ReadyOutcome =
  | { kind: 'ok'; body: ReadyBody; ledgerBody: ReadyBody; figures: BudgetFigures }
  | Exclude<BudgetOutcome, { kind: 'ok' }>;

/** A trip's budget and the revision of the plan it was computed from. */
export type TripBudget = { revision: number; outcome: ReadyOutcome };

/** The budget's response body, made once per revision, so each request for it only sends bytes. */
function readyOutcome(revision: number, outcome: BudgetOutcome): ReadyOutcome {
  if (outcome.kind !== 'ok') return outcome;
  const { resultJson, ledgerJson, figures } = outcome;
  return {
    kind: 'ok',
    figures,
    body: readyBody(`{"version":${revision},"result":${resultJson}}`),
    ledgerBody: readyBody(`{"version":${revision},"ledger":${ledgerJson}}`),
  };
}

export function computeBudget(draft: EngineInputDraft | null): BudgetOutcome {
  if (!draft) return { kind: 'none', reason: 'Add a stop to see the budget.' };
  const parsed = engineInputSchema.safeParse(draft);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { kind: 'none', reason: `The plan cannot be simulated yet: ${issue?.path.join('.')} ${issue?.message}` };
  }
  try {
    const result = simulateParsed(parsed.data);
    const budget = toBudgetResult(result);
    const { lowestSocPct, reservePct } = result.headline;
    return {
      kind: 'ok',
      resultJson: JSON.stringify(budget),
      ledgerJson: JSON.stringify(toLedgerColumns(result.ledger)),
      figures: {
        lowestSocPct,
        reservePct,
        flagCount: result.flags.length,
        lowestByStop: lowestChargeByStop(budget.soc, parsed.data.trip.stops.length),
      },
    };
  } catch (error) {
    // An engine fault is reported, not thrown: the pool keeps its worker and the server logs the message.
    return { kind: 'failed', message: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
}

/** The budget of a stored trip, or undefined when there is no such trip. */
export function computeTripBudget(
  db: DbExecutor,
  tripId: string,
  onSimulated: () => void = () => undefined,
): TripBudget | undefined {
  // One read transaction: the plan and its revision come from the same moment, however busy the writers are.
  const read = db.transaction(
    (tx) => {
      const trip = findTrip(tx, tripId);
      const detail = trip ? loadTripDetail(tx, tripId, 'viewer') : undefined;
      if (!trip || !detail) return undefined;
      const draft = toEngineInput(detail);
      // The weather held for the stops' places and dates: the record's years and any forecast.
      const weather = engineWeatherFor(
        tx,
        detail.stops.map((record) => record.stop),
      );
      return { revision: trip.revision, draft: draft && weather ? { ...draft, weather } : draft };
    },
    { behavior: 'deferred' },
  );
  if (!read) return undefined;
  const outcome = computeBudget(read.draft);
  onSimulated();
  return { revision: read.revision, outcome: readyOutcome(read.revision, outcome) };
}

/** A worker's read-only connections, one per database file, opened on its first budget from that file. */
const connections = new Map<string, Db>();

/** What a worker thread runs for one task: the budget of a trip stored in the database at `databasePath`. */
export function computeStoredBudget(
  databasePath: string,
  tripId: string,
  onSimulated?: () => void,
): TripBudget | undefined {
  let db = connections.get(databasePath);
  if (!db) {
    db = openReadOnlyDatabase(databasePath);
    connections.set(databasePath, db);
  }
  return computeTripBudget(db, tripId, onSimulated);
}
