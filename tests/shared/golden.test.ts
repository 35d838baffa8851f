// Golden results: simulateTrip and findHeadroom on the demo trips, the benchmark trips and synthetic trips must
// give byte-identical JSON to the fixtures captured before the engine's speed work. The readable parts are compared
// first so a failure shows where the results part; the hashes then catch any other digit.
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { GOLDEN_CASES } from './golden-inputs';
import { goldenSummary, type GoldenSummary } from './golden-summary';

function fixture(name: string): GoldenSummary {
  return JSON.parse(readFileSync(resolve(__dirname, 'golden', `${name}.json`), 'utf8')) as GoldenSummary;
}

describe('golden results', () => {
  for (const [name, input] of Object.entries(GOLDEN_CASES)) {
    it(`when ${name} is simulated and searched, then every figure matches the stored result`, () => {
      const want = fixture(name);
      const got = goldenSummary(input);
      expect(got.ledgerLength).toBe(want.ledgerLength);
      expect(got.headline).toEqual(want.headline);
      expect(got.ledgerSpots).toEqual(want.ledgerSpots);
      expect(got.firstDay).toEqual(want.firstDay);
      expect(got.lastDay).toEqual(want.lastDay);
      expect(got.flags).toEqual(want.flags);
      expect(got.bandLowest).toEqual(want.bandLowest);
      expect(got.headroom).toEqual(want.headroom);
      expect(got.sha256).toEqual(want.sha256);
    });
  }

  it('when the battery is a hundredth of an amp-hour larger, then the stored result no longer matches', () => {
    const input = GOLDEN_CASES['demo-highland-loop'];
    if (!input) throw new Error('missing case');
    const nudged = {
      ...input,
      rig: { ...input.rig, battery: { ...input.rig.battery, capacityAh: input.rig.battery.capacityAh + 0.01 } },
    };
    const got = goldenSummary(nudged);
    const want = fixture('demo-highland-loop');
    expect(got.sha256.ledger).not.toBe(want.sha256.ledger);
    expect(got.sha256.result).not.toBe(want.sha256.result);
  });
});
