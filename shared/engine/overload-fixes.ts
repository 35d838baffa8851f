// Fixes for an inverter overload. One appliance alone over the rating: a larger inverter (the next common size),
// that appliance only where a hookup carries it, or only while the generator runs (checked by walking the trip with
// that schedule: it clears when the inverter is never overloaded at that place while the appliance runs); staggering
// cannot help. Several together: staggering them, or a larger inverter.
import type { Appliance } from '../schemas/appliance';
import type { StepLoads } from './climate';
import { applianceTrial, shoreOnlySchedule, type FixContext } from './fixes';
import { nextInverterW, overloadedAt, runningAc } from './flags';
import { generatorHoursText, generatorOnlySchedule } from './generator-only';
import type { Fix, FixCheck, Flag } from './result-types';
import { nameInSentence } from './flag-text';

function generatorOnlyFix(ctx: FixContext, flag: Flag, alone: Appliance): Fix | null {
  const { p } = ctx;
  const row = flag.window.firstRow;
  const place = p.where[row] ?? -1;
  const stop = place >= 0 ? p.input.trip.stops[place] : undefined;
  if (!stop?.generatorHours) return null;
  const schedule = generatorOnlySchedule(p, alone);
  if (!schedule) return null;
  const kind = 'appliance-generator-only' as const;
  const run = applianceTrial(ctx, alone, { kind, schedule }).planned;
  // Cleared when, at that place, the inverter is never overloaded while this appliance runs (another appliance's
  // overload there is a flag of its own once this one is gone).
  const loads = run.scenario.loads;
  let stillAt = -1;
  for (let i = 0; i < run.p.n && stillAt < 0; i++)
    if (
      run.p.where[i] === place &&
      overloadedAt(run.p, loads, run.genHours, i) &&
      runningAc({ p: run.p, loads }, i).some((a) => a.id === alone.id)
    )
      stillAt = i;
  let lowest = 100;
  for (let i = 0; i < run.p.n; i++) lowest = Math.min(lowest, run.socPct[i] ?? 100);
  const check: FixCheck = { clears: stillAt < 0, lowestSocPct: lowest };
  const name = nameInSentence(alone.name);
  return {
    kind,
    text:
      `run the ${name} only while the generator runs (${generatorHoursText(p, place)})` +
      (check.clears ? '' : ' — helps, not enough alone (the inverter is still overloaded there when it runs)'),
    params: { applianceId: alone.id },
    applianceEdit: { applianceId: alone.id, schedule },
    check,
  };
}

/** The fixes of an inverter-overload flag, from the AC loads running at its row. */
export function overloadFixes(ctx: FixContext, loads: StepLoads, flag: Flag): Fix[] {
  const { p } = ctx;
  const inv = p.input.rig.inverter;
  if (!inv) return [];
  const i = flag.window.firstRow;
  const ratedW = inv.ratedW;
  const surgeW = inv.surgeW ?? inv.ratedW * 2;
  const running = loads.acRunningW[i] ?? 0;
  const neededW = nextInverterW(Math.max(running, (running + (loads.acSurgeExtraW[i] ?? 0)) / 2));
  const together = runningAc({ p, loads }, i);
  const names = together.map((a) => nameInSentence(a.name));
  const larger: Fix = { kind: 'larger-inverter', text: `an inverter of ${neededW} W`, params: { ratedW: neededW } };
  const alone = together.find(
    (a) => a.quantity * a.runningW > ratedW || a.quantity * (a.surgeW ?? a.runningW) > surgeW,
  );
  if (!alone) {
    return [
      {
        kind: 'stagger-appliances',
        text: `do not run ${names.join(' and ')} in the same minutes`,
        params: { applianceIds: together.map((a) => a.id) },
      },
      larger,
    ];
  }
  const single = nextInverterW(
    Math.max(alone.quantity * alone.runningW, (alone.quantity * (alone.surgeW ?? alone.runningW)) / 2),
  );
  const fixes: Fix[] = [
    {
      kind: 'larger-inverter',
      text: `an inverter of ${single} W: the ${nameInSentence(alone.name)} alone asks ${alone.quantity * alone.runningW} W of the ${ratedW} W one`,
      params: { ratedW: Math.max(single, neededW) },
    },
  ];
  const shore = shoreOnlySchedule(p, alone);
  if (shore)
    fixes.push({
      kind: 'appliance-shore-only',
      text: `run the ${nameInSentence(alone.name)} only on hookup days`,
      params: { applianceId: alone.id },
      applianceEdit: { applianceId: alone.id, schedule: shore },
    });
  const generator = generatorOnlyFix(ctx, flag, alone);
  if (generator) fixes.push(generator);
  return fixes;
}
