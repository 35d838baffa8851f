// Demo trips as engine input (invented places and rigs). Shared by the tests and, later, the database seed.
import type { ApplianceInput } from '../schemas/appliance';
import type { EngineInputDraft } from '../schemas/engine-input';
import { applianceFromLibrary } from './appliance-library';
import { DESERT_DC_WIRING, HIGHLAND_DC_WIRING } from './demo-dc-wiring';

const everyEvening = (startHour: number, minutes: number, startMinute = 0): ApplianceInput['schedule'] => ({
  kind: 'routine',
  windows: [{ days: { kind: 'all' }, startHour, startMinute, minutes }],
});

const caravanLoads: ApplianceInput[] = [
  applianceFromLibrary('led-lights', { id: 'lights' }),
  applianceFromLibrary('fridge-12v-compressor', { id: 'fridge' }),
  applianceFromLibrary('water-pump', { id: 'pump' }),
  applianceFromLibrary('phone-charging', { id: 'phones', quantity: 2 }),
  applianceFromLibrary('laptop', { id: 'laptop' }),
  applianceFromLibrary('tv', { id: 'tv' }),
  applianceFromLibrary('kettle', {
    id: 'kettle',
    schedule: {
      kind: 'routine',
      windows: [
        { days: { kind: 'all' }, startHour: 7, startMinute: 0, minutes: 5 },
        { days: { kind: 'all' }, startHour: 16, startMinute: 0, minutes: 5 },
      ],
    },
  }),
  applianceFromLibrary('hair-dryer', {
    id: 'hair-dryer',
    schedule: {
      kind: 'routine',
      windows: [{ days: { kind: 'day-type', dayType: 'camp' }, startHour: 7, startMinute: 30, minutes: 10 }],
    },
  }),
  applianceFromLibrary('propane-heater', { id: 'heater' }),
  applianceFromLibrary('propane-stove', { id: 'stove' }),
];

/** "Highland loop": a 6 m caravan, 12–19 September 2027, metric, Europe/London. */
export const highlandLoop: EngineInputDraft = {
  trip: {
    name: 'Highland loop',
    stops: [
      {
        name: 'Lochan Mhor lochside pitch',
        lat: 56.98,
        lon: -5.12,
        timeZone: 'Europe/London',
        arriveAt: '2027-09-12T15:00+01:00',
        departAt: '2027-09-14T10:00+01:00',
        exposure: { kind: 'preset', preset: 'open' },
        skyOutlook: 'broken-cloud',
        hookup: { amps: 16, volts: 230 },
        lowC: 8,
        highC: 15,
      },
      {
        name: 'Glen Carrach pinewood',
        lat: 57.16,
        lon: -4.79,
        timeZone: 'Europe/London',
        arriveAt: '2027-09-14T13:00+01:00',
        departAt: '2027-09-16T10:00+01:00',
        exposure: { kind: 'preset', preset: 'deep-forest' },
        skyOutlook: 'broken-cloud',
        generatorHours: null,
        lowC: 6,
        highC: 14,
      },
      {
        name: 'Rubha Sgeir coastal field',
        lat: 57.58,
        lon: -5.78,
        timeZone: 'Europe/London',
        arriveAt: '2027-09-16T13:30+01:00',
        departAt: '2027-09-17T10:00+01:00',
        exposure: { kind: 'preset', preset: 'open' },
        skyOutlook: 'clear',
        lowC: 9,
        highC: 16,
      },
      {
        name: 'Strathbeag club rally field',
        lat: 57.42,
        lon: -4.48,
        timeZone: 'Europe/London',
        arriveAt: '2027-09-17T13:00+01:00',
        departAt: '2027-09-19T11:00+01:00',
        exposure: { kind: 'preset', preset: 'open' },
        skyOutlook: 'broken-cloud',
        generatorHours: { startHour: 9, endHour: 20 },
        lowC: 7,
        highC: 15,
      },
    ],
    drives: [{ hoursOnRoad: 2.5 }, { hoursOnRoad: 3 }, { hoursOnRoad: 2.5 }],
  },
  rig: {
    name: '6 m caravan',
    battery: { chemistry: 'lifepo4', capacityAh: 200, nominalV: 12.8, initialSocPct: 100 },
    solarArrays: [{ name: 'Roof', ratedW: 400, mounting: 'flat', fit: 'flush' }],
    controller: { kind: 'mppt', maxAmps: 30 },
    inverter: { ratedW: 2000, surgeW: 4000, efficiency: 0.9, idleW: 12 },
    shoreCharger: { amps: 20 },
    vehicleCharger: { kind: 'dc-dc', amps: 25 },
    propaneTanks: [
      { name: 'Cylinder A', propaneKg: 6 },
      { name: 'Cylinder B', propaneKg: 6 },
    ],
    dcWiring: HIGHLAND_DC_WIRING,
    // A 6 m touring caravan for two (outside body size).
    cabin: { lengthM: 6, widthM: 2.3, heightM: 2.1, insulation: 'standard', occupants: 2 },
  },
  appliances: caravanLoads,
  options: { assumedHookup: { amps: 16, volts: 230 } },
};

const trailerLoads: ApplianceInput[] = [
  applianceFromLibrary('led-lights', { id: 'lights' }),
  applianceFromLibrary('fridge-12v-compressor', { id: 'fridge', runningW: 60 }),
  applianceFromLibrary('water-pump', { id: 'pump' }),
  applianceFromLibrary('roof-vent-fan', { id: 'vent-fan' }),
  applianceFromLibrary('roof-air-conditioner', {
    id: 'roof-ac',
    schedule: {
      kind: 'thermostat',
      mode: 'cooling',
      setPointC: 27,
      activeWindows: [{ days: { kind: 'all' }, startHour: 13, startMinute: 0, minutes: 300 }],
    },
  }),
  applianceFromLibrary('microwave', { id: 'microwave' }),
  applianceFromLibrary('coffee-maker', { id: 'coffee' }),
  applianceFromLibrary('laptop', { id: 'laptop', schedule: everyEvening(9, 240) }),
  applianceFromLibrary('satellite-internet', { id: 'satellite' }),
  applianceFromLibrary('phone-charging', { id: 'phones', quantity: 2 }),
  applianceFromLibrary('tv', { id: 'tv' }),
  applianceFromLibrary('propane-stove', { id: 'stove' }),
  applianceFromLibrary('furnace-propane', {
    id: 'furnace',
    schedule: { kind: 'thermostat', mode: 'heating', setPointC: 16 },
  }),
];

/** "Desert spring loop": a travel trailer, April 2027, shown in US units, America/Phoenix. */
export const desertSpringLoop: EngineInputDraft = {
  trip: {
    name: 'Desert spring loop',
    stops: [
      {
        name: 'Dry Mesa overlook',
        lat: 33.41,
        lon: -112.96,
        timeZone: 'America/Phoenix',
        arriveAt: '2027-04-05T14:00-07:00',
        departAt: '2027-04-08T10:00-07:00',
        exposure: { kind: 'preset', preset: 'open' },
        skyOutlook: 'clear',
        lowC: 13,
        highC: 31,
      },
      {
        name: 'Cholla Bend wash',
        lat: 32.62,
        lon: -111.89,
        timeZone: 'America/Phoenix',
        arriveAt: '2027-04-08T13:00-07:00',
        departAt: '2027-04-10T10:00-07:00',
        exposure: { kind: 'preset', preset: 'light-cover' },
        skyOutlook: 'hazy',
        lowC: 12,
        highC: 33,
      },
      {
        name: 'Tinaja Flats RV park',
        lat: 32.05,
        lon: -110.87,
        timeZone: 'America/Phoenix',
        arriveAt: '2027-04-10T13:00-07:00',
        departAt: '2027-04-11T10:00-07:00',
        exposure: { kind: 'preset', preset: 'open' },
        skyOutlook: 'clear',
        hookup: { amps: 30, volts: 120 },
        lowC: 11,
        highC: 30,
      },
      {
        name: 'Red Shale canyon camp',
        lat: 32.98,
        lon: -110.42,
        timeZone: 'America/Phoenix',
        arriveAt: '2027-04-11T14:00-07:00',
        departAt: '2027-04-13T10:00-07:00',
        exposure: { kind: 'custom', horizonDeg: [5, 10, 25, 30, 20, 10, 25, 35], canopyTransmittance: 0 },
        skyOutlook: 'clear',
        generatorHours: { startHour: 8, endHour: 20 },
        lowC: 8,
        highC: 28,
      },
    ],
    drives: [{ hoursOnRoad: 2 }, { hoursOnRoad: 2 }, { hoursOnRoad: 3 }],
  },
  rig: {
    name: 'Travel trailer',
    battery: { chemistry: 'lifepo4', capacityAh: 400, nominalV: 12.8, initialSocPct: 100 },
    solarArrays: [{ name: 'Roof', ratedW: 800, mounting: 'flat', fit: 'flush' }],
    controller: { kind: 'mppt', maxAmps: 60 },
    inverter: { ratedW: 3000, surgeW: 6000, efficiency: 0.9, idleW: 25 },
    shoreCharger: { amps: 55 },
    vehicleCharger: { kind: 'alternator', amps: 30 },
    generator: { ratedW: 2200, fuel: 'propane', mode: { kind: 'rule', startBelowSocPct: 30, stopAboveSocPct: 85 } },
    propaneTanks: [
      { name: 'Front A', propaneKg: 9.07 },
      { name: 'Front B', propaneKg: 9.07 },
    ],
    dcWiring: DESERT_DC_WIRING,
    // A 24 ft travel trailer for two.
    cabin: { lengthM: 7.3, widthM: 2.4, heightM: 2.3, insulation: 'standard', occupants: 2 },
  },
  appliances: trailerLoads,
  options: { assumedHookup: { amps: 30, volts: 120 } },
};

export const DEMO_TRIPS = { highlandLoop, desertSpringLoop } as const;
