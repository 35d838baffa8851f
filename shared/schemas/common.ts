// Shared building blocks for the engine's input contracts.
// Units live in field names (W, Wh, Ah, V, A, °C, kg, m, deg); US units are converted in shared/units.ts.
import { IANAZone } from 'luxon';
import { z } from 'zod';

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

// Checking a zone builds an Intl formatter, which is slow; remember the answers.
const zoneValidity = new Map<string, boolean>();
function isValidZone(zone: string): boolean {
  const known = zoneValidity.get(zone);
  if (known !== undefined) return known;
  const valid = IANAZone.isValidZone(zone);
  zoneValidity.set(zone, valid);
  return valid;
}

export const timeZoneSchema = z
  .string()
  .refine(isValidZone, { message: 'Use an IANA time zone such as Europe/London' });

export const localHourSchema = z.number().int().min(0).max(24);

export const dayTypeSchema = z.enum(['travel', 'camp']);
export type DayType = z.infer<typeof dayTypeSchema>;

/** Which trip days a routine window applies to. */
export const daySelectorSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('all') }),
  z.object({ kind: z.literal('trip-days'), dayIndexes: z.array(z.number().int().min(0).max(366)).min(1) }),
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
