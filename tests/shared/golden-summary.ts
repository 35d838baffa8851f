// What golden.test.ts pins for one input: a sha256 of the JSON of each part of the result, its flags carrying the
// fixes checkFixes gives them (so any change in any digit shows), plus readable spot values (headline, flags, a few ledger rows, first and last day sheet, the
// headroom in full) so a failing comparison says where the results part.
import { createHash } from 'node:crypto';
import { checkFixes, findHeadroom, simulateTrip, withFixes } from '@/shared/engine';
import type { EngineInputDraft } from '@/shared/schemas';

export type GoldenSummary = {
  sha256: {
    result: string;
    ledger: string;
    days: string;
    headline: string;
    flags: string;
    band: string;
    headroom: string;
  };
  ledgerLength: number;
  ledgerSpots: unknown[];
  firstDay: unknown;
  lastDay: unknown;
  headline: unknown;
  flags: unknown;
  bandLowest: { better: number; worse: number } | null;
  headroom: unknown;
};

const sha256 = (s: string): string => createHash('sha256').update(s).digest('hex');

/** A JSON round trip, so the stored fixture and the live value compare alike (Infinity and NaN become null). */
const plain = (v: unknown): unknown => JSON.parse(JSON.stringify(v)) as unknown;

/** Ledger rows at fixed fractions of the trip: start, around the first evening, middle, late, last. */
export function spotIndexes(n: number): number[] {
  return [...new Set([0, Math.min(n - 1, 19), Math.floor(n / 3), Math.floor(n / 2), Math.floor((4 * n) / 5), n - 1])];
}

export function goldenSummary(input: EngineInputDraft): GoldenSummary {
  // The fixes are checked apart from the budget; put back on their flags, the result reads as it was captured.
  const budget = simulateTrip(input);
  const r = { ...budget, flags: withFixes(budget.flags, checkFixes(input)) };
  const h = findHeadroom(input);
  return {
    sha256: {
      result: sha256(JSON.stringify(r)),
      ledger: sha256(JSON.stringify(r.ledger)),
      days: sha256(JSON.stringify(r.days)),
      headline: sha256(JSON.stringify(r.headline)),
      flags: sha256(JSON.stringify(r.flags)),
      band: sha256(JSON.stringify(r.band)),
      headroom: sha256(JSON.stringify(h)),
    },
    ledgerLength: r.ledger.length,
    ledgerSpots: spotIndexes(r.ledger.length).map((i) => plain(r.ledger[i])),
    firstDay: plain(r.days[0]),
    lastDay: plain(r.days[r.days.length - 1]),
    headline: plain(r.headline),
    flags: plain(r.flags),
    bandLowest: r.band ? { better: r.band.better.lowestSocPct, worse: r.band.worse.lowestSocPct } : null,
    headroom: plain(h),
  };
}
