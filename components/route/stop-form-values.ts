// The stop editor's form values: what a person types (local date and time, display units, horizon as a list)
// and the conversion to and from the shared stop schema, which stays the one validator.
import { DateTime } from 'luxon';
import { z } from 'zod';
import { SITE_PRESETS } from '@/shared/engine/site-exposure';
import {
  stopSchema,
  type SiteExposure,
  type SitePreset,
  type SkyOutlook,
  type Stop,
  type StopInput,
  type StopSkySource,
} from '@/shared/schemas/trip';
import { fieldsSound, RUN_WITH_OTHER_ERRORS } from '@/shared/schemas/cross-field';
import { timeZoneSchema } from '@/shared/schemas/common';
import { fromDisplay, toDisplay, type UnitSystem } from '@/shared/units';
import { insideForecastHorizon } from '@/shared/weather-ranges';

const LOCAL = 'yyyy-MM-dd HH:mm';

const HOUR_RANGE = 'Use an hour from 0 to 24.';
/** An hour of the day: "Enter an hour." only when it is empty, the range otherwise. */
const hourField = () =>
  z
    .number({ error: (issue) => (issue.input === null || issue.input === undefined ? 'Enter an hour.' : undefined) })
    .int({ error: 'Use a whole hour, 0 to 24.' })
    .min(0, { error: HOUR_RANGE })
    .max(24, { error: HOUR_RANGE });

const LOCAL_PATTERN = /^\d{4}-\d{2}-\d{2} \d{2}:\d{2}$/;
const MISSING_TIME = 'That date and time does not exist in this time zone (check the date, or a clock change).';
const HORIZON_RULE = 'List 4 to 36 angles from 0 to 90°, clockwise from north (for example 8 or 16 of them).';

/** The instant a local date and time names in a zone, or null when the clock never shows it there. */
export function localToIso(local: string, zone: string): string | null {
  const t = DateTime.fromFormat(local, LOCAL, { zone });
  // Luxon moves a time inside a spring-forward gap to a real one; a typed time that moved did not exist.
  if (!t.isValid || t.toFormat(LOCAL) !== local) return null;
  return t.toISO({ suppressSeconds: true, suppressMilliseconds: true });
}

export function horizonAngles(text: string): number[] {
  return text
    .split(/[\s,;]+/)
    .filter(Boolean)
    .map(Number);
}

const stopFieldsSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the stop a name.' }).max(120),
  lat: z
    .number({ error: 'Enter a latitude.' })
    .min(-90, { error: 'Latitude runs from −90 to 90.' })
    .max(90, { error: 'Latitude runs from −90 to 90.' }),
  lon: z
    .number({ error: 'Enter a longitude.' })
    .min(-180, { error: 'Longitude runs from −180 to 180.' })
    .max(180, { error: 'Longitude runs from −180 to 180.' }),
  timeZone: timeZoneSchema,
  arrive: z.string().regex(LOCAL_PATTERN, { error: 'Choose the day and time of arrival.' }),
  depart: z.string().regex(LOCAL_PATTERN, { error: 'Choose the day and time of leaving.' }),
  /** canopy: sky openness and leaf-area index (the presets are quick picks of both); custom: a horizon per sector. */
  exposureKind: z.enum(['canopy', 'custom']),
  opennessPct: z
    .number({ error: 'Enter how much of the sky is open, 0 to 100 %.' })
    .min(0, { error: 'Sky openness runs from 0 to 100 %.' })
    .max(100, { error: 'Sky openness runs from 0 to 100 %.' }),
  leafAreaIndex: z
    .number({ error: 'Enter the leaf-area index, 0 to 10.' })
    .min(0, { error: 'The leaf-area index runs from 0 to 10.' })
    .max(10, { error: 'The leaf-area index runs from 0 to 10.' }),
  deciduous: z.boolean(),
  horizon: z.string(),
  canopyPct: z.number({ error: 'Enter a share from 0 to 100.' }).min(0).max(100),
  skySource: z.enum(['record', 'forecast', 'preset']),
  skyOutlook: z.enum(['clear', 'hazy', 'broken-cloud', 'overcast']),
  hookupOn: z.boolean(),
  amps: z.number({ error: 'Enter the amps.' }).positive().max(100),
  volts: z.number({ error: 'Enter the volts.' }).positive().max(480),
  generatorOn: z.boolean(),
  generatorStart: hourField(),
  generatorEnd: hourField(),
  ownTemperatures: z.boolean(),
  low: z.number({ error: 'Enter the expected low.' }),
  high: z.number({ error: 'Enter the expected high.' }),
  notes: z.string().max(4000),
});

/** The form's fields in the order they appear on screen. */
export const STOP_FIELD_ORDER = Object.keys(stopFieldsSchema.shape) as (keyof StopFormValues)[];

/**
 * The whole stop form in one pass: each rule between fields runs as soon as its own fields are sound, so a wrong
 * latitude never hides a high below the low, and every refusal shows at the same time.
 */
export const stopFormSchema = stopFieldsSchema.superRefine((v, ctx) => {
  const sound = (...fields: (keyof StopFormValues)[]) => fieldsSound(ctx, ...fields);
  const refuse = (path: keyof StopFormValues, message: string) =>
    ctx.addIssue({ code: 'custom', path: [path], message });
  if (sound('low', 'high') && v.high < v.low) refuse('high', 'The high must be at or above the low.');
  if (v.exposureKind === 'custom') {
    const angles = horizonAngles(v.horizon);
    if (angles.length < 4 || angles.length > 36 || angles.some((h) => !Number.isFinite(h) || h < 0 || h > 90))
      refuse('horizon', HORIZON_RULE);
  }
  if (!sound('timeZone')) return;
  const arriveAt = sound('arrive') ? localToIso(v.arrive, v.timeZone) : undefined;
  const departAt = sound('depart') ? localToIso(v.depart, v.timeZone) : undefined;
  if (arriveAt === null) refuse('arrive', MISSING_TIME);
  if (departAt === null) refuse('depart', MISSING_TIME);
  if (arriveAt && departAt && Date.parse(departAt) <= Date.parse(arriveAt))
    refuse('depart', 'Leave after you arrive: pick a later day or time.');
}, RUN_WITH_OTHER_ERRORS);
export type StopFormValues = z.infer<typeof stopFieldsSchema>;

export function toFormValues(
  stop: Stop | null,
  notes: string,
  units: UnitSystem,
  fallbackZone: string,
): StopFormValues {
  const zone = stop?.timeZone ?? fallbackZone;
  const local = (iso: string | undefined, fallback: string) =>
    iso ? DateTime.fromISO(iso, { setZone: true }).setZone(zone).toFormat(LOCAL) : fallback;
  const exposure: SiteExposure = stop?.exposure ?? { kind: 'preset', preset: 'open' };
  const canopy =
    exposure.kind === 'canopy'
      ? exposure
      : exposure.kind === 'preset'
        ? SITE_PRESETS[exposure.preset]
        : SITE_PRESETS.open;
  const t = (c: number) => Math.round(toDisplay(c, 'temperature', units).value);
  return {
    name: stop?.name ?? '',
    lat: stop?.lat ?? 0,
    lon: stop?.lon ?? 0,
    timeZone: zone,
    arrive: local(stop?.arriveAt, ''),
    depart: local(stop?.departAt, ''),
    exposureKind: exposure.kind === 'custom' ? 'custom' : 'canopy',
    opennessPct: canopy.skyOpennessPct,
    leafAreaIndex: canopy.leafAreaIndex,
    deciduous: exposure.kind === 'canopy' && exposure.deciduous,
    horizon: exposure.kind === 'custom' ? exposure.horizonDeg.join(', ') : '0, 0, 0, 0, 0, 0, 0, 0',
    canopyPct: exposure.kind === 'custom' ? Math.round(exposure.canopyTransmittance * 100) : 0,
    skySource: stop?.skySource ?? 'record',
    skyOutlook: stop?.skyOutlook ?? 'clear',
    hookupOn: !!stop?.hookup,
    amps: stop?.hookup?.amps ?? 16,
    volts: stop?.hookup?.volts ?? 230,
    generatorOn: stop ? stop.generatorHours !== null : true,
    generatorStart: stop?.generatorHours?.startHour ?? 8,
    generatorEnd: stop?.generatorHours?.endHour ?? 20,
    ownTemperatures: stop?.ownTemperatures ?? false,
    low: t(stop?.lowC ?? 8),
    high: t(stop?.highC ?? 18),
    notes,
  };
}

export type StopFromForm =
  { ok: true; stop: StopInput } | { ok: false; errors: Partial<Record<keyof StopFormValues, string>> };

/** The quick pick a sky openness and leaf-area index stand on, if any. */
export function presetAt(opennessPct: number, leafAreaIndex: number): SitePreset | null {
  const hit = (Object.keys(SITE_PRESETS) as SitePreset[]).find(
    (k) => SITE_PRESETS[k].skyOpennessPct === opennessPct && SITE_PRESETS[k].leafAreaIndex === leafAreaIndex,
  );
  return hit ?? null;
}

/** A canopy that stands on a quick pick (evergreen) is stored as that preset, so its name shows in the route. */
function canopyExposure(v: StopFormValues): SiteExposure {
  const preset = v.deciduous ? null : presetAt(v.opennessPct, v.leafAreaIndex);
  return preset
    ? { kind: 'preset', preset }
    : { kind: 'canopy', skyOpennessPct: v.opennessPct, leafAreaIndex: v.leafAreaIndex, deciduous: v.deciduous };
}

const FIELD_OF: Record<string, keyof StopFormValues> = {
  notes: 'notes',
  name: 'name',
  lat: 'lat',
  lon: 'lon',
  timeZone: 'timeZone',
  arriveAt: 'arrive',
  departAt: 'depart',
  exposure: 'horizon',
  highC: 'high',
  lowC: 'low',
  skySource: 'skySource',
  skyOutlook: 'skyOutlook',
  ownTemperatures: 'ownTemperatures',
  hookup: 'amps',
  generatorHours: 'generatorStart',
};

/** The form field that shows a stop field ("departAt", or the API's "stop.departAt"), if any. */
export function stopFieldOf(apiField: string): keyof StopFormValues | undefined {
  const [first = '', second] = apiField.split('.');
  const key = first === 'stop' && second ? second : first;
  return Object.hasOwn(FIELD_OF, key) ? FIELD_OF[key] : undefined;
}

/** Builds the API's stop from the form and runs the shared schema on it; its messages land on the right fields. */
export function fromFormValues(v: StopFormValues, units: UnitSystem): StopFromForm {
  const arriveAt = localToIso(v.arrive, v.timeZone);
  const departAt = localToIso(v.depart, v.timeZone);
  const horizonDeg = horizonAngles(v.horizon);
  if (!arriveAt || !departAt) {
    const errors: Partial<Record<keyof StopFormValues, string>> = {};
    if (!arriveAt) errors.arrive = MISSING_TIME;
    if (!departAt) errors.depart = MISSING_TIME;
    return { ok: false, errors };
  }
  const stop: StopInput = {
    name: v.name.trim(),
    lat: v.lat,
    lon: v.lon,
    timeZone: v.timeZone,
    arriveAt,
    departAt,
    exposure:
      v.exposureKind === 'canopy'
        ? canopyExposure(v)
        : { kind: 'custom', horizonDeg, canopyTransmittance: v.canopyPct / 100 },
    skyOutlook: v.skyOutlook as SkyOutlook,
    skySource: v.skySource,
    hookup: v.hookupOn ? { amps: v.amps, volts: v.volts } : null,
    generatorHours: v.generatorOn ? { startHour: v.generatorStart, endHour: v.generatorEnd } : null,
    lowC: Math.round(fromDisplay(v.low, 'temperature', units) * 10) / 10,
    highC: Math.round(fromDisplay(v.high, 'temperature', units) * 10) / 10,
    ownTemperatures: v.ownTemperatures,
  };
  const parsed = stopSchema.safeParse(stop);
  if (parsed.success) return { ok: true, stop };
  const errors: Partial<Record<keyof StopFormValues, string>> = {};
  for (const issue of parsed.error.issues) {
    const field = stopFieldOf(String(issue.path[0]));
    if (field && !errors[field]) errors[field] = issue.message;
  }
  return { ok: false, errors };
}

/**
 * The sky sources the form offers: the forecast only while some day of the stop lies inside its horizon (or when
 * the stop already uses it, so the saved choice stays visible).
 */
export function skySourceOptions(
  v: Pick<StopFormValues, 'arrive' | 'depart' | 'timeZone' | 'skySource'>,
  today: Date,
): StopSkySource[] {
  const arriveAt = LOCAL_PATTERN.test(v.arrive) ? localToIso(v.arrive, v.timeZone) : null;
  const departAt = LOCAL_PATTERN.test(v.depart) ? localToIso(v.depart, v.timeZone) : null;
  const near = !!arriveAt && !!departAt && insideForecastHorizon({ arriveAt, departAt }, today);
  return near || v.skySource === 'forecast' ? ['record', 'forecast', 'preset'] : ['record', 'preset'];
}
