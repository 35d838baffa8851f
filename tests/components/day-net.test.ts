// A day's net counts every source: all sources in − use − losses, which is what the battery gained less what it could
// not supply; a day that ends full is never shown as a warning.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solarReadout } from '@/components/budget/solar-readout';
import { netIsWarning } from '@/components/ledger/day-net';
import { findHeadroom, simulateTrip } from '@/shared/engine';
import { fiveNightTrip } from '@/tests/fixtures/five-night-trip';
import { leverLine } from '@/components/budget/headroom-lines';
import type { SimulationResult } from '@/shared/engine/result-types';
import { build, tripArb } from '@/tests/factories/random-plan';
import { GOLDEN_CASES } from '../shared/golden-inputs';

function expectNetIsStoredChange(r: SimulationResult, startStoredWh: number): void {
  let stored = startStoredWh;
  for (const day of r.days) {
    const rows = r.ledger.filter((row, i) => i >= 0 && dayOf(r, i) === day.dayIndex);
    const end = rows[rows.length - 1]?.storedWh ?? stored;
    expect(day.sourcesWh).toBeCloseTo(day.harvestWh + day.hookupWh + day.vehicleWh + day.generatorWh, 6);
    expect(day.netWh).toBeCloseTo(end - stored - day.energyShortWh, 3);
    stored = end;
  }
}

/** The day index of ledger row i, by walking the day sheets' order (rows of one day are consecutive). */
function dayOf(r: SimulationResult, i: number): number {
  let n = 0;
  let day = -1;
  let last = '';
  for (let k = 0; k <= i; k++) {
    const local = r.ledger[k]?.local.slice(0, 10) ?? '';
    if (local !== last) {
      last = local;
      day = r.days[n]?.dayIndex ?? day;
      n++;
    }
  }
  return day;
}

describe('day net', () => {
  it('when the highland demo is simulated, then each day’s net is the battery’s change less what ran short', () => {
    const input = GOLDEN_CASES['demo-highland-loop'];
    if (!input) throw new Error('missing case');
    const r = simulateTrip(input);
    expectNetIsStoredChange(r, r.headline.capacityWh * ((input.rig.battery.initialSocPct ?? 100) / 100));
  });

  it('when any random plan is simulated, then each day’s net is the battery’s change less what ran short', () => {
    fc.assert(
      fc.property(tripArb, (t) => {
        const r = simulateTrip(build(t));
        expectNetIsStoredChange(r, r.headline.capacityWh * (t.initialSocPct / 100));
      }),
      { numRuns: 30, seed: 13 },
    );
  });

  it.each([
    [{ netWh: -2303, endSocPct: 100 }, false],
    [{ netWh: -2303, endSocPct: 99.6 }, false],
    [{ netWh: -2303, endSocPct: 42 }, true],
    [{ netWh: 500, endSocPct: 42 }, false],
  ])('when a day is %o, then a warning is %s', (day, want) => {
    expect(netIsWarning(day)).toBe(want);
  });
});

describe('chart readout solar', () => {
  it('when the battery is full at midday, then the readout gives what was available and wasted and says why', () => {
    const r = solarReadout({ solarAvailableWh: 820, solarUsedWh: 16, solarWastedWh: 804, socPct: 100 });
    expect(r).toEqual({ availableWh: 820, usedWh: 16, wastedWh: 804, batteryFull: true });
  });
  it('when the battery has room, then little solar used is not put down to a full battery', () => {
    expect(solarReadout({ solarAvailableWh: 20, solarUsedWh: 20, solarWastedWh: 0, socPct: 60 }).batteryFull).toBe(
      false,
    );
  });
});

describe('what it would take', () => {
  it('when the five-night trip is searched, then every lever gives its lowest charge or says why it cannot fix', () => {
    const h = findHeadroom(fiveNightTrip);
    expect(h.needed).toBe(true);
    for (const lever of h.levers) {
      const line = leverLine(lever);
      if (lever.status === 'found') expect(line.text).toMatch(/lowest charge then \d+ %$/);
      if (lever.status === 'cannot-fix') expect(line.text).toMatch(/^cannot fix: .+\(lowest \d+ %\)$/);
    }
  });
});
