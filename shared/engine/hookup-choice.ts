// A hookup fix with another supply: the supplies a traveller may pick (the stop's country's first, then the rest of
// the table in shared/hookup-supply.ts), and the check of a picked supply against its flag by the very code that
// checks the engine's own hookup fix.
import { HOOKUP_REGIONS, hookupRegionOf, type HookupSupply } from '../hookup-supply';
import { engineInputSchema, type EngineInputDraft } from '../schemas/engine-input';
import { fixContextOf } from './check-fixes';
import { hookupFix } from './fixes';
import type { FixCheck, Flag } from './result-types';

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

/**
 * Whether a hookup of this supply at the stop clears the flag, and the lowest charge it gives inside the flag: the
 * engine's own hookup fix, checked as every fix is (in each recorded year when the input carries a record), with the
 * picked supply as the trip's chosen one. Null when the stop could not take a hookup fix at all.
 */
export function checkHookupSupply(
  draft: EngineInputDraft,
  flag: Flag,
  stopIndex: number,
  supply: HookupSupply,
): FixCheck | null {
  const input = engineInputSchema.parse(draft);
  const { ctx } = fixContextOf({ ...input, options: { ...input.options, assumedHookup: supply } });
  return hookupFix(ctx, flag, stopIndex)?.check ?? null;
}
