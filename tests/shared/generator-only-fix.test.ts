// "Run it only while the generator runs": offered for a single appliance over the inverter's rating and for a
// shortfall's leading appliance when the stop allows generator hours, checked by walking the trip with it, and
// turned into the appliance's schedule that Apply sends.
import { describe, expect, it } from 'vitest';
import { checkFixes, simulateTrip, withFixes } from '@/shared/engine';
import type { Fix, FlagWithFixes } from '@/shared/engine/result-types';
import type { EngineInputDraft } from '@/shared/schemas';
import { fiveNightTrip } from '@/tests/fixtures/five-night-trip';

/** The five-night trip with a 2.2 kW petrol generator that runs 13:00–19:00 every day. */
const withGenerator: EngineInputDraft = {
  ...fiveNightTrip,
  rig: {
    ...fiveNightTrip.rig,
    generator: {
      ratedW: 2200,
      fuel: 'petrol',
      mode: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 13, startMinute: 0, minutes: 360 }] },
    },
  },
};

const checked = (input: EngineInputDraft): FlagWithFixes[] => withFixes(simulateTrip(input).flags, checkFixes(input));
const generatorOnly = (flag: FlagWithFixes | undefined): Fix | undefined =>
  flag?.fixes.find((f) => f.kind === 'appliance-generator-only');

describe('only while the generator runs', () => {
  it('when the roof air conditioner alone overloads the inverter, then running it only with the generator is offered, clears the overload and Apply carries that schedule', () => {
    const overload = checked(withGenerator).find((f) => f.kind === 'inverter-overload');
    const fix = generatorOnly(overload);
    expect(fix?.text).toBe('run the roof air conditioner only while the generator runs (on its routine)');
    expect(fix?.check?.clears).toBe(true);
    const schedule = fix?.applianceEdit?.schedule;
    expect(schedule).toMatchObject({
      kind: 'thermostat',
      activeWindows: [{ days: { kind: 'all' }, startHour: 13, startMinute: 0, minutes: 360 }],
    });
    // Applied as the edit Apply sends, no overload at that stop names the air conditioner any more.
    const applied = {
      ...withGenerator,
      appliances: (withGenerator.appliances ?? []).map((a) =>
        a.id === 'roof-ac' && schedule ? { ...a, schedule } : a,
      ),
    };
    const atStop = (flags: FlagWithFixes[] | ReturnType<typeof simulateTrip>['flags']) =>
      flags.filter(
        (f) =>
          f.kind === 'inverter-overload' &&
          f.where.kind === 'stop' &&
          f.where.stopIndex === 0 &&
          f.cause.includes('roof air conditioner'),
      );
    expect(atStop(checked(withGenerator))).toHaveLength(1);
    expect(atStop(simulateTrip(applied).flags)).toEqual([]);
  });

  it('when the air conditioner leads a shortfall at a stop with generator hours, then the fix for it is checked and says whether it clears', () => {
    // A generator that only starts when the battery is nearly empty: the shortfall below the reserve stays.
    const lateStarter: EngineInputDraft = {
      ...withGenerator,
      rig: {
        ...withGenerator.rig,
        generator: { ratedW: 2200, fuel: 'petrol', mode: { kind: 'rule', startBelowSocPct: 1, stopAboveSocPct: 2 } },
      },
    };
    const shortfall = checked(lateStarter).find((f) => f.kind === 'energy-short' || f.kind === 'below-reserve');
    expect(shortfall?.causes[0]?.applianceId).toBe('roof-ac');
    const fix = generatorOnly(shortfall);
    expect(fix?.applianceEdit?.applianceId).toBe('roof-ac');
    expect(fix?.text).toMatch(/^run the roof air conditioner only while the generator runs \(08:00–20:00 at stop \d\)/);
    expect(fix?.check).toBeDefined();
    expect(fix?.text.includes('helps, not enough alone')).toBe(!fix?.check?.clears);
  });

  it('when the rig has no generator, then no fix says to run anything with it', () => {
    const fixes = checked(fiveNightTrip).flatMap((f) => f.fixes);
    expect(fixes.map((f) => f.kind)).not.toContain('appliance-generator-only');
  });

  it('when no stop allows generator hours, then no fix says to run anything with the generator', () => {
    const quiet = {
      ...withGenerator,
      trip: { ...withGenerator.trip, stops: withGenerator.trip.stops.map((s) => ({ ...s, generatorHours: null })) },
    };
    const fixes = checked(quiet).flatMap((f) => f.fixes);
    expect(fixes.map((f) => f.kind)).not.toContain('appliance-generator-only');
  });
});
