// Causes: the battery's draw before each shortfall, attributed to appliances, the inverter and battery losses.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { simulateTrip } from '@/shared/engine';
import { isShortfall } from '@/shared/engine/flags';
import type { SimulationResult } from '@/shared/engine/result-types';
import { build, tripArb } from '@/tests/factories/random-plan';
import { fiveNightTrip } from '@/tests/fixtures/five-night-trip';
import { GOLDEN_CASES } from './golden-inputs';

/** The battery's draw over a flag's draw-down, from the ledger alone: what left its terminals, what it could not
 * give, and its own discharge losses. */
function drawFromLedger(r: SimulationResult, firstRow: number, lastRow: number): number {
  let wh = 0;
  for (const row of r.ledger.slice(firstRow, lastRow + 1)) {
    const out = Math.max(0, -row.batteryFlowWh);
    wh += out + row.energyShortWh + (row.batteryFlowWh < 0 ? row.batteryLossWh : 0);
  }
  return wh;
}

function expectRankedShares(r: SimulationResult): void {
  for (const flag of r.flags.filter(isShortfall)) {
    const causes = flag.causes;
    for (let k = 1; k < causes.length; k++) expect(causes[k - 1]?.wh ?? 0).toBeGreaterThanOrEqual(causes[k]?.wh ?? 0);
    const shares = causes.reduce((s, c) => s + c.sharePct, 0);
    if (causes.length > 0) expect(shares).toBeLessThanOrEqual(100 + 1e-9);
    expect(flag.drawdown.lastRow).toBe(flag.lowest.row);
    expect(flag.drawdown.firstRow).toBeLessThanOrEqual(flag.lowest.row);
  }
}

describe('causes of a shortfall', () => {
  it('when the five-night trip is simulated, then its first flag names the roof air conditioner as the leading cause', () => {
    const r = simulateTrip(fiveNightTrip);
    const first = r.flags[0];
    expect(first && isShortfall(first)).toBe(true);
    expect(first?.causes[0]?.applianceId).toBe('roof-ac');
    expect(first?.causes[0]?.sharePct).toBeGreaterThan(50);
    expect(first?.cause).toMatch(/Drawn down by roof air conditioner \d+ %/);
  });

  for (const [name, input] of Object.entries(GOLDEN_CASES)) {
    it(`when ${name} is simulated, then each shortfall's causes are ranked and their shares add to at most 100 %`, () => {
      expectRankedShares(simulateTrip(input));
    });
  }

  it('when a random plan has no hookup or generator, then the causes add up to the battery draw the ledger shows', () => {
    const offGrid = tripArb.map((t) => ({ ...t, hookup: false, generator: false }));
    fc.assert(
      fc.property(offGrid, (t) => {
        const r = simulateTrip(build(t));
        expectRankedShares(r);
        for (const flag of r.flags.filter(isShortfall)) {
          const want = drawFromLedger(r, flag.drawdown.firstRow, flag.drawdown.lastRow);
          const got = flag.causes.reduce((s, c) => s + c.wh, 0);
          // Causes under half a percent are left out of the list: allow for each one that could be missing.
          const leftOut = 0.005 * (t.appliances.length + 2) * want;
          expect(got).toBeLessThanOrEqual(want * 1.001 + 1e-6);
          expect(got).toBeGreaterThanOrEqual(want * 0.999 - leftOut - 1e-6);
        }
      }),
      { numRuns: 60, seed: 11 },
    );
  });
});
