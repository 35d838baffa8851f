// Entry of the password worker thread when the server runs from its TypeScript sources, loaded the way the budget
// workers are (see server/budget/worker.mjs): tsx's CommonJS loader registered in this thread, then the TypeScript
// module that does the work. `npm start` runs the compiled worker instead (see scripts/build-server.ts).
import { createRequire } from 'node:module';
import { register } from 'tsx/cjs/api';

register();
export default createRequire(import.meta.url)('./password-worker.ts').default;
