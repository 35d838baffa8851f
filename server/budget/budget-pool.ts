import { availableParallelism } from 'node:os';
import { MessageChannel, type ResourceLimits } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { workerFile } from '../worker-file';
import type { BudgetWork, TripBudget } from './compute';

/** The budget took longer than its time limit (or more memory than a worker has) and was stopped. */
export class BudgetTooLargeError extends Error {
  constructor() {
    super('The budget took longer than its time limit and was stopped.');
    this.name = 'BudgetTooLargeError';
  }
}

/** Every worker is busy and the queue is full: try again shortly. */
export class BudgetBusyError extends Error {
  constructor() {
    super('Every budget worker is busy.');
    this.name = 'BudgetBusyError';
  }
}

/** Runs one trip's budget off the event loop: reading the plan, simulating it and serialising the result. */
export type BudgetRunner = {
  /** Undefined when the trip does not exist (any more). `work` is the budget (the default) or its checked fixes. */
  run: (tripId: string, work?: BudgetWork) => Promise<TripBudget | undefined>;
  /** Starts the workers now, so the first budget does not wait for them. */
  warmUp: () => void;
  /** The heap limits each running worker was started with (none before the first starts). */
  workerLimits: () => ResourceLimits[];
  close: () => Promise<void>;
};

export type BudgetPoolOptions = {
  /** The SQLite file the workers read plans from (each opens its own read-only connection). */
  databasePath: string;
  /** Longest a budget may compute, counted from when a worker starts on it; by default 5 s. */
  timeLimitMs?: number;
  /** Worker threads; by default one fewer than the cores (at least one, at most four), never more than the cores. */
  threads?: number;
  /** Budgets that may wait for a worker; more are refused as busy. */
  maxQueue?: number;
  /** Old-generation heap of each worker, MB: a plan that needs more is stopped like one that takes too long. */
  memoryMb?: number;
};

const WORKER_FILE = workerFile(__dirname, 'budget-worker.cjs', 'worker.mjs');

/** The largest plan the API accepts computes in a quarter of a second: 5 s leaves room for a busy machine. */
export const DEFAULT_BUDGET_TIME_LIMIT_MS = 5_000;
/** The largest plan the API accepts, budget or fixes, computes within 48 MB of old generation: 128 leaves room. */
export const DEFAULT_BUDGET_MEMORY_MB = 128;
/**
 * A budget's garbage is short-lived (the engine's hourly arrays, the body's strings): a small young generation
 * keeps an idle worker's committed heap small without promoting more of it.
 */
const WORKER_YOUNG_GENERATION_MB = 16;

export const defaultBudgetThreads = (): number => Math.max(1, Math.min(4, availableParallelism() - 1));

/** How the pool is sized: threads bounded by the cores (each thread is a whole V8 heap), each heap bounded too. */
export function budgetPoolSettings(options: Omit<BudgetPoolOptions, 'databasePath'>) {
  const threads = Math.max(1, Math.min(options.threads ?? defaultBudgetThreads(), availableParallelism()));
  return {
    threads,
    maxQueue: options.maxQueue ?? 16 * threads,
    timeLimitMs: options.timeLimitMs ?? DEFAULT_BUDGET_TIME_LIMIT_MS,
    resourceLimits: {
      maxOldGenerationSizeMb: options.memoryMb ?? DEFAULT_BUDGET_MEMORY_MB,
      maxYoungGenerationSizeMb: WORKER_YOUNG_GENERATION_MB,
    } satisfies ResourceLimits,
  };
}

/** A small pool of worker threads (piscina) with a time limit per budget. Threads start on first use or warmUp(). */
export function createBudgetPool(options: BudgetPoolOptions): BudgetRunner {
  const { threads, maxQueue, timeLimitMs, resourceLimits } = budgetPoolSettings(options);
  let pool: Piscina | undefined;
  const open = (): Piscina =>
    (pool ??= new Piscina({
      filename: WORKER_FILE,
      minThreads: 1,
      maxThreads: threads,
      idleTimeout: 60_000,
      maxQueue,
      resourceLimits,
    }));

  return {
    warmUp: () => void open(),
    workerLimits: () => (pool?.threads ?? []).map((thread) => thread.resourceLimits ?? {}),
    async run(tripId, work = 'budget') {
      const workers = open();
      if (workers.queueSize >= maxQueue) throw new BudgetBusyError();
      const { port1: startedHere, port2: startedThere } = new MessageChannel();
      const abort = new AbortController();
      let timer: NodeJS.Timeout | undefined;
      // 'started' when the worker begins, 'simulated' when the engine is done: the limit covers reading and
      // simulating the plan; writing and compressing the body after it is bounded by the result's size.
      startedHere.on('message', (stage: unknown) => {
        if (stage === 'started') timer = setTimeout(() => abort.abort(), timeLimitMs);
        else clearTimeout(timer);
      });
      try {
        return (await workers.run(
          { databasePath: options.databasePath, tripId, work, started: startedThere },
          { transferList: [startedThere], signal: abort.signal },
        )) as TripBudget | undefined;
      } catch (error) {
        // Aborting terminates the worker in the middle of the computation; piscina starts a fresh one.
        if (abort.signal.aborted) throw new BudgetTooLargeError();
        if ((error as { code?: unknown }).code === 'ERR_WORKER_OUT_OF_MEMORY') throw new BudgetTooLargeError();
        throw error;
      } finally {
        clearTimeout(timer);
        startedHere.close();
      }
    },
    async close() {
      const open = pool;
      pool = undefined;
      await open?.destroy();
    },
  };
}
