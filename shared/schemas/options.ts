// Simulation options, all with defaults a user would expect.
import { z } from 'zod';
import { hookupSchema } from './trip';

export const optionsSchema = z.object({
  transposition: z.enum(['hay-davies', 'isotropic']).default('hay-davies'),
  /** Ground reflectance; 0.2 is the common default for grass and gravel. */
  groundReflectance: z.number().min(0).max(1).default(0.2),
  /** W/m²; 1361 after Kopp & Lean (2011). */
  solarConstantWm2: z.number().min(1300).max(1400).default(1361),
  /** Losses at the panel's glass by the angle of incidence (Martin & Ruiz); off only for closed-form checks. */
  incidenceLosses: z.boolean().default(true),
  /** Run the same trip under one sky level better and one worse. */
  skyBand: z.boolean().default(true),
  /** Hookup the headroom finder assumes when it books a night at a stop that has none. */
  /** The hookup supply fixes offer when the trip names one; else the supply usual in each stop's country. */
  assumedHookup: hookupSchema.optional(),
});
export type Options = z.infer<typeof optionsSchema>;
