// Inputs whose results are pinned by golden.test.ts: the demo trips, the benchmark trips, and synthetic trips
// that reach the rarer branches (tilted arrays, PWM, lead-acid, generator routines and rules, custom horizons,
// Ineichen–Perez clear sky, isotropic transposition, daylight-saving changes, polar day, cold lithium, no inverter).
import { APPLIANCE_LIBRARY, applianceFromLibrary, DEMO_TRIPS } from '@/shared/engine';
import type { ApplianceInput, EngineInputDraft } from '@/shared/schemas';

function libraryAppliances(count: number): ApplianceInput[] {
  return Array.from({ length: count }, (_, i) => {
    const item = APPLIANCE_LIBRARY[i % APPLIANCE_LIBRARY.length];
    return applianceFromLibrary(item?.key ?? 'led-lights', { id: `a${i}` });
  });
}

/** The benchmark's trip: stops every ~4 days in America/Denver, every library appliance cycled, a hookup every 5th stop. */
export function benchTrip(days: number, applianceCount: number): EngineInputDraft {
  const stopsCount = Math.max(2, Math.round(days / 4));
  const stopDays = days / stopsCount;
  const start = Date.parse('2027-06-01T12:00Z');
  const stops = Array.from({ length: stopsCount }, (_, i) => ({
    name: `Stop ${i + 1}`,
    lat: 44 + i * 0.3,
    lon: -110 + i * 0.4,
    timeZone: 'America/Denver',
    arriveAt: new Date(start + i * stopDays * 86_400_000).toISOString(),
    departAt: new Date(start + ((i + 1) * stopDays - 0.125) * 86_400_000).toISOString(),
    exposure: {
      kind: 'preset' as const,
      preset: (['open', 'light-cover', 'partial-shade', 'deep-forest'] as const)[i % 4] ?? 'open',
    },
    skyOutlook: (['clear', 'hazy', 'broken-cloud'] as const)[i % 3] ?? 'clear',
    lowC: 8,
    highC: 27,
    hookup: i % 5 === 2 ? { amps: 30, volts: 120 } : null,
  }));
  return {
    trip: { name: 'Bench', stops, drives: stops.slice(1).map(() => ({ hoursOnRoad: 2.5 })) },
    rig: {
      name: 'Bench rig',
      battery: { chemistry: 'lifepo4', capacityAh: 400, nominalV: 12.8 },
      solarArrays: [
        { ratedW: 600, mounting: 'flat' },
        { ratedW: 200, mounting: 'tilted', tiltDeg: 35, azimuthDeg: 180, fit: 'racked' },
      ],
      controller: { kind: 'mppt', maxAmps: 60 },
      inverter: { ratedW: 3000, surgeW: 6000 },
      shoreCharger: { amps: 40 },
      vehicleCharger: { kind: 'dc-dc', amps: 30 },
      generator: { ratedW: 2200, fuel: 'propane' },
      propaneTanks: [{ propaneKg: 9 }, { propaneKg: 9 }],
    },
    appliances: libraryAppliances(applianceCount),
    options: { skyBand: true },
  };
}

/**
 * Southern spring in Australia/Adelaide (+09:30 → +10:30 on 3 October 2027): two tilted arrays on a PWM
 * controller, a flooded lead-acid bank with heavy AC loads (Peukert), a routine generator whose windows cross
 * midnight and name trip days, custom horizons with canopy, Ineichen–Perez clear sky and isotropic transposition.
 */
const southernSpring: EngineInputDraft = {
  trip: {
    name: 'Southern spring',
    stops: [
      {
        name: 'Gum Creek bend',
        lat: -34.2,
        lon: 139.1,
        elevationM: 450,
        timeZone: 'Australia/Adelaide',
        arriveAt: '2027-10-01T14:20+09:30',
        departAt: '2027-10-04T09:00+10:30',
        linkeTurbidity: 3.2,
        exposure: {
          kind: 'custom',
          horizonDeg: [10, 12, 25, 40, 35, 20, 8, 5, 5, 8, 15, 30],
          canopyTransmittance: 0.25,
        },
        skyOutlook: 'hazy',
        hookup: null,
        generatorHours: { startHour: 20, endHour: 2 },
        lowC: 4,
        highC: 22,
      },
      {
        name: 'Salt Pan flat',
        lat: -33.1,
        lon: 137.6,
        elevationM: 20,
        timeZone: 'Australia/Adelaide',
        arriveAt: '2027-10-04T15:45+10:30',
        departAt: '2027-10-06T10:40+10:30',
        exposure: {
          kind: 'custom',
          horizonDeg: [0, 3, 6, 9, 60, 0, 0, 2],
          canopyTransmittance: 0,
          skyViewFraction: 0.9,
        },
        skyOutlook: 'overcast',
        hookup: { amps: 10, volts: 240 },
        lowC: 9,
        highC: 27,
      },
    ],
    drives: [{ hoursOnRoad: 4.5, vehicleCharging: true }],
  },
  rig: {
    name: 'Lead-acid camper',
    battery: { chemistry: 'flooded', capacityAh: 230, nominalV: 12, initialSocPct: 85 },
    solarArrays: [
      {
        name: 'Roof tilt',
        ratedW: 300,
        mounting: 'tilted',
        tiltDeg: 30,
        azimuthDeg: 10,
        fit: 'racked',
        vmpV: 19.5,
        gammaPctPerC: -0.45,
      },
      {
        name: 'Blanket',
        ratedW: 160,
        mounting: 'tilted',
        tiltDeg: 55,
        azimuthDeg: 330,
        fit: 'flush',
        noctC: 48,
        vmpV: 17,
        derate: 0.8,
      },
    ],
    controller: { kind: 'pwm', maxAmps: 30 },
    inverter: { ratedW: 1500, surgeW: 2500, efficiency: 0.88, idleW: 15, mode: 'always' },
    shoreCharger: { amps: 25, efficiency: 0.85 },
    vehicleCharger: { kind: 'alternator', amps: 40 },
    generator: {
      ratedW: 2000,
      fuel: 'petrol',
      mode: {
        kind: 'routine',
        windows: [
          { days: { kind: 'all' }, startHour: 18, startMinute: 20, minutes: 100 },
          { days: { kind: 'trip-days', dayIndexes: [1, 3] }, startHour: 23, startMinute: 10, minutes: 95 },
        ],
      },
    },
    propaneTanks: [{ propaneKg: 4, fillPct: 60 }],
  },
  appliances: [
    applianceFromLibrary('microwave', {
      id: 'microwave',
      schedule: {
        kind: 'routine',
        windows: [
          { days: { kind: 'all' }, startHour: 7, startMinute: 40, minutes: 12 },
          { days: { kind: 'day-type', dayType: 'camp' }, startHour: 18, startMinute: 45, minutes: 20 },
        ],
      },
    }),
    applianceFromLibrary('kettle', {
      id: 'kettle',
      schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 7, startMinute: 45, minutes: 6 }] },
    }),
    applianceFromLibrary('induction-hob', {
      id: 'hob',
      schedule: {
        kind: 'routine',
        windows: [{ days: { kind: 'day-type', dayType: 'travel' }, startHour: 19, startMinute: 0, minutes: 35 }],
      },
    }),
    applianceFromLibrary('fridge-12v-compressor', { id: 'fridge', quantity: 2 }),
    applianceFromLibrary('diesel-air-heater', {
      id: 'diesel-heater',
      schedule: {
        kind: 'thermostat',
        mode: 'heating',
        setPointC: 14,
        activeWindows: [{ days: { kind: 'all' }, startHour: 21, startMinute: 0, minutes: 600 }],
      },
    }),
    applianceFromLibrary('box-fan', {
      id: 'fan',
      schedule: { kind: 'thermostat', mode: 'cooling', setPointC: 20 },
    }),
    applianceFromLibrary('propane-oven', {
      id: 'oven',
      schedule: {
        kind: 'routine',
        windows: [{ days: { kind: 'trip-days', dayIndexes: [2] }, startHour: 17, startMinute: 0, minutes: 75 }],
      },
    }),
    applianceFromLibrary('cpap', { id: 'cpap' }),
    {
      id: 'tv',
      name: 'TV',
      circuit: 'ac',
      runningW: 90,
      standbyW: 3,
      surgeW: 150,
      schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 20, startMinute: 0, minutes: 150 }] },
    },
  ],
  options: {
    transposition: 'isotropic',
    groundReflectance: 0.35,
    solarConstantWm2: 1366,
    skyBand: true,
    assumedHookup: { amps: 15, volts: 240 },
  },
};

/**
 * Alpine autumn into Portugal across the end of summer time (31 October 2027, two zones): an unheated lithium
 * bank in frost (charging blocked), a rule generator with an allowed window, a routine in the repeated hour,
 * overlapping AC loads that overload the inverter, a propane heater that empties a part-filled cylinder, and a
 * last step shorter than an hour.
 */
const alpineAutumn: EngineInputDraft = {
  trip: {
    name: 'Alpine autumn',
    stops: [
      {
        name: 'Col du Nord',
        lat: 45.9,
        lon: 6.9,
        elevationM: 1500,
        timeZone: 'Europe/Paris',
        arriveAt: '2027-10-29T15:00+02:00',
        departAt: '2027-11-01T09:30+01:00',
        exposure: { kind: 'preset', preset: 'light-cover' },
        skyOutlook: 'hazy',
        generatorHours: { startHour: 9, endHour: 19 },
        lowC: -8,
        highC: 4,
      },
      {
        name: 'Praia Velha',
        lat: 38.7,
        lon: -9.4,
        timeZone: 'Europe/Lisbon',
        arriveAt: '2027-11-01T14:00Z',
        departAt: '2027-11-03T10:15Z',
        exposure: {
          kind: 'custom',
          horizonDeg: [0, 0, 5, 5, 10, 20, 30, 30, 20, 10, 5, 5, 0, 0, 0, 0],
          canopyTransmittance: 0.1,
        },
        skyOutlook: 'clear',
        generatorHours: null,
        lowC: 8,
        highC: 18,
      },
    ],
    drives: [{ hoursOnRoad: 3 }],
  },
  rig: {
    name: 'Alpine van',
    battery: {
      chemistry: 'lifepo4',
      capacityAh: 150,
      nominalV: 12.8,
      initialSocPct: 70,
      reservePct: 25,
      heatedSpace: false,
    },
    solarArrays: [
      { name: 'East tilt', ratedW: 220, mounting: 'tilted', tiltDeg: 45, azimuthDeg: 135, fit: 'racked' },
      { name: 'West tilt', ratedW: 180, mounting: 'tilted', tiltDeg: 20, azimuthDeg: 260, fit: 'flush' },
      { name: 'Flat', ratedW: 100, mounting: 'flat' },
    ],
    controller: { kind: 'mppt', maxAmps: 40, efficiency: 0.95 },
    inverter: { ratedW: 1500, surgeW: 2500, efficiency: 0.9, idleW: 8 },
    shoreCharger: { amps: 30 },
    vehicleCharger: { kind: 'dc-dc', amps: 20 },
    generator: {
      ratedW: 1800,
      fuel: 'petrol',
      mode: { kind: 'rule', startBelowSocPct: 45, stopAboveSocPct: 80 },
      fuelModel: { idleFuelKwhPerH: 2.2, fuelKwhPerKwhOut: 4.5 },
    },
    propaneTanks: [{ propaneKg: 5, fillPct: 40 }],
  },
  appliances: [
    {
      id: 'night-pump',
      name: 'Night pump',
      circuit: 'dc',
      runningW: 70,
      schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 1, startMinute: 30, minutes: 60 }] },
    },
    applianceFromLibrary('propane-heater', {
      id: 'heater',
      schedule: { kind: 'thermostat', mode: 'heating', setPointC: 18 },
    }),
    applianceFromLibrary('induction-hob', {
      id: 'hob',
      schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 18, startMinute: 0, minutes: 30 }] },
    }),
    applianceFromLibrary('kettle', {
      id: 'kettle',
      schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 18, startMinute: 10, minutes: 10 }] },
    }),
    applianceFromLibrary('laptop', {
      id: 'laptop',
      schedule: {
        kind: 'routine',
        windows: [{ days: { kind: 'trip-days', dayIndexes: [1, 2] }, startHour: 9, startMinute: 0, minutes: 480 }],
      },
    }),
    applianceFromLibrary('fridge-12v-compressor', { id: 'fridge' }),
    applianceFromLibrary('led-lights', { id: 'lights' }),
    applianceFromLibrary('satellite-internet', {
      id: 'sat',
      schedule: {
        kind: 'routine',
        windows: [{ days: { kind: 'day-type', dayType: 'travel' }, startHour: 16, startMinute: 0, minutes: 240 }],
      },
    }),
  ],
  options: { transposition: 'hay-davies', skyBand: true, assumedHookup: { amps: 16, volts: 230 } },
};

/** Midnight sun above the Arctic Circle: AGM bank, no inverter (AC loads go unserved), no band, a long roadside pause. */
const arcticSummer: EngineInputDraft = {
  trip: {
    name: 'Arctic summer',
    stops: [
      {
        name: 'Fjord head',
        lat: 69.6,
        lon: 18.9,
        timeZone: 'Europe/Oslo',
        arriveAt: '2027-06-18T20:00+02:00',
        departAt: '2027-06-20T08:00+02:00',
        exposure: { kind: 'preset', preset: 'partial-shade' },
        skyOutlook: 'broken-cloud',
        lowC: 6,
        highC: 14,
      },
      {
        name: 'Tundra pull-out',
        lat: 70.4,
        lon: 23.7,
        timeZone: 'Europe/Oslo',
        arriveAt: '2027-06-20T20:00+02:00',
        departAt: '2027-06-22T12:00+02:00',
        exposure: { kind: 'preset', preset: 'open' },
        skyOutlook: 'overcast',
        hookup: { amps: 6, volts: 230 },
        lowC: 3,
        highC: 11,
      },
    ],
    drives: [{ hoursOnRoad: 5, vehicleCharging: false }],
  },
  rig: {
    name: 'Arctic camper',
    battery: { chemistry: 'agm', capacityAh: 120, nominalV: 12, initialSocPct: 60 },
    solarArrays: [{ ratedW: 250, mounting: 'flat', fit: 'flush' }],
    controller: { kind: 'mppt', maxAmps: 20 },
    inverter: null,
    shoreCharger: { amps: 15 },
    vehicleCharger: { kind: 'dc-dc', amps: 25 },
    generator: null,
    propaneTanks: [],
  },
  appliances: [
    applianceFromLibrary('fridge-12v-compressor', { id: 'fridge' }),
    applianceFromLibrary('coffee-maker', { id: 'coffee' }),
    applianceFromLibrary('water-pump', { id: 'pump' }),
    applianceFromLibrary('phone-charging', { id: 'phones', quantity: 3 }),
  ],
  options: { skyBand: false },
};

export const GOLDEN_CASES: Readonly<Record<string, EngineInputDraft>> = {
  'demo-highland-loop': DEMO_TRIPS.highlandLoop,
  'demo-desert-spring-loop': DEMO_TRIPS.desertSpringLoop,
  'bench-30-days': benchTrip(30, 40),
  'bench-7-days': benchTrip(7, 15),
  'southern-spring-pwm-flooded-routine-generator': southernSpring,
  'alpine-autumn-dst-cold-lithium': alpineAutumn,
  'arctic-summer-no-inverter': arcticSummer,
};
