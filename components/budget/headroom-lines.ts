// Words for the "What it would take" card: each lever's answer, with the lowest charge it gives or why it cannot.
import type { HeadroomLever } from '@/shared/engine/headroom';

export function leverLine(l: HeadroomLever): { text: string; tone: 'ink' | 'ember' | 'inkSoft' } {
  if (l.status === 'found')
    return { text: `${l.text} — lowest charge then ${l.resultingLowestSocPct.toFixed(0)} %`, tone: 'ink' };
  if (l.status === 'cannot-fix')
    return { text: `cannot fix: ${l.text} (lowest ${l.resultingLowestSocPct.toFixed(0)} %)`, tone: 'ember' };
  return { text: l.text, tone: 'inkSoft' };
}
