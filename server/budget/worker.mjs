// Entry of a budget worker thread. Node cannot load TypeScript by itself, and a worker does not inherit the loader
// of the thread that started it under every runner (tsx for `npm start`, vitest for the tests), so the worker
// registers tsx's CommonJS loader for its own requires and then loads the TypeScript module that does the work.
// The CommonJS loader runs in this thread; tsx's ESM loader (`tsImport`) would start a loader thread of its own,
// a second V8 heap per worker, for nothing (what compute.ts reaches loads as CommonJS).
import { createRequire } from 'node:module';
import { register } from 'tsx/cjs/api';

register();
const { computeStoredBudget } = createRequire(import.meta.url)('./compute.ts');

/**
 * One trip's budget, or its flags' checked fixes (`work`). `started` is told first, so the server's time limit counts the work only, not the time the
 * task waited in the queue or the worker took to start, and told again once the engine is done (the body is then
 * only written and compressed).
 * @param {{ databasePath: string; tripId: string; work?: 'budget' | 'fixes'; started: import('node:worker_threads').MessagePort }} task
 */
export default function runBudget({ databasePath, tripId, work, started }) {
  started.postMessage('started');
  try {
    return computeStoredBudget(databasePath, tripId, () => started.postMessage('simulated'), work ?? 'budget');
  } finally {
    started.close();
  }
}
