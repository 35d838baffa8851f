// checkFixes: the fixes of a trip's flags, each checked by walking the trip again with it applied. It is its own
// step, apart from simulateTrip, because checking costs dozens of extra walks of the battery (each recorded year's
// too): the server computes it when someone looks at the flags, and the app runs it for a what-if the same way.
// The flags are the planned run's, found exactly as simulateTrip finds them, and matched by id.
import { engineInputSchema, type EngineInput, type EngineInputDraft } from '../schemas/engine-input';
import { FIX_HOLD_SHARE, shortfallFixes, type FixContext, type TrialBase } from './fixes';
import { isShortfall } from './flags';
import { dcCurrentA, inverterDcDrawW } from './inverter';
import { overloadFixes } from './overload-fixes';
import type { Fix, Flag, FlagFixes, FlagWithFixes } from './result-types';
import { planTrip } from './simulate';

export type CheckFixesOptions = {
  /** Only these flags (by id); all of them when left out. */
  flagIds?: readonly string[];
  /** With recorded years, the share of them a fix must hold in to clear its flag; FIX_HOLD_SHARE (9 in 10) by default. */
  holdShare?: number;
};

/** Advice that needs no walk: more propane, a warm battery, cables sized for the inverter's current. */
function adviceFixes(input: EngineInput, flag: Flag): Fix[] {
  switch (flag.kind) {
    case 'propane-out': {
      const extraKg = flag.size.value;
      return [
        { kind: 'add-propane', text: `${extraKg} kg more propane (a refill or another cylinder)`, params: { extraKg } },
      ];
    }
    case 'cold-charge-blocked':
      return [
        {
          kind: 'keep-battery-warm',
          text: 'keep the battery inside the heated space (or use a self-heating battery)',
          params: { heatedSpace: true },
        },
      ];
    case 'high-dc-current': {
      const inv = input.rig.inverter;
      if (!inv) return [];
      const amps = dcCurrentA(inverterDcDrawW(inv, inv.ratedW, 1), input.rig.battery.nominalV);
      return [
        {
          kind: 'check-cabling',
          text: `size cables and fuse for ${Math.round(amps)} A by the applicable code and have a qualified installer check them`,
          params: { currentA: Math.round(amps), minFuseA: Math.ceil(amps * 1.25) },
        },
      ];
    }
    default:
      return [];
  }
}

/**
 * The planned run of a validated input and what its fixes are checked against: the planned walk and, with a record,
 * each recorded year under its own sky and air, as the chance of holding ran it.
 */
export function fixContextOf(
  input: EngineInput,
  holdShare = FIX_HOLD_SHARE,
): { run: ReturnType<typeof planTrip>; ctx: FixContext } {
  const run = planTrip(input);
  const { p, solar, planned, sky, years, capacityWh, reservePct } = run;
  const base = (scenario: typeof planned, cabinSolarW: Float64Array, ambientC: Float64Array): TrialBase => ({
    scenario,
    cabinSolarW,
    ambientC,
  });
  const ctx: FixContext = {
    p,
    planned: base(planned, solar.cabinSolarW, sky?.ambientC ?? p.ambientC),
    years: (years?.years ?? []).map(({ sky: yearSky, run: yearRun }) => {
      return base(yearRun.scenario, yearRun.solar.cabinSolarW, yearSky.ambientC);
    }),
    holdShare,
    capacityWh,
    reservePct,
    trials: new Map(),
  };
  return { run, ctx };
}

/** The checked fixes of each flag of a validated input, in the flags' order. */
export function checkFixesParsed(input: EngineInput, options: CheckFixesOptions = {}): FlagFixes[] {
  const { run, ctx } = fixContextOf(input, options.holdShare);
  const { planned } = run;
  const wanted = options.flagIds ? new Set(options.flagIds) : null;
  return run.flags
    .filter((flag) => !wanted || wanted.has(flag.id))
    .map((flag) => ({
      flagId: flag.id,
      fixes: isShortfall(flag)
        ? shortfallFixes(ctx, flag)
        : flag.kind === 'inverter-overload'
          ? overloadFixes(ctx, planned.loads, flag)
          : adviceFixes(input, flag),
    }));
}

/** Validate and check the fixes of a trip's flags. Invalid input throws a ZodError listing each bad field. */
export function checkFixes(input: EngineInputDraft, options?: CheckFixesOptions): FlagFixes[] {
  return checkFixesParsed(engineInputSchema.parse(input), options);
}

/** The flags with their fixes (none for a flag the list does not name). */
export function withFixes(flags: readonly Flag[], checked: readonly FlagFixes[]): FlagWithFixes[] {
  const byId = new Map(checked.map((c) => [c.flagId, c.fixes]));
  return flags.map((flag) => ({ ...flag, fixes: byId.get(flag.id) ?? [] }));
}
