import { describe, expect, it } from 'vitest';
import { engineInputSchema, stopSchema } from '@/shared/schemas';
import { simulateTrip, highlandLoop } from '@/shared/engine';
import { cToF, fromDisplay, toDisplay, UNIT_TABLE, type Quantity } from '@/shared/units';

const goodStop = highlandLoop.trip.stops[0];

describe('engine input schemas', () => {
  it('when the demo input is parsed, then defaults are filled in (sky, exposure, generator hours, options)', () => {
    const parsed = engineInputSchema.parse(highlandLoop);
    expect(parsed.options.transposition).toBe('hay-davies');
    expect(parsed.trip.stops[1]?.generatorHours).toBeNull();
    expect(parsed.trip.stops[0]?.generatorHours).toEqual({ startHour: 8, endHour: 20 });
    expect(parsed.rig.solarArrays[0]?.gammaPctPerC).toBe(-0.4);
  });

  it.each([
    ['a latitude past the pole', { lat: 91 }, 'lat'],
    ['a time with no offset', { arriveAt: '2027-09-12T15:00' }, 'arriveAt'],
    ['an unknown time zone', { timeZone: 'Mars/Olympus' }, 'timeZone'],
    ['a high below the low', { lowC: 20, highC: 10 }, 'highC'],
    ['a departure before arrival', { departAt: '2027-09-11T10:00+01:00' }, 'departAt'],
    ['a non-number temperature', { lowC: Number.NaN }, 'lowC'],
  ])('when a stop has %s, then zod names the field', (_what, patch, field) => {
    const r = stopSchema.safeParse({ ...goodStop, ...patch });
    expect(r.success).toBe(false);
    expect(r.error?.issues.some((i) => i.path.includes(field))).toBe(true);
  });

  it('when drives do not match the stops, then the error points at trip.drives', () => {
    const r = engineInputSchema.safeParse({ ...highlandLoop, trip: { ...highlandLoop.trip, drives: [] } });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(['trip', 'drives']);
  });

  it('when a negative battery capacity is given, then simulateTrip throws a field-level error instead of a number', () => {
    const bad = {
      ...highlandLoop,
      rig: { ...highlandLoop.rig, battery: { chemistry: 'lifepo4', capacityAh: -5, nominalV: 12.8 } },
    };
    expect(() => simulateTrip(bad as typeof highlandLoop)).toThrow(/capacityAh/);
  });

  it('when appliances share an id, then the duplicate is reported', () => {
    const a = highlandLoop.appliances?.[0];
    const r = engineInputSchema.safeParse({ ...highlandLoop, appliances: [a, a] });
    expect(r.success).toBe(false);
  });
});

describe('units', () => {
  it.each([
    ['temperature', 100, 212],
    ['temperature', -40, -40],
    ['mass', 9.0718474, 20],
    ['volume', 3.785411784, 1],
    ['length', 0.3048, 1],
    ['distance', 1.609344, 1],
    ['heatRate', 1000, 3412.14],
  ] as const)('when %s %f is shown in US units, then it reads %f', (q: Quantity, metric, us) => {
    expect(toDisplay(metric, q, 'us').value).toBeCloseTo(us, 6);
    expect(fromDisplay(us, q, 'us')).toBeCloseTo(metric, 6);
    expect(toDisplay(metric, q, 'metric').value).toBe(metric);
  });
  it('when every row converts there and back, then the value returns unchanged', () => {
    for (const c of Object.values(UNIT_TABLE)) expect(c.fromUs(c.toUs(12.345))).toBeCloseTo(12.345, 9);
    expect(cToF(0)).toBe(32);
  });
});
