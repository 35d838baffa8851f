// When the check-ins at a stop disagree with the plan enough to offer "Calibrate from check-ins". The plan is walked
// from the stop's first reading (as the fit does) and compared with the later readings and harvests; the offer
// stands when the residuals' RMS passes DISAGREEMENT_RMS_PCT of the bank.
//
// Why 5 %: a battery monitor's state of charge drifts a few percent between full charges (coulomb counting; 1–3 % is
// usual — from memory), and a daily harvest read off a controller's history is a rounded figure. A plan that misses
// by less than that is within what the readings themselves can tell; past it the stop's sky or the loads differ from
// what was planned, and fitting them is worth the traveller's look.
import type { EngineInput } from '../schemas/engine-input';
import type { Stop } from '../schemas/trip';
import { FIT_MIN_RESIDUALS, residuals, rms, type CalibrationReading } from './calibrate';

export const DISAGREEMENT_RMS_PCT = 5;

export type CalibrationNeed =
  /** Too few readings at the stop to fit two numbers: nothing is offered, and nothing is said. */
  { kind: 'too-few' } | { kind: 'agrees'; rmsPct: number } | { kind: 'disagrees'; rmsPct: number };

/** The readings taken while the rig stood at a stop (from arrival up to, not including, departure). */
export function readingsAtStop<T extends { at: string }>(
  stop: Pick<Stop, 'arriveAt' | 'departAt'>,
  readings: readonly T[],
) {
  const from = Date.parse(stop.arriveAt);
  const to = Date.parse(stop.departAt);
  return readings.filter((r) => {
    const at = Date.parse(r.at);
    return at >= from && at < to;
  });
}

/** How far the plan stands from what was seen at one stop. */
export function calibrationNeed(
  input: EngineInput,
  stopIndex: number,
  readings: readonly CalibrationReading[],
): CalibrationNeed {
  const stop = input.trip.stops[stopIndex];
  if (!stop) return { kind: 'too-few' };
  const here = readingsAtStop(stop, readings).sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  const misses = residuals(input, here);
  if (misses.length < FIT_MIN_RESIDUALS) return { kind: 'too-few' };
  const rmsPct = rms(misses);
  return rmsPct > DISAGREEMENT_RMS_PCT ? { kind: 'disagrees', rmsPct } : { kind: 'agrees', rmsPct };
}
