// A check-in restarts the battery walk: from the first step that starts at or after the reading, the stored energy
// and the propane are the ones read, not the ones the plan carried there. A reading between step starts applies
// from the next step (the walk's state is only known at step boundaries).
import type { Prepared } from './prepare';

export type WalkRestart = {
  /** The first step walked from the reading. */
  index: number;
  socPct: number;
  /** Null: the plan's own propane count carries on. */
  propaneKg: number | null;
};

/** Where the walk restarts, or null when there is no reading or it falls after the trip's last step. */
export function walkRestart(p: Prepared): WalkRestart | null {
  const start = p.input.startState;
  if (!start) return null;
  const atMs = Date.parse(start.at);
  for (let i = 0; i < p.n; i++)
    if ((p.startMs[i] ?? 0) >= atMs) return { index: i, socPct: start.socPct, propaneKg: start.propaneKg };
  return null;
}
