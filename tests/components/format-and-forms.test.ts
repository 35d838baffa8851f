import { describe, expect, it } from 'vitest';
import { energy, fuelAmount, mass, temperature } from '@/components/format/units';
import {
  fromFormValues,
  presetAt,
  skySourceOptions,
  stopFieldOf,
  stopFormSchema,
  toFormValues,
} from '@/components/route/stop-form-values';
import { highlandLoop } from '@/shared/engine';
import { stopSchema } from '@/shared/schemas/trip';
import { readStoredUnits } from '@/stores/units-store';

describe('unit formatting', () => {
  it.each([
    [950, { value: '950', unit: 'Wh' }],
    [2075.9, { value: '2,076', unit: 'Wh' }],
    [12_345, { value: '12.3', unit: 'kWh' }],
  ])('when %s Wh is shown, then it reads %o', (wh, figure) => {
    expect(energy(wh)).toEqual(figure);
  });
  it.each([
    ['metric', { value: '20', unit: '°C' }],
    ['us', { value: '68', unit: '°F' }],
  ] as const)('when 20 °C is shown in %s, then it reads %o', (system, figure) => {
    expect(temperature(20, system)).toEqual(figure);
  });
  it('when propane is shown in US units, then kilograms become pounds', () => {
    expect(mass(9.07, 'us')).toEqual({ value: '20.0', unit: 'lb' });
    expect(fuelAmount(3.785, 'L', 'us')).toEqual({ value: '1.0', unit: 'gal' });
  });
});

describe('stored units', () => {
  it.each([
    [null, 'metric'],
    ['{"units":"us"}', 'us'],
    ['{"units":"imperial"}', 'metric'],
    ['not json', 'metric'],
  ] as const)('when storage holds %s, then the units are %s', (raw, units) => {
    expect(readStoredUnits(raw)).toBe(units);
  });
});

describe('stop form values', () => {
  const stop = stopSchema.parse(highlandLoop.trip.stops[1]);

  it('when a stored stop is opened and saved unchanged, then the same stop comes back', () => {
    const built = fromFormValues(toFormValues(stop, '', 'metric', 'Europe/London'), 'metric');
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    expect(stopSchema.parse(built.stop)).toEqual(stop);
  });

  it('when US units are used, then temperatures go in as °F and are stored as °C', () => {
    const values = toFormValues(stop, '', 'us', 'Europe/London');
    expect(values.low).toBe(43);
    const built = fromFormValues({ ...values, low: 32, high: 50 }, 'us');
    expect(built.ok && built.stop.lowC).toBe(0);
  });

  /** Every message the form's resolver gives, by field. */
  const refusals = (values: unknown): Record<string, string> => {
    const result = stopFormSchema.safeParse(values);
    return Object.fromEntries((result.error?.issues ?? []).map((issue) => [String(issue.path[0]), issue.message]));
  };

  it('when departure is before arrival, then the message lands on the depart field', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    expect(refusals({ ...values, depart: '2027-09-13 10:00' }).depart).toMatch(/Leave after you arrive/);
  });

  it('when the latitude is wrong and the high is below the low, then both refusals show at once', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    const found = refusals({ ...values, lat: 123, low: 20, high: 5, depart: '2027-09-13 10:00', name: '' });
    expect(found).toMatchObject({
      name: 'Give the stop a name.',
      lat: 'Latitude runs from −90 to 90.',
      high: 'The high must be at or above the low.',
      depart: expect.stringMatching(/Leave after you arrive/),
    });
  });

  it('when a generator hour is 25, then the message gives the range; when it is empty, it asks for an hour', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    expect(refusals({ ...values, generatorStart: 25 }).generatorStart).toBe('Use an hour from 0 to 24.');
    expect(refusals({ ...values, generatorEnd: null }).generatorEnd).toBe('Enter an hour.');
  });

  it('when the time zone is not a real zone, then the zone field is refused and the dates wait for it', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    const found = refusals({ ...values, timeZone: 'Mars/Olympus' });
    expect(found.timeZone).toMatch(/time zone/);
    expect(found.arrive).toBeUndefined();
  });

  it('when the server names a stop field, then the form field that shows it is found; unknown names find none', () => {
    expect(stopFieldOf('stop.departAt')).toBe('depart');
    expect(stopFieldOf('stop.highC')).toBe('high');
    expect(stopFieldOf('notes')).toBe('notes');
    expect(stopFieldOf('stop.constructor')).toBeUndefined();
    expect(stopFieldOf('tripVersion')).toBeUndefined();
  });

  it('when the deep-forest stop is opened, then its sky openness and leaf-area index show, and the quick pick is lit', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    expect(values).toMatchObject({ exposureKind: 'canopy', opennessPct: 5.5, leafAreaIndex: 5, deciduous: false });
    expect(presetAt(values.opennessPct, values.leafAreaIndex)).toBe('deep-forest');
  });

  it('when a measured openness and deciduous trees are typed, then the stop keeps them as a canopy', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    const built = fromFormValues({ ...values, opennessPct: 38, leafAreaIndex: 4, deciduous: true }, 'metric');
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    expect(built.stop.exposure).toEqual({ kind: 'canopy', skyOpennessPct: 38, leafAreaIndex: 4, deciduous: true });
    const back = toFormValues(stopSchema.parse(built.stop), '', 'metric', 'Europe/London');
    expect(back).toMatchObject({ opennessPct: 38, leafAreaIndex: 4, deciduous: true });
    expect(presetAt(38, 4)).toBeNull();
  });

  it('when a custom horizon has too few angles, then the horizon field says how to write it', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    expect(refusals({ ...values, exposureKind: 'custom', horizon: '10, 20' }).horizon).toMatch(/4 to 36 angles/);
  });

  it('when a local time falls in the spring-forward gap, then it is refused', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    const gap = { ...values, arrive: '2027-03-28 01:30', depart: '2027-03-29 10:00' };
    expect(fromFormValues(gap, 'metric').ok).toBe(false);
    expect(refusals(gap).arrive).toMatch(/does not exist/);
  });

  it('when a stop picks its own sky and keeps its own temperatures, then both are saved and read back', () => {
    const values = toFormValues(stop, '', 'metric', 'Europe/London');
    expect(values).toMatchObject({ skySource: 'record', ownTemperatures: false });
    const built = fromFormValues(
      { ...values, skySource: 'preset', skyOutlook: 'hazy', ownTemperatures: true },
      'metric',
    );
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    const back = toFormValues(stopSchema.parse(built.stop), '', 'metric', 'Europe/London');
    expect(back).toMatchObject({ skySource: 'preset', skyOutlook: 'hazy', ownTemperatures: true });
  });

  it('when a stop lies beyond the 16-day forecast, then the forecast is not offered unless it is already chosen', () => {
    const today = new Date('2027-06-01T12:00:00Z');
    const at = (arrive: string, depart: string) => ({ arrive, depart, timeZone: 'Europe/London' });
    expect(skySourceOptions({ ...at('2027-06-10 14:00', '2027-06-12 10:00'), skySource: 'record' }, today)).toEqual([
      'record',
      'forecast',
      'preset',
    ]);
    expect(skySourceOptions({ ...at('2027-07-10 14:00', '2027-07-12 10:00'), skySource: 'record' }, today)).toEqual([
      'record',
      'preset',
    ]);
    expect(skySourceOptions({ ...at('2027-07-10 14:00', '2027-07-12 10:00'), skySource: 'forecast' }, today)).toContain(
      'forecast',
    );
  });
});
