// Random plans for property tests (fast-check): two stops and a drive, a random rig and up to six routine loads.
import fc from 'fast-check';
import type { ApplianceInput, EngineInputDraft } from '@/shared/schemas';

export const applianceArb = fc.record({
  circuit: fc.constantFrom('ac' as const, 'dc' as const),
  runningW: fc.integer({ min: 1, max: 1800 }),
  dutyCycle: fc.double({ min: 0.1, max: 1, noNaN: true }),
  startHour: fc.integer({ min: 0, max: 23 }),
  minutes: fc.integer({ min: 5, max: 600 }),
});

export const tripArb = fc.record({
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
  timeZone: fc.constantFrom('UTC', 'Europe/London', 'America/Denver', 'Australia/Sydney', 'Pacific/Auckland'),
});

export type RandomPlan = typeof tripArb extends fc.Arbitrary<infer T> ? T : never;

export function build(t: RandomPlan): EngineInputDraft {
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
    timeZone: t.timeZone,
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
