import { toBudgetResult } from '@/shared/budget-result';
import { describe, expect, it } from 'vitest';
import { headroomAim } from '@/components/budget/headroom-lines';
import type { HeadroomResult } from '@/shared/engine/headroom';
import { assumedSkyText, chanceHeadline, chanceYears, stopSkyText } from '@/components/budget/plan-chance-text';
import { socSeries } from '@/components/budget/soc-series';
import { DEMO_TRIPS, simulateTrip } from '@/shared/engine';
import type { PlanChance } from '@/shared/engine/result-types';

const chance: PlanChance = {
  years: 20,
  held: 17,
  median: { year: 2019, lowestSocPct: 54.4 },
  bad: { year: 2011, lowestSocPct: 31.2 },
  worst: { year: 2008, lowestSocPct: 18.6 },
  byYear: [],
};

describe('the chance the plan holds, in words', () => {
  it('when 17 of 20 years held, then the headline says so and names the median, bad and worst years', () => {
    expect(chanceHeadline(chance)).toBe('Holds in 17 of 20 past years');
    expect(chanceYears(chance)).toEqual([
      { label: 'Median year', year: 2019, lowest: '54%' },
      { label: 'A bad year (1 in 10)', year: 2011, lowest: '31%' },
      { label: 'Worst year', year: 2008, lowest: '19%' },
    ]);
  });

  it('when some stops have no record, then the count of assumed skies is given; none, no sentence', () => {
    expect(assumedSkyText({ sources: ['record', 'preset', 'record', 'preset'], assumedStops: 2 }, 4)).toBe(
      '2 of 4 stops use an assumed sky',
    );
    expect(assumedSkyText({ sources: ['preset', 'preset'], assumedStops: 2 }, 2)).toBe(
      'All 2 stops use an assumed sky',
    );
    expect(assumedSkyText({ sources: ['record'], assumedStops: 0 }, 1)).toBeNull();
    // A budget kept from before skies were reported: every sky is assumed.
    expect(assumedSkyText(undefined, 3)).toBe('All 3 stops use an assumed sky');
  });

  it("when a stop's record is loading, ready or unavailable, then its line says where its sky comes from", () => {
    const base = { stopId: 's', yearsWanted: 20, forecastDays: 0 };
    const clear = { source: 'record', presetName: 'clear', ownTemperatures: false } as const;
    expect(stopSkyText({ ...base, state: 'loading', yearsReady: 7 }, clear)).toContain('loading, 7 of 20 years');
    expect(stopSkyText({ ...base, state: 'ready', yearsReady: 20, forecastDays: 3 }, clear)).toBe(
      'Sky from the record: 20 past years; forecast for 3 days',
    );
    expect(
      stopSkyText({ ...base, state: 'unavailable', yearsReady: 0 }, { ...clear, presetName: 'overcast' }),
    ).toContain('the sky is assumed overcast');
  });

  it('when a stop picks its own sky, the forecast or its own temperatures, then its line says which is in use', () => {
    const ready = { stopId: 's', yearsWanted: 20, yearsReady: 20, forecastDays: 0, state: 'ready' } as const;
    const smoke = { source: 'preset', presetName: 'hazy or smoke', ownTemperatures: false } as const;
    expect(stopSkyText(ready, smoke)).toBe('Sky: your pick, hazy or smoke (the weather record is not used)');
    expect(stopSkyText({ ...ready, forecastDays: 4 }, { ...smoke, source: 'forecast' })).toBe(
      'Sky from the forecast for 4 days; other days assumed hazy or smoke',
    );
    expect(stopSkyText(ready, { ...smoke, source: 'forecast' })).toContain('none for this stop yet');
    expect(stopSkyText(ready, { ...smoke, source: 'record', ownTemperatures: true })).toBe(
      'Sky from the record: 20 past years · Temperatures: your low and high',
    );
  });
});

describe('what it would take, in words', () => {
  const result: HeadroomResult = {
    reservePct: 20,
    confidence: { held: 9, of: 10, years: 20, baselineHeld: 14 },
    baselineLowestSocPct: 11.6,
    baselineEnergyShortWh: 0,
    needed: true,
    levers: [],
  };
  it('when the search ran on recorded years, then the card says it aims at 9 of 10 past years and how many hold now', () => {
    expect(headroomAim(result)).toContain('above the 20 % reserve in 9 of 10 past years (now it holds in 14 of 20');
    expect(
      headroomAim({ ...result, needed: false, confidence: { held: 9, of: 10, years: 20, baselineHeld: 19 } }),
    ).toBe('Nothing: the plan stays above the 20 % reserve in 9 of 10 past years (it holds in 19 of 20).');
  });
  it('when there are no recorded years, then the card speaks of the whole trip on the planned sky', () => {
    expect(headroomAim({ ...result, confidence: null })).toBe(
      'Each on its own, the smallest change that keeps the whole trip above the 20 % reserve (now the lowest is 12 %).',
    );
  });
});

describe('the chart band', () => {
  it('when a budget ran on recorded years, then the band is their 10th to 90th percentile', () => {
    const result = simulateTrip(DEMO_TRIPS.highlandLoop);
    const p10 = result.ledger.map((r) => r.socPct - 5);
    const p90 = result.ledger.map((r) => r.socPct + 5);
    const series = socSeries({ ...toBudgetResult(result), band: null, socBand: { p10, p90 } });
    expect(series.points.map((p) => p.worse)).toEqual(p10);
    expect(series.points.map((p) => p.better)).toEqual(p90);
  });
});
