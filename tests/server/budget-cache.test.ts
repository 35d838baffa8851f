// The kept budget answers are bounded by their bytes: past the bound, the one asked for least recently is dropped
// (and computed again if asked for later), so a few large plans cannot hold the server's memory.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Db } from '@/db/client';
import { findTrip } from '@/db/queries/trips';
import type { BudgetRunner } from '@/server/budget/budget-pool';
import { createBudgetService } from '@/server/budget/budget-service';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { createTrip } from '../factories/trip-factory';

const BODY_BYTES = 1_000;

/** Answers every trip with a body of BODY_BYTES kept bytes (a stand-in gzip form), noting each trip it ran. */
function sizedRunner(db: () => Db) {
  const runs: string[] = [];
  const runner: BudgetRunner = {
    run: async (tripId) => {
      runs.push(tripId);
      const trip = findTrip(db(), tripId);
      if (!trip) return undefined;
      const body = { gzip: new Uint8Array(BODY_BYTES), br: new Uint8Array(0) };
      return { revision: trip.revision, outcome: { kind: 'ok', body, ledgerBody: null, figures: null } };
    },
    warmUp: () => undefined,
    workerLimits: () => [],
    close: async () => undefined,
  };
  return { runner, runs };
}

describe('the kept budget answers', () => {
  let ctx: TestContext;
  const ids: string[] = [];

  beforeAll(async () => {
    // The app's own runner is never asked here: each test makes a service of its own over the app's database.
    ctx = createTestApp({ budgetRunner: sizedRunner(() => ctx.db).runner });
    const { agent } = await signUpAgent(ctx.app, 'Cache planner');
    for (const name of ['First', 'Second', 'Third']) ids.push((await createTrip(agent, { name })).trip.id);
  });
  afterAll(() => ctx.close());

  it('when the kept bytes pass the bound, then the answer asked for least recently is dropped first', async () => {
    const [first = '', second = '', third = ''] = ids;
    const { runner, runs } = sizedRunner(() => ctx.db);
    // Room for two answers of BODY_BYTES, not three.
    const budgets = createBudgetService(ctx.db, runner, undefined, { entries: 100, bytes: 2.5 * BODY_BYTES });
    await budgets.forTrip(first);
    await budgets.forTrip(second);
    await budgets.forTrip(first); // kept: not run again, and now the most recently asked for
    expect(runs).toEqual([first, second]);

    await budgets.forTrip(third); // three would pass the bound: the second, asked for least recently, goes
    await budgets.forTrip(first);
    expect(runs).toEqual([first, second, third]);
    await budgets.forTrip(second);
    expect(runs).toEqual([first, second, third, second]);
  });

  it('when the bound is by count, then past it the least recently asked for is dropped too', async () => {
    const [first = '', second = ''] = ids;
    const { runner, runs } = sizedRunner(() => ctx.db);
    const budgets = createBudgetService(ctx.db, runner, undefined, { entries: 1, bytes: 100 * BODY_BYTES });
    await budgets.forTrip(first);
    await budgets.forTrip(first);
    await budgets.forTrip(second);
    await budgets.forTrip(first);
    expect(runs).toEqual([first, second, first]);
  });
});
