// A check-in: a reading taken on the road (the battery monitor's state of charge, the propane left, a day's
// harvest from the charge controller's history). The budget re-forecasts the rest of the trip from the latest one.
import { z } from 'zod';
import { isoInstantSchema, percentSchema } from './common';
import { fieldRule, LIMITS } from './limits';

/** How much is left in one cylinder, the way people read it: full, roughly a share, or weighed. */
export const propaneReadingSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('full') }).strict(),
  z.object({ kind: z.literal('fraction'), share: z.number().min(0, 'Use 0 to 1.').max(1, 'Use 0 to 1.') }).strict(),
  /** Propane left in kg, not counting the cylinder itself. */
  z
    .object({
      kind: z.literal('weight'),
      kg: z.number().min(0, 'A weight cannot be negative.').max(500, 'Use at most 500 kg.'),
    })
    .strict(),
]);
export type PropaneReading = z.infer<typeof propaneReadingSchema>;

/** One cylinder's reading; `tank` is the cylinder's place in the rig's list (0 = the first). */
export const cylinderReadingSchema = z
  .object({
    tank: z
      .number()
      .int()
      .min(0)
      .max(LIMITS.propaneTanksPerRig - 1),
    reading: propaneReadingSchema,
  })
  .strict();
export type CylinderReading = z.infer<typeof cylinderReadingSchema>;

/** The most a day's harvest can sensibly be: 40 kW of panels for 24 hours. */
const HARVEST_WH_MAX = 1_000_000;

export const checkInFieldsSchema = z
  .object({
    /** When the reading was taken; the server uses "now" when it is left out. */
    at: isoInstantSchema.optional(),
    socPct: percentSchema,
    propane: z
      .array(cylinderReadingSchema)
      .max(LIMITS.propaneTanksPerRig, { error: `A rig has at most ${LIMITS.propaneTanksPerRig} cylinders.` })
      .default([])
      .refine((list) => new Set(list.map((c) => c.tank)).size === list.length, {
        message: 'Each cylinder can be read once per check-in.',
        params: fieldRule(),
      }),
    /** Yesterday's harvest from the charge controller's daily history. */
    harvestWh: z.number().min(0, 'A harvest cannot be negative.').max(HARVEST_WH_MAX).nullable().default(null),
    note: z
      .string()
      .trim()
      .max(LIMITS.checkInNoteChars, { error: `Use at most ${LIMITS.checkInNoteChars} characters.` })
      .default(''),
  })
  .strict();
export type CheckInFields = z.infer<typeof checkInFieldsSchema>;
export type CheckInFieldsInput = z.input<typeof checkInFieldsSchema>;

export const checkInRecordSchema = z.object({
  id: z.string(),
  version: z.number().int().min(1),
  authorId: z.string().nullable(),
  authorName: z.string(),
  createdAt: z.string(),
  checkIn: checkInFieldsSchema.extend({ at: isoInstantSchema }),
});
export type CheckInRecord = z.infer<typeof checkInRecordSchema>;

export const createCheckInRequestSchema = z.object({ checkIn: checkInFieldsSchema }).strict();
export const updateCheckInRequestSchema = z
  .object({ version: z.number().int().min(1), checkIn: checkInFieldsSchema })
  .strict();

/** Propane left in one cylinder of `capacityKg` for a reading. A weight above the cylinder's size counts as full. */
export function propaneKgOf(reading: PropaneReading, capacityKg: number): number {
  switch (reading.kind) {
    case 'full':
      return capacityKg;
    case 'fraction':
      return reading.share * capacityKg;
    case 'weight':
      return Math.min(reading.kg, capacityKg);
  }
}
