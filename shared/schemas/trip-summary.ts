import { z } from 'zod';

/** A calendar date, YYYY-MM-DD, that really exists (no 31 February). */
export const isoDateSchema = z.iso.date({ error: 'Use a date like 2027-09-12.' });

/** What the trips list shows of a trip; the API answers GET /api/trips with these. */
export const tripSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  startDate: isoDateSchema,
  endDate: isoDateSchema,
  timeZone: z.string(),
  version: z.number().int(),
  updatedAt: z.string(),
  /** Filled in lists: the caller's role, the rig's name and the budget's headline. */
  role: z.enum(['owner', 'planner', 'crew', 'viewer']).optional(),
  rigName: z.string().nullable().optional(),
  lowestSocPct: z.number().nullable().optional(),
  reservePct: z.number().nullable().optional(),
  flagCount: z.number().int().nullable().optional(),
  /**
   * How current the budget figures are: `current`; `computing` (none yet, or the last ones, of an earlier version
   * of the plan, while the new budget is computed); `unavailable` (no stops yet, or a plan too large to compute).
   */
  budgetStatus: z.enum(['current', 'computing', 'unavailable']).optional(),
  /** The clubs the trip is shared with, by name (for its owner and planners, who manage the shares). */
  sharedWith: z.array(z.string()).optional(),
  /** The stops' positions and lowest charge there, for the card's small map. */
  route: z.array(z.object({ lat: z.number(), lon: z.number(), lowestSocPct: z.number().nullable() })).optional(),
});

export type TripSummary = z.infer<typeof tripSummarySchema>;

export const tripListResponseSchema = z.object({ trips: z.array(tripSummarySchema) });
export type TripListResponse = z.infer<typeof tripListResponseSchema>;

export const tripResponseSchema = z.object({ trip: tripSummarySchema });
export type TripResponse = z.infer<typeof tripResponseSchema>;
