// One worker thread reads GPX files off the main thread (see gpx-worker.ts). The machine has few cores and the
// budget engine needs them, so one thread, a short queue, and a time limit per file.
import { Piscina } from 'piscina';
import type { GpxPreview } from '@/shared/schemas/gpx';
import { HttpError } from '../errors';
import { workerFile } from '../worker-file';
import type { GpxTask, GpxTaskResult } from './gpx-worker';

const QUEUE_LIMIT = 4;
const TIME_LIMIT_MS = 30_000;

let pool: Piscina<GpxTask, GpxTaskResult> | null = null;

function gpxPool(): Piscina<GpxTask, GpxTaskResult> {
  pool ??= new Piscina<GpxTask, GpxTaskResult>({
    // The compiled worker under `npm start`; from the sources, an entry that registers tsx in the worker's thread.
    filename: workerFile(__dirname, 'gpx-worker.cjs', 'gpx-worker.mjs'),
    // A GPX file is capped in size (see the route's limit); this bounds what a pathological one may take.
    resourceLimits: { maxOldGenerationSizeMb: 128, maxYoungGenerationSizeMb: 16 },
    minThreads: 0,
    maxThreads: 1,
    maxQueue: QUEUE_LIMIT,
    idleTimeout: 60_000,
  });
  return pool;
}

/** Reads and plans a GPX file in the worker; file problems become a 422 about the file. */
export async function previewGpx(task: GpxTask): Promise<GpxPreview> {
  let result: GpxTaskResult;
  try {
    result = await gpxPool().run(task, { signal: AbortSignal.timeout(TIME_LIMIT_MS) });
  } catch (error) {
    const name = (error as Error | undefined)?.name ?? '';
    if (name === 'AbortError' || name === 'TimeoutError')
      throw new HttpError(422, 'unprocessable', 'That file took too long to read. Export a simplified track.', {
        file: ['That file took too long to read.'],
      });
    if (/queue is full/i.test((error as Error | undefined)?.message ?? ''))
      throw new HttpError(503, 'rate_limited', 'Several files are being read just now. Try again in a moment.');
    throw error;
  }
  if (!result.ok) throw new HttpError(422, 'unprocessable', result.message, { file: [result.message] });
  return result.preview;
}

/** Stops the worker (tests and shutdown). */
export async function closeGpxPool(): Promise<void> {
  await pool?.destroy();
  pool = null;
}
