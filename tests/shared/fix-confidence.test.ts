// With recorded years, a fix clears its flag only when the flag's stretch holds in at least 9 of 10 of them, and its
// text says in how many; without a record, fixes are checked on the planned sky alone.
import { describe, expect, it } from 'vitest';
import { checkFixes, FIX_HOLD_SHARE, simulateTrip, withFixes } from '@/shared/engine';
import { yearsNeeded } from '@/shared/engine/fixes';
import type { Fix } from '@/shared/engine/result-types';
import type { EngineInputDraft } from '@/shared/schemas';
import { withSyntheticRecord } from '@/tests/factories/recorded-weather';
import { fiveNightTrip } from '@/tests/fixtures/five-night-trip';
import { benchTrip } from './golden-inputs';

const week = benchTrip(7, 15);
const onRecord = withSyntheticRecord(week, 10);

/** The first shortfall flag's battery fix, checked at a share of years. */
function batteryFix(input: EngineInputDraft, holdShare?: number): { flagId: string; fix: Fix | undefined } {
  const flags = withFixes(simulateTrip(input).flags, checkFixes(input, holdShare === undefined ? {} : { holdShare }));
  const flag = flags.find((f) => f.kind === 'energy-short' || f.kind === 'below-reserve');
  return { flagId: flag?.id ?? '', fix: flag?.fixes.find((f) => f.kind === 'add-battery') };
}

describe('fixes at a chosen confidence', () => {
  it('when the trip has 10 recorded years, then the battery a fix adds holds in 9 of them and its text says so', () => {
    expect(FIX_HOLD_SHARE).toBe(0.9);
    const { fix } = batteryFix(onRecord);
    expect(fix?.check?.clears).toBe(true);
    const held = fix?.check?.years?.held ?? 0;
    expect(fix?.check?.years?.of).toBe(10);
    expect(held).toBeGreaterThanOrEqual(yearsNeeded(FIX_HOLD_SHARE, 10));
    expect(fix?.text).toContain(`holds in ${held} of 10 past years with this`);
  });

  it('when the size that holds in the median year is not enough in the bad years, then the fix is larger than it', () => {
    const median = batteryFix(onRecord, 0.5);
    const nineInTen = batteryFix(onRecord);
    // The smallest battery that holds in half the years (the median year's) …
    expect(median.fix?.check?.clears).toBe(true);
    expect(median.fix?.check?.years?.held).toBeGreaterThanOrEqual(5);
    // … holds in fewer than 9 of the 10, so at the default confidence the fix adds more.
    expect(median.fix?.check?.years?.held ?? 10).toBeLessThan(yearsNeeded(FIX_HOLD_SHARE, 10));
    expect(Number(nineInTen.fix?.params.extraAh)).toBeGreaterThan(Number(median.fix?.params.extraAh));
    expect(nineInTen.flagId).toBe(median.flagId);
  });

  it('when the trip has no record, then fixes are checked on the planned sky and say nothing of past years', () => {
    const checked = checkFixes(fiveNightTrip).flatMap((f) => f.fixes.filter((fix) => fix.check));
    expect(checked.length).toBeGreaterThan(0);
    for (const fix of checked) {
      expect(fix.check?.years).toBeUndefined();
      expect(fix.text).not.toContain('past years');
    }
  });
});
