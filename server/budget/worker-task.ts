// What a budget worker thread runs for one task. Loaded by the thread's entry: `worker.mjs` under tsx (tests,
// `npm run dev`), or the compiled `build/budget-worker.cjs` beside the compiled server (`npm start`).
import type { MessagePort } from 'node:worker_threads';
import { computeStoredBudget, type BudgetWork, type TripBudget } from './compute';

export type BudgetTask = { databasePath: string; tripId: string; work?: BudgetWork; started: MessagePort };

/**
 * One trip's budget, or its flags' checked fixes (`work`). `started` is told first, so the server's time limit
 * counts the work only, not the time the task waited in the queue or the worker took to start, and told again once
 * the engine is done (the body is then only written and compressed).
 */
export default function runBudget({ databasePath, tripId, work, started }: BudgetTask): TripBudget | undefined {
  started.postMessage('started');
  try {
    return computeStoredBudget(databasePath, tripId, () => started.postMessage('simulated'), work ?? 'budget');
  } finally {
    started.close();
  }
}
