// The cheapest lever of "What it would take": each found lever priced at a rough outlay for this trip (common
// practice prices, see shared/engine/lever-cost.ts), the lowest wins, and a lever that cannot fix never does.
import { describe, expect, it } from 'vitest';
import { findHeadroom } from '@/shared/engine';
import type { HeadroomLever, HeadroomResult } from '@/shared/engine/headroom';
import { cheapestLever, leverOutlay } from '@/shared/engine/lever-cost';
import { fiveNightTrip } from '@/tests/fixtures/five-night-trip';

const lever = (l: Partial<HeadroomLever> & Pick<HeadroomLever, 'lever' | 'amount'>): HeadroomLever => ({
  status: 'found',
  unit: 'Ah',
  resultingLowestSocPct: 25,
  text: '',
  params: {},
  ...l,
});

const result = (levers: HeadroomLever[]): HeadroomResult => ({
  reservePct: 20,
  baselineLowestSocPct: 5,
  baselineEnergyShortWh: 300,
  needed: true,
  levers,
  confidence: null,
});

describe('cheapest lever', () => {
  it('when two hookup nights cost less than 100 Ah at 12 V, then the hookup is the cheapest', () => {
    const r = result([
      lever({ lever: 'battery', amount: 100, params: { extraAh: 100, extraWh: 1200 } }),
      lever({ lever: 'hookup', amount: 2, unit: 'nights' }),
    ]);
    // 1200 Wh × 0.30 = 360 against 2 nights × 20 = 40 (common practice prices).
    expect(leverOutlay(r.levers[0] as HeadroomLever)).toBeCloseTo(360);
    expect(leverOutlay(r.levers[1] as HeadroomLever)).toBeCloseTo(40);
    expect(cheapestLever(r)).toBe('hookup');
  });

  it('when the rig has no generator, then buying one counts and a little solar wins', () => {
    const r = result([
      lever({ lever: 'generator', amount: 3, unit: 'h', params: { assumedGenerator: true } }),
      lever({ lever: 'solar', amount: 100, unit: 'W' }),
    ]);
    expect(leverOutlay(r.levers[0] as HeadroomLever)).toBeCloseTo(603);
    expect(cheapestLever(r)).toBe('solar');
    const owned = result([
      lever({ lever: 'generator', amount: 3, unit: 'h', params: { assumedGenerator: false } }),
      lever({ lever: 'solar', amount: 100, unit: 'W' }),
    ]);
    expect(cheapestLever(owned)).toBe('generator');
  });

  it('when a lever cannot fix or does not apply, then it is never the cheapest', () => {
    const r = result([
      lever({ lever: 'hookup', amount: 0, unit: 'nights', status: 'cannot-fix' }),
      lever({ lever: 'generator', amount: 0, unit: 'h', status: 'not-applicable' }),
      lever({ lever: 'battery', amount: 400, params: { extraAh: 400, extraWh: 4800 } }),
    ]);
    expect(cheapestLever(r)).toBe('battery');
    expect(cheapestLever(result([lever({ lever: 'hookup', amount: 0, status: 'cannot-fix' })]))).toBeNull();
  });

  it('when the five-night trip falls short, then the cheapest is a found lever with the lowest outlay', () => {
    const h = findHeadroom(fiveNightTrip);
    expect(h.needed).toBe(true);
    const best = cheapestLever(h);
    const found = h.levers.filter((l) => l.status === 'found');
    expect(found.length).toBeGreaterThan(0);
    const chosen = found.find((l) => l.lever === best);
    expect(chosen).toBeDefined();
    for (const l of found) expect(leverOutlay(chosen as HeadroomLever)).toBeLessThanOrEqual(leverOutlay(l) ?? 0);
  });
});
