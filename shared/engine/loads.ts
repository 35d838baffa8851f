// Loads: running and standby watts, duty cycle, routines, and thermostats that follow the ambient curve
// (duty rises linearly from the set point to flat out at fullDutyDeltaC past it — a planning simplification).
import type { DayType } from '../schemas/common';
import type { Appliance } from '../schemas/appliance';
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

/** Share of the step the appliance is switched on (scheduled), before its duty cycle. */
export function onShare(a: Appliance, step: LocalStep, prevDayType: DayType, ambientC: number): number {
  const s = a.schedule;
  if (s.kind === 'always') return 1;
  if (s.kind === 'routine') return windowsShare(s.windows, step, prevDayType);
  const active = s.activeWindows ? windowsShare(s.activeWindows, step, prevDayType) : 1;
  return active * thermostatDuty(s.mode, ambientC, s.setPointC, s.fullDutyDeltaC);
}

export type ApplianceStep = { electricWh: number; heatWh: number; running: boolean };

/** Energy in a step of durationH hours: running watts while it runs, standby watts the rest of the time. */
export function applianceStep(a: Appliance, share: number, durationH: number): ApplianceStep {
  const runShare = share * a.dutyCycle;
  const electricWh = a.quantity * (a.runningW * runShare + a.standbyW * (1 - runShare)) * durationH;
  return { electricWh, heatWh: a.quantity * a.heatInputW * runShare * durationH, running: share > 0 };
}
