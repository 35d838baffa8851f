import { availableParallelism } from 'node:os';
import path from 'node:path';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
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
  close: () => Promise<void>;
};

export type BudgetPoolOptions = {
  /** The SQLite file the workers read plans from (each opens its own read-only connection). */
  databasePath: string;
  /** Longest a budget may compute, counted from when a worker starts on it; by default 5 s. */
  timeLimitMs?: number;
  /** Worker threads; by default one fewer than the cores (at least one, at most four), leaving one for requests. */
  threads?: number;
  /** Budgets that may wait for a worker; more are refused as busy. */
  maxQueue?: number;
  /** Heap of each worker, MB: a plan that needs more is stopped like one that takes too long. */
  memoryMb?: number;
};

const WORKER_FILE = path.join(__dirname, 'worker.mjs');

/** The largest plan the API accepts computes in a quarter of a second: 5 s leaves room for a busy machine. */
export const DEFAULT_BUDGET_TIME_LIMIT_MS = 5_000;

export const defaultBudgetThreads = (): number => Math.max(1, Math.min(4, availableParallelism() - 1));

/** A small pool of worker threads (piscina) with a time limit per budget. Threads start on first use or warmUp(). */
export function createBudgetPool(options: BudgetPoolOptions): BudgetRunner {
  const threads = options.threads ?? defaultBudgetThreads();
  const maxQueue = options.maxQueue ?? 16 * threads;
  const timeLimitMs = options.timeLimitMs ?? DEFAULT_BUDGET_TIME_LIMIT_MS;
  let pool: Piscina | undefined;
  const open = (): Piscina =>
    (pool ??= new Piscina({
      filename: WORKER_FILE,
      minThreads: 1,
      maxThreads: threads,
      idleTimeout: 60_000,
      maxQueue,
      resourceLimits: { maxOldGenerationSizeMb: options.memoryMb ?? 256 },
    }));

  return {
    warmUp: () => void open(),
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
