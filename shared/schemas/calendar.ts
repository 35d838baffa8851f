import { z } from 'zod';

/** A calendar subscription address as its owner sees it; the secret part is only ever in `url` when just made. */
export const calendarFeedSchema = z.object({
  id: z.string(),
  createdAt: z.string(),
  lastFetchedAt: z.string().nullable(),
  /** Present once, in the answer to creating it: the server keeps only a hash of the token. */
  url: z.string().optional(),
  webcalUrl: z.string().optional(),
});
export type CalendarFeed = z.infer<typeof calendarFeedSchema>;

export const calendarFeedListSchema = z.object({ feeds: z.array(calendarFeedSchema) });
export type CalendarFeedList = z.infer<typeof calendarFeedListSchema>;

/** Each member may keep a few addresses per trip (a phone, a laptop, a shared family calendar). */
export const MAX_CALENDAR_FEEDS = 5;
