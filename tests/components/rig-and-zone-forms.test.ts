import { describe, expect, it } from 'vitest';
import {
  fuelModelStart,
  INVERTER_HOURS_START,
  INVERTER_MODE_NOTE,
  generatorModeFor,
  newSolarArray,
  panelTemperature,
  percentOfFraction,
  perDegree,
  roofArea,
  withMounting,
} from '@/components/rig/rig-form-values';
import { allZones, filterZones, placeOf } from '@/components/route/zone-filter';
import { fuelModelSchema, rigSchema, solarArraySchema } from '@/shared/schemas/rig';

describe('rig form figures', () => {
  it('when a person starts their own fuel figures, then they start from the typical curve for that size and fuel', () => {
    expect(fuelModelStart(2200, 'propane')).toEqual({ idleFuelKwhPerH: 1.58, fuelKwhPerKwhOut: 3.3 });
    expect(fuelModelStart(5000, 'diesel').idleFuelKwhPerH).toBe(4.48); // 0.08415 L/h per kW × 10.64 kWh/L × 5 kW
    expect(fuelModelStart(undefined, undefined)).toEqual(fuelModelStart(2000, 'petrol'));
  });

  it.each([
    [0.9, 90],
    [0.97, 97],
    [0.855, 85.5],
  ])('when a fraction of %s is shown, then it reads %s % and goes back unchanged', (fraction, pct) => {
    expect(percentOfFraction.show(fraction)).toBe(pct);
    expect(percentOfFraction.store(pct)).toBe(fraction);
  });

  it('when the panel temperature is shown in US units, then 45 °C reads 113 °F and 113 °F is stored as 45 °C', () => {
    const t = panelTemperature('us');
    expect(t.unit).toBe('°F');
    expect(t.show(45)).toBe(113);
    expect(t.store(113)).toBe(45);
    expect(panelTemperature('metric').show(45)).toBe(45);
  });

  it('when the roof area is shown in US units, then 12 m² reads 129 ft² and a typed 129 ft² is stored near 12 m²', () => {
    const a = roofArea('us');
    expect(a.unit).toBe('ft²');
    expect(a.show(12)).toBe(129); // 12 / 0.3048² = 129.17 ft²
    expect(a.store(129)).toBeCloseTo(11.984, 3);
    expect(roofArea('metric').show(12)).toBe(12);
    expect(a.range(1, 60)).toBe('Enter a figure from 10.8 to 645.8 ft².');
  });

  it('when the temperature coefficient is shown per °F, then it is 5/9 of the figure per °C', () => {
    const g = perDegree('us');
    expect(g.unit).toBe('%/°F');
    expect(g.show(-0.45)).toBe(-0.25);
    expect(g.store(-0.25)).toBe(-0.45);
    expect(perDegree('metric').show(-0.4)).toBe(-0.4);
  });

  it('when a figure is refused, then the range reads in the shown unit, low to high', () => {
    expect(percentOfFraction.range(0.5, 1)).toBe('Enter a figure from 50 to 100 %.');
    expect(panelTemperature('us').range(30, 70)).toBe('Enter a figure from 86 to 158 °F.');
    expect(perDegree('us').range(-1, 0)).toBe('Enter a figure from -0.556 to 0 %/°F.');
  });

  it('when an array is added, then every field starts from the schema default', () => {
    const array = newSolarArray(200, 1);
    expect(array).toEqual(solarArraySchema.parse({ name: 'Array 2', ratedW: 200 }));
    expect(array).toMatchObject({
      fit: 'flush',
      noctC: 45,
      gammaPctPerC: -0.4,
      vmpV: 18,
      derate: 0.86,
      azimuthDeg: 180,
    });
  });

  it('when an array is laid flat, then its tilt becomes 0 so the schema accepts it; tilted again, it starts at 30°', () => {
    const tilted = { ...newSolarArray(200, 0), mounting: 'tilted' as const, tiltDeg: 20 };
    const flat = withMounting(tilted, 'flat');
    expect(flat.tiltDeg).toBe(0);
    expect(solarArraySchema.safeParse(flat).success).toBe(true);
    expect(withMounting(flat, 'tilted').tiltDeg).toBe(30);
    expect(withMounting(tilted, 'tilted').tiltDeg).toBe(20);
  });

  it('when the generator mode is switched, then a rule keeps its thresholds and set hours come back as opened', () => {
    const rule = { kind: 'rule' as const, startBelowSocPct: 30, stopAboveSocPct: 80 };
    const routine = { kind: 'routine' as const, windows: [{ startHour: 9, minutes: 120 }] };
    expect(generatorModeFor('off', rule, undefined)).toEqual({ kind: 'off' });
    expect(generatorModeFor('rule', rule, undefined)).toEqual(rule);
    expect(generatorModeFor('rule', { kind: 'off' }, undefined)).toEqual({
      kind: 'rule',
      startBelowSocPct: 40,
      stopAboveSocPct: 90,
    });
    expect(generatorModeFor('routine', { kind: 'off' }, routine)).toEqual(routine);
  });

  it('when a rig with every advanced field set goes through the form schema, then each figure is kept', () => {
    const rig = rigSchema.parse({
      name: 'Full rig',
      battery: { chemistry: 'lifepo4', capacityAh: 200, nominalV: 12.8, heatedSpace: true, initialSocPct: 80 },
      solarArrays: [
        {
          ...withMounting(newSolarArray(400, 0), 'tilted'),
          azimuthDeg: 200,
          fit: 'racked',
          noctC: panelTemperature('us').store(111.2),
          derate: percentOfFraction.store(80),
        },
      ],
      controller: { kind: 'pwm', maxAmps: 30, efficiency: 0.95 },
      inverter: { ratedW: 2000, efficiency: 0.88, idleW: 14, mode: 'always' },
      shoreCharger: { amps: 20, efficiency: 0.85 },
      vehicleCharger: { kind: 'alternator', amps: 40 },
      generator: {
        ratedW: 2200,
        fuel: 'diesel',
        mode: { kind: 'rule', startBelowSocPct: 35, stopAboveSocPct: 85 },
        fuelModel: fuelModelStart(2200, 'propane'),
      },
    });
    expect(rig.solarArrays[0]).toMatchObject({
      mounting: 'tilted',
      tiltDeg: 30,
      azimuthDeg: 200,
      fit: 'racked',
      noctC: 44,
      derate: 0.8,
    });
    expect(rig.inverter).toEqual({ ratedW: 2000, efficiency: 0.88, idleW: 14, mode: 'always' });
    expect(rig.generator?.fuelModel).toEqual(fuelModelStart(2200, 'propane'));
    expect(fuelModelSchema.safeParse(fuelModelStart(2200, 'propane')).success).toBe(true);
    expect(rig.battery).toMatchObject({ heatedSpace: true, initialSocPct: 80 });
  });

  it('when the generator would stop below where it starts, then the message lands on the stop field', () => {
    const result = rigSchema.safeParse({
      name: 'R',
      battery: { chemistry: 'agm', capacityAh: 100, nominalV: 12 },
      generator: { ratedW: 2000, mode: { kind: 'rule', startBelowSocPct: 60, stopAboveSocPct: 50 } },
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(['generator', 'mode', 'stopAboveSocPct']);
  });

  it('when the inverter is kept on in set hours but none are given, then the message lands on the hours', () => {
    const rig = { name: 'R', battery: { chemistry: 'agm', capacityAh: 100, nominalV: 12 } } as const;
    const without = rigSchema.safeParse({ ...rig, inverter: { ratedW: 2000, mode: 'scheduled' } });
    expect(without.success).toBe(false);
    expect(without.error?.issues[0]?.path).toEqual(['inverter', 'onHours']);
    const withHours = rigSchema.safeParse({
      ...rig,
      inverter: { ratedW: 2000, mode: 'scheduled', onHours: { ...INVERTER_HOURS_START } },
    });
    expect(withHours.success).toBe(true);
    expect(INVERTER_MODE_NOTE.scheduled).toMatch(/these hours/);
  });
});

describe('time zone search', () => {
  const zones = [
    'America/Argentina/Buenos_Aires',
    'America/New_York',
    'America/Denver',
    'Europe/London',
    'Europe/Londonderry',
    'Pacific/Auckland',
    'UTC',
  ];

  it.each([
    ['new york', 'America/New_York'],
    ['NEW_YORK', 'America/New_York'],
    ['america/new', 'America/New_York'],
    ['buenos', 'America/Argentina/Buenos_Aires'],
    ['lond', 'Europe/London'],
  ])('when "%s" is typed, then %s comes first', (query, zone) => {
    expect(filterZones(zones, query).zones[0]).toBe(zone);
  });

  it('when every word must match, then a word that is nowhere drops the zone', () => {
    expect(filterZones(zones, 'europe york').zones).toEqual([]);
  });

  it('when a place starts with the search, then it ranks above zones that only contain it', () => {
    expect(filterZones(zones, 'land').zones).toEqual(['Pacific/Auckland']);
  });

  it('when more zones match than are shown, then the count of the rest is given', () => {
    expect(filterZones(zones, 'america', 2)).toEqual({
      zones: ['America/Argentina/Buenos_Aires', 'America/Denver'],
      more: 1,
    });
    expect(filterZones(zones, '', 3).more).toBe(4);
  });

  it('when a zone is named, then its place reads as words', () => {
    expect(placeOf('America/Argentina/Buenos_Aires')).toBe('Buenos Aires');
    expect(placeOf('UTC')).toBe('UTC');
  });

  it('when the runtime lists its zones, then UTC and common zones are among them', () => {
    const all = allZones();
    expect(all).toContain('UTC');
    expect(all).toContain('Europe/London');
    expect(all.length).toBeGreaterThan(300);
  });
});
