// What a budget worker runs: read the stored plan from the database, check it against the engine's contract,
// simulate it (or check its flags' fixes), and hand back the response body already serialised and compressed, so the
// server's event loop never reads, walks, serialises or compresses a large plan or result.
import { openReadOnlyDatabase, type Db, type DbExecutor } from '@/db/client';
import { findTrip, loadTripDetail } from '@/db/queries/trips';
import { engineWeatherFor } from '@/db/queries/weather-series';
import { toBudgetResult } from '@/shared/budget-result';
import { checkFixesParsed, simulateParsed } from '@/shared/engine';
import { toLedgerColumns } from '@/shared/ledger-columns';
import { lowestChargeByStop } from '@/shared/route-charge';
import { engineInputSchema, type EngineInput, type EngineInputDraft } from '@/shared/schemas/engine-input';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { readyBody, type ReadyBody } from './ready-body';

/** The figures the trips list shows of a budget, with the lowest charge at each stop for the card's small map. */
export type BudgetFigures = {
  lowestSocPct: number;
  reservePct: number;
  flagCount: number;
  lowestByStop: (number | null)[];
};

/** What a worker computes for a trip: its budget, or its flags' checked fixes (`GET …/budget/fixes`). */
export type BudgetWork = 'budget' | 'fixes';

export type BudgetOutcome =
  /**
   * `json` is the body's payload (`result` or `fixes`); a budget also has its hourly ledger as columns (`ledgerJson`)
   * and the trips list's figures, which fixes have not (null).
   */
  | { kind: 'ok'; json: string; ledgerJson: string | null; figures: BudgetFigures | null }
  /** Nothing to simulate yet, or a plan the engine refuses: the reason is shown in place of the budget. */
  | { kind: 'none'; reason: string }
  /** The engine failed: a fault to log, not the user's doing. */
  | { kind: 'failed'; message: string };

/**
 * What the server keeps of a budget, ready in each encoding: the budget's body `{ version, result }` and the
 * ledger's `{ version, ledger }` (the hourly rows as columns, sent only to the screens that show them); or the
 * fixes' body `{ version, fixes }`, with no ledger.
 */
export type ReadyOutcome =
  | { kind: 'ok'; body: ReadyBody; ledgerBody: ReadyBody | null; figures: BudgetFigures | null }
  | Exclude<BudgetOutcome, { kind: 'ok' }>;

/** A trip's budget and the revision of the plan it was computed from. */
export type TripBudget = { revision: number; outcome: ReadyOutcome };

/** The response body, made once per revision, so each request for it only sends bytes. */
function readyOutcome(revision: number, work: BudgetWork, outcome: BudgetOutcome): ReadyOutcome {
  if (outcome.kind !== 'ok') return outcome;
  const { json, ledgerJson, figures } = outcome;
  const field = work === 'fixes' ? 'fixes' : 'result';
  return {
    kind: 'ok',
    figures,
    body: readyBody(`{"version":${revision},"${field}":${json}}`),
    ledgerBody: ledgerJson === null ? null : readyBody(`{"version":${revision},"ledger":${ledgerJson}}`),
  };
}

/** The plan checked against the engine's contract, or the reason it cannot be simulated yet. */
function parsePlan(draft: EngineInputDraft | null): { input: EngineInput } | { kind: 'none'; reason: string } {
  if (!draft) return { kind: 'none', reason: 'Add a stop to see the budget.' };
  const parsed = engineInputSchema.safeParse(draft);
  if (parsed.success) return { input: parsed.data };
  const issue = parsed.error.issues[0];
  return { kind: 'none', reason: `The plan cannot be simulated yet: ${issue?.path.join('.')} ${issue?.message}` };
}

/** Runs the engine; a fault is reported, not thrown: the pool keeps its worker and the server logs the message. */
function guarded(run: () => BudgetOutcome): BudgetOutcome {
  try {
    return run();
  } catch (error) {
    return { kind: 'failed', message: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
}

export function computeBudget(draft: EngineInputDraft | null): BudgetOutcome {
  const plan = parsePlan(draft);
  if (!('input' in plan)) return plan;
  return guarded(() => {
    const result = simulateParsed(plan.input);
    const budget = toBudgetResult(result);
    const { lowestSocPct, reservePct } = result.headline;
    return {
      kind: 'ok',
      json: JSON.stringify(budget),
      ledgerJson: JSON.stringify(toLedgerColumns(result.ledger)),
      figures: {
        lowestSocPct,
        reservePct,
        flagCount: result.flags.length,
        lowestByStop: lowestChargeByStop(budget.soc, plan.input.trip.stops.length),
      },
    };
  });
}

/** The checked fixes of the plan's flags (the same flags its budget has, matched by id). */
export function computeFixes(draft: EngineInputDraft | null): BudgetOutcome {
  const plan = parsePlan(draft);
  if (!('input' in plan)) return plan;
  return guarded(() => ({
    kind: 'ok',
    json: JSON.stringify(checkFixesParsed(plan.input)),
    ledgerJson: null,
    figures: null,
  }));
}

/** The budget (or the checked fixes) of a stored trip, or undefined when there is no such trip. */
export function computeTripBudget(
  db: DbExecutor,
  tripId: string,
  onSimulated: () => void = () => undefined,
  work: BudgetWork = 'budget',
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
  const outcome = work === 'fixes' ? computeFixes(read.draft) : computeBudget(read.draft);
  onSimulated();
  return { revision: read.revision, outcome: readyOutcome(read.revision, work, outcome) };
}

/** A worker's read-only connections, one per database file, opened on its first budget from that file. */
const connections = new Map<string, Db>();

/** What a worker thread runs for one task: the budget (or fixes) of a trip stored in the database at `databasePath`. */
export function computeStoredBudget(
  databasePath: string,
  tripId: string,
  onSimulated?: () => void,
  work: BudgetWork = 'budget',
): TripBudget | undefined {
  let db = connections.get(databasePath);
  if (!db) {
    db = openReadOnlyDatabase(databasePath);
    connections.set(databasePath, db);
  }
  return computeTripBudget(db, tripId, onSimulated, work);
}
