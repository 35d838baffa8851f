// Trip contract: stops (where the rig stays) and drives (the moves between them).
import { z } from 'zod';
import { nameText } from './text';
import {
  isoInstantSchema,
  localHourSchema,
  nonNegativeSchema,
  fractionSchema,
  percentSchema,
  timeZoneSchema,
} from './common';
import { LIMITS, fieldRule } from './limits';
import { drivePlanShape } from './drive-plan';

export const sitePresetSchema = z.enum(['open', 'light-cover', 'partial-shade', 'deep-forest']);
export type SitePreset = z.infer<typeof sitePresetSchema>;

export const skyOutlookSchema = z.enum(['clear', 'hazy', 'broken-cloud', 'overcast']);
export type SkyOutlook = z.infer<typeof skyOutlookSchema>;

/**
 * Where a stop's sky comes from: the past years' record at the place (the default), the forecast (for days inside
 * its horizon), or the stop's own sky outlook (for what no record knows, such as wildfire smoke). Without a record
 * or forecast the outlook is the assumed sky either way.
 */
export const stopSkySourceSchema = z.enum(['record', 'forecast', 'preset']);
export type StopSkySource = z.infer<typeof stopSkySourceSchema>;

/** Custom horizon: obstruction elevation per compass sector, sectors clockwise from north (e.g. 8 or 16). */
export const customExposureSchema = z.object({
  kind: z.literal('custom'),
  horizonDeg: z
    .array(z.number().min(0).max(90))
    .min(4)
    .max(LIMITS.horizonSectors, { error: `Use at most ${LIMITS.horizonSectors} compass sectors.` }),
  /** Share of beam light that passes through the obstruction (0 = solid, 1 = nothing there). */
  canopyTransmittance: fractionSchema.default(0),
  /** Share of the sky dome seen by a flat panel; computed from the horizon when left out. */
  skyViewFraction: fractionSchema.optional(),
});

/**
 * Sky openness: the share of the sky hemisphere the pitch sees (as a canopy photo or a phone app measures it), and
 * the leaf-area index of the canopy over the rest, which sets how the sun's beam fades through it.
 */
export const canopyExposureSchema = z.object({
  kind: z.literal('canopy'),
  skyOpennessPct: percentSchema,
  leafAreaIndex: z.number().min(0).max(10).default(3),
  /** Deciduous cover is bare in its hemisphere's leaf-off months. */
  deciduous: z.boolean().default(false),
});
export type CanopyExposure = z.infer<typeof canopyExposureSchema>;

export const siteExposureSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('preset'), preset: sitePresetSchema }),
  canopyExposureSchema,
  customExposureSchema,
]);
export type SiteExposure = z.infer<typeof siteExposureSchema>;

export const hookupSchema = z.object({ amps: z.number().positive().max(100), volts: z.number().positive().max(480) });
export type Hookup = z.infer<typeof hookupSchema>;

/** Local hours the site allows a generator; endHour < startHour means the window crosses midnight. */
export const generatorHoursSchema = z.object({ startHour: localHourSchema, endHour: localHourSchema });
export type GeneratorHours = z.infer<typeof generatorHoursSchema>;

export const stopSchema = z
  .object({
    name: nameText(120, { empty: 'Give the stop a name.' }),
    lat: z.number().min(-90).max(90),
    lon: z.number().min(-180).max(180),
    elevationM: z.number().min(-500).max(6000).default(0),
    timeZone: timeZoneSchema,
    arriveAt: isoInstantSchema,
    departAt: isoInstantSchema,
    exposure: siteExposureSchema.default({ kind: 'preset', preset: 'open' }),
    skyOutlook: skyOutlookSchema.default('clear'),
    skySource: stopSkySourceSchema.default('record'),
    /** Linke turbidity; when given the Ineichen–Perez clear sky is used instead of Haurwitz. */
    linkeTurbidity: z.number().min(1).max(10).optional(),
    hookup: hookupSchema.nullable().default(null),
    /** null: no generator at this stop. Default 08:00–20:00 (common campground quiet hours). */
    generatorHours: generatorHoursSchema.nullable().default({ startHour: 8, endHour: 20 }),
    lowC: z.number().min(-50).max(60),
    highC: z.number().min(-50).max(60),
    /** true: the low and high above stand over recorded and forecast air temperatures. */
    ownTemperatures: z.boolean().default(false),
  })
  .refine((s) => s.highC >= s.lowC, { message: 'The high must be at or above the low.', path: ['highC'] })
  .refine((s) => Date.parse(s.departAt) > Date.parse(s.arriveAt), {
    message: 'Leave after you arrive: pick a later day or time.',
    path: ['departAt'],
  });
export type Stop = z.infer<typeof stopSchema>;
export type StopInput = z.input<typeof stopSchema>;

export const driveSchema = z.object({
  hoursOnRoad: nonNegativeSchema.max(48),
  vehicleCharging: z.boolean().default(true),
  ...drivePlanShape,
});
export type Drive = z.infer<typeof driveSchema>;

export const MAX_TRIP_DAYS = LIMITS.tripDays;
/** A trip of MAX_TRIP_DAYS calendar days spans one hour more when the clocks go back inside it. */
const MAX_TRIP_HOURS = MAX_TRIP_DAYS * 24 + 1;

export const tripSchema = z
  .object({
    name: nameText(120, { empty: 'Give the trip a name.' }),
    stops: z
      .array(stopSchema)
      .min(1)
      .max(LIMITS.stopsPerTrip, { error: `A trip has at most ${LIMITS.stopsPerTrip} stops.` }),
    /** drives[i] goes from stops[i] to stops[i + 1]. */
    drives: z
      .array(driveSchema)
      .max(LIMITS.stopsPerTrip - 1)
      .default([]),
  })
  .superRefine((trip, ctx) => {
    if (trip.drives.length !== trip.stops.length - 1) {
      ctx.addIssue({
        code: 'custom',
        path: ['drives'],
        message: `Expected ${trip.stops.length - 1} drives (one between each pair of stops)`,
      });
    }
    trip.stops.forEach((stop, i) => {
      const next = trip.stops[i + 1];
      if (!next) return;
      const gapH = (Date.parse(next.arriveAt) - Date.parse(stop.departAt)) / 3_600_000;
      if (gapH < 0)
        ctx.addIssue({
          code: 'custom',
          path: ['stops', i + 1, 'arriveAt'],
          message: 'Arrives before the previous stop is left',
        });
      const drive = trip.drives[i];
      if (drive && drive.hoursOnRoad > gapH + 1e-9) {
        ctx.addIssue({
          code: 'custom',
          path: ['drives', i, 'hoursOnRoad'],
          message: `Longer than the ${gapH.toFixed(1)} h between the stops`,
        });
      }
    });
    const first = trip.stops[0];
    const last = trip.stops[trip.stops.length - 1];
    if (first && last) {
      const hours = (Date.parse(last.departAt) - Date.parse(first.arriveAt)) / 3_600_000;
      if (hours > MAX_TRIP_HOURS)
        ctx.addIssue({
          code: 'custom',
          path: ['stops'],
          message: `A trip may last at most ${MAX_TRIP_DAYS} days`,
          params: fieldRule(MAX_TRIP_DAYS),
        });
    }
  });
export type Trip = z.infer<typeof tripSchema>;
export type TripInput = z.input<typeof tripSchema>;
