// The largest plan the API accepts: every list at its maximum (LIMITS) and every costly branch of the engine taken
// (custom horizons, Ineichen–Perez clear sky, tilted arrays, a routine generator, thermostats, windows that name
// trip days, a battery small enough to raise a flag most nights). The benchmark times its budget; the API tests
// store it to keep the server busy.
import type { ApplianceInput } from '@/shared/schemas/appliance';
import type { RoutineWindow } from '@/shared/schemas/common';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';
import { LIMITS } from '@/shared/schemas/limits';
import type { RigInput } from '@/shared/schemas/rig';
import type { StopInput } from '@/shared/schemas/trip';

/** The trip's dates: LIMITS.tripDays days in summer, when Mountain time is six hours behind UTC all through. */
export const LARGEST_TRIP = {
  startDate: '2027-06-01',
  endDate: new Date(Date.parse('2027-06-01T00:00Z') + (LIMITS.tripDays - 1) * 86_400_000).toISOString().slice(0, 10),
  timeZone: 'America/Denver',
};

const OFFSET = '-06:00';
const DAY_MS = 86_400_000;

/** Local wall time `hour` on trip day `day`, as an ISO instant with the summer offset. */
function at(day: number, hour: number): string {
  const date = new Date(Date.parse(`${LARGEST_TRIP.startDate}T00:00Z`) + day * DAY_MS).toISOString().slice(0, 10);
  return `${date}T${String(hour).padStart(2, '0')}:00${OFFSET}`;
}

const allTripDays = Array.from({ length: LIMITS.tripDays }, (_, day) => day);

/** One window in each hour of the day, each naming every day of the trip. */
const everyHourEveryDay: RoutineWindow[] = Array.from({ length: LIMITS.windowsPerAppliance }, (_, k) => ({
  days: { kind: 'trip-days', dayIndexes: allTripDays },
  startHour: k % 24,
  startMinute: 5,
  minutes: 50,
}));

export function largestStops(): StopInput[] {
  const stays = (LIMITS.tripDays - 1) / LIMITS.stopsPerTrip;
  return Array.from({ length: LIMITS.stopsPerTrip }, (_, i) => {
    const arriveDay = Math.floor(i * stays);
    const last = i === LIMITS.stopsPerTrip - 1;
    return {
      name: `Pitch ${i + 1}`,
      lat: 37 + (i % 20) * 0.4,
      lon: -112 + Math.floor(i / 20) * 2,
      elevationM: 1500,
      // Two zone names with the same summer offset: the engine works out local time per run of one zone.
      timeZone: i % 2 === 0 ? 'America/Denver' : 'America/Boise',
      arriveAt: at(arriveDay, 10),
      departAt: last ? at(LIMITS.tripDays - 1, 22) : at(Math.floor((i + 1) * stays), 8),
      exposure: {
        kind: 'custom',
        horizonDeg: Array.from({ length: LIMITS.horizonSectors }, (_, s) => (s * 7 + i) % 50),
        canopyTransmittance: 0.3,
      },
      skyOutlook: (['clear', 'hazy', 'broken-cloud', 'overcast'] as const)[i % 4],
      linkeTurbidity: 3,
      hookup: i % 3 === 0 ? { amps: 30, volts: 120 } : null,
      generatorHours: { startHour: 8, endHour: 20 },
      lowC: i % 5 === 0 ? -4 : 6,
      highC: 30,
    };
  });
}

export function largestRig(): RigInput {
  return {
    name: 'Largest rig',
    battery: { chemistry: 'lifepo4', capacityAh: 100, nominalV: 12.8 },
    solarArrays: Array.from({ length: LIMITS.solarArraysPerRig }, (_, k) => ({
      name: `Array ${k + 1}`,
      ratedW: 200,
      mounting: 'tilted' as const,
      tiltDeg: 10 + k * 5,
      azimuthDeg: 90 + k * 25,
      fit: k % 2 === 0 ? ('flush' as const) : ('racked' as const),
    })),
    controller: { kind: 'mppt', maxAmps: 100 },
    inverter: { ratedW: 1000, surgeW: 2000 },
    shoreCharger: { amps: 40 },
    vehicleCharger: { kind: 'dc-dc', amps: 30 },
    generator: { ratedW: 2000, fuel: 'propane', mode: { kind: 'routine', windows: everyHourEveryDay } },
    propaneTanks: Array.from({ length: LIMITS.propaneTanksPerRig }, (_, k) => ({
      name: `Cylinder ${k + 1}`,
      propaneKg: 9,
    })),
  };
}

/** Appliance fields as the API takes them (no id): AC, DC, fuel and thermostat loads in turn. */
export function largestAppliances(): Omit<ApplianceInput, 'id'>[] {
  return Array.from({ length: LIMITS.appliancesPerTrip }, (_, j) => {
    const kind = j % 4;
    const base = { name: `Load ${j + 1}`, quantity: 1, standbyW: 1, dutyCycle: 0.6 };
    if (kind === 0)
      return {
        ...base,
        circuit: 'ac' as const,
        runningW: 400,
        surgeW: 900,
        schedule: { kind: 'routine', windows: everyHourEveryDay },
      };
    if (kind === 1)
      return {
        ...base,
        circuit: 'dc' as const,
        runningW: 30,
        schedule: { kind: 'routine', windows: everyHourEveryDay },
      };
    if (kind === 2)
      return {
        ...base,
        circuit: 'fuel' as const,
        runningW: 20,
        heatInputW: 2000,
        schedule: { kind: 'routine', windows: everyHourEveryDay },
      };
    return {
      ...base,
      circuit: 'ac' as const,
      runningW: 1200,
      schedule: { kind: 'thermostat', mode: 'cooling', setPointC: 24, activeWindows: everyHourEveryDay },
    };
  });
}

/** The whole plan as the engine takes it (the server builds the same from the stored trip). */
export function largestPlan(): EngineInputDraft {
  const stops = largestStops();
  return {
    trip: {
      name: 'Largest plan',
      stops,
      drives: stops.slice(1).map(() => ({ hoursOnRoad: 2, vehicleCharging: true })),
    },
    rig: largestRig(),
    appliances: largestAppliances().map((a, j) => ({ ...a, id: `load-${j}` })),
  };
}
