import type { ApplianceFields, Schedule } from '@/shared/schemas/appliance';
import { HOURS, stripOf } from './routine-cells';

/** Minutes a schedule runs on a camp day (every-day plus camp-day windows); null when it follows temperature. */
export function campDayMinutes(schedule: Schedule): number | null {
  if (schedule.kind === 'always') return HOURS * 60;
  if (schedule.kind === 'thermostat') return null;
  const minutes = schedule.windows
    .filter((w) => ['all', 'camp'].includes(stripOf(w.days) ?? ''))
    .reduce((s, w) => s + w.minutes, 0);
  return Math.min(minutes, HOURS * 60);
}

/** Electrical energy a typical camp day, Wh (fuel appliances count only their fan and controls). */
export function dailyEnergyWh(
  a: Pick<ApplianceFields, 'schedule' | 'runningW' | 'standbyW' | 'dutyCycle' | 'quantity'>,
): number | null {
  const minutes = campDayMinutes(a.schedule);
  if (minutes === null) return null;
  const on = (minutes / 60) * a.runningW * a.dutyCycle;
  const standby = ((HOURS * 60 - minutes) / 60) * a.standbyW;
  return (on + standby) * a.quantity;
}
