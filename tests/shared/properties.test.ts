// Property tests (fast-check): energy balance, bounds, monotonicity, determinism, over random trips.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { simulateTrip } from '@/shared/engine';
import type { EngineInputDraft } from '@/shared/schemas';
import { build, tripArb } from '@/tests/factories/random-plan';

const RUNS = 40;

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
