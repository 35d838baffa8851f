// Pure pieces of the rig form: how stored figures are shown (fractions as percent, panel temperatures in the
// user's units) and typed back, and the whole parts the form adds, so every field starts filled.
import { defaultFuelModel } from '@/shared/engine/generator';
import { solarArraySchema, type FuelKind, type FuelModel, type RigInput, type SolarArray } from '@/shared/schemas/rig';
import { fromDisplay, toDisplay, type UnitSystem } from '@/shared/units';

const round = (v: number, digits: number) => Math.round(v * 10 ** digits) / 10 ** digits;

/** A field's look in the form: from the stored value to what is shown, and back from what is typed. */
export type Shown = {
  unit: string;
  show: (stored: number) => number;
  store: (typed: number) => number;
  /** The allowed range in the shown unit, for a message a person can act on. */
  range: (min: number, max: number) => string;
};

const rangeText = (unit: string, show: (v: number) => number, digits: number) => (min: number, max: number) => {
  const [a, b] = [round(show(min), digits), round(show(max), digits)].sort((x, y) => x - y);
  return `Enter a figure from ${a} to ${b} ${unit}.`;
};

/** Efficiencies and derates are stored as fractions (0.9) and read as percentages (90 %). */
export const percentOfFraction: Shown = {
  unit: '%',
  show: (f) => round(f * 100, 1),
  store: (p) => round(p / 100, 4),
  range: rangeText('%', (f) => f * 100, 1),
};

/** The panel's nominal operating cell temperature, in °C or °F. */
export function panelTemperature(units: UnitSystem): Shown {
  const unit = toDisplay(0, 'temperature', units).unit;
  const show = (c: number) => round(toDisplay(c, 'temperature', units).value, 1);
  return { unit, show, store: (t) => round(fromDisplay(t, 'temperature', units), 2), range: rangeText(unit, show, 1) };
}

/** A length of the body, in m or ft. */
export function bodyLength(units: UnitSystem): Shown {
  const unit = toDisplay(0, 'length', units).unit;
  const show = (m: number) => round(toDisplay(m, 'length', units).value, 1);
  return { unit, show, store: (t) => round(fromDisplay(t, 'length', units), 3), range: rangeText(unit, show, 1) };
}

/** The roof's area for panels, in m² or ft² (shown to whole square feet: a roof is not measured finer). */
export function roofArea(units: UnitSystem): Shown {
  const unit = toDisplay(0, 'area', units).unit;
  const raw = (m2: number) => toDisplay(m2, 'area', units).value;
  const show = (m2: number) => round(raw(m2), units === 'us' ? 0 : 1);
  // The limits are told to a tenth, so a figure just past a rounded limit is never refused under it.
  return { unit, show, store: (t) => round(fromDisplay(t, 'area', units), 3), range: rangeText(unit, raw, 1) };
}

/** The insulation choices in plain words, with the heat they let through (typical, from memory). */
export const INSULATION_CHOICES = [
  { value: 'basic', label: 'Basic (thin walls, single glazing)' },
  { value: 'standard', label: 'Standard touring' },
  { value: 'four-season', label: 'Four-season' },
] as const;

/** Power change per degree: a step of 1 °F is 5/9 of a step of 1 °C, so the coefficient scales by that much. */
export function perDegree(units: UnitSystem): Shown {
  const unit = `%/${toDisplay(0, 'temperature', units).unit}`;
  const factor = units === 'us' ? 5 / 9 : 1;
  const show = (perC: number) => round(perC * factor, 3);
  return { unit, show, store: (t) => round(t / factor, 4), range: rangeText(unit, show, 3) };
}

type SolarArrayInput = NonNullable<RigInput['solarArrays']>[number];

/** A new array with every field filled from the schema's defaults, so the advanced fields never start blank. */
export function newSolarArray(ratedW: number, index: number): SolarArray {
  return solarArraySchema.parse({ name: index === 0 ? 'Roof array' : `Array ${index + 1}`, ratedW });
}

/** A flat array lies on the roof: its tilt is 0 (the schema insists) and its facing does not matter. */
export function withMounting(array: SolarArrayInput, mounting: 'flat' | 'tilted'): SolarArrayInput {
  // 30° is a usual fixed tilt to start from when a flat array is first tilted; the person then sets their own.
  return { ...array, mounting, tiltDeg: mounting === 'flat' ? 0 : array.tiltDeg || 30 };
}

export type GeneratorModeInput = NonNullable<NonNullable<RigInput['generator']>['mode']>;
export type GeneratorModeKind = GeneratorModeInput['kind'];

/**
 * The generator's mode when the person picks another kind. A rule keeps its thresholds if it had them; set hours
 * (from a budget fix) are not edited in the form, so going back to them restores the ones the rig was opened with.
 */
export function generatorModeFor(
  kind: GeneratorModeKind,
  current: GeneratorModeInput | undefined,
  opened: GeneratorModeInput | undefined,
): GeneratorModeInput | undefined {
  if (kind === 'off') return { kind: 'off' };
  if (kind === 'rule')
    return current?.kind === 'rule'
      ? {
          kind: 'rule',
          startBelowSocPct: current.startBelowSocPct ?? 40,
          stopAboveSocPct: current.stopAboveSocPct ?? 90,
        }
      : { kind: 'rule', startBelowSocPct: 40, stopAboveSocPct: 90 };
  return opened?.kind === 'routine' ? opened : current;
}

/**
 * The figures a person starts their own fuel model from: the engine's typical curve for the generator's size and fuel
 * (rounded so the fields read cleanly), which they then replace with their unit's.
 */
export function fuelModelStart(ratedW: number | undefined, fuel: FuelKind | undefined): FuelModel {
  const m = defaultFuelModel(ratedW && ratedW > 0 ? ratedW : 2000, fuel ?? 'petrol');
  return { idleFuelKwhPerH: round(m.idleFuelKwhPerH, 2), fuelKwhPerKwhOut: round(m.fuelKwhPerKwhOut, 2) };
}

/** The hours a newly scheduled inverter starts from: a usual waking day, which the person then sets. */
export const INVERTER_HOURS_START = { startHour: 7, endHour: 23 } as const;

/** What each way of keeping the inverter means for its idle draw, in plain words beside the choice. */
export const INVERTER_MODE_NOTE: Record<'on-demand' | 'scheduled' | 'always', string> = {
  'on-demand': 'Its idle draw counts only in hours when an AC appliance runs from the battery.',
  scheduled: 'Its idle draw counts every day in these hours, and whenever an AC appliance runs outside them.',
  always: 'Its idle draw counts every hour of the trip.',
};
