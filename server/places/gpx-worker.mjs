// Entry of the GPX worker thread, loaded the way the budget workers are (see server/budget/worker.mjs): tsx's
// CommonJS loader registered in this thread, then the TypeScript module that does the work. Passing the server's
// own Node options to a worker instead fails under `npm start`, whose heap bound is not a worker option.
import { createRequire } from 'node:module';
import { register } from 'tsx/cjs/api';

register();
const { default: previewGpxFile } = createRequire(import.meta.url)('./gpx-worker.ts');

/** @param {import('./gpx-worker').GpxTask} task */
export default function runGpxPreview(task) {
  return previewGpxFile(task);
}
