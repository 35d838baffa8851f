// The budget with one stop's stay changed, worked out in the browser before anything is saved: from the latest
// check-in when there is one (what lies ahead), else the whole plan.
import { simulateParsed } from '@/shared/engine';
import { latestReading, reforecastFrom } from '@/shared/engine/reforecast';
import type { TripDetail } from '@/shared/schemas/api';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { engineInputSchema } from '@/shared/schemas/engine-input';
import type { StayMode } from '@/shared/schemas/stay';
import { changeStay } from '@/shared/stay-change';
import { toEngineInput } from '@/shared/trip-to-engine-input';

export type StayOutcome =
  { ok: true; lowestSocPct: number; lowestAtLocal: string; fromCheckIn: boolean } | { ok: false; message: string };

/** The stop travellers are at: where the latest check-in was taken, else where `now` falls, else the first. */
export function currentStopIndex(detail: TripDetail, checkIns: readonly CheckInRecord[], now: Date): number {
  const at = latestReading(checkIns.map((c) => c.checkIn))?.at;
  const ms = at ? Date.parse(at) : now.getTime();
  const i = detail.stops.findIndex((s) => Date.parse(s.stop.arriveAt) <= ms && ms < Date.parse(s.stop.departAt));
  if (i >= 0) return i;
  // Between two stops (on the road), the next one is the one whose stay can still change.
  const next = detail.stops.findIndex((s) => Date.parse(s.stop.arriveAt) > ms);
  return next >= 0 ? next : 0;
}

/** The lowest charge with the change (nights 0: as planned). */
export function stayOutcome(
  detail: TripDetail,
  checkIns: readonly CheckInRecord[],
  stopIndex: number,
  nights: number,
  mode: StayMode,
): StayOutcome {
  const draft = toEngineInput(detail);
  if (!draft) return { ok: false, message: 'Add a stop to see a budget.' };
  const parsed = engineInputSchema.safeParse(draft);
  if (!parsed.success) return { ok: false, message: 'This plan cannot be simulated yet.' };
  const input = parsed.data;
  const changed =
    nights === 0
      ? { ok: true as const, stops: input.trip.stops }
      : changeStay(input.trip.stops, stopIndex, nights, mode);
  if (!changed.ok) return { ok: false, message: changed.breach.message };
  const next = { ...input, trip: { ...input.trip, stops: changed.stops } };
  const latest = latestReading(checkIns.map((c) => c.checkIn));
  const re = latest ? reforecastFrom(next, latest) : undefined;
  const headline = re ? re.result.headline : simulateParsed(next).headline;
  return { ok: true, lowestSocPct: headline.lowestSocPct, lowestAtLocal: headline.lowestAtLocal, fromCheckIn: !!re };
}
