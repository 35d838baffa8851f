// The cable and fuse check of one DC run (CHECK-VALUES §8):
// - ampacity: the table's figure for the conductor (ABYC E-11 or NFPA 70 Table 310.16, the rig's chosen basis),
//   times the engine-space factor where it runs through one, must carry the run's worst-case current.
// - voltage drop: a share of the system voltage, at most 3 % on critical runs and 10 % on others (ABYC E-11).
//   ABYC's own formula, V = 10.75 × I × L / CM with L the round trip in feet (tinned copper by NFPA 70 Ch. 9
//   Table 8's coated/uncoated ratio); NFPA 70 by Table 8's resistance at 75 °C, coated or uncoated.
// - protection: a fuse or breaker of at least 125 % of the continuous current and no more than the conductor's
//   ampacity (common practice), and for 14–10 AWG on NFPA 70 no more than 240.4(D) allows.
// - the smallest conductor of the run's family (AWG or mm²) that passes all three.
// The verdict is for planning; the applicable code and a qualified installer decide.
import type { CableBasis, ConductorSize, DcRun, InsulationRatingC } from '../schemas/dc-wiring';
import { runCurrent, type CableRig, type MissingPart, type RunCurrent } from './cable-current';
import { areaCmil, ratingAwg, sizesOf, type SizeUnit } from './conductor-size';
import {
  CIRCULAR_MILS,
  ENGINE_SPACE_FACTOR,
  RESISTANCE_OHM_PER_KFT,
  SMALL_CONDUCTOR_MAX_PROTECTION_A,
  STANDARD_PROTECTION_A,
  tableAmpacityA,
} from './conductor-tables';

export const FEET_PER_METRE = 1 / 0.3048;
/** ABYC E-11's resistivity constant for copper, Ω·cmil/ft. */
export const ABYC_K_OHM_CMIL_PER_FT = 10.75;
export const DROP_LIMIT_PCT = { critical: 3, other: 10 } as const;
export const CONTINUOUS_PROTECTION_FACTOR = 1.25;

/** How a conductor is installed: what the tables need besides its size. */
export type Installation = {
  basis: CableBasis;
  insulationC: InsulationRatingC;
  engineSpace: boolean;
  tinned: boolean;
};

/** The conductor's ampacity where it runs, A. */
export function ampacityA(size: ConductorSize, at: Installation): number {
  const table = tableAmpacityA(at.basis, ratingAwg(size), at.insulationC);
  return at.engineSpace ? table * ENGINE_SPACE_FACTOR[at.insulationC] : table;
}

/** The largest fuse or breaker that still protects the conductor, A. */
export function maxProtectionA(size: ConductorSize, at: Installation): number {
  const cap = at.basis === 'nfpa70' ? SMALL_CONDUCTOR_MAX_PROTECTION_A[ratingAwg(size)] : undefined;
  return Math.min(ampacityA(size, at), cap ?? Infinity);
}

/** Voltage lost along the run, out and back, V. */
export function voltageDropV(size: ConductorSize, at: Installation, currentA: number, oneWayM: number): number {
  const roundTripFt = 2 * oneWayM * FEET_PER_METRE;
  const ref = ratingAwg(size);
  const tinnedRatio = RESISTANCE_OHM_PER_KFT.tinned[ref] / RESISTANCE_OHM_PER_KFT.bare[ref];
  if (at.basis === 'abyc-e11')
    return ((ABYC_K_OHM_CMIL_PER_FT * currentA * roundTripFt) / areaCmil(size)) * (at.tinned ? tinnedRatio : 1);
  // Table 8 gives Ω per 1000 ft for AWG sizes; a metric size scales its rating row's value by area.
  const ohmPerKft = RESISTANCE_OHM_PER_KFT[at.tinned ? 'tinned' : 'bare'][ref] * (CIRCULAR_MILS[ref] / areaCmil(size));
  return (ohmPerKft * roundTripFt * currentA) / 1000;
}

/** The smallest standard rating at or above 125 % of the continuous current, A (null beyond the largest). */
export function protectionForA(continuousA: number): number | null {
  const min = continuousA * CONTINUOUS_PROTECTION_FACTOR;
  return STANDARD_PROTECTION_A.find((a) => a >= min - 1e-9) ?? null;
}

export type Demand = { currentA: number; oneWayM: number; systemV: number; dropLimitPct: number };

export type ConductorVerdict = {
  ampacityA: number;
  carries: boolean;
  dropV: number;
  dropPct: number;
  dropOk: boolean;
  /** The largest protection that still protects this conductor, A. */
  maxProtectionA: number;
  /** The standard rating to fit (125 % of continuous, rounded up to one on sale), A. */
  protectionA: number | null;
  /** Whether that rating still protects this conductor. */
  protectionFits: boolean;
  passes: boolean;
};

export function judgeConductor(size: ConductorSize, at: Installation, demand: Demand): ConductorVerdict {
  const amp = ampacityA(size, at);
  const dropV = voltageDropV(size, at, demand.currentA, demand.oneWayM);
  const dropPct = (100 * dropV) / demand.systemV;
  const maxA = maxProtectionA(size, at);
  const protectionA = protectionForA(demand.currentA);
  const carries = amp >= demand.currentA;
  const dropOk = dropPct <= demand.dropLimitPct;
  const protectionFits = protectionA !== null && protectionA <= maxA;
  return {
    ampacityA: amp,
    carries,
    dropV,
    dropPct,
    dropOk,
    maxProtectionA: maxA,
    protectionA,
    protectionFits,
    passes: carries && dropOk && protectionFits,
  };
}

/** The smallest size of a family that passes, or null when none up to the tables' largest does. */
export function smallestPassing(unit: SizeUnit, at: Installation, demand: Demand): ConductorSize | null {
  return sizesOf(unit).find((size) => judgeConductor(size, at, demand).passes) ?? null;
}

/** The smallest size that carries the current by the table alone (no drop or protection rule), or null. */
export function smallestByAmpacity(unit: SizeUnit, at: Installation, currentA: number): ConductorSize | null {
  return sizesOf(unit).find((size) => ampacityA(size, at) >= currentA) ?? null;
}

export type RunProblem =
  'ampacity' | 'drop' | 'no-protection-fits' | 'protection-missing' | 'protection-too-small' | 'protection-too-large';

export type RunNote = 'time-delay' | 'array-protection-optional';

export type RunCheck =
  | { known: false; missing: MissingPart }
  | {
      known: true;
      passes: boolean;
      current: Extract<RunCurrent, { known: true }>;
      dropLimitPct: number;
      conductor: ConductorVerdict;
      problems: RunProblem[];
      notes: RunNote[];
      /** The smallest conductor of the run's family that passes here; null when none in the tables does. */
      smallest: ConductorSize | null;
    };

export function installationOf(run: DcRun, basis: CableBasis): Installation {
  return { basis, insulationC: run.insulationC, engineSpace: run.engineSpace, tinned: run.tinned };
}

function protectionProblems(run: DcRun, conductor: ConductorVerdict, continuousA: number): RunProblem[] {
  const p = run.protection;
  // One or two strings in parallel cannot feed a fault more than the panels' own current (NFPA 70 690.9, from memory).
  if (p.kind === 'none') return run.kind === 'array-controller' ? [] : ['protection-missing'];
  const problems: RunProblem[] = [];
  if (p.amps < continuousA * CONTINUOUS_PROTECTION_FACTOR - 1e-9) problems.push('protection-too-small');
  if (p.amps > conductor.maxProtectionA + 1e-9) problems.push('protection-too-large');
  return problems;
}

/** Checks one run of the rig. */
export function checkRun(run: DcRun, rig: CableRig, basis: CableBasis, allRuns: readonly DcRun[]): RunCheck {
  const current = runCurrent(run, rig, allRuns);
  if (!current.known) return current;
  const at = installationOf(run, basis);
  const demand: Demand = {
    currentA: current.continuousA,
    oneWayM: run.lengthM,
    systemV: current.systemV,
    dropLimitPct: run.critical ? DROP_LIMIT_PCT.critical : DROP_LIMIT_PCT.other,
  };
  const conductor = judgeConductor(run.size, at, demand);
  const problems: RunProblem[] = [];
  if (!conductor.carries) problems.push('ampacity');
  if (!conductor.dropOk) problems.push('drop');
  if (conductor.carries && !conductor.protectionFits) problems.push('no-protection-fits');
  problems.push(...protectionProblems(run, conductor, current.continuousA));
  const notes: RunNote[] = [];
  const fitted = run.protection.kind === 'none' ? conductor.protectionA : run.protection.amps;
  if (current.surgeA !== null && fitted !== null && current.surgeA > fitted) notes.push('time-delay');
  if (run.kind === 'array-controller' && run.protection.kind === 'none') notes.push('array-protection-optional');
  return {
    known: true,
    passes: problems.length === 0,
    current,
    dropLimitPct: demand.dropLimitPct,
    conductor,
    problems,
    notes,
    smallest: smallestPassing(run.size.unit, at, demand),
  };
}
