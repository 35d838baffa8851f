// The whole engine input: one trip on one rig with its appliances.
import { z } from 'zod';
import { applianceSchema } from './appliance';
import { engineWeatherSchema } from './engine-weather';
import { optionsSchema } from './options';
import { rigSchema } from './rig';
import { startStateSchema } from './start-state';
import { LIMITS } from './limits';
import { tripSchema } from './trip';

export const engineInputSchema = z
  .object({
    trip: tripSchema,
    rig: rigSchema,
    appliances: z
      .array(applianceSchema)
      .max(LIMITS.appliancesPerTrip, { error: `A trip has at most ${LIMITS.appliancesPerTrip} appliances.` })
      .default([]),
    options: optionsSchema.default(optionsSchema.parse({})),
    /** Recorded years and the forecast per stop; null: every stop plans with its preset sky. */
    weather: engineWeatherSchema.nullable().default(null),
    /** A reading on the road to walk on from (a check-in); null walks the whole trip from the rig's own start. */
    startState: startStateSchema.nullable().default(null),
  })
  .superRefine((input, ctx) => {
    const seen = new Set<string>();
    input.appliances.forEach((a, i) => {
      if (seen.has(a.id))
        ctx.addIssue({ code: 'custom', path: ['appliances', i, 'id'], message: `Duplicate appliance id ${a.id}` });
      seen.add(a.id);
    });
  });
export type EngineInput = z.infer<typeof engineInputSchema>;
/** What callers may pass before defaults are filled in. */
export type EngineInputDraft = z.input<typeof engineInputSchema>;
