// A hookup fix with another supply: the stop's country's supplies are offered first, then the rest of the table, and
// a picked supply is checked against its flag exactly as the engine checks its own fixes.
import { describe, expect, it } from 'vitest';
import { checkFixes, simulateTrip } from '@/shared/engine';
import { withFixes } from '@/shared/engine/check-fixes';
import { checkHookupSupply, hookupSupplyChoices, supplyKey } from '@/shared/engine/hookup-choice';
import { HOOKUP_REGIONS } from '@/shared/hookup-supply';
import { withSyntheticRecord } from '@/tests/factories/recorded-weather';
import { fiveNightTrip } from '@/tests/fixtures/five-night-trip';

describe('hookup supplies to pick from', () => {
  it('when a stop is in Oregon, then 15, 20, 30 and 50 A at 120 V come first and every table supply follows once', () => {
    const choices = hookupSupplyChoices('America/Los_Angeles').map(supplyKey);
    expect(choices.slice(0, 4)).toEqual(['15A-120V', '20A-120V', '30A-120V', '50A-120V']);
    const table = new Set(HOOKUP_REGIONS.flatMap((r) => r.options.map(supplyKey)));
    expect(new Set(choices)).toEqual(table);
    expect(choices).toHaveLength(table.size);
  });
  it('when a stop is in France, then 16 A at 230 V is among the first three', () => {
    expect(hookupSupplyChoices('Europe/Paris').slice(0, 3).map(supplyKey)).toContain('16A-230V');
  });
});

describe('a picked supply, checked', () => {
  const result = simulateTrip(fiveNightTrip);
  const found = withFixes(result.flags, checkFixes(fiveNightTrip))
    .flatMap((flag) => flag.fixes.map((fix) => ({ flag, fix })))
    .find(({ fix }) => fix.kind === 'add-hookup-night');
  if (!found) throw new Error('the five-night trip offers a hookup fix');
  const { flag, fix } = found;
  const stopIndex = Number(fix.params.stopIndex);

  it('when the supply is the one the engine offered, then the check is the engine’s own', () => {
    const check = checkHookupSupply(fiveNightTrip, flag, stopIndex, {
      amps: Number(fix.params.amps),
      volts: Number(fix.params.volts),
    });
    expect(check?.clears).toBe(fix.check?.clears);
    expect(check?.lowestSocPct).toBeCloseTo(fix.check?.lowestSocPct ?? Number.NaN, 6);
  });
  it('when a larger supply is picked, then the lowest charge is no lower than with a smaller one', () => {
    const small = checkHookupSupply(fiveNightTrip, flag, stopIndex, { amps: 15, volts: 120 });
    const large = checkHookupSupply(fiveNightTrip, flag, stopIndex, { amps: 50, volts: 120 });
    expect(large?.lowestSocPct).toBeGreaterThanOrEqual((small?.lowestSocPct ?? Number.NaN) - 1e-9);
  });
  it('when a tiny supply is picked, then it does not clear a flag the offered supply clears alone', () => {
    const tiny = checkHookupSupply(fiveNightTrip, flag, stopIndex, { amps: 0.1, volts: 120 });
    if (fix.check?.clears) expect(tiny?.clears).toBe(false);
    expect(tiny?.lowestSocPct).toBeLessThanOrEqual(fix.check?.lowestSocPct ?? 100);
  });
});

describe('a picked supply on a trip with recorded years', () => {
  const onRecord = withSyntheticRecord(fiveNightTrip, 10);
  const found = withFixes(simulateTrip(onRecord).flags, checkFixes(onRecord))
    .flatMap((flag) => flag.fixes.map((fix) => ({ flag, fix })))
    .find(({ fix }) => fix.kind === 'add-hookup-night');
  if (!found) throw new Error('the five-night trip on record offers a hookup fix');
  const { flag, fix } = found;
  const stopIndex = Number(fix.params.stopIndex);

  it('when the offered supply is picked again, then its check counts the same recorded years as the fix list', () => {
    const check = checkHookupSupply(onRecord, flag, stopIndex, {
      amps: Number(fix.params.amps),
      volts: Number(fix.params.volts),
    });
    expect(check?.years?.of).toBe(10);
    expect(check).toEqual(fix.check);
  });
  it('when the stop already has a hookup, then there is no hookup fix to check', () => {
    const stops = onRecord.trip.stops.map((s, i) => (i === stopIndex ? { ...s, hookup: { amps: 16, volts: 230 } } : s));
    const booked = { ...onRecord, trip: { ...onRecord.trip, stops } };
    expect(checkHookupSupply(booked, flag, stopIndex, { amps: 30, volts: 120 })).toBeNull();
  });
});
