// Entry of the GPX worker thread when the server runs from its TypeScript sources, loaded the way the budget
// workers are (see server/budget/worker.mjs): tsx's CommonJS loader registered in this thread, then the TypeScript
// module that does the work. Passing the server's own Node options to a worker instead fails under `npm start`,
// whose heap bound is not a worker option. `npm start` runs the compiled worker instead (see scripts/build-server.ts).
import { createRequire } from 'node:module';
import { register } from 'tsx/cjs/api';

register();
export default createRequire(import.meta.url)('./gpx-worker.ts').default;
