// Peukert's law (Peukert 1897; CHECK-VALUES §7) applied to the current while each load runs, and a lead-acid
// capacity rated at the 20-hour rate taken without a second discharge-efficiency cut.
import { describe, expect, it } from 'vitest';
import { CHEMISTRY, peukertFactor, peukertRuntimeH, pvwattsDcW, simulateTrip } from '@/shared/engine';
import type { ApplianceInput, EngineInputDraft } from '@/shared/schemas';
import { simpleTrip } from './trip-builder';

/** A flooded 100 Ah 12 V bank (k 1.25) with one DC load and no sources, for `hours`. */
function floodedWith(load: ApplianceInput, hours = 1): EngineInputDraft {
  const t = simpleTrip({ capacityAh: 100, appliances: [load] });
  const end = new Date(Date.parse('2027-06-21T00:00Z') + hours * 3_600_000).toISOString();
  return {
    ...t,
    trip: { ...t.trip, stops: t.trip.stops.map((s) => ({ ...s, departAt: end })) },
    rig: { ...t.rig, battery: { chemistry: 'flooded', capacityAh: 100, nominalV: 12, reservePct: 0 } },
  };
}

const removedWh = (input: EngineInputDraft): number => {
  const r = simulateTrip(input);
  return 1200 - (r.ledger.at(-1)?.storedWh ?? 0);
};

describe('Peukert arithmetic (Peukert 1897; CHECK-VALUES §7, S/C)', () => {
  // 100 Ah rated at 20 h, k 1.2: t = 20·(100/(20·I))^1.2.
  it.each([
    [0.05, 5, 20],
    [0.2, 20, 3.789],
    [1, 100, 0.5493],
  ])('when a 100 Ah bank (k 1.2) is drawn at %s C (%d A), then it runs %f h', (_c, amps, hours) => {
    expect(peukertRuntimeH(100, 20, 1.2, amps)).toBeCloseTo(hours, 3);
    // The walk's factor gives the same run time: the charge removed per amp-hour delivered.
    expect(100 / (amps * peukertFactor(amps, 100, 1.2))).toBeCloseTo(hours, 3);
  });

  it.each([
    [0.05, 60, 1],
    [0.2, 240, 1],
    [1, 1200, 0.25],
  ])(
    'when a flooded 100 Ah, 12 V bank carries a steady %s C (%s W) for %s h, then it loses capacity × time ÷ Peukert run time',
    (_c, watts, hours) => {
      const load: ApplianceInput = {
        id: 'l',
        name: 'Load',
        circuit: 'dc',
        runningW: watts,
        schedule: { kind: 'always' },
      };
      const runtimeH = peukertRuntimeH(100, 20, CHEMISTRY.flooded.peukertK, watts / 12);
      expect(removedWh(floodedWith(load, hours))).toBeCloseTo((1200 * hours) / runtimeH, 6);
    },
  );
});

describe('Peukert on the current while each load runs', () => {
  it('when a 1,200 W DC load runs a third of each hour, then its 400 Wh cost the factor for 100 A, not for the 33 A average', () => {
    // Arithmetic (CHECK-VALUES §7, C): the exponent applies to the running current.
    const load: ApplianceInput = {
      id: 'ac',
      name: 'Cycling load',
      circuit: 'dc',
      runningW: 1200,
      dutyCycle: 1 / 3,
      schedule: { kind: 'always' },
    };
    const k = CHEMISTRY.flooded.peukertK;
    const removed = removedWh(floodedWith(load));
    expect(removed).toBeCloseTo(400 * peukertFactor(100, 100, k), 6);
    expect(removed).toBeGreaterThan(400 * peukertFactor(100 / 3, 100, k) * 1.2);
  });

  it('when a 1,300 W air conditioner cycles 20 minutes an hour through the inverter on a 200 Ah flooded bank, then the factor is that of its running current (about 121 A)', () => {
    const t = simpleTrip({ capacityAh: 200, inverter: true });
    const input: EngineInputDraft = {
      ...t,
      trip: {
        ...t.trip,
        stops: t.trip.stops.map((s) => ({ ...s, departAt: '2027-06-21T01:00Z' })),
      },
      rig: { ...t.rig, battery: { chemistry: 'flooded', capacityAh: 200, nominalV: 12, reservePct: 0 } },
      appliances: [
        {
          id: 'ac',
          name: 'Air conditioner',
          circuit: 'ac',
          runningW: 1300,
          dutyCycle: 1 / 3,
          schedule: { kind: 'always' },
        },
      ],
    };
    const r = simulateTrip(input);
    const row = r.ledger[0];
    const dcWh = (row?.acLoadWh ?? 0) + (row?.inverterLossWh ?? 0);
    const removed = 2400 - (row?.storedWh ?? 0);
    const runningA = pvwattsDcW(1300, 2000, 0.9) / 12; // through the 2,000 W inverter's curve: about 121 A
    expect(removed / dcWh).toBeCloseTo(peukertFactor(runningA, 200, CHEMISTRY.flooded.peukertK), 6);
    expect(removed / dcWh).toBeGreaterThan(1.2 * peukertFactor(runningA / 3, 200, CHEMISTRY.flooded.peukertK));
  });
});

describe('lead-acid capacity at its 20-hour rating', () => {
  it.each(['agm', 'flooded'] as const)(
    'when a %s bank carries its 20-hour current, then it gives its rated energy: no discharge-efficiency cut on top',
    (chemistry) => {
      const load: ApplianceInput = { id: 'l', name: 'Load', circuit: 'dc', runningW: 60, schedule: { kind: 'always' } };
      const input = floodedWith(load, 10);
      expect(removedWh({ ...input, rig: { ...input.rig, battery: { ...input.rig.battery, chemistry } } })).toBeCloseTo(
        600,
        6,
      );
    },
  );

  it('when the lead-acid presets are read, then their whole round trip (78–85 %, common practice) is on the charge side', () => {
    for (const c of ['agm', 'flooded'] as const) {
      expect(CHEMISTRY[c].dischargeEfficiency).toBe(1);
      expect(CHEMISTRY[c].chargeEfficiency).toBeGreaterThanOrEqual(0.78);
      expect(CHEMISTRY[c].chargeEfficiency).toBeLessThanOrEqual(0.85);
    }
  });
});
