import type { Db } from '@/db/client';
import { findTrip } from '@/db/queries/trips';
import { BudgetBusyError, BudgetTooLargeError, type BudgetRunner } from './budget-pool';
import type { BudgetResult } from '@/shared/budget-result';
import type { SimulationResult } from '@/shared/engine/result-types';
import { fromLedgerColumns, type LedgerColumns } from '@/shared/ledger-columns';
import type { BudgetFigures, BudgetWork, TripBudget } from './compute';
import { readyBodySize, readyJson, type ReadyBody } from './ready-body';

export type BudgetAnswer = { revision: number } &
  /**
   * `body` is the response `{ version, result }` (or `{ version, fixes }`) and a budget's `ledgerBody`
   * `{ version, ledger }`, serialised and compressed by the worker.
   */
  (
    | { kind: 'ok'; body: ReadyBody; ledgerBody: ReadyBody | null; figures: BudgetFigures | null }
    /** Nothing to simulate yet, or a plan the engine refuses: the reason is shown in place of the budget. */
    | { kind: 'none'; reason: string }
    | { kind: 'too-large' }
  );

/** What the trips list shows: the last figures computed (of this revision or an older one) and how current they are. */
export type BudgetGlance = {
  figures: BudgetFigures | null;
  status: 'current' | 'computing' | 'unavailable';
};

/**
 * Full answers kept, by count and by bytes (each as gzip and Brotli only, outside V8's heap; the plain JSON, several
 * times larger, is not kept). The least recently asked for goes first.
 */
export const DEFAULT_BUDGET_CACHE = { entries: 100, bytes: 32 * 1024 * 1024 };
/** A plan stopped for taking too long is not tried again for this long, so asking again costs nothing. */
const TOO_LARGE_KEPT_MS = 60_000;
/** Trips whose last figures are remembered for the list; far more than one server's trips in use at once. */
const GLANCE_ENTRIES = 10_000;
const FAULT_REASON = 'The budget could not be computed for this plan. Please report it.';

const sizeOf = (answer: BudgetAnswer): number =>
  answer.kind === 'ok' ? readyBodySize(answer.body) + (answer.ledgerBody ? readyBodySize(answer.ledgerBody) : 0) : 0;

/**
 * Budgets, and their flags' checked fixes, per (trip, revision), computed off the event loop by a runner (a worker pool that reads the plan itself)
 * and kept: any change to a trip bumps its revision, so a kept budget is never stale and needs no invalidation.
 * The trips list reads `glance`, which never waits: it answers the last figures and starts a computation when
 * they are out of date. On this thread a budget costs one look-up of the trip's revision.
 */
export function createBudgetService(
  db: Db,
  runner: BudgetRunner,
  onError: (error: unknown, tripId: string) => void = () => undefined,
  cache: { entries: number; bytes: number } = DEFAULT_BUDGET_CACHE,
) {
  const answers = new Map<string, BudgetAnswer>();
  let answerBytes = 0;
  const running = new Map<string, Promise<BudgetAnswer | undefined>>();
  const tooLargeUntil = new Map<string, number>();
  const glances = new Map<string, { revision: number; figures: BudgetFigures | null; unavailable: boolean }>();

  function keep(key: string, answer: BudgetAnswer): void {
    if (answers.has(key)) return;
    answers.set(key, answer);
    answerBytes += sizeOf(answer);
    while (answers.size > cache.entries || answerBytes > cache.bytes) {
      const oldest = answers.entries().next().value;
      if (!oldest) break;
      answers.delete(oldest[0]);
      answerBytes -= sizeOf(oldest[1]);
    }
  }

  function remember(tripId: string, answer: BudgetAnswer): void {
    const last = glances.get(tripId);
    if (last && last.revision > answer.revision) return;
    glances.delete(tripId);
    glances.set(tripId, {
      revision: answer.revision,
      // A plan that cannot be computed keeps no figures: older ones would describe another plan.
      figures: answer.kind === 'ok' ? answer.figures : null,
      unavailable: answer.kind !== 'ok',
    });
    if (glances.size > GLANCE_ENTRIES) {
      const oldest = glances.keys().next().value;
      if (oldest !== undefined) glances.delete(oldest);
    }
  }

  function toAnswer(tripId: string, budget: TripBudget): BudgetAnswer {
    const { revision, outcome } = budget;
    if (outcome.kind !== 'failed') return { revision, ...outcome };
    // An engine fault must not take the trip's pages down with it; say so and log it.
    onError(new Error(outcome.message), tripId);
    return { revision, kind: 'none', reason: FAULT_REASON };
  }

  async function compute(tripId: string, revision: number, work: BudgetWork): Promise<BudgetAnswer | undefined> {
    try {
      const budget = await runner.run(tripId, work);
      return budget && toAnswer(tripId, budget);
    } catch (error) {
      if (error instanceof BudgetTooLargeError) return { revision, kind: 'too-large' };
      if (error instanceof BudgetBusyError) throw error;
      onError(error, tripId);
      return { revision, kind: 'none', reason: FAULT_REASON };
    }
  }

  /** Budgets are kept under `trip:revision`, fixes under `trip:revision:fixes`. */
  const keyOf = (tripId: string, revision: number, work: BudgetWork): string =>
    work === 'budget' ? `${tripId}:${revision}` : `${tripId}:${revision}:${work}`;

  function settle(tripId: string, work: BudgetWork, answer: BudgetAnswer | undefined): BudgetAnswer | undefined {
    if (!answer) return undefined;
    // Keyed by the revision the worker read, which may be newer than the one asked for.
    const key = keyOf(tripId, answer.revision, work);
    if (answer.kind === 'too-large') {
      tooLargeUntil.set(key, Date.now() + TOO_LARGE_KEPT_MS);
      if (tooLargeUntil.size > cache.entries) tooLargeUntil.delete(tooLargeUntil.keys().next().value ?? key);
    } else keep(key, answer);
    if (work === 'budget') remember(tripId, answer);
    return answer;
  }

  function start(tripId: string, revision: number, work: BudgetWork = 'budget'): Promise<BudgetAnswer | undefined> {
    const key = keyOf(tripId, revision, work);
    const kept = answers.get(key);
    if (kept) {
      // Asked for again: it moves to the end of the Map's order, the last in line to be dropped.
      answers.delete(key);
      answers.set(key, kept);
      return Promise.resolve(kept);
    }
    const refusedUntil = tooLargeUntil.get(key);
    if (refusedUntil !== undefined) {
      if (refusedUntil > Date.now()) return Promise.resolve({ revision, kind: 'too-large' });
      tooLargeUntil.delete(key);
    }
    const pending = running.get(key);
    if (pending) return pending;
    const job = compute(tripId, revision, work)
      .then((answer) => settle(tripId, work, answer))
      .finally(() => running.delete(key));
    running.set(key, job);
    return job;
  }

  return {
    /** The budget at the trip's current revision, or undefined when the trip does not exist. */
    async forTrip(tripId: string): Promise<BudgetAnswer | undefined> {
      const trip = findTrip(db, tripId);
      if (!trip) return undefined;
      return start(trip.id, trip.revision);
    },

    /** The checked fixes of the budget's flags at the trip's current revision, or undefined when there is no trip. */
    async fixesForTrip(tripId: string): Promise<BudgetAnswer | undefined> {
      const trip = findTrip(db, tripId);
      if (!trip) return undefined;
      return start(trip.id, trip.revision, 'fixes');
    },

    /**
     * The simulated result for a file made from the trip (a calendar): null when there is none to give — no stops
     * yet, a plan too large to compute, or every worker busy — so the file is still written, without budget lines.
     */
    async resultForFile(tripId: string): Promise<SimulationResult | null> {
      const trip = findTrip(db, tripId);
      if (!trip) return null;
      const answer = await start(trip.id, trip.revision).catch((error: unknown) => {
        if (error instanceof BudgetBusyError) return undefined;
        throw error;
      });
      if (answer?.kind !== 'ok' || !answer.ledgerBody) return null;
      const { result } = (await readyJson(answer.body)) as { result: BudgetResult };
      const { ledger } = (await readyJson(answer.ledgerBody)) as { ledger: LedgerColumns };
      const { soc: _track, ...rest } = result;
      return { ...rest, ledger: fromLedgerColumns(ledger) };
    },

    /** The trips list's figures for a trip at `revision`, without waiting; starts a computation when they are old. */
    glance(tripId: string, revision: number): BudgetGlance {
      const last = glances.get(tripId);
      if (last?.revision === revision)
        return { figures: last.figures, status: last.unavailable ? 'unavailable' : 'current' };
      // Busy workers refuse it now; the next look at the list asks again.
      start(tripId, revision).catch(() => undefined);
      return { figures: last?.figures ?? null, status: 'computing' };
    },

    warmUp: () => runner.warmUp(),
    close: () => runner.close(),
  };
}

export type BudgetService = ReturnType<typeof createBudgetService>;
