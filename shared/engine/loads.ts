// Loads: an appliance draws its running watts for the share of a step it runs and its standby watts the rest of
// the time; a fuel appliance also burns its heat input while it runs. When it runs comes from its schedule: always,
// routine windows in local time, or a thermostat, whose active windows are read here and whose duty comes from the
// cabin heat balance (climate.ts).
import type { DayType } from '../schemas/common';
import type { Appliance, Schedule } from '../schemas/appliance';
import { windowsShare, type LocalStep } from './routines';

/** Share of the step the schedule switches the appliance on (a thermostat: its active windows), before its duty. */
export function scheduledShare(s: Schedule, step: LocalStep, prevDayType: DayType): number {
  if (s.kind === 'always') return 1;
  const windows = s.kind === 'routine' ? s.windows : s.activeWindows;
  return windows ? windowsShare(windows, step, prevDayType) : 1;
}

/** Electric energy drawn at running watts in a step of durationH hours that runs for `runShare` of it, Wh. */
export function applianceRunningWh(a: Appliance, runShare: number, durationH: number): number {
  return a.quantity * a.runningW * runShare * durationH;
}

/** Electric energy in that step: running watts while it runs, standby watts the rest of the time, Wh. */
export function applianceEnergyWh(a: Appliance, runShare: number, durationH: number): number {
  return applianceRunningWh(a, runShare, durationH) + a.quantity * a.standbyW * (1 - runShare) * durationH;
}

/** Propane heat input burned in that step (fuel appliances), Wh. */
export function applianceHeatWh(a: Appliance, runShare: number, durationH: number): number {
  return a.quantity * a.heatInputW * runShare * durationH;
}

export type ApplianceStep = { electricWh: number; heatWh: number; running: boolean };

/** Energy in a step of durationH hours switched on for `share` of it (its duty cycle applies on top). */
export function applianceStep(a: Appliance, share: number, durationH: number): ApplianceStep {
  const runShare = share * a.dutyCycle;
  return {
    electricWh: applianceEnergyWh(a, runShare, durationH),
    heatWh: applianceHeatWh(a, runShare, durationH),
    running: share > 0,
  };
}

/** The three energies of one appliance, for loops that ask them step after step. */
export type ApplianceMeter = {
  energyWh: (runShare: number, durationH: number) => number;
  runningWh: (runShare: number, durationH: number) => number;
  heatWh: (runShare: number, durationH: number) => number;
};

// Methods, not arrow-function properties: built per appliance and per sky, and under tsx each named arrow would also
// be given its name by a defineProperty call.
export function applianceMeter(a: Appliance): ApplianceMeter {
  return {
    energyWh(runShare, durationH) {
      return applianceEnergyWh(a, runShare, durationH);
    },
    runningWh(runShare, durationH) {
      return applianceRunningWh(a, runShare, durationH);
    },
    heatWh(runShare, durationH) {
      return applianceHeatWh(a, runShare, durationH);
    },
  };
}
