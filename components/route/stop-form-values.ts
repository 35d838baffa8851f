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
} from '@/shared/schemas/trip';
import { fromDisplay, toDisplay, type UnitSystem } from '@/shared/units';

const LOCAL = 'yyyy-MM-dd HH:mm';

export const stopFormSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the stop a name.' }).max(120),
  lat: z
    .number({ error: 'Enter a latitude.' })
    .min(-90, { error: 'Latitude runs from −90 to 90.' })
    .max(90, { error: 'Latitude runs from −90 to 90.' }),
  lon: z
    .number({ error: 'Enter a longitude.' })
    .min(-180, { error: 'Longitude runs from −180 to 180.' })
    .max(180, { error: 'Longitude runs from −180 to 180.' }),
  timeZone: z.string().min(1, { error: 'Choose a time zone.' }),
  arrive: z.string().regex(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}$/, { error: 'Use a date and time like 2027-09-12 15:00.' }),
  depart: z.string().regex(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2}$/, { error: 'Use a date and time like 2027-09-14 10:00.' }),
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
  skyOutlook: z.enum(['clear', 'hazy', 'broken-cloud', 'overcast']),
  hookupOn: z.boolean(),
  amps: z.number({ error: 'Enter the amps.' }).positive().max(100),
  volts: z.number({ error: 'Enter the volts.' }).positive().max(480),
  generatorOn: z.boolean(),
  generatorStart: z.number({ error: 'Enter an hour.' }).int().min(0).max(24),
  generatorEnd: z.number({ error: 'Enter an hour.' }).int().min(0).max(24),
  low: z.number({ error: 'Enter the expected low.' }),
  high: z.number({ error: 'Enter the expected high.' }),
  notes: z.string().max(4000),
});
export type StopFormValues = z.infer<typeof stopFormSchema>;

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
    skyOutlook: stop?.skyOutlook ?? 'clear',
    hookupOn: !!stop?.hookup,
    amps: stop?.hookup?.amps ?? 16,
    volts: stop?.hookup?.volts ?? 230,
    generatorOn: stop ? stop.generatorHours !== null : true,
    generatorStart: stop?.generatorHours?.startHour ?? 8,
    generatorEnd: stop?.generatorHours?.endHour ?? 20,
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
  name: 'name',
  lat: 'lat',
  lon: 'lon',
  timeZone: 'timeZone',
  arriveAt: 'arrive',
  departAt: 'depart',
  exposure: 'horizon',
  highC: 'high',
  lowC: 'low',
  hookup: 'amps',
  generatorHours: 'generatorStart',
};

/** Builds the API's stop from the form and runs the shared schema on it; its messages land on the right fields. */
export function fromFormValues(v: StopFormValues, units: UnitSystem): StopFromForm {
  const iso = (local: string) => {
    const t = DateTime.fromFormat(local, LOCAL, { zone: v.timeZone });
    // Luxon moves a time inside a spring-forward gap to a real one; a typed time that moved did not exist.
    if (!t.isValid || t.toFormat(LOCAL) !== local) return null;
    return t.toISO({ suppressSeconds: true, suppressMilliseconds: true });
  };
  const arriveAt = iso(v.arrive);
  const departAt = iso(v.depart);
  const errors: Partial<Record<keyof StopFormValues, string>> = {};
  if (!arriveAt)
    errors.arrive = 'That date and time does not exist in this time zone (check the date, or a clock change).';
  if (!departAt)
    errors.depart = 'That date and time does not exist in this time zone (check the date, or a clock change).';
  const horizonDeg = v.horizon
    .split(/[\s,;]+/)
    .filter(Boolean)
    .map(Number);
  if (
    v.exposureKind === 'custom' &&
    (horizonDeg.length < 4 || horizonDeg.length > 36 || horizonDeg.some((h) => !Number.isFinite(h) || h < 0 || h > 90))
  ) {
    errors.horizon = 'List 4 to 36 angles from 0 to 90°, clockwise from north (for example 8 or 16 of them).';
  }
  if (!arriveAt || !departAt || errors.horizon) return { ok: false, errors };
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
    hookup: v.hookupOn ? { amps: v.amps, volts: v.volts } : null,
    generatorHours: v.generatorOn ? { startHour: v.generatorStart, endHour: v.generatorEnd } : null,
    lowC: Math.round(fromDisplay(v.low, 'temperature', units) * 10) / 10,
    highC: Math.round(fromDisplay(v.high, 'temperature', units) * 10) / 10,
  };
  const parsed = stopSchema.safeParse(stop);
  if (parsed.success) return { ok: true, stop };
  for (const issue of parsed.error.issues) {
    const field = FIELD_OF[String(issue.path[0])];
    if (field && !errors[field])
      errors[field] =
        issue.path[0] === 'departAt'
          ? 'The stop must be left after it is reached.'
          : issue.path[0] === 'highC'
            ? 'The high must be at or above the low.'
            : issue.message;
  }
  return { ok: false, errors };
}
