// Calibration benchmark: how long "Calibrate from check-ins" fits a stop's sky openness and load scale, run straight
// through, and the longest the screen's sliced run holds the thread at once (one walk of the plan between pauses).
// Reported, not asserted. Readings: every six hours at the trip's second stop, walked by the engine under known values.
import { calibrate, calibrationSteps, withCalibration, type CalibrationReading } from '../shared/engine/calibrate';
import { DEMO_TRIPS, simulateParsed } from '../shared/engine';
import { engineInputSchema, type EngineInput, type EngineInputDraft } from '../shared/schemas/engine-input';
import { largestPlan } from '../tests/factories/largest-plan';
import { benchTrip } from '../tests/shared/golden-inputs';
import { loadAverage as load } from './load-average';

const STOP = 1;

function readingsFor(truth: EngineInput): CalibrationReading[] {
  const stop = truth.trip.stops[STOP];
  if (!stop) return [];
  const first = new Date(Math.ceil(Date.parse(stop.arriveAt) / 3_600_000) * 3_600_000).toISOString();
  const walked = simulateParsed({ ...truth, startState: { at: first, socPct: 80, propaneKg: null } });
  const start = walked.ledger.findIndex((row) => Date.parse(row.utc) >= Date.parse(first));
  const end = Date.parse(stop.departAt);
  const out: CalibrationReading[] = [{ at: first, socPct: 80, propane: [], harvestWh: null }];
  for (let i = start + 6; walked.ledger[i] && Date.parse(walked.ledger[i]?.utc ?? '') < end; i += 6)
    out.push({
      at: walked.ledger[i]?.utc ?? '',
      socPct: walked.ledger[i - 1]?.socPct ?? 0,
      propane: [],
      harvestWh: null,
    });
  return out;
}

function measure(name: string, draft: EngineInputDraft): void {
  const plan = engineInputSchema.parse({ ...draft, options: { ...draft.options, skyBand: false } });
  const readings = readingsFor(withCalibration(plan, STOP, 40, 0.7));
  const times: number[] = [];
  for (let run = 0; run < 3; run++) {
    const t = performance.now();
    calibrate(plan, STOP, readings);
    times.push(performance.now() - t);
  }
  let longest = 0;
  let pauses = 0;
  const steps = calibrationSteps(plan, STOP, readings);
  for (let t = performance.now(), next = steps.next(); ; next = steps.next()) {
    const now = performance.now();
    longest = Math.max(longest, now - t);
    t = now;
    if (next.done) break;
    pauses++;
  }
  const median = times.sort((a, b) => a - b)[1] ?? Number.NaN;
  console.log(
    `${name}: ${readings.length} readings, fit median ${median.toFixed(0)} ms, ${pauses} pauses, longest slice ${longest.toFixed(1)} ms`,
  );
}

console.log(`load average before: ${load()}`);
measure('Highland loop (demo, 8 days)', DEMO_TRIPS.highlandLoop);
measure('30 days, 40 appliances', benchTrip(30, 40));
measure('largest plan the API accepts', largestPlan());
console.log(`load average after: ${load()}`);
