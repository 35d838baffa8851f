// The largest plan the API accepts. Each maximum is what a real trip needs with room to spare; together they keep
// the budget of the largest plan well inside a quarter of a second (the "largest plan" case of `npm run bench`).
// README's "Limits" section lists them; change both together.

export const LIMITS = {
  /** Days of a trip, its first and last day both counted: a whole season away. */
  tripDays: 120,
  /** Stops per trip: a new pitch every second night of the longest trip. */
  stopsPerTrip: 60,
  /** Appliances per trip: a large rig has 30 to 40 loads. */
  appliancesPerTrip: 60,
  /** Routine windows per appliance (also a thermostat's active windows and a generator's routine). */
  windowsPerAppliance: 24,
  /** Compass sectors of a custom horizon (every 10°). */
  horizonSectors: 36,
  solarArraysPerRig: 8,
  propaneTanksPerRig: 8,
  /** Clubs one person may organise. */
  clubsPerUser: 20,
  /** Trips one person owns: years of weekends and rallies. */
  tripsPerUser: 500,
  /** Rigs one person keeps in My rigs. */
  savedRigsPerUser: 50,
  /** Characters of a trip, stop, rig or club name. */
  nameChars: 120,
  /** Characters of an appliance, array or cylinder name. */
  shortNameChars: 80,
  /** Characters of a trip's or stop's notes. */
  notesChars: 4000,
  /** Check-ins per trip: several a day on the longest trip. */
  checkInsPerTrip: 600,
  /** Characters of a check-in's note. */
  checkInNoteChars: 1000,
  /** Characters of a record id. */
  idChars: 64,
} as const;

/**
 * Issue params for a refinement about one field on its own (a size limit, a list naming a day twice): the API
 * answers such a refusal 400 like any value out of range, not 422 like a rule between fields.
 */
export const fieldRule = (limit?: number) => ({ fieldRule: true, ...(limit === undefined ? {} : { limit }) });

export function isFieldRuleIssue(issue: { code: string; params?: unknown }): boolean {
  return (
    issue.code === 'custom' &&
    typeof issue.params === 'object' &&
    issue.params !== null &&
    (issue.params as { fieldRule?: unknown }).fieldRule === true
  );
}

/** Days from startDate to endDate (YYYY-MM-DD), both counted: 1 for a trip that ends the day it starts. */
export function tripDayCount(startDate: string, endDate: string): number {
  return Math.round((Date.parse(`${endDate}T00:00Z`) - Date.parse(`${startDate}T00:00Z`)) / 86_400_000) + 1;
}
