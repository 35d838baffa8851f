// Row ↔ record conversions. The records are the shared engine schemas plus id and version, so the
// API, the screens and the engine read one shape.
import type { ApplianceRecord, DriveRecord, RigRecord, SavedRigRecord, StopRecord } from '@/shared/schemas/api';
import type { ApplianceFields, Schedule } from '@/shared/schemas/appliance';
import type { RoutineWindow } from '@/shared/schemas/common';
import { emptyDcWiring } from '@/shared/schemas/dc-wiring';
import type { Rig } from '@/shared/schemas/rig';
import type { Drive, Stop } from '@/shared/schemas/trip';
import { windowsOfSchedule } from '@/shared/trip-rules';
import type { ApplianceRow, RoutineWindowRow } from '../schema/appliances';
import type { DriveRow } from '../schema/drives';
import type { RigRow } from '../schema/rigs';
import type { StopRow } from '../schema/stops';

export function rigToColumns(rig: Rig) {
  return {
    name: rig.name,
    chemistry: rig.battery.chemistry,
    capacityAh: rig.battery.capacityAh,
    nominalV: rig.battery.nominalV,
    reservePct: rig.battery.reservePct ?? null,
    initialSocPct: rig.battery.initialSocPct,
    heatedSpace: rig.battery.heatedSpace,
    solarArrays: rig.solarArrays,
    controller: rig.controller,
    inverter: rig.inverter,
    shoreCharger: rig.shoreCharger,
    vehicleCharger: rig.vehicleCharger,
    generator: rig.generator,
    propaneTanks: rig.propaneTanks,
    dcWiring: rig.dcWiring,
    cabinLengthM: rig.cabin.lengthM,
    cabinWidthM: rig.cabin.widthM,
    cabinHeightM: rig.cabin.heightM,
    insulation: rig.cabin.insulation,
    occupants: rig.cabin.occupants,
    roofAreaM2: rig.cabin.roofAreaM2 ?? null,
  };
}

export function rigFromRow(row: RigRow): Rig {
  return {
    name: row.name,
    battery: {
      chemistry: row.chemistry,
      capacityAh: row.capacityAh,
      nominalV: row.nominalV,
      ...(row.reservePct === null ? {} : { reservePct: row.reservePct }),
      initialSocPct: row.initialSocPct,
      heatedSpace: row.heatedSpace,
    },
    solarArrays: row.solarArrays,
    controller: row.controller ?? null,
    inverter: row.inverter ?? null,
    shoreCharger: row.shoreCharger ?? null,
    vehicleCharger: row.vehicleCharger ?? null,
    generator: row.generator ?? null,
    propaneTanks: row.propaneTanks,
    dcWiring: row.dcWiring ?? emptyDcWiring(),
    cabin: {
      lengthM: row.cabinLengthM,
      widthM: row.cabinWidthM,
      heightM: row.cabinHeightM,
      insulation: row.insulation,
      occupants: row.occupants,
      ...(row.roofAreaM2 === null ? {} : { roofAreaM2: row.roofAreaM2 }),
    },
  };
}

export const rigRecord = (row: RigRow): RigRecord => ({ id: row.id, version: row.version, rig: rigFromRow(row) });
/** One of My rigs with its usual loads (none on rigs saved before rigs kept loads). */
export const savedRigRecord = (row: RigRow): SavedRigRecord => ({ ...rigRecord(row), loads: row.loads ?? [] });

export function stopToColumns(stop: Stop) {
  return {
    name: stop.name,
    lat: stop.lat,
    lon: stop.lon,
    elevationM: stop.elevationM,
    timeZone: stop.timeZone,
    arriveAt: stop.arriveAt,
    departAt: stop.departAt,
    exposure: stop.exposure,
    skyOutlook: stop.skyOutlook,
    skySource: stop.skySource,
    linkeTurbidity: stop.linkeTurbidity ?? null,
    hookupAmps: stop.hookup?.amps ?? null,
    hookupVolts: stop.hookup?.volts ?? null,
    generatorStartHour: stop.generatorHours?.startHour ?? null,
    generatorEndHour: stop.generatorHours?.endHour ?? null,
    lowC: stop.lowC,
    highC: stop.highC,
    ownTemperatures: stop.ownTemperatures,
  };
}

export function stopFromRow(row: StopRow): Stop {
  return {
    name: row.name,
    lat: row.lat,
    lon: row.lon,
    elevationM: row.elevationM,
    timeZone: row.timeZone,
    arriveAt: row.arriveAt,
    departAt: row.departAt,
    exposure: row.exposure,
    skyOutlook: row.skyOutlook,
    skySource: row.skySource,
    ...(row.linkeTurbidity === null ? {} : { linkeTurbidity: row.linkeTurbidity }),
    hookup:
      row.hookupAmps !== null && row.hookupVolts !== null ? { amps: row.hookupAmps, volts: row.hookupVolts } : null,
    generatorHours:
      row.generatorStartHour !== null && row.generatorEndHour !== null
        ? { startHour: row.generatorStartHour, endHour: row.generatorEndHour }
        : null,
    lowC: row.lowC,
    highC: row.highC,
    ownTemperatures: row.ownTemperatures,
  };
}

export const stopRecord = (row: StopRow): StopRecord => ({
  id: row.id,
  version: row.version,
  notes: row.notes,
  stop: stopFromRow(row),
});

export const driveFromRow = (row: DriveRow): Drive => ({
  hoursOnRoad: row.hoursOnRoad,
  vehicleCharging: row.vehicleCharging,
  distanceKm: row.distanceKm,
  distanceSource: row.distanceSource,
  roadFactor: row.roadFactor,
  averageSpeedKmh: row.averageSpeedKmh,
  hoursSource: row.hoursSource,
});
export const driveRecord = (row: DriveRow): DriveRecord => ({
  id: row.id,
  version: row.version,
  drive: driveFromRow(row),
});

export function applianceToColumns(fields: ApplianceFields) {
  const { schedule } = fields;
  return {
    name: fields.name,
    circuit: fields.circuit,
    quantity: fields.quantity,
    runningW: fields.runningW,
    standbyW: fields.standbyW,
    dutyCycle: fields.dutyCycle,
    surgeW: fields.surgeW ?? null,
    heatInputW: fields.heatInputW,
    ...scheduleToColumns(schedule),
  };
}

export function scheduleToColumns(schedule: Schedule) {
  return {
    scheduleKind: schedule.kind,
    thermostatMode: schedule.kind === 'thermostat' ? schedule.mode : null,
    setPointC: schedule.kind === 'thermostat' ? schedule.setPointC : null,
    thermostatEfficiency: schedule.kind === 'thermostat' ? (schedule.efficiency ?? null) : null,
    thermostatCapacityW: schedule.kind === 'thermostat' ? (schedule.capacityW ?? null) : null,
  };
}

/** The windows a schedule stores as rows: a routine's windows, or a thermostat's active windows. */
export function scheduleWindows(schedule: Schedule): readonly RoutineWindow[] {
  return windowsOfSchedule(schedule).windows;
}

function windowFromRow(row: RoutineWindowRow): RoutineWindow {
  return { days: row.days, startHour: row.startHour, startMinute: row.startMinute, minutes: row.minutes };
}

function scheduleFromRow(row: ApplianceRow, windows: RoutineWindowRow[]): Schedule {
  const ordered = [...windows].sort((a, b) => a.position - b.position).map(windowFromRow);
  if (row.scheduleKind === 'routine') return { kind: 'routine', windows: ordered };
  if (row.scheduleKind === 'thermostat') {
    return {
      kind: 'thermostat',
      mode: row.thermostatMode ?? 'heating',
      setPointC: row.setPointC ?? 20,
      ...(row.thermostatEfficiency === null ? {} : { efficiency: row.thermostatEfficiency }),
      ...(row.thermostatCapacityW === null ? {} : { capacityW: row.thermostatCapacityW }),
      ...(ordered.length > 0 ? { activeWindows: ordered } : {}),
    };
  }
  return { kind: 'always' };
}

export function applianceRecord(row: ApplianceRow, windows: RoutineWindowRow[]): ApplianceRecord {
  return {
    id: row.id,
    version: row.version,
    caretakerUserId: row.caretakerUserId,
    appliance: {
      id: row.id,
      name: row.name,
      circuit: row.circuit,
      quantity: row.quantity,
      runningW: row.runningW,
      standbyW: row.standbyW,
      dutyCycle: row.dutyCycle,
      ...(row.surgeW === null ? {} : { surgeW: row.surgeW }),
      heatInputW: row.heatInputW,
      schedule: scheduleFromRow(row, windows),
    },
  };
}
