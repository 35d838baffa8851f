// When the check-ins at a stop disagree with the plan enough to offer a calibration: readings the plan itself would
// give agree, readings off by more than the threshold (or from a rig whose loads ran harder) disagree, and too few
// readings offer nothing.
import { describe, expect, it } from 'vitest';
import { DEMO_TRIPS, simulateParsed } from '@/shared/engine';
import { withCalibration, type CalibrationReading } from '@/shared/engine/calibrate';
import { calibrationNeed, DISAGREEMENT_RMS_PCT, readingsAtStop } from '@/shared/engine/calibration-need';
import { engineInputSchema, type EngineInput } from '@/shared/schemas';

const FOREST = 1;
const FIRST_AT = '2027-09-14T17:00:00.000Z'; // Tue 18:00 at the pinewood, an hour of the plan's grid
const plan = engineInputSchema.parse(DEMO_TRIPS.highlandLoop);

/** Readings every three hours at the forest pitch, walked by the engine from 95 % at FIRST_AT under `truth`. */
function readingsFrom(truth: EngineInput): CalibrationReading[] {
  const result = simulateParsed({ ...truth, startState: { at: FIRST_AT, socPct: 95, propaneKg: null } });
  const start = result.ledger.findIndex((row) => row.utc === FIRST_AT);
  const out: CalibrationReading[] = [{ at: FIRST_AT, socPct: 95, propane: [], harvestWh: null }];
  for (let i = start + 3; i < start + 13; i += 3) {
    const row = result.ledger[i];
    const socPct = result.ledger[i - 1]?.socPct;
    if (row && socPct !== undefined) out.push({ at: row.utc, socPct, propane: [], harvestWh: null });
  }
  return out;
}

const shifted = (readings: CalibrationReading[], by: number) =>
  readings.map((r, i) => (i === 0 ? r : { ...r, socPct: r.socPct - by }));

describe('disagreement between check-ins and the plan', () => {
  const own = readingsFrom(plan);

  it('when the plan is walked to make the readings, then they sit well inside the charge range', () => {
    // Offsets below must not push a reading past empty or full, where the residual would no longer be the offset.
    for (const r of own) expect(r.socPct).toBeGreaterThan(DISAGREEMENT_RMS_PCT * 2);
    expect(own.length).toBe(5);
  });

  it.each([
    ['the readings are what the plan says', 0, 'agrees'],
    ['every reading is 4 % below the plan', 4, 'agrees'],
    ['every reading is 6 % below the plan', 6, 'disagrees'],
    ['every reading is 6 % above the plan', -6, 'disagrees'],
  ])('when %s, then the stop %s', (_what, by, kind) => {
    const need = calibrationNeed(plan, FOREST, shifted(own, by));
    expect(need.kind).toBe(kind);
    if (need.kind !== 'too-few') expect(need.rmsPct).toBeCloseTo(Math.abs(by), 6);
  });

  it('when the loads ran half as hard again as planned, then the stop disagrees', () => {
    const need = calibrationNeed(plan, FOREST, readingsFrom(withCalibration(plan, FOREST, 5.5, 1.5)));
    expect(need.kind).toBe('disagrees');
  });

  it('when the stop has two readings and no harvest (one residual for two numbers), then there is too little to fit', () => {
    expect(calibrationNeed(plan, FOREST, shifted(own, 20).slice(0, 2))).toEqual({ kind: 'too-few' });
  });

  it('when the readings were taken at another stop, then they do not count for this one', () => {
    const coast = 2;
    const stop = plan.trip.stops[coast];
    if (!stop) throw new Error('no coastal stop');
    expect(readingsAtStop(stop, own)).toEqual([]);
    expect(calibrationNeed(plan, coast, shifted(own, 20))).toEqual({ kind: 'too-few' });
  });
});
