// Loads: an appliance draws its running watts for the share of a step it runs and its standby watts the rest of
// the time; a fuel appliance also burns its heat input while it runs. When it runs comes from its schedule:
// always, routine windows in local time, or a thermostat (duty rises linearly from the set point to flat out at
// fullDutyDeltaC past it — a planning simplification).
import type { DayType } from '../schemas/common';
import type { Appliance, Schedule } from '../schemas/appliance';
import { windowsShare, type LocalStep } from './routines';

export function thermostatDuty(
  mode: 'cooling' | 'heating',
  ambientC: number,
  setPointC: number,
  fullDutyDeltaC: number,
): number {
  const excess = mode === 'cooling' ? ambientC - setPointC : setPointC - ambientC;
  return Math.min(1, Math.max(0, excess / fullDutyDeltaC));
}

/** Share of the step the schedule switches the appliance on, before any thermostat: its windows, or all of it. */
export function scheduledShare(s: Schedule, step: LocalStep, prevDayType: DayType): number {
  if (s.kind === 'always') return 1;
  const windows = s.kind === 'routine' ? s.windows : s.activeWindows;
  return windows ? windowsShare(windows, step, prevDayType) : 1;
}

/** Share of the step the appliance is switched on (scheduled, and for a thermostat its duty), before its duty cycle. */
export function onShare(a: Appliance, step: LocalStep, prevDayType: DayType, ambientC: number): number {
  const s = a.schedule;
  const share = scheduledShare(s, step, prevDayType);
  return s.kind === 'thermostat' ? share * thermostatDuty(s.mode, ambientC, s.setPointC, s.fullDutyDeltaC) : share;
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
