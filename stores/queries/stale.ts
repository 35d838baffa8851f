// Named freshness times for TanStack Query; never inline numbers.
export const STALE = {
  SECONDS: { THIRTY: 30_000 },
  MINUTES: { ONE: 60_000, FIVE: 5 * 60_000 },
  DAYS: { ONE: 24 * 60 * 60_000, SEVEN: 7 * 24 * 60 * 60_000 },
} as const;
