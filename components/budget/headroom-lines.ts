// Words for the "What it would take" card: each lever's answer, with the lowest charge it gives or why it cannot.
import type { HeadroomLever, HeadroomResult } from '@/shared/engine/headroom';

export function leverLine(l: HeadroomLever): { text: string; tone: 'ink' | 'ember' | 'inkSoft' } {
  if (l.status === 'found')
    return { text: `${l.text} — lowest charge then ${l.resultingLowestSocPct.toFixed(0)} %`, tone: 'ink' };
  if (l.status === 'cannot-fix')
    return { text: `cannot fix: ${l.text} (lowest ${l.resultingLowestSocPct.toFixed(0)} %)`, tone: 'ember' };
  return { text: l.text, tone: 'inkSoft' };
}

/** What the card aims at, in words: the reserve, and on recorded years the share of them ("in 9 of 10 past years"). */
export function headroomAim(h: HeadroomResult): string {
  const c = h.confidence;
  if (!h.needed)
    return c
      ? `Nothing: the plan stays above the ${h.reservePct} % reserve in ${c.held} of ${c.of} past years (it holds in ${c.baselineHeld} of ${c.years}).`
      : `Nothing: the plan stays above the ${h.reservePct} % reserve all trip.`;
  return c
    ? `Each on its own, the smallest change that keeps the whole trip above the ${h.reservePct} % reserve in ${c.held} of ${c.of} past years (now it holds in ${c.baselineHeld} of ${c.years}; a bad year's lowest is ${h.baselineLowestSocPct.toFixed(0)} %).`
    : `Each on its own, the smallest change that keeps the whole trip above the ${h.reservePct} % reserve (now the lowest is ${h.baselineLowestSocPct.toFixed(0)} %).`;
}
