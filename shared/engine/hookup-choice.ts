// A hookup fix with another supply: the supplies a traveller may pick (the stop's country's first, then the rest of
// the table in shared/hookup-supply.ts), and the check of a picked supply against its flag, the way every fix is
// checked: the battery walked again with the hookup on at the stop, and the flag cleared when, from its draw-down's
// start to its window's end, the charge stays at or above the reserve and nothing runs short.
import { HOOKUP_REGIONS, hookupRegionOf, type HookupSupply } from '../hookup-supply';
import { engineInputSchema, type EngineInputDraft } from '../schemas/engine-input';
import { prepare } from './prepare';
import type { FixCheck, Flag } from './result-types';
import { plannedScenario, reservePctOf } from './simulate';
import { solarSeries } from './solar';
import { newLedger, walk } from './walk';

export const supplyKey = (s: HookupSupply): string => `${s.amps}A-${s.volts}V`;

/** The supplies to offer at a stop: its country's usual ones first, then every other one the table knows, once each. */
export function hookupSupplyChoices(timeZone: string): HookupSupply[] {
  const own = hookupRegionOf(timeZone);
  const regions = own ? [own, ...HOOKUP_REGIONS.filter((r) => r !== own)] : [...HOOKUP_REGIONS];
  const seen = new Set<string>();
  const out: HookupSupply[] = [];
  for (const r of regions)
    for (const s of r.options) {
      if (seen.has(supplyKey(s))) continue;
      seen.add(supplyKey(s));
      out.push(s);
    }
  return out;
}

/** Whether a hookup of this supply at the stop clears the flag, and the lowest charge it gives inside the flag. */
export function checkHookupSupply(
  draft: EngineInputDraft,
  flag: Flag,
  stopIndex: number,
  supply: HookupSupply,
): FixCheck {
  const input = engineInputSchema.parse(draft);
  const p = prepare(input);
  const base = plannedScenario(p, solarSeries(p, 0));
  const hookupW = Float64Array.from(base.hookupW);
  for (let i = 0; i < p.n; i++) if (p.where[i] === stopIndex) hookupW[i] = supply.amps * supply.volts;
  const l = newLedger(p.n);
  walk(p, { ...base, hookupW }, l);
  const reservePct = reservePctOf(input);
  let lowest = 100;
  let short = 0;
  for (let i = flag.drawdown.firstRow; i <= flag.window.lastRow; i++) {
    lowest = Math.min(lowest, l.socPct[i] ?? 0);
    short += l.energyShortWh[i] ?? 0;
  }
  return { clears: lowest >= reservePct - 1e-6 && short <= 1e-6, lowestSocPct: lowest };
}
