// The cable check of a whole rig: its entered DC runs, or, when none are entered, the runs its parts imply
// (dc-run-defaults.ts), each checked on the rig's chosen basis (cable-check.ts).
import type { CableBasis, DcRun } from '../schemas/dc-wiring';
import type { Rig } from '../schemas/rig';
import type { CableRig } from './cable-current';
import { checkRun, type RunCheck } from './cable-check';
import type { SizeUnit } from './conductor-size';
import { suggestedDcRuns, type DcLoad } from './dc-run-defaults';

export type CheckedRun = { run: DcRun; check: RunCheck };

export type WiringCheck = {
  basis: CableBasis;
  /** True when the runs are suggested from the rig rather than entered. */
  suggested: boolean;
  runs: CheckedRun[];
  passing: number;
  failing: number;
  unknown: number;
};

export function checkRuns(runs: readonly DcRun[], rig: CableRig, basis: CableBasis): CheckedRun[] {
  return runs.map((run) => ({ run, check: checkRun(run, rig, basis, runs) }));
}

export function checkDcWiring(
  rig: CableRig & Pick<Rig, 'dcWiring'>,
  { unit, dcLoads = [] }: { unit: SizeUnit; dcLoads?: readonly DcLoad[] },
): WiringCheck {
  const { basis } = rig.dcWiring;
  const suggested = rig.dcWiring.runs.length === 0;
  const runs = checkRuns(suggested ? suggestedDcRuns(rig, basis, unit, dcLoads) : rig.dcWiring.runs, rig, basis);
  const count = (test: (c: RunCheck) => boolean) => runs.filter((r) => test(r.check)).length;
  return {
    basis,
    suggested,
    runs,
    passing: count((c) => c.known && c.passes),
    failing: count((c) => c.known && !c.passes),
    unknown: count((c) => !c.known),
  };
}
