// Where the battery walk restarts from: a state of charge (and propane) read at a time on the road. The hours before
// it stay as planned; from the first hour that starts at or after it the walk carries the reading forward.
import { z } from 'zod';
import { isoInstantSchema, percentSchema } from './common';

export const startStateSchema = z
  .object({
    at: isoInstantSchema,
    socPct: percentSchema,
    /** Propane left across all cylinders; null keeps the plan's own count. */
    propaneKg: z.number().min(0).max(4000).nullable().default(null),
  })
  .strict();
export type StartState = z.infer<typeof startStateSchema>;
