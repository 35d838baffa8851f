// The re-forecast from a check-in must be the trip that remains, simulated afresh from the reading: the same
// numbers, hour for hour, as a new plan that starts where and when the reading was taken.
import { describe, expect, it } from 'vitest';
import { simulateParsed } from '@/shared/engine';
import { latestReading, propaneAfterReading, reforecastFrom, type Reading } from '@/shared/engine/reforecast';
import { engineInputSchema, type EngineInput, type RoutineWindow } from '@/shared/schemas';
import { GOLDEN_CASES } from './golden-inputs';

const HOUR_MS = 3_600_000;
/** A day number past the end of any trip: a window of a day already behind us never runs again. */
const NO_DAY = 119;

function shiftWindows(windows: readonly RoutineWindow[], days: number): RoutineWindow[] {
  return windows.map((w) => {
    if (w.days.kind !== 'trip-days') return w;
    const ahead = w.days.dayIndexes.map((d) => d - days).filter((d) => d >= 0);
    return { ...w, days: { kind: 'trip-days', dayIndexes: ahead.length > 0 ? ahead : [NO_DAY] } };
  });
}

/** The trip from `at` (inside stop `stopIndex`) on, starting from the reading, with trip days renumbered. */
function remainingTrip(input: EngineInput, at: string, stopIndex: number, daysGone: number, reading: Reading) {
  const stops = input.trip.stops.slice(stopIndex).map((s, i) => (i === 0 ? { ...s, arriveAt: at } : s));
  const tanks = input.rig.propaneTanks.map((tank, i) => {
    const read = reading.propane.find((c) => c.tank === i);
    return read
      ? { ...tank, fillPct: ((propaneAfterReading([tank], [{ ...read, tank: 0 }]) ?? 0) / tank.propaneKg) * 100 }
      : tank;
  });
  const generator = input.rig.generator;
  return engineInputSchema.parse({
    ...input,
    trip: { ...input.trip, stops, drives: input.trip.drives.slice(stopIndex) },
    rig: {
      ...input.rig,
      battery: { ...input.rig.battery, initialSocPct: reading.socPct },
      propaneTanks: tanks,
      generator:
        generator?.mode.kind === 'routine'
          ? { ...generator, mode: { ...generator.mode, windows: shiftWindows(generator.mode.windows, daysGone) } }
          : generator,
    },
    appliances: input.appliances.map((a) => {
      const s = a.schedule;
      if (s.kind === 'routine') return { ...a, schedule: { ...s, windows: shiftWindows(s.windows, daysGone) } };
      if (s.kind === 'thermostat' && s.activeWindows)
        return { ...a, schedule: { ...s, activeWindows: shiftWindows(s.activeWindows, daysGone) } };
      return a;
    }),
  });
}

/**
 * A reading on the hour a day into the first stop that stays a day and a half or longer. The first such stop: a
 * routine window of a trip day before the reading that runs on past midnight cannot be written into a plan that
 * starts at the reading (a plan names no day before its first), so the fresh plan could not hold it.
 */
function readingTime(input: EngineInput): { at: string; stopIndex: number } {
  const t0 = Date.parse(input.trip.stops[0]?.arriveAt ?? '');
  const stopIndex = input.trip.stops.findIndex((s) => Date.parse(s.departAt) - Date.parse(s.arriveAt) >= 36 * HOUR_MS);
  const stop = input.trip.stops[stopIndex];
  if (!stop) throw new Error('no stop long enough');
  const atMs = t0 + Math.ceil((Date.parse(stop.arriveAt) + 20 * HOUR_MS - t0) / HOUR_MS) * HOUR_MS;
  return { at: new Date(atMs).toISOString(), stopIndex };
}

const COMPARED = [
  'socPct',
  'storedWh',
  'propaneLeftKg',
  'solarUsedWh',
  'acLoadWh',
  'dcLoadWh',
  'energyShortWh',
  'generatorH',
] as const;

describe('re-forecast from a check-in', () => {
  for (const [name, draft] of Object.entries(GOLDEN_CASES)) {
    it(`when ${name} is re-forecast from a reading a day into a stop, then it equals a fresh simulation of the rest of the trip`, () => {
      const input = engineInputSchema.parse(draft);
      const { at, stopIndex } = readingTime(input);
      const reading: Reading = {
        at,
        socPct: 57.5,
        propane: input.rig.propaneTanks.length > 0 ? [{ tank: 0, reading: { kind: 'fraction', share: 0.4 } }] : [],
      };
      const plan = simulateParsed(input);
      const re = reforecastFrom(input, reading);
      if (!re) throw new Error('reading after the trip');
      const dayOfReading = plan.days.find((d) => d.date === re.fromLocal.slice(0, 10));
      const fresh = simulateParsed(remainingTrip(input, at, stopIndex, dayOfReading?.dayIndex ?? 0, reading));

      expect(re.result.ledger.length - re.index).toBe(fresh.ledger.length);
      expect(re.result.ledger[re.index]?.utc).toBe(fresh.ledger[0]?.utc);
      for (let k = 0; k < fresh.ledger.length; k++) {
        const got = re.result.ledger[re.index + k];
        const want = fresh.ledger[k];
        for (const field of COMPARED)
          expect(got?.[field], `${field} at hour ${k}`).toBeCloseTo(want?.[field] ?? NaN, 9);
      }
      expect(re.result.headline.lowestSocPct).toBeCloseTo(fresh.headline.lowestSocPct, 9);
      expect(re.result.headline.lowestAtUtc).toBe(fresh.headline.lowestAtUtc);
      expect(re.result.headline.energyShortWh).toBeCloseTo(fresh.headline.energyShortWh, 6);
      expect(re.result.headline.generatorHours).toBeCloseTo(fresh.headline.generatorHours, 9);
      // The reading differs from the plan's own state there, so the forecast is not the plan's.
      expect(re.result.ledger[re.index]?.socPct).not.toBeCloseTo(plan.ledger[re.index]?.socPct ?? NaN, 3);
      // The hours before the reading are the plan's.
      expect(re.result.ledger[re.index - 1]?.socPct).toBe(plan.ledger[re.index - 1]?.socPct);
    });
  }

  it('when readings are listed out of order, then the latest by its time is walked from', () => {
    const readings = [
      { at: '2027-09-14T18:00+01:00', socPct: 68 },
      { at: '2027-09-15T08:00+01:00', socPct: 55 },
      { at: '2027-09-13T20:00+01:00', socPct: 90 },
    ];
    expect(latestReading(readings)?.socPct).toBe(55);
    expect(latestReading([])).toBeUndefined();
  });

  it('when only one cylinder is read, then the others count as they were at the start', () => {
    const tanks = [
      { name: 'A', propaneKg: 6, fillPct: 100 },
      { name: 'B', propaneKg: 6, fillPct: 50 },
    ];
    expect(propaneAfterReading(tanks, [{ tank: 0, reading: { kind: 'weight', kg: 2.5 } }])).toBeCloseTo(5.5, 12);
    expect(propaneAfterReading(tanks, [{ tank: 1, reading: { kind: 'full' } }])).toBeCloseTo(12, 12);
    expect(propaneAfterReading(tanks, [])).toBeNull();
  });

  it('when the reading falls after the trip, then there is nothing to re-forecast', () => {
    const input = engineInputSchema.parse(GOLDEN_CASES['demo-highland-loop']);
    expect(reforecastFrom(input, { at: '2030-01-01T00:00Z', socPct: 50, propane: [] })).toBeUndefined();
  });
});
