// Budgets run in worker threads with a time limit, never on the event loop: the server keeps answering while one
// computes, a budget past its limit answers a clear error, and the trips list never waits for a budget.
import type { Server } from 'node:http';
import { availableParallelism } from 'node:os';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  BudgetBusyError,
  BudgetTooLargeError,
  budgetPoolSettings,
  createBudgetPool,
  DEFAULT_BUDGET_MEMORY_MB,
  type BudgetRunner,
} from '@/server/budget/budget-pool';
import { computeTripBudget, type TripBudget } from '@/server/budget/compute';
import { createLargestTrip } from '../factories/largest-trip';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip } from '../factories/trip-factory';

/** A runner the test controls: each budget waits until the test settles it. */
function heldRunner() {
  const waiting: { tripId: string; settle: (budget: TripBudget | undefined | Error) => void }[] = [];
  const runner: BudgetRunner = {
    run: (tripId) =>
      new Promise<TripBudget | undefined>((resolve, reject) =>
        waiting.push({ tripId, settle: (budget) => (budget instanceof Error ? reject(budget) : resolve(budget)) }),
      ),
    warmUp: () => undefined,
    workerLimits: () => [],
    close: async () => undefined,
  };
  return { runner, waiting };
}

/** Resolves once `ready()` holds, checking every few milliseconds. */
async function until(ready: () => boolean): Promise<void> {
  while (!ready()) await new Promise((resolve) => setTimeout(resolve, 5));
}

async function timed<T>(work: () => Promise<T>): Promise<{ value: T; ms: number }> {
  const started = performance.now();
  const value = await work();
  return { value, ms: performance.now() - started };
}

describe('budgets in worker threads', () => {
  let ctx: TestContext;
  let server: Server;
  let agent: Awaited<ReturnType<typeof signUpAgent>>['agent'];
  let largestId: string;
  let smallId: string;

  beforeAll(async () => {
    // The time limit is tested on its own below; here a busy machine must not turn the largest plan into a refusal.
    ctx = createTestApp({ config: { budget: { timeLimitMs: 60_000 } } });
    ({ agent } = await signUpAgent(ctx.app, 'Largest planner'));
    largestId = (await createLargestTrip(agent)).trip.id;
    smallId = (await createTrip(agent, { name: 'Small' })).trip.id;
    await addStop(agent, smallId);
    await addStop(agent, smallId);
    await addAppliance(agent, smallId);
    // A small trip's budget first, so the worker has started and loaded the engine before anything is timed.
    expect((await agent.get(`/api/trips/${smallId}/budget`)).status).toBe(200);
    server = ctx.app.listen(0, '127.0.0.1');
  }, 180_000);
  afterAll(() => {
    server?.close();
    ctx?.close();
  });

  it('when a budget runs in a worker, then its answer is the one computed in this thread', async () => {
    const pool = createBudgetPool({ databasePath: ctx.db.$client.name, threads: 1 });
    try {
      const inWorker = await pool.run(smallId);
      expect(inWorker).toEqual(computeTripBudget(ctx.db, smallId));
      expect(inWorker?.outcome.kind).toBe('ok');
      expect(await pool.run('no-such-trip')).toBeUndefined();
    } finally {
      await pool.close();
    }
  });

  it('when the pool is given a heap size, then each worker it starts runs with that old generation and a small young one', async () => {
    const pool = createBudgetPool({ databasePath: ctx.db.$client.name, threads: 1, memoryMb: 72 });
    try {
      expect(pool.workerLimits()).toEqual([]);
      expect((await pool.run(smallId))?.outcome.kind).toBe('ok');
      const limits = pool.workerLimits();
      expect(limits).toHaveLength(1);
      expect(limits[0]).toMatchObject({ maxOldGenerationSizeMb: 72, maxYoungGenerationSizeMb: 16 });
    } finally {
      await pool.close();
    }
  });

  it('when a budget computes longer than its time limit, then the worker is stopped and the run says too large', async () => {
    const pool = createBudgetPool({ databasePath: ctx.db.$client.name, threads: 1, timeLimitMs: 5 });
    try {
      await expect(pool.run(largestId)).rejects.toBeInstanceOf(BudgetTooLargeError);
    } finally {
      await pool.close();
    }
  });

  it('when the largest plan budget is computing, then /api/health answers in under 50 ms and is never held up by it', async () => {
    let budgetDone = false;
    const sent = performance.now();
    const budget = agent.get(`/api/trips/${largestId}/budget`).then((response) => {
      budgetDone = true;
      return response;
    });
    // Ask for health again and again until the budget is answered; keep the checks made wholly while it computed.
    const during: number[] = [];
    while (!budgetDone) {
      const check = await timed(() => request(server).get('/api/health'));
      expect(check.value.status).toBe(200);
      if (!budgetDone) during.push(check.ms);
    }
    const answered = await budget;
    const budgetMs = performance.now() - sent;
    expect(answered.status).toBe(200);
    expect(answered.body.result.soc.socPct.length).toBeGreaterThan(2800);
    // On a shared machine a single check can be held up by other processes, so the typical (median) check is held
    // to 50 ms; a computation on the event loop would instead hold one check for most of the budget's time.
    const sorted = [...during].sort((x, y) => x - y);
    expect(during.length).toBeGreaterThanOrEqual(10);
    expect(sorted[Math.floor(sorted.length / 2)]).toBeLessThan(50);
    expect(sorted[sorted.length - 1]).toBeLessThan(budgetMs / 2);
  });
});

describe('the time limit through the API', () => {
  it('when a budget computes longer than the configured limit, then 422 budget_too_large with the error body', async () => {
    const ctx = createTestApp({ config: { budget: { timeLimitMs: 1 } } });
    try {
      const { agent } = await signUpAgent(ctx.app, 'Impatient planner');
      // Two months, three stops and a load: many milliseconds of work, against a limit of one.
      const { trip } = await createTrip(agent);
      for (let i = 0; i < 3; i++) await addStop(agent, trip.id);
      await addAppliance(agent, trip.id);
      const response = await agent.get(`/api/trips/${trip.id}/budget`);
      expect(response.status).toBe(422);
      expect(response.body).toEqual({
        error: { code: 'budget_too_large', message: expect.stringContaining('too large to compute') },
      });
      expect((await agent.get('/api/health')).status).toBe(200);
    } finally {
      ctx.close();
    }
  }, 60_000);
});

describe('the trips list and the budget cache', () => {
  let ctx: TestContext;
  let held: ReturnType<typeof heldRunner>;

  beforeAll(() => {
    held = heldRunner();
    ctx = createTestApp({ budgetRunner: held.runner });
  });
  afterAll(() => ctx.close());

  it('when a budget is not computed yet, then the trips list answers at once with "computing" and starts it once', async () => {
    const { agent } = await signUpAgent(ctx.app, 'List reader');
    const { trip } = await createTrip(agent);
    await addStop(agent, trip.id);
    await addAppliance(agent, trip.id);

    const first = await agent.get('/api/trips');
    expect(first.status).toBe(200);
    expect(first.body.trips[0]).toMatchObject({ id: trip.id, budgetStatus: 'computing', lowestSocPct: null });
    const again = await agent.get('/api/trips');
    expect(again.body.trips[0].budgetStatus).toBe('computing');
    expect(held.waiting).toHaveLength(1);

    const job = held.waiting.shift();
    job?.settle(computeTripBudget(ctx.db, job.tripId));
    await new Promise((resolve) => setImmediate(resolve));
    const ready = await agent.get('/api/trips');
    expect(ready.body.trips[0]).toMatchObject({ budgetStatus: 'current', flagCount: expect.any(Number) });
    expect(ready.body.trips[0].lowestSocPct).toEqual(expect.any(Number));
    expect(held.waiting).toHaveLength(0);
  });

  it('when the plan changes, then the list keeps the last figures, says "computing", and the budget is asked once', async () => {
    const { agent } = await signUpAgent(ctx.app, 'Editor');
    const { trip } = await createTrip(agent);
    await addStop(agent, trip.id);
    await agent.get('/api/trips');
    const job = held.waiting.shift();
    job?.settle(computeTripBudget(ctx.db, job.tripId));
    await new Promise((resolve) => setImmediate(resolve));
    const before = (await agent.get('/api/trips')).body.trips[0];

    await addAppliance(agent, trip.id);
    const budgets = Promise.all([agent.get(`/api/trips/${trip.id}/budget`), agent.get(`/api/trips/${trip.id}/budget`)]);
    await until(() => held.waiting.length > 0);
    const during = (await agent.get('/api/trips')).body.trips[0];
    expect(during).toMatchObject({ budgetStatus: 'computing', lowestSocPct: before.lowestSocPct });
    expect(held.waiting).toHaveLength(1);
    const next = held.waiting.shift();
    next?.settle(computeTripBudget(ctx.db, next.tripId));
    const [a, b] = await budgets;
    expect(a.status).toBe(200);
    expect(b.body).toEqual(a.body);
  });

  it('when every worker is busy and the queue is full, then 503 busy with Retry-After', async () => {
    const { agent } = await signUpAgent(ctx.app, 'Busy reader');
    const { trip } = await createTrip(agent);
    await addStop(agent, trip.id);
    const response = agent.get(`/api/trips/${trip.id}/budget`).then((answer) => answer);
    await until(() => held.waiting.length > 0);
    held.waiting.shift()?.settle(new BudgetBusyError());
    const answered = await response;
    expect(answered.status).toBe(503);
    expect(answered.headers['retry-after']).toBe('5');
    expect(answered.body.error.code).toBe('busy');
  });
});

describe('the size of the budget pool', () => {
  it('when more threads are asked for than the machine has cores, then the pool has one per core', () => {
    expect(budgetPoolSettings({ threads: 64 }).threads).toBe(availableParallelism());
    expect(budgetPoolSettings({ threads: 1 }).threads).toBe(1);
  });

  it('when no heap size is configured, then each worker gets the default old generation', () => {
    expect(budgetPoolSettings({}).resourceLimits.maxOldGenerationSizeMb).toBe(DEFAULT_BUDGET_MEMORY_MB);
    expect(budgetPoolSettings({ memoryMb: 300 }).resourceLimits.maxOldGenerationSizeMb).toBe(300);
  });
});
