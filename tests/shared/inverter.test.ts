// The inverter's part-load curve (PVWatts v5, Dobos 2014; CHECK-VALUES §9, C) and how the rig keeps it on.
import { describe, expect, it } from 'vitest';
import { inverterDcDrawW, pvwattsAcW, pvwattsDcW, simulateTrip } from '@/shared/engine';
import type { EngineInputDraft } from '@/shared/schemas';
import type { InverterInput } from '@/shared/schemas/rig';
import { simpleTrip } from './trip-builder';

describe('PVWatts v5 part-load curve (pvlib test_pvwatts_*, C)', () => {
  it.each([
    [90, 85.58556604752516],
    [50, 47.60843624],
    [100, 95],
  ])('when P_dc0 100 W and η_nom 0.95 take %d W of DC, then they give %f W of AC', (dc, ac) => {
    expect(pvwattsAcW(dc, 100, 0.95)).toBeCloseTo(ac, 8);
  });

  it('when the AC output is asked for, then the DC input found gives back that output on the curve', () => {
    for (const ac of [5, 40, 75, 500, 1500, 2000])
      expect(pvwattsAcW(pvwattsDcW(ac, 2000, 0.9), 2000 / 0.9, 0.9)).toBeCloseTo(ac, 9);
  });

  it('when a 2,000 W inverter (90 % nominal) feeds 40–75 W, then it takes 10–30 % more than the flat 90 % figure', () => {
    // Light loads: off-grid inverters run well below their peak efficiency (common practice, CHECK-VALUES §9).
    for (const ac of [40, 75]) {
      const extra = pvwattsDcW(ac, 2000, 0.9) / (ac / 0.9) - 1;
      expect(extra).toBeGreaterThan(0.1);
      expect(extra).toBeLessThan(0.3);
    }
    // Near its rating it is back at its nominal efficiency.
    expect(2000 / pvwattsDcW(2000, 2000, 0.9)).toBeCloseTo(0.9, 3);
  });
});

/** 48 h with a TV 19:00–21:00 and the inverter kept as given (idle 20 W, no other draw). */
function kept(inverter: InverterInput): EngineInputDraft {
  const t = simpleTrip({ inverter: true, capacityAh: 400, depart: '2027-06-23T00:00Z' });
  return {
    ...t,
    rig: { ...t.rig, inverter: { ...inverter, ratedW: 2000, efficiency: 0.9, idleW: 20 } },
    appliances: [
      {
        id: 'tv',
        name: 'TV',
        circuit: 'ac',
        runningW: 100,
        schedule: { kind: 'routine', windows: [{ startHour: 19, minutes: 120 }] },
      },
    ],
  };
}

const inverterLossWh = (input: EngineInputDraft): number =>
  simulateTrip(input).ledger.reduce((s, row) => s + row.inverterLossWh, 0);

describe('how the inverter is kept', () => {
  const loss100 = pvwattsDcW(100, 2000, 0.9) - 100;

  it('when it is on only for AC loads, then idle is drawn in the TV hours only', () => {
    expect(inverterLossWh(kept({ ratedW: 2000, mode: 'on-demand' }))).toBeCloseTo(4 * (loss100 + 20), 6);
  });

  it('when it is kept on all the time, then idle is drawn every hour', () => {
    expect(inverterLossWh(kept({ ratedW: 2000, mode: 'always' }))).toBeCloseTo(4 * loss100 + 48 * 20, 6);
  });

  it('when it is kept on 07:00–23:00, then idle is drawn in those hours (and the TV hours lie inside them)', () => {
    const loss = inverterLossWh(kept({ ratedW: 2000, mode: 'scheduled', onHours: { startHour: 7, endHour: 23 } }));
    expect(loss).toBeCloseTo(4 * loss100 + 2 * 16 * 20, 6);
  });

  it('when the set hours cross midnight, then they count on both sides of it', () => {
    const loss = inverterLossWh(kept({ ratedW: 2000, mode: 'scheduled', onHours: { startHour: 22, endHour: 2 } }));
    // 22:00–02:00 on both nights is 8 h (the trip starts at 00:00 on the first day: 00–02 and 22–24, twice).
    expect(loss).toBeCloseTo(4 * (loss100 + 20) + 8 * 20, 6);
  });

  it('when the idle draw of a scheduled inverter is asked for, then it is the curve plus idle for the share on', () => {
    expect(inverterDcDrawW({ ratedW: 2000, efficiency: 0.9, idleW: 20 }, 0, 0.5)).toBe(10);
  });
});
