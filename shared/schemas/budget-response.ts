// The shapes `GET …/budget` and `GET …/ledger` answer with. The app reads the bytes as these types without
// parsing them again (a budget is large and already checked where it is made); the API tests hold the server to them.
import { z } from 'zod';
import type { BudgetResult } from '../budget-result';
import { LEDGER_NUMBER_FIELDS, type LedgerColumns } from '../ledger-columns';

export type BudgetResponse = { version: number; result: BudgetResult | null; reason?: string };
export type LedgerResponse = { version: number; ledger: LedgerColumns | null; reason?: string };

const numbers = z.array(z.number());
const strings = z.array(z.string());
const whereKinds = z.array(z.enum(['s', 'd']));
const indexes = z.array(z.number().int().nonnegative());

/** Every column has one entry per hour. */
const sameLength = (columns: Record<string, readonly unknown[]>): boolean => {
  const lengths = new Set(Object.values(columns).map((column) => column.length));
  return lengths.size <= 1;
};

export const socTrackSchema = z
  .object({ utc: strings, local: strings, socPct: numbers, whereKind: whereKinds, whereIndex: indexes })
  .strict()
  .refine(sameLength, { message: 'Every column of the state-of-charge track has one entry per hour' });

export const ledgerColumnsSchema = z
  .object({
    utc: strings,
    local: strings,
    whereKind: whereKinds,
    whereIndex: indexes,
    ...Object.fromEntries(LEDGER_NUMBER_FIELDS.map((field) => [field, numbers])),
  })
  .strict()
  .refine(sameLength, { message: 'Every ledger column has one entry per hour' }) as unknown as z.ZodType<LedgerColumns>;

const whereSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('stop'), stopIndex: z.number().int() }),
  z.object({ kind: z.literal('drive'), driveIndex: z.number().int() }),
]);

const headlineSchema = z.looseObject({
  capacityWh: z.number(),
  reservePct: z.number(),
  lowestSocPct: z.number(),
  lowestAtUtc: z.string(),
  lowestAtLocal: z.string(),
  lowestWhere: whereSchema,
  energyShortWh: z.number(),
});

const daySchema = z.looseObject({
  dayIndex: z.number().int(),
  date: z.string(),
  netWh: z.number(),
  lowestSocPct: z.number(),
  endSocPct: z.number(),
});

const flagSchema = z.looseObject({
  id: z.string(),
  kind: z.string(),
  severity: z.enum(['danger', 'warning', 'info']),
  atUtc: z.string(),
  atLocal: z.string(),
  where: whereSchema,
  cause: z.string(),
});

/** The budget without its hourly rows: no `ledger` key may come back into it. */
export const budgetResultSchema = z
  .object({
    soc: socTrackSchema,
    days: z.array(daySchema),
    headline: headlineSchema,
    flags: z.array(flagSchema),
    band: z
      .object({ better: z.looseObject({ socPct: numbers }), worse: z.looseObject({ socPct: numbers }) })
      .nullable(),
    chance: z.looseObject({ years: z.number(), held: z.number() }).nullable(),
    socBand: z.object({ p10: numbers, p90: numbers }).nullable(),
    skies: z.looseObject({ assumedStops: z.number() }),
  })
  .strict();

export const budgetResponseSchema = z.union([
  z.object({ version: z.number().int(), result: budgetResultSchema }).strict(),
  z.object({ version: z.number().int(), result: z.null(), reason: z.string() }).strict(),
]);

export const ledgerResponseSchema = z.union([
  z.object({ version: z.number().int(), ledger: ledgerColumnsSchema }).strict(),
  z.object({ version: z.number().int(), ledger: z.null(), reason: z.string() }).strict(),
]);
