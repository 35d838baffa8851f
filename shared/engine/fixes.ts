// Fixes for a shortfall, generated from its causes and the rig's levers, each checked by walking the battery again
// with the fix applied. A fix "clears" its flag when, from the draw-down's start to the window's end, the charge
// stays at or above the reserve and nothing runs short; otherwise it "helps, not enough alone" and says the lowest
// charge it reaches. Every size is one a traveller can buy or book:
// - generator time in whole quarter hours inside the stop's allowed hours, with the fuel it burns;
// - battery in modules of 50 Ah (banks under 200 Ah) or 100 Ah at the bank's voltage, up to a plausible bank for the
//   rig's size: 5 kWh for a van under 5.5 m, 10 kWh for a caravan or trailer under 8 m, 15 kWh above (from memory);
// - solar in 100 W panels, up to what the roof holds: its area (the rig's own figure, else its length × width),
//   60 % of it usable around vents, hatches and the air conditioner, at 200 W/m² for ~20 %-efficient modules
//   (common practice);
// - a hookup of the supply usual in the stop's country (hookup-supply.ts) unless the trip names one.
import type { Appliance, Schedule } from '../schemas/appliance';
import type { RoutineWindow } from '../schemas/common';
import { hookupRegionOf } from '../hookup-supply';
import { climateLoads } from './climate';
import { hhmm } from './describe';
import { groupedNumber, nameInSentence } from './flag-text';
import { defaultFuelModel } from './generator';
import { generatorHoursText, generatorOnlySchedule } from './generator-only';
import { QUARTERS, withAppliances, type Prepared } from './prepare';
import type { Fix, FixCheck, Flag } from './result-types';
import { newLedger, walk, type Scenario } from './walk';

/** A portable generator assumed when the rig has none (common 2 kW class). */
export const ASSUMED_GENERATOR_W = 2000;
export const PANEL_W = 100;
export const ROOF_USABLE_SHARE = 0.6;
export const PANEL_W_PER_M2 = 200;

/** The share of recorded years a fix must hold in to clear its flag (holds in 9 of 10 years). */
export const FIX_HOLD_SHARE = 0.9;

/** What a trial is built on: the trip under one sky (the planned run's, or one recorded year's). */
export type TrialBase = { scenario: Scenario; cabinSolarW: Float64Array; ambientC: Float64Array };

export type FixContext = {
  p: Prepared;
  /** The planned run: the preset sky's, or with a record the median year's. */
  planned: TrialBase;
  /** Each recorded year (empty without a record): a fix is checked in every one of them. */
  years: TrialBase[];
  /** The share of years a fix must hold in to clear (FIX_HOLD_SHARE unless asked otherwise). */
  holdShare: number;
  capacityWh: number;
  reservePct: number;
  /** Trials already walked in this run, by what they changed: flags that share a fix share its walk. */
  trials: Map<string, Trial>;
};

/** One walk of a trial: the charge and the energy short per row. */
type TrialRun = { socPct: Float64Array; shortWh: Float64Array };
/** The planned run's walk also keeps what the fixes' text and the overload check read. */
type PlannedTrialRun = TrialRun & {
  fuel: number;
  generatorH: number;
  genHours: Float64Array;
  p: Prepared;
  scenario: Scenario;
};
export type Trial = { planned: PlannedTrialRun; years: TrialRun[] };

type MakeTrial = (base: TrialBase) => { p: Prepared; scenario: Scenario };

function walkPlanned(ctx: FixContext, make: MakeTrial): PlannedTrialRun {
  const { p, scenario } = make(ctx.planned);
  const l = newLedger(p.n);
  walk(p, scenario, l);
  let fuel = 0;
  let generatorH = 0;
  for (let i = 0; i < p.n; i++) {
    fuel += l.generatorFuel[i] ?? 0;
    generatorH += l.generatorH[i] ?? 0;
  }
  return { socPct: l.socPct, shortWh: l.energyShortWh, fuel, generatorH, genHours: l.generatorH, p, scenario };
}

function walkYear(base: TrialBase, make: MakeTrial): TrialRun {
  const { p, scenario } = make(base);
  const l = newLedger(p.n);
  walk(p, scenario, l);
  return { socPct: l.socPct, shortWh: l.energyShortWh };
}

/** Walks a trial under the planned sky and each recorded year's (unless only the planned run is wanted). */
function runTrial(ctx: FixContext, key: string, make: MakeTrial, plannedOnly = false): Trial {
  const known = ctx.trials.get(key);
  if (known) return known;
  const trial = {
    planned: walkPlanned(ctx, make),
    years: plannedOnly ? [] : ctx.years.map((base) => walkYear(base, make)),
  };
  ctx.trials.set(key, trial);
  return trial;
}

/** From the draw-down's start to the window's end: the lowest charge, and whether it held (no shortfall). */
function windowHolds(ctx: FixContext, flag: Flag, run: TrialRun): { holds: boolean; lowest: number } {
  let lowest = 100;
  let short = 0;
  for (let i = flag.drawdown.firstRow; i <= flag.window.lastRow; i++) {
    lowest = Math.min(lowest, run.socPct[i] ?? 0);
    short += run.shortWh[i] ?? 0;
  }
  return { holds: lowest >= ctx.reservePct - 1e-6 && short <= 1e-6, lowest };
}

/** Years a fix must hold in: the chosen share of them, rounded up. */
export const yearsNeeded = (share: number, of: number): number => Math.ceil(share * of - 1e-9);

function verdict(ctx: FixContext, flag: Flag, t: Trial): FixCheck {
  if (t.years.length === 0) {
    const { holds, lowest } = windowHolds(ctx, flag, t.planned);
    return { clears: holds, lowestSocPct: lowest };
  }
  const runs = t.years.map((run) => windowHolds(ctx, flag, run));
  const of = runs.length;
  const held = runs.filter((r) => r.holds).length;
  const need = yearsNeeded(ctx.holdShare, of);
  // The lowest charge that the chosen share of years stays at or above (a bad year's, 1 in 10 by default).
  const lows = runs.map((r) => r.lowest).sort((a, b) => a - b);
  return { clears: held >= need, lowestSocPct: lows[of - need] ?? lows[0] ?? 0, years: { held, of } };
}

/** What the fix's text adds about its check: nothing, the years it holds in, or that it is not enough alone. */
function checkText(check: FixCheck): string {
  const lowest = `${check.lowestSocPct.toFixed(0)} %`;
  if (!check.years) return check.clears ? '' : ` — helps, not enough alone (lowest ${lowest})`;
  const years = `holds in ${check.years.held} of ${check.years.of} past years with this`;
  return check.clears ? ` — ${years}` : ` — helps, not enough alone: ${years} (lowest ${lowest} in a bad year)`;
}

/** Smallest k in 1..max whose trial clears the flag, else max (the most the lever allows). */
function smallestStep(max: number, clears: (k: number) => boolean): number {
  if (max <= 1 || !clears(max)) return max;
  let lo = 0;
  let hi = max;
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (clears(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

// ---- the leading appliance -------------------------------------------------------------------------------------

/** Trip days on which the rig stands on a hookup (some hour of the day at a stop with one). */
export function hookupDays(p: Prepared): number[] {
  const days = new Set<number>();
  for (let i = 0; i < p.n; i++) if ((p.hookupW[i] ?? 0) > 0) days.add(p.dayIndex[i] ?? 0);
  return [...days].sort((a, b) => a - b);
}

function onDays(windows: RoutineWindow[] | undefined, dayIndexes: number[]): RoutineWindow[] {
  const base = windows && windows.length > 0 ? windows : [{ startHour: 0, startMinute: 0, minutes: 1440 }];
  return base.map((w) => ({ ...w, days: { kind: 'trip-days' as const, dayIndexes } }));
}

type ApplianceChange = { kind: Fix['kind']; text: string; schedule: Schedule };

/** Run it only on the days the rig stands on a hookup: the schedule that says so, or null without such days. */
export function shoreOnlySchedule(p: Prepared, a: Appliance): Schedule | null {
  const days = hookupDays(p);
  if (days.length === 0) return null;
  const s = a.schedule;
  if (s.kind === 'thermostat') return { ...s, activeWindows: onDays(s.activeWindows, days) };
  if (s.kind === 'routine') return { ...s, windows: onDays(s.windows, days) };
  return { kind: 'routine', windows: onDays(undefined, days) };
}

function applianceChanges(p: Prepared, a: Appliance, stopIndex: number | null): ApplianceChange[] {
  const name = nameInSentence(a.name);
  const s = a.schedule;
  const out: ApplianceChange[] = [];
  if (s.kind === 'thermostat') {
    const step = s.mode === 'cooling' ? 2 : -2;
    const to = s.setPointC + step;
    out.push({
      kind: 'thermostat-setting',
      text: `set the ${name} to ${to} °C instead of ${s.setPointC} °C`,
      schedule: { ...s, setPointC: to },
    });
  }
  if (s.kind === 'routine' && s.windows.length > 0) {
    const halved = s.windows.map((w) => ({ ...w, minutes: Math.max(5, Math.round(w.minutes / 2)) }));
    const was = s.windows[0]?.minutes ?? 0;
    out.push({
      kind: 'appliance-less',
      text: `run the ${name} half as long (${halved[0]?.minutes ?? 0} min instead of ${was} min each time)`,
      schedule: { ...s, windows: halved },
    });
    const solar = p.input.rig.solarArrays.length > 0;
    const first = s.windows[0];
    if (solar && first && (first.startHour < 10 || first.startHour >= 15)) {
      const moved = s.windows.map((w) => ({ ...w, startHour: 11, startMinute: 0 }));
      out.push({
        kind: 'appliance-another-time',
        text: `run the ${name} from 11:00 instead of ${hhmm(first.startHour)}, when the panels give most`,
        schedule: { ...s, windows: moved },
      });
    }
  }
  const shore = shoreOnlySchedule(p, a);
  if (shore) out.push({ kind: 'appliance-shore-only', text: `run the ${name} only on hookup days`, schedule: shore });
  const stop = stopIndex === null ? undefined : p.input.trip.stops[stopIndex];
  const generator = stop?.generatorHours && stopIndex !== null ? generatorOnlySchedule(p, a) : null;
  if (generator && stopIndex !== null)
    out.push({
      kind: 'appliance-generator-only',
      text: `run the ${name} only while the generator runs (${generatorHoursText(p, stopIndex)})`,
      schedule: generator,
    });
  return out;
}

/** The trip walked with one appliance on another schedule (its loads, heating and cooling worked out again). */
export function applianceTrial(
  ctx: FixContext,
  a: Appliance,
  change: { kind: Fix['kind']; schedule: Schedule },
): Trial {
  const { p } = ctx;
  let q: Prepared | undefined;
  return runTrial(ctx, `appliance:${a.id}:${change.kind}`, (base) => {
    q ??= withAppliances(
      p,
      p.input.appliances.map((x) => (x.id === a.id ? { ...x, schedule: change.schedule } : x)),
    );
    return { p: q, scenario: { ...base.scenario, loads: climateLoads(q, base.cabinSolarW, base.ambientC) } };
  });
}

function applianceFixes(ctx: FixContext, flag: Flag): Fix[] {
  const lead = flag.causes[0];
  if (!lead || lead.kind !== 'appliance' || lead.applianceId === null) return [];
  const { p } = ctx;
  const j = p.input.appliances.findIndex((a) => a.id === lead.applianceId);
  const a = p.input.appliances[j];
  if (!a) return [];
  const stopIndex = flag.where.kind === 'stop' ? flag.where.stopIndex : null;
  return applianceChanges(p, a, stopIndex).map((change) => {
    const trial = applianceTrial(ctx, a, change);
    const check = verdict(ctx, flag, trial);
    return {
      kind: change.kind,
      text: `${change.text}${checkText(check)}`,
      params: { applianceId: a.id },
      applianceEdit: { applianceId: a.id, schedule: change.schedule },
      check,
    };
  });
}

// ---- generator -------------------------------------------------------------------------------------------------

function stopSteps(p: Prepared, stopIndex: number): number[] {
  const steps: number[] = [];
  for (let i = 0; i < p.n; i++) if (p.where[i] === stopIndex) steps.push(i);
  return steps;
}

function generatorFix(ctx: FixContext, flag: Flag, stopIndex: number): Fix | null {
  const { p } = ctx;
  const stop = p.input.trip.stops[stopIndex];
  const hours = stop?.generatorHours;
  if (!stop || !hours || !p.input.rig.shoreCharger) return null;
  const spanH = (hours.endHour - hours.startHour + 24) % 24;
  const maxQuarters = spanH * QUARTERS;
  if (maxQuarters === 0) return null;
  const g = p.input.rig.generator;
  const ratedW = g?.ratedW ?? ASSUMED_GENERATOR_W;
  const fuelKind = g?.fuel ?? 'petrol';
  const plan = {
    kind: 'routine' as const,
    ratedW,
    model: g?.fuelModel ?? defaultFuelModel(ratedW, fuelKind),
    fuelKind,
  };
  const steps = stopSteps(p, stopIndex);
  const keep = g?.mode.kind === 'routine';
  /** Quarters of each day at the stop, the last q quarter hours before the allowed end. */
  const trialFor = (q: number): Trial => {
    let withRun: Prepared | undefined;
    return runTrial(ctx, `generator:${stopIndex}:${q}`, (base) => {
      withRun ??= { ...p, genRoutine: quartersBeforeEnd(q) };
      return { p: withRun, scenario: { ...base.scenario, generator: plan } };
    });
  };
  /** Each day at the stop, the last q quarter hours before the allowed end (besides the rig's own routine). */
  const quartersBeforeEnd = (q: number): Uint8Array => {
    const genRoutine = keep ? Uint8Array.from(p.genRoutine) : new Uint8Array(p.n);
    for (const i of steps) {
      const dtMin = (p.stepH[i] ?? 1) * 60;
      for (let k = 0; k < QUARTERS; k++) {
        const qMin = (p.minuteOfDay[i] ?? 0) + ((k + 0.5) * dtMin) / QUARTERS;
        // Minutes before the allowed end, across midnight too.
        const before = (((hours.endHour * 60 - qMin) % 1440) + 1440) % 1440;
        if (before > 0 && before <= q * 15) genRoutine[i] = (genRoutine[i] ?? 0) | (1 << k);
      }
    }
    return genRoutine;
  };
  const q = smallestStep(maxQuarters, (k) => verdict(ctx, flag, trialFor(k)).clears);
  const trial = trialFor(q);
  const check = verdict(ctx, flag, trial);
  const base = runTrial(ctx, 'base', (b) => ({ p, scenario: b.scenario }), true).planned;
  const minutes = q * 15;
  const startMin = (((hours.endHour * 60 - minutes) % 1440) + 1440) % 1440;
  const startHour = Math.floor(startMin / 60);
  const startMinute = startMin % 60;
  const from = `${String(startHour).padStart(2, '0')}:${String(startMinute).padStart(2, '0')}`;
  const fuel = Math.max(0, trial.planned.fuel - base.fuel);
  const unit = fuelKind === 'propane' ? 'kg propane' : `L ${fuelKind}`;
  const what = g ? 'the generator' : `a ${ASSUMED_GENERATOR_W} W portable generator`;
  const dayIndexes = [...new Set(steps.map((i) => p.dayIndex[i] ?? 0))];
  const runH = Math.max(0, trial.planned.generatorH - base.generatorH);
  return {
    kind: 'add-generator-hours',
    text:
      `run ${what} ${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min a day, ${from}–` +
      `${hhmm(hours.endHour)}, at stop ${stopIndex + 1} (allowed ${hhmm(hours.startHour)}–${hhmm(hours.endHour)}): ` +
      `${runH.toFixed(1)} h in all, about ${fuel.toFixed(1)} ${unit}${checkText(check)}`,
    params: {
      stopIndex,
      hours: minutes / 60,
      startHour,
      startMinute,
      minutes,
      endHour: hours.endHour,
      allowedStartHour: hours.startHour,
      dayIndexes: dayIndexes.map(String),
      fuel: Math.round(fuel * 10) / 10,
      assumedGenerator: !g,
    },
    check,
  };
}

// ---- hookup ----------------------------------------------------------------------------------------------------

/** Where the table does not know the stop's country, the headroom finder assumes a 16 A, 230 V pedestal. */
export const UNKNOWN_COUNTRY_HOOKUP = { amps: 16, volts: 230 } as const;

/** The supply a hookup fix offers at a stop: the trip's chosen one, else the one usual in the stop's country. */
export function hookupSupplyFor(p: Prepared, stopIndex: number): { amps: number; volts: number } | null {
  const stop = p.input.trip.stops[stopIndex];
  return p.input.options.assumedHookup ?? (stop ? (hookupRegionOf(stop.timeZone)?.usual ?? null) : null);
}

export function hookupFix(ctx: FixContext, flag: Flag, stopIndex: number): Fix | null {
  const { p } = ctx;
  const stop = p.input.trip.stops[stopIndex];
  if (!stop || stop.hookup || !p.input.rig.shoreCharger) return null;
  const region = hookupRegionOf(stop.timeZone);
  const picked = p.input.options.assumedHookup;
  const supply = hookupSupplyFor(p, stopIndex);
  if (!supply) return null;
  const hookupW = Float64Array.from(p.hookupW);
  for (const i of stopSteps(p, stopIndex)) hookupW[i] = supply.amps * supply.volts;
  const trial = runTrial(ctx, `hookup:${stopIndex}:${supply.amps}x${supply.volts}`, (base) => ({
    p,
    scenario: { ...base.scenario, hookupW },
  }));
  const check = verdict(ctx, flag, trial);
  const basis = picked ? 'the supply you chose' : `usual in ${region?.label ?? 'that country'}`;
  return {
    kind: 'add-hookup-night',
    text: `book a hookup at stop ${stopIndex + 1} (${supply.amps} A at ${supply.volts} V, ${basis})${checkText(check)}`,
    params: { stopIndex, nights: 1, amps: supply.amps, volts: supply.volts },
    check,
  };
}

// ---- battery and solar -----------------------------------------------------------------------------------------

/** The largest bank a rig of this size plausibly carries, Wh (from memory; see the header). */
export function plausibleBatteryWh(p: Prepared): number {
  const length = p.input.rig.cabin.lengthM;
  return length < 5.5 ? 5000 : length < 8 ? 10000 : 15000;
}

export function batteryModuleAh(p: Prepared): number {
  return p.input.rig.battery.capacityAh >= 200 ? 100 : 50;
}

function batteryFix(ctx: FixContext, flag: Flag): Fix | null {
  const { p } = ctx;
  const b = p.input.rig.battery;
  const moduleAh = batteryModuleAh(p);
  const maxModules = Math.floor((plausibleBatteryWh(p) - ctx.capacityWh) / (moduleAh * b.nominalV));
  if (maxModules < 1) return null;
  const trialFor = (k: number): Trial =>
    runTrial(ctx, `battery:${k}`, (base) => ({
      p,
      scenario: { ...base.scenario, capacityWh: ctx.capacityWh + k * moduleAh * b.nominalV },
    }));
  const k = smallestStep(maxModules, (m) => verdict(ctx, flag, trialFor(m)).clears);
  const check = verdict(ctx, flag, trialFor(k));
  const extraAh = k * moduleAh;
  const cap = check.clears ? '' : ` (the most a rig this size plausibly carries: ${plausibleBatteryWh(p) / 1000} kWh)`;
  return {
    kind: 'add-battery',
    text: `add ${k} × ${moduleAh} Ah at ${b.nominalV} V (${extraAh} Ah, ${((extraAh * b.nominalV) / 1000).toFixed(2)} kWh)${cap}${checkText(check)}`,
    params: { extraAh, moduleAh, modules: k },
    check,
  };
}

/** Panel watts the roof can still take (portable arrays apart), W, in whole panels. */
export function roofRoomW(p: Prepared): number {
  const rig = p.input.rig;
  const area = rig.cabin.roofAreaM2 ?? rig.cabin.lengthM * rig.cabin.widthM;
  const onRoof = rig.solarArrays.filter((a) => !a.portable).reduce((s, a) => s + a.ratedW, 0);
  const room = area * ROOF_USABLE_SHARE * PANEL_W_PER_M2 - onRoof;
  return Math.max(0, Math.floor(room / PANEL_W) * PANEL_W);
}

function solarFix(ctx: FixContext, flag: Flag): Fix | null {
  const { p } = ctx;
  const ratedW = p.input.rig.solarArrays.reduce((s, a) => s + a.ratedW, 0);
  const maxPanels = roofRoomW(p) / PANEL_W;
  if (ratedW === 0 || maxPanels < 1) return null;
  const trialFor = (k: number): Trial =>
    runTrial(ctx, `solar:${k}`, (base) => ({
      p,
      scenario: { ...base.scenario, solarScale: 1 + (k * PANEL_W) / ratedW },
    }));
  const k = smallestStep(maxPanels, (m) => verdict(ctx, flag, trialFor(m)).clears);
  const check = verdict(ctx, flag, trialFor(k));
  const cap = check.clears ? '' : ' (all the roof holds)';
  return {
    kind: 'add-solar',
    text: `add ${k} × ${PANEL_W} W panels (${groupedNumber(k * PANEL_W)} W)${cap}${checkText(check)}`,
    params: { extraW: k * PANEL_W, panels: k },
    check,
  };
}

/** The checked fixes of a shortfall flag: those that clear it first, each group in the order generated. */
export function shortfallFixes(ctx: FixContext, flag: Flag): Fix[] {
  const where = flag.where;
  const stopIndex = where.kind === 'stop' ? where.stopIndex : where.driveIndex;
  const fixes = [
    ...applianceFixes(ctx, flag),
    generatorFix(ctx, flag, stopIndex),
    hookupFix(ctx, flag, stopIndex),
    solarFix(ctx, flag),
    batteryFix(ctx, flag),
  ].filter((f): f is Fix => f !== null);
  return [...fixes.filter((f) => f.check?.clears), ...fixes.filter((f) => !f.check?.clears)];
}
