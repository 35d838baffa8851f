// Worst-case current on each DC run, worked out from the rig's own parts (I = P / V):
// - battery to inverter: rating ÷ (low battery voltage × efficiency), since the DC side also carries the losses,
//   and the current is highest just before the inverter's low-voltage cut-off. A 3000 W inverter on 12 V draws
//   about 250 A before losses (CHECK-VALUES §8, common practice).
// - low battery voltage: 7/8 of nominal, the usual inverter cut-off of 10.5 V on a 12 V bank (common practice).
// - controller to battery: the controller's output limit; DC-DC charger: its rated output current.
// - array to controller: the array's maximum-power current (rated W ÷ Vmp, arrays taken as wired in parallel)
//   × 1.25 for sunshine above standard test conditions (NFPA 70 690.8(A)(1), from memory; the code applies it to
//   the short-circuit current, which is a few percent above the maximum-power current).
// - a DC load circuit: running watts ÷ low battery voltage, and its surge watts likewise for a moment.
// - the distribution point: the watts it feeds when entered, else the sum of the DC load circuits.
import type { DcRun } from '../schemas/dc-wiring';
import type { Rig } from '../schemas/rig';

/** The rig parts the cable check reads. */
export type CableRig = Pick<Rig, 'battery' | 'inverter' | 'controller' | 'solarArrays' | 'vehicleCharger'>;

export const LOW_VOLTAGE_SHARE = 10.5 / 12;
export const ARRAY_IRRADIANCE_FACTOR = 1.25;

export type MissingPart = 'inverter' | 'controller' | 'solar' | 'vehicle-charger' | 'load';

export type RunCurrent =
  | {
      known: true;
      /** The current the run must carry continuously, A. */
      continuousA: number;
      /** A moment's start-up current, A, where the rig says one. */
      surgeA: number | null;
      /** The voltage the drop is a share of, V. */
      systemV: number;
    }
  | { known: false; missing: MissingPart };

/** DC current an inverter draws to deliver acW at a battery voltage, A. */
export function inverterDrawA(acW: number, batteryV: number, efficiency: number): number {
  return acW / (batteryV * efficiency);
}

export const lowBatteryV = (nominalV: number): number => nominalV * LOW_VOLTAGE_SHARE;

const known = (continuousA: number, systemV: number, surgeA: number | null = null): RunCurrent => ({
  known: true,
  continuousA,
  surgeA,
  systemV,
});

function loadCurrent(loadW: number | undefined, surgeW: number | undefined, nominalV: number): RunCurrent {
  if (loadW === undefined || loadW <= 0) return { known: false, missing: 'load' };
  const lowV = lowBatteryV(nominalV);
  return known(loadW / lowV, nominalV, surgeW && surgeW > loadW ? surgeW / lowV : null);
}

/** What a distribution point feeds: its own figure if entered, else every DC load circuit at once. */
function distributionLoad(run: DcRun, allRuns: readonly DcRun[]): { loadW?: number; surgeW?: number } {
  if (run.loadW !== undefined) return { loadW: run.loadW, surgeW: run.surgeW };
  const loads = allRuns.filter((r) => r.kind === 'dc-load');
  if (loads.length === 0) return {};
  const runningW = loads.reduce((sum, r) => sum + (r.loadW ?? 0), 0);
  // The largest start-up on top of everything else running.
  const extraW = Math.max(0, ...loads.map((r) => (r.surgeW ?? 0) - (r.loadW ?? 0)));
  return { loadW: runningW, surgeW: extraW > 0 ? runningW + extraW : undefined };
}

export function runCurrent(run: DcRun, rig: CableRig, allRuns: readonly DcRun[]): RunCurrent {
  const nominalV = rig.battery.nominalV;
  switch (run.kind) {
    case 'battery-inverter': {
      const inv = rig.inverter;
      if (!inv) return { known: false, missing: 'inverter' };
      const lowV = lowBatteryV(nominalV);
      const surgeA = inv.surgeW ? inverterDrawA(inv.surgeW, lowV, inv.efficiency) : null;
      return known(inverterDrawA(inv.ratedW, lowV, inv.efficiency), nominalV, surgeA);
    }
    case 'controller-battery':
      return rig.controller ? known(rig.controller.maxAmps, nominalV) : { known: false, missing: 'controller' };
    case 'array-controller': {
      if (rig.solarArrays.length === 0) return { known: false, missing: 'solar' };
      const impA = rig.solarArrays.reduce((sum, a) => sum + a.ratedW / a.vmpV, 0);
      const vmpV = Math.min(...rig.solarArrays.map((a) => a.vmpV));
      return known(impA * ARRAY_IRRADIANCE_FACTOR, vmpV);
    }
    case 'dc-dc-charger':
      return rig.vehicleCharger
        ? known(rig.vehicleCharger.amps, nominalV)
        : { known: false, missing: 'vehicle-charger' };
    case 'dc-load':
      return loadCurrent(run.loadW, run.surgeW, nominalV);
    case 'battery-distribution': {
      const { loadW, surgeW } = distributionLoad(run, allRuns);
      return loadCurrent(loadW, surgeW, nominalV);
    }
  }
}
