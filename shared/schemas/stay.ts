// Stay longer or leave early: nights added to or taken from one stop, and what gives way.
import { z } from 'zod';
import { fieldRule } from './limits';

/** 'shift-rest': later stops move by the same nights (the trip grows or shrinks); 'next-stop': the next stop gives or takes them. */
export const stayModeSchema = z.enum(['shift-rest', 'next-stop']);
export type StayMode = z.infer<typeof stayModeSchema>;

/** At most a month more or less at one stop in one change. */
export const MOST_NIGHTS_CHANGED = 30;

export const changeStayRequestSchema = z
  .object({
    tripVersion: z.number().int().min(1),
    nights: z
      .number()
      .int('Use whole nights.')
      .min(-MOST_NIGHTS_CHANGED)
      .max(MOST_NIGHTS_CHANGED)
      .refine((n) => n !== 0, { message: 'Add or remove at least one night.', params: fieldRule() }),
    mode: stayModeSchema,
  })
  .strict();
export type ChangeStayRequest = z.infer<typeof changeStayRequestSchema>;
