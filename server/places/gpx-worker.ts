// Runs in a worker thread (piscina): reading a large GPX file builds a DOM for seconds, which must never hold up
// the server's other requests. Answers plain data, since errors lose their class between threads.
import type { GpxPreview } from '@/shared/schemas/gpx';
import { planGpxImport } from './gpx-plan';
import { GpxError, readGpx } from './gpx-read';

export type GpxTask = {
  text: string;
  trip: { startDate: string; endDate: string; timeZone: string };
  speedKmh: number;
  replaces: number;
};
export type GpxTaskResult = { ok: true; preview: GpxPreview } | { ok: false; message: string };

export default function previewGpxFile(task: GpxTask): GpxTaskResult {
  try {
    return { ok: true, preview: planGpxImport(readGpx(task.text), task.trip, task.speedKmh, task.replaces) };
  } catch (error) {
    if (error instanceof GpxError) return { ok: false, message: error.message };
    throw error;
  }
}
