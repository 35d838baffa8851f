// Cold batteries hold less: the deliverable share of the rated capacity by the temperature of the battery's place
// (typical curves per chemistry, CHECK-VALUES §7, M), and the no-charging-below-0 °C rule for lithium.
import { describe, expect, it } from 'vitest';
import { coldCapacityShare, simulateTrip } from '@/shared/engine';
import type { ApplianceInput, EngineInputDraft } from '@/shared/schemas';
import { simpleTrip } from './trip-builder';

describe('capacity in the cold (common practice, CHECK-VALUES §7, M)', () => {
  it.each([
    ['agm', 0, 0.8],
    ['flooded', -20, 0.65],
    ['lifepo4', 0, 0.9],
    ['lifepo4', -20, 0.7],
    ['agm', 25, 1],
    ['lifepo4', 35, 1],
  ] as const)('when a %s battery is at %d °C, then it delivers %f of its rating', (chem, t, share) => {
    expect(coldCapacityShare(chem, t)).toBeCloseTo(share, 12);
  });

  it('when the battery cools, then what it delivers never rises', () => {
    for (const chem of ['agm', 'lifepo4'] as const) {
      let prev = 1;
      for (let t = 40; t >= -40; t -= 1) {
        const s = coldCapacityShare(chem, t);
        expect(s).toBeLessThanOrEqual(prev);
        prev = s;
      }
    }
  });
});

/** An AGM bank drained by a steady 100 W with no sources, in a frost (−10 °C all day), inside or outside. */
function frosty(inside: boolean, heater: boolean): EngineInputDraft {
  const t = simpleTrip({
    lat: 70,
    lon: 20,
    arrive: '2027-12-20T00:00Z',
    depart: '2027-12-23T00:00Z',
    lowC: -10,
    highC: -10,
    capacityAh: 100,
  });
  const appliances: ApplianceInput[] = [
    { id: 'load', name: 'Load', circuit: 'dc', runningW: 100, schedule: { kind: 'always' } },
  ];
  if (heater)
    appliances.push({
      id: 'heater',
      name: 'Heater',
      circuit: 'fuel',
      runningW: 0,
      heatInputW: 5000,
      schedule: { kind: 'thermostat', mode: 'heating', setPointC: 20 },
    });
  return {
    ...t,
    rig: {
      ...t.rig,
      battery: { chemistry: 'agm', capacityAh: 100, nominalV: 12, reservePct: 0, heatedSpace: inside },
      propaneTanks: [{ propaneKg: 50 }],
    },
    appliances,
  };
}

describe('a cold battery in the walk', () => {
  it('when an AGM bank sits outside at −10 °C, then it runs short with 27.5 % of its charge held back, and the ledger says so', () => {
    const r = simulateTrip(frosty(false, false));
    const held = 1 - coldCapacityShare('agm', -10); // 0.275
    expect(Math.min(...r.ledger.map((row) => row.socPct))).toBeCloseTo(held * 100, 6);
    expect(r.headline.energyShortWh).toBeGreaterThan(0);
    expect(r.ledger[0]?.batteryC).toBe(-10);
    expect(r.ledger[0]?.batteryCapacityPct).toBeCloseTo(72.5, 9);
  });

  it('when the same bank sits inside a heated cabin, then it is at the cabin’s 20 °C and delivers far more before running short', () => {
    const outside = simulateTrip(frosty(false, true)).headline.energyShortWh;
    const inside = simulateTrip(frosty(true, true));
    expect(inside.ledger[5]?.batteryC).toBeCloseTo(20, 9);
    expect(inside.ledger[5]?.batteryCapacityPct).toBeCloseTo(100 * coldCapacityShare('agm', 20), 9);
    expect(inside.headline.energyShortWh).toBeLessThan(outside);
  });

  it('when a lithium battery sits inside an unheated cabin in a frost, then the cabin is below 0 °C too and charging is held off', () => {
    const t = simpleTrip({ solarW: 400, initialSocPct: 50, lowC: -12, highC: -6 });
    const r = simulateTrip({ ...t, rig: { ...t.rig, battery: { ...t.rig.battery, heatedSpace: true } } });
    expect(r.flags.some((f) => f.kind === 'cold-charge-blocked')).toBe(true);
  });
});
