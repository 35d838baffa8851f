// Shared building blocks for the engine's input contracts.
// Units live in field names (W, Wh, Ah, V, A, °C, kg, m, deg); US units are converted in shared/units.ts.
import { IANAZone } from 'luxon';
import { z } from 'zod';
import { LIMITS, fieldRule } from './limits';
import './plain-errors';

export const percentSchema = z.number().min(0).max(100);
export const fractionSchema = z.number().min(0).max(1);
export const nonNegativeSchema = z.number().nonnegative();
export const positiveSchema = z.number().positive();

/** An instant with an explicit offset or Z, so it never depends on the machine's time zone. */
const ISO_INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,3})?)?(Z|[+-]\d{2}:\d{2})$/;
export const isoInstantSchema = z
  .string()
  .regex(ISO_INSTANT, { message: 'Use an ISO time with an offset or Z, e.g. 2027-09-12T14:00+01:00' })
  .refine((s) => Number.isFinite(Date.parse(s)), { message: 'Not a real date and time' });

// Checking a zone builds an Intl formatter, which is slow; remember the zones found valid. Only those: there are a
// few hundred of them, while a client can send any number of different wrong names.
const validZones = new Set<string>();
/** Longer than any IANA zone name ("America/Argentina/ComodRivadavia" has 32 characters). */
const ZONE_NAME_MAX = 64;
function isValidZone(zone: string): boolean {
  if (validZones.has(zone)) return true;
  if (zone.length > ZONE_NAME_MAX || !IANAZone.isValidZone(zone)) return false;
  validZones.add(zone);
  return true;
}

export const timeZoneSchema = z
  .string()
  .max(ZONE_NAME_MAX)
  .refine(isValidZone, { message: 'Not a known time zone: choose one from the list, such as Europe/London.' });

export const localHourSchema = z.number().int().min(0).max(24);

export const dayTypeSchema = z.enum(['travel', 'camp']);
export type DayType = z.infer<typeof dayTypeSchema>;

/**
 * Days of the trip a window names, 0 for its first local day: each day once, none past the longest trip. (The API
 * also holds them inside the trip's own dates.) A trip of LIMITS.tripDays days can touch one more local day when its
 * first night begins late, so the last index allowed is LIMITS.tripDays.
 */
const LAST_DAY_INDEX = LIMITS.tripDays;
const MOST_DAY_INDEXES = LIMITS.tripDays + 1;

// Checked in one pass over the list rather than by a schema per number: the largest plan holds over a hundred
// thousand day numbers, and element-by-element checking was a third of its budget's time.
export const dayIndexesSchema = z
  .custom<number[]>((value) => Array.isArray(value), {
    error: 'Give the days as a list of day numbers.',
    params: fieldRule(),
  })
  .superRefine((days, ctx) => {
    if (!Array.isArray(days)) return;
    const refuse = (message: string) => ctx.addIssue({ code: 'custom', message, params: fieldRule(MOST_DAY_INDEXES) });
    if (days.length === 0) return refuse('Choose at least one day.');
    if (days.length > MOST_DAY_INDEXES) return refuse(`Name at most ${MOST_DAY_INDEXES} days, each once.`);
    const seen = new Uint8Array(MOST_DAY_INDEXES);
    for (const day of days) {
      if (typeof day !== 'number' || !Number.isInteger(day) || day < 0 || day > LAST_DAY_INDEX)
        return refuse(`Use day numbers from 0 to ${LAST_DAY_INDEX} (a trip has at most ${LIMITS.tripDays} days).`);
      if (seen[day] === 1) return refuse('Name each day once.');
      seen[day] = 1;
    }
  });

/** Which trip days a routine window applies to. */
export const daySelectorSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('all') }),
  z.object({ kind: z.literal('trip-days'), dayIndexes: dayIndexesSchema }),
  z.object({ kind: z.literal('day-type'), dayType: dayTypeSchema }),
]);
export type DaySelector = z.infer<typeof daySelectorSchema>;

/** A routine window in the stop's local time: starts at hour:minute and lasts `minutes` (may cross midnight). */
export const routineWindowSchema = z.object({
  days: daySelectorSchema.default({ kind: 'all' }),
  startHour: z.number().int().min(0).max(23),
  startMinute: z.number().int().min(0).max(59).default(0),
  minutes: z.number().int().min(1).max(1440),
});
export type RoutineWindow = z.infer<typeof routineWindowSchema>;

/** An appliance's (or a generator's) routine windows, at most LIMITS.windowsPerAppliance. */
export const routineWindowsSchema = z
  .array(routineWindowSchema)
  .max(LIMITS.windowsPerAppliance, { error: `Use at most ${LIMITS.windowsPerAppliance} time windows.` });
