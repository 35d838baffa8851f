import { latestReading, reforecastFrom, type Reforecast } from '@/shared/engine/reforecast';
import type { TripDetail } from '@/shared/schemas/api';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { engineInputSchema } from '@/shared/schemas/engine-input';
import { toEngineInput } from '@/shared/trip-to-engine-input';

export type ReforecastState = { state: 'none' } | { state: 'ready'; reforecast: Reforecast } | { state: 'after-trip' };

// The last run, keyed by its input and reading: re-rendering must not re-run the engine (~50–150 ms).
let last: { key: string; value: ReforecastState } | undefined;

/** The trip walked on from its latest check-in, run in the browser (so it works without the server). */
export function reforecastFor(detail: TripDetail, checkIns: readonly CheckInRecord[]): ReforecastState {
  const latest = latestReading(checkIns.map((c) => c.checkIn));
  const draft = toEngineInput(detail);
  if (!latest || !draft) return { state: 'none' };
  const key = JSON.stringify([draft, latest]);
  if (last?.key === key) return last.value;
  const parsed = engineInputSchema.safeParse(draft);
  let value: ReforecastState = { state: 'none' };
  if (parsed.success) {
    const reforecast = reforecastFrom(parsed.data, latest);
    value = reforecast ? { state: 'ready', reforecast } : { state: 'after-trip' };
  }
  last = { key, value };
  return value;
}
