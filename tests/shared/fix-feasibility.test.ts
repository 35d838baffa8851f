// Fixes are feasible: generator time inside the stop's allowed hours in whole quarter hours, battery and solar in
// real steps within the rig's caps, a hookup usual in the stop's country, a common inverter size, never "stagger"
// when one appliance alone overloads the inverter; and each checked fix says whether it clears its flag.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkFixesParsed, simulateParsed, withFixes } from '@/shared/engine';
import { INVERTER_SIZES_W, isShortfall } from '@/shared/engine/flags';
import { batteryModuleAh, plausibleBatteryWh, roofRoomW, PANEL_W } from '@/shared/engine/fixes';
import { generatorWindows } from '@/shared/engine/generator-only';
import { prepare } from '@/shared/engine/prepare';
import type { Fix, FlagWithFixes } from '@/shared/engine/result-types';
import { isUsualHookup } from '@/shared/hookup-supply';
import { engineInputSchema, type EngineInput, type EngineInputDraft } from '@/shared/schemas';
import type { RoutineWindow } from '@/shared/schemas/common';
import { build, tripArb } from '@/tests/factories/random-plan';
import { fiveNightTrip } from '@/tests/fixtures/five-night-trip';
import { GOLDEN_CASES } from './golden-inputs';

const num = (v: unknown): number => (typeof v === 'number' ? v : Number.NaN);

/** Whether window w runs only on days and at times generator window g does (across midnight too). */
function windowInside(w: RoutineWindow, g: RoutineWindow): boolean {
  const daysInside =
    g.days.kind === 'all' ||
    (g.days.kind === 'trip-days' &&
      w.days.kind === 'trip-days' &&
      w.days.dayIndexes.every((d) => g.days.kind === 'trip-days' && g.days.dayIndexes.includes(d))) ||
    (g.days.kind === 'day-type' && w.days.kind === 'day-type' && g.days.dayType === w.days.dayType);
  const offset = (w.startHour * 60 + w.startMinute - (g.startHour * 60 + g.startMinute) + 1440) % 1440;
  return daysInside && offset + w.minutes <= g.minutes;
}

/** Minutes after local midnight inside [start, end) of allowed hours (across midnight too). */
function insideAllowed(minute: number, startHour: number, endHour: number): boolean {
  const from = startHour * 60;
  const span = ((((endHour - startHour) * 60) % 1440) + 1440) % 1440;
  return (minute - from + 1440) % 1440 < span;
}

/** The planned run's flags with the fixes checkFixes gives them. */
const checkedFlags = (input: EngineInput): FlagWithFixes[] =>
  withFixes(simulateParsed(input).flags, checkFixesParsed(input));

function expectFeasible(input: EngineInput, flags: FlagWithFixes[]): void {
  const p = prepare(input);
  const rig = input.rig;
  const capacityWh = rig.battery.capacityAh * rig.battery.nominalV;
  for (const flag of flags) {
    for (const fix of flag.fixes) expectFixFeasible(input, fix, { capacityWh, p });
    if (isShortfall(flag)) {
      for (const fix of flag.fixes) {
        expect(fix.check, `${fix.kind} of ${flag.id} was not checked`).toBeDefined();
        expect(fix.text.includes('helps, not enough alone')).toBe(!fix.check?.clears);
      }
    }
    if (flag.kind === 'inverter-overload' && rig.inverter) {
      const ratedW = rig.inverter.ratedW;
      const stagger = flag.fixes.find((f) => f.kind === 'stagger-appliances');
      const ids = stagger && Array.isArray(stagger.params.applianceIds) ? stagger.params.applianceIds : [];
      for (const id of ids) {
        const a = input.appliances.find((x) => x.id === id);
        expect(a && a.quantity * a.runningW <= ratedW).toBe(true);
      }
    }
  }
}

function expectFixFeasible(input: EngineInput, fix: Fix, ctx: { capacityWh: number; p: ReturnType<typeof prepare> }) {
  switch (fix.kind) {
    case 'add-generator-hours': {
      const stop = input.trip.stops[num(fix.params.stopIndex)];
      const hours = stop?.generatorHours;
      expect(hours).toBeTruthy();
      if (!hours) return;
      const minutes = num(fix.params.minutes);
      expect(minutes % 15).toBe(0);
      const start = num(fix.params.startHour) * 60 + num(fix.params.startMinute);
      expect(insideAllowed(start, hours.startHour, hours.endHour)).toBe(true);
      expect(insideAllowed((start + minutes - 1) % 1440, hours.startHour, hours.endHour)).toBe(true);
      expect(minutes).toBeLessThanOrEqual(((((hours.endHour - hours.startHour) % 24) + 24) % 24) * 60);
      break;
    }
    case 'add-battery': {
      const extraAh = num(fix.params.extraAh);
      expect(extraAh % batteryModuleAh(ctx.p)).toBe(0);
      expect(ctx.capacityWh + extraAh * input.rig.battery.nominalV).toBeLessThanOrEqual(plausibleBatteryWh(ctx.p));
      break;
    }
    case 'add-solar': {
      const extraW = num(fix.params.extraW);
      expect(extraW % PANEL_W).toBe(0);
      expect(extraW).toBeLessThanOrEqual(roofRoomW(ctx.p));
      break;
    }
    case 'add-hookup-night': {
      const stop = input.trip.stops[num(fix.params.stopIndex)];
      expect(stop && isUsualHookup(stop.timeZone, { amps: num(fix.params.amps), volts: num(fix.params.volts) })).toBe(
        true,
      );
      break;
    }
    case 'larger-inverter':
      expect(INVERTER_SIZES_W).toContain(num(fix.params.ratedW));
      break;
    case 'appliance-generator-only': {
      const schedule = fix.applianceEdit?.schedule;
      const own =
        schedule?.kind === 'thermostat' ? schedule.activeWindows : schedule?.kind === 'routine' ? schedule.windows : [];
      const gen = generatorWindows(ctx.p) ?? [];
      expect(own?.length).toBeGreaterThan(0);
      for (const w of own ?? []) expect(gen.some((g) => windowInside(w, g))).toBe(true);
      break;
    }
    default:
      break;
  }
}

const run = (draft: EngineInputDraft): void => {
  const input = engineInputSchema.parse(draft);
  expectFeasible(input, checkedFlags(input));
};

describe('feasible fixes', () => {
  for (const [name, input] of Object.entries(GOLDEN_CASES)) {
    it(`when ${name} is simulated, then every fix is within the allowed hours, the caps and the country's supply`, () =>
      run(input));
  }

  it('when 1,000 random plans are simulated, then every fix is within the allowed hours, the caps and the country’s supply', () => {
    fc.assert(
      fc.property(tripArb, (t) => run(build(t))),
      { numRuns: 1000, seed: 12 },
    );
  }, 600_000);

  it('when the five-night trip is simulated, then its first fix acts on the roof air conditioner and clears the flag', () => {
    const fix = checkedFlags(engineInputSchema.parse(fiveNightTrip))[0]?.fixes[0];
    expect(fix?.applianceEdit?.applianceId).toBe('roof-ac');
    expect(fix?.check?.clears).toBe(true);
  });

  it('when one appliance alone is over the inverter rating, then no fix says to stagger it', () => {
    const overloads = checkedFlags(engineInputSchema.parse(fiveNightTrip)).filter(
      (f) => f.kind === 'inverter-overload',
    );
    expect(overloads.length).toBeGreaterThan(0);
    for (const f of overloads) {
      expect(f.fixes.map((x) => x.kind)).not.toContain('stagger-appliances');
      expect(f.fixes[0]).toMatchObject({ kind: 'larger-inverter', params: { ratedW: 1500 } });
    }
  });

  it('when the rig declares a small roof, then the solar room shrinks to it and portable panels take none of it', () => {
    const parsed = engineInputSchema.parse(fiveNightTrip);
    const withRoof = (roofAreaM2: number, portableW: number) =>
      prepare({
        ...parsed,
        rig: {
          ...parsed.rig,
          cabin: { ...parsed.rig.cabin, roofAreaM2 },
          solarArrays: [
            ...parsed.rig.solarArrays,
            ...(portableW > 0
              ? engineInputSchema.shape.rig.parse({
                  ...parsed.rig,
                  solarArrays: [{ ratedW: portableW, portable: true }],
                }).solarArrays
              : []),
          ],
        },
      });
    // 5 m² × 60 % usable × 200 W/m² = 600 W of panels, less the 400 W already on the roof.
    expect(roofRoomW(withRoof(5, 0))).toBe(200);
    expect(roofRoomW(withRoof(5, 300))).toBe(200);
    expect(roofRoomW(withRoof(2, 0))).toBe(0);
  });

  it('when a stop is in the United States, then the hookup fix offers 30 A at 120 V, not a European 16 A', () => {
    const hookup = checkedFlags(engineInputSchema.parse(fiveNightTrip))
      .flatMap((f) => f.fixes)
      .find((f) => f.kind === 'add-hookup-night');
    expect(hookup?.params).toMatchObject({ amps: 30, volts: 120 });
  });
});
