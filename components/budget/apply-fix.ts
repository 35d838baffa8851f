// Turns an engine Fix into the edit that carries it out, or null when the fix is advice only
// (staggering appliances, checking cables). Appliance fixes carry the schedule the engine checked. Pure, so it is tested without a screen.
import { ASSUMED_GENERATOR_W } from '@/shared/engine/flags';
import type { DaySheet, Fix } from '@/shared/engine/result-types';
import type { Schedule } from '@/shared/schemas/appliance';
import type { ApplianceRecord, StopRecord, TripDetail } from '@/shared/schemas/api';
import type { RoutineWindow } from '@/shared/schemas/common';
import type { RigInput } from '@/shared/schemas/rig';
import type { HookupSupply } from '@/shared/hookup-supply';

export type FixEdit =
  | { kind: 'rig'; rig: RigInput; summary: string }
  | { kind: 'stop'; record: StopRecord; stop: StopRecord['stop']; summary: string }
  | { kind: 'appliance'; record: ApplianceRecord; schedule: Schedule; summary: string };

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/** Trip days spent (at least partly) at a stop, from the day sheets. */
export function dayIndexesAtStop(days: DaySheet[], stopIndex: number): number[] {
  return days.filter((d) => d.stopIndexes.includes(stopIndex)).map((d) => d.dayIndex);
}

function generatorEdit(detail: TripDetail, fix: Fix, days: DaySheet[]): FixEdit | null {
  const stopIndex = num(fix.params.stopIndex);
  const hours = num(fix.params.hours);
  const startHour = num(fix.params.startHour);
  if (stopIndex === null || hours === null || startHour === null) return null;
  // The engine names the days it checked the fix on; the day sheets are the fallback for older results.
  const named = Array.isArray(fix.params.dayIndexes) ? fix.params.dayIndexes.map(Number) : [];
  const dayIndexes = named.length > 0 ? named : dayIndexesAtStop(days, stopIndex);
  if (dayIndexes.length === 0) return null;
  // Exactly the window the engine walked: the last quarter hours before the allowed end.
  const window: RoutineWindow = {
    days: { kind: 'trip-days', dayIndexes },
    startHour,
    startMinute: num(fix.params.startMinute) ?? 0,
    minutes: Math.max(15, Math.min(1440, num(fix.params.minutes) ?? Math.round(hours * 60))),
  };
  const rig = detail.rig.rig;
  const current = rig.generator;
  const windows = current?.mode.kind === 'routine' ? [...current.mode.windows, window] : [window];
  return {
    kind: 'rig',
    rig: {
      ...rig,
      generator: current
        ? { ...current, mode: { kind: 'routine', windows } }
        : { ratedW: ASSUMED_GENERATOR_W, fuel: 'petrol', mode: { kind: 'routine', windows } },
    },
    summary: `Generator ${hours} h at ${detail.stops[stopIndex]?.stop.name ?? 'that stop'}`,
  };
}

/** What the traveller changed on a fix before Apply: a hookup fix's supply. */
export type FixChoice = { supply?: HookupSupply };

export function editForFix(detail: TripDetail, fix: Fix, days: DaySheet[], choice: FixChoice = {}): FixEdit | null {
  const rig = detail.rig.rig;
  switch (fix.kind) {
    case 'add-battery': {
      const extraAh = num(fix.params.extraAh);
      if (extraAh === null) return null;
      return {
        kind: 'rig',
        rig: { ...rig, battery: { ...rig.battery, capacityAh: rig.battery.capacityAh + extraAh } },
        summary: `Battery +${extraAh} Ah`,
      };
    }
    case 'add-solar': {
      const extraW = num(fix.params.extraW);
      const first = rig.solarArrays[0];
      if (extraW === null || !first) return null;
      return {
        kind: 'rig',
        rig: { ...rig, solarArrays: [{ ...first, ratedW: first.ratedW + extraW }, ...rig.solarArrays.slice(1)] },
        summary: `Solar +${extraW} W`,
      };
    }
    case 'larger-inverter': {
      const ratedW = num(fix.params.ratedW);
      if (ratedW === null) return null;
      const inverter = rig.inverter ?? { ratedW, efficiency: 0.9, idleW: 10, mode: 'on-demand' as const };
      return { kind: 'rig', rig: { ...rig, inverter: { ...inverter, ratedW } }, summary: `Inverter ${ratedW} W` };
    }
    case 'add-propane': {
      const extraKg = num(fix.params.extraKg);
      if (extraKg === null) return null;
      return {
        kind: 'rig',
        rig: {
          ...rig,
          propaneTanks: [...rig.propaneTanks, { name: 'Extra cylinder', propaneKg: extraKg, fillPct: 100 }],
        },
        summary: `Propane +${extraKg} kg`,
      };
    }
    case 'keep-battery-warm':
      return {
        kind: 'rig',
        rig: { ...rig, battery: { ...rig.battery, heatedSpace: true } },
        summary: 'Battery kept in the heated space',
      };
    case 'add-hookup-night': {
      const stopIndex = num(fix.params.stopIndex);
      const amps = choice.supply?.amps ?? num(fix.params.amps);
      const volts = choice.supply?.volts ?? num(fix.params.volts);
      const record = stopIndex === null ? undefined : detail.stops[stopIndex];
      if (!record || amps === null || volts === null) return null;
      return {
        kind: 'stop',
        record,
        stop: { ...record.stop, hookup: { amps, volts } },
        summary: `Hookup at ${record.stop.name} (${amps} A at ${volts} V)`,
      };
    }
    case 'add-generator-hours':
      return generatorEdit(detail, fix, days);
    case 'thermostat-setting':
    case 'appliance-less':
    case 'appliance-another-time':
    case 'appliance-shore-only':
    case 'appliance-generator-only': {
      const change = fix.applianceEdit;
      const record = change ? detail.appliances.find((a) => a.id === change.applianceId) : undefined;
      if (!change || !record) return null;
      return {
        kind: 'appliance',
        record,
        schedule: change.schedule,
        summary: `${record.appliance.name}: ${fix.text.split(' — ')[0] ?? fix.text}`,
      };
    }
    default:
      return null;
  }
}
