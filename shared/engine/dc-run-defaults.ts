// The DC runs a rig implies when none are entered: one for each part it has, at lengths usual in caravans,
// trailers and vans (common practice, rough: the inverter, controller and chargers sit beside the bank; the
// roof array is a few metres away; a load circuit crosses the vehicle), each sized and fused by the check itself.
// They are a starting point to measure and correct, not a survey of the vehicle.
import type { Appliance } from '../schemas/appliance';
import { MAX_LOAD_W, MAX_SURGE_W, type CableBasis, type DcRun, type DcRunKind } from '../schemas/dc-wiring';
import type { CableRig } from './cable-current';
import { runCurrent } from './cable-current';
import { DROP_LIMIT_PCT, installationOf, protectionForA, smallestPassing } from './cable-check';
import { sizesOf, type SizeUnit } from './conductor-size';

/** Typical one-way lengths, m (common practice, rough). */
export const TYPICAL_LENGTH_M: Readonly<Record<DcRunKind, number>> = {
  'battery-inverter': 1.5,
  'battery-distribution': 2,
  'controller-battery': 1.5,
  'array-controller': 6,
  'dc-dc-charger': 1.5,
  'dc-load': 5,
};

/** Lights and small loads can lose more voltage than the charging and inverter runs. */
export const CRITICAL_BY_DEFAULT: Readonly<Record<DcRunKind, boolean>> = {
  'battery-inverter': true,
  'battery-distribution': true,
  'controller-battery': true,
  'array-controller': true,
  'dc-dc-charger': true,
  'dc-load': false,
};

export const RUN_NAMES: Readonly<Record<DcRunKind, string>> = {
  'battery-inverter': 'Battery to inverter',
  'battery-distribution': 'Battery to distribution point',
  'controller-battery': 'Charge controller to battery',
  'array-controller': 'Solar array to controller',
  'dc-dc-charger': 'DC-DC charger',
  'dc-load': 'DC load circuit',
};

function runName(kind: DcRunKind, rig: CableRig): string {
  return kind === 'dc-dc-charger' && rig.vehicleCharger?.kind === 'alternator'
    ? 'Alternator to battery'
    : RUN_NAMES[kind];
}

/** A DC load as the rig's loads list has it, for a suggested circuit. */
export type DcLoad = { name: string; runningW: number; surgeW?: number };

/** Suggested load circuits: the largest loads first, at most this many. */
export const MAX_SUGGESTED_LOAD_RUNS = 8;

/** A new run of a kind, fitted with the conductor and protection the check picks for it (or the largest size). */
export function newRun(
  kind: DcRunKind,
  rig: CableRig,
  basis: CableBasis,
  unit: SizeUnit,
  others: readonly DcRun[],
  load?: DcLoad,
): DcRun {
  const sizes = sizesOf(unit);
  const draft: DcRun = {
    kind,
    name: load ? load.name.slice(0, 80) : runName(kind, rig),
    lengthM: TYPICAL_LENGTH_M[kind],
    size: sizes[0] ?? { unit: 'awg', awg: '14' },
    insulationC: 105,
    tinned: false,
    engineSpace: false,
    critical: CRITICAL_BY_DEFAULT[kind],
    protection: { kind: 'none' },
    // Held inside the schema's bounds, so a suggestion is always a run the API will store.
    ...(load
      ? {
          loadW: Math.min(load.runningW, MAX_LOAD_W),
          ...(load.surgeW ? { surgeW: Math.min(load.surgeW, MAX_SURGE_W) } : {}),
        }
      : {}),
  };
  const current = runCurrent(draft, rig, [...others, draft]);
  if (!current.known) return draft;
  const demand = {
    currentA: current.continuousA,
    oneWayM: draft.lengthM,
    systemV: current.systemV,
    dropLimitPct: draft.critical ? DROP_LIMIT_PCT.critical : DROP_LIMIT_PCT.other,
  };
  const size = smallestPassing(unit, installationOf(draft, basis), demand) ?? sizes[sizes.length - 1] ?? draft.size;
  const amps = protectionForA(current.continuousA);
  // A single array string needs no fuse of its own; everything fed from the battery does.
  const protection =
    kind === 'array-controller' || amps === null ? ({ kind: 'none' } as const) : ({ kind: 'fuse', amps } as const);
  return { ...draft, size, protection };
}

/** The runs a rig implies, from its parts and its DC loads. */
export function suggestedDcRuns(
  rig: CableRig,
  basis: CableBasis,
  unit: SizeUnit,
  dcLoads: readonly DcLoad[] = [],
): DcRun[] {
  const runs: DcRun[] = [];
  const add = (kind: DcRunKind, load?: DcLoad) => runs.push(newRun(kind, rig, basis, unit, runs, load));
  if (rig.inverter) add('battery-inverter');
  if (rig.controller) add('controller-battery');
  if (rig.solarArrays.length > 0) add('array-controller');
  if (rig.vehicleCharger) add('dc-dc-charger');
  const loads = [...dcLoads]
    .filter((l) => l.runningW > 0)
    .sort((a, b) => b.runningW - a.runningW)
    .slice(0, MAX_SUGGESTED_LOAD_RUNS);
  for (const load of loads) add('dc-load', load);
  // The distribution point feeds every load circuit, so it is sized once they are known.
  if (loads.length > 0) add('battery-distribution');
  return runs;
}

/** The DC side of a trip's appliances: DC loads, and the fans and controls of fuel-burning ones. */
export function dcLoadsFromAppliances(appliances: readonly Appliance[]): DcLoad[] {
  return appliances
    .filter((a) => (a.circuit === 'dc' || a.circuit === 'fuel') && a.runningW > 0)
    .map((a) => {
      const runningW = a.runningW * a.quantity;
      // One unit starting while the others run.
      const surgeW = a.surgeW ? a.surgeW + a.runningW * (a.quantity - 1) : undefined;
      return { name: a.name, runningW, ...(surgeW ? { surgeW } : {}) };
    });
}
