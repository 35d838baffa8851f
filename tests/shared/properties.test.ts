// Property tests (fast-check): energy balance, bounds, monotonicity, determinism, over random trips.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { simulateTrip } from '@/shared/engine';
import type { ApplianceInput, EngineInputDraft } from '@/shared/schemas';

const RUNS = 40;

const applianceArb = fc.record({
  circuit: fc.constantFrom('ac' as const, 'dc' as const),
  runningW: fc.integer({ min: 1, max: 1800 }),
  dutyCycle: fc.double({ min: 0.1, max: 1, noNaN: true }),
  startHour: fc.integer({ min: 0, max: 23 }),
  minutes: fc.integer({ min: 5, max: 600 }),
});

const tripArb = fc.record({
  lat: fc.double({ min: -60, max: 65, noNaN: true }),
  lon: fc.double({ min: -170, max: 170, noNaN: true }),
  month: fc.integer({ min: 1, max: 12 }),
  days: fc.integer({ min: 1, max: 4 }),
  capacityAh: fc.integer({ min: 50, max: 600 }),
  chemistry: fc.constantFrom('lifepo4' as const, 'agm' as const, 'flooded' as const),
  initialSocPct: fc.integer({ min: 5, max: 100 }),
  solarW: fc.integer({ min: 0, max: 1500 }),
  tilted: fc.boolean(),
  sky: fc.constantFrom('clear' as const, 'hazy' as const, 'broken-cloud' as const, 'overcast' as const),
  exposure: fc.constantFrom('open' as const, 'light-cover' as const, 'partial-shade' as const, 'deep-forest' as const),
  hookup: fc.boolean(),
  lowC: fc.integer({ min: -10, max: 25 }),
  appliances: fc.array(applianceArb, { maxLength: 6 }),
  generator: fc.boolean(),
});

type Arb = typeof tripArb extends fc.Arbitrary<infer T> ? T : never;

function build(t: Arb): EngineInputDraft {
  const arrive = `2027-${String(t.month).padStart(2, '0')}-10T10:00Z`;
  const mid = new Date(Date.parse(arrive) + t.days * 86_400_000).toISOString();
  const next = new Date(Date.parse(mid) + 3 * 3_600_000).toISOString();
  const depart = new Date(Date.parse(next) + t.days * 86_400_000).toISOString();
  const appliances: ApplianceInput[] = t.appliances.map((a, i) => ({
    id: `a${i}`,
    name: `Load ${i}`,
    circuit: a.circuit,
    runningW: a.runningW,
    dutyCycle: a.dutyCycle,
    schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: a.startHour, minutes: a.minutes }] },
  }));
  const stop = (name: string, arriveAt: string, departAt: string, hookup: boolean) => ({
    name,
    lat: t.lat,
    lon: t.lon,
    timeZone: 'UTC',
    arriveAt,
    departAt,
    exposure: { kind: 'preset' as const, preset: t.exposure },
    skyOutlook: t.sky,
    lowC: t.lowC,
    highC: t.lowC + 10,
    hookup: hookup ? { amps: 10, volts: 230 } : null,
  });
  return {
    trip: {
      name: 'Random',
      stops: [stop('A', arrive, mid, false), stop('B', next, depart, t.hookup)],
      drives: [{ hoursOnRoad: 2 }],
    },
    rig: {
      name: 'Random rig',
      battery: { chemistry: t.chemistry, capacityAh: t.capacityAh, nominalV: 12.8, initialSocPct: t.initialSocPct },
      solarArrays:
        t.solarW > 0
          ? [
              {
                ratedW: t.solarW,
                mounting: t.tilted ? 'tilted' : 'flat',
                tiltDeg: t.tilted ? 30 : 0,
                azimuthDeg: t.lat >= 0 ? 180 : 0,
              },
            ]
          : [],
      controller: t.solarW > 0 ? { kind: 'mppt', maxAmps: 60 } : null,
      inverter: { ratedW: 2000, efficiency: 0.9, idleW: 10 },
      shoreCharger: { amps: 20 },
      vehicleCharger: { kind: 'dc-dc', amps: 20 },
      generator: t.generator
        ? { ratedW: 2000, fuel: 'petrol', mode: { kind: 'rule', startBelowSocPct: 40, stopAboveSocPct: 90 } }
        : null,
    },
    appliances,
    options: { skyBand: false },
  };
}

function withBattery(d: EngineInputDraft, capacityAh: number): EngineInputDraft {
  return { ...d, rig: { ...d.rig, battery: { ...d.rig.battery, capacityAh } } };
}

const noGenerator = tripArb.map((t) => ({ ...t, generator: false }));

describe('engine invariants', () => {
  it('when any trip is walked, then each hour’s energy balance closes within 0.1 %', () => {
    fc.assert(
      fc.property(tripArb, (t) => {
        const input = build(t);
        const r = simulateTrip(input);
        let prev = r.headline.capacityWh * (t.initialSocPct / 100);
        for (const row of r.ledger) {
          const inflow = row.solarUsedWh + row.vehicleWh + row.hookupWh + row.generatorWh + row.energyShortWh;
          const outflow =
            row.acLoadWh +
            row.dcLoadWh +
            row.inverterLossWh +
            row.chargerLossWh +
            row.batteryLossWh +
            (row.storedWh - prev);
          expect(Math.abs(inflow - outflow)).toBeLessThanOrEqual(1e-3 * Math.max(inflow, Math.abs(outflow), 1));
          prev = row.storedWh;
        }
      }),
      { numRuns: RUNS },
    );
  });

  it('when any trip is walked, then the state of charge stays within 0–100 % and nothing is NaN', () => {
    fc.assert(
      fc.property(tripArb, (t) => {
        const r = simulateTrip(build(t));
        for (const row of r.ledger) {
          expect(row.socPct).toBeGreaterThanOrEqual(0);
          expect(row.socPct).toBeLessThanOrEqual(100 + 1e-9);
          expect(Number.isFinite(row.storedWh + row.solarAvailableWh + row.acLoadWh)).toBe(true);
        }
      }),
      { numRuns: RUNS },
    );
  });

  it('when the battery grows, then the lowest charge never falls (no rule-driven generator)', () => {
    fc.assert(
      fc.property(noGenerator, fc.integer({ min: 1, max: 400 }), (t, extra) => {
        const base = simulateTrip(build(t)).headline.lowestSocPct;
        const bigger = simulateTrip(withBattery(build(t), t.capacityAh + extra)).headline.lowestSocPct;
        expect(bigger).toBeGreaterThanOrEqual(base - 1e-9);
      }),
      { numRuns: RUNS },
    );
  });

  it('when the solar array grows, then the lowest charge never falls (no rule-driven generator)', () => {
    fc.assert(
      fc.property(noGenerator, fc.integer({ min: 1, max: 1000 }), (t, extra) => {
        const base = simulateTrip(build(t)).headline.lowestSocPct;
        const more = simulateTrip(build({ ...t, solarW: t.solarW + extra })).headline.lowestSocPct;
        expect(more).toBeGreaterThanOrEqual(base - 1e-9);
      }),
      { numRuns: RUNS },
    );
  });

  it('when a load is removed, then the lowest charge never falls (no rule-driven generator)', () => {
    fc.assert(
      fc.property(
        noGenerator.filter((t) => t.appliances.length > 0),
        (t) => {
          const base = simulateTrip(build(t)).headline.lowestSocPct;
          const fewer = simulateTrip(build({ ...t, appliances: t.appliances.slice(1) })).headline.lowestSocPct;
          expect(fewer).toBeGreaterThanOrEqual(base - 1e-9);
        },
      ),
      { numRuns: RUNS },
    );
  });

  it('when the same input is simulated twice, then the output is identical', () => {
    fc.assert(
      fc.property(tripArb, (t) => {
        expect(JSON.stringify(simulateTrip(build(t)))).toBe(JSON.stringify(simulateTrip(build(t))));
      }),
      { numRuns: 20 },
    );
  });
});
