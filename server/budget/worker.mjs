// Entry of a budget worker thread when the server runs from its TypeScript sources (tests, `npm run dev`). Node
// cannot load TypeScript by itself, and a worker does not inherit the loader of the thread that started it under
// every runner (vitest for the tests), so the worker registers tsx's CommonJS loader for its own requires and then
// loads the TypeScript module that does the work. The CommonJS loader runs in this thread; tsx's ESM loader
// (`tsImport`) would start a loader thread of its own, a second V8 heap per worker, for nothing. `npm start` runs
// the compiled worker instead (see scripts/build-server.ts), without tsx.
import { createRequire } from 'node:module';
import { register } from 'tsx/cjs/api';

register();
export default createRequire(import.meta.url)('./worker-task.ts').default;
