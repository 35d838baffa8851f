import { describe, expect, it } from 'vitest';
import { nextStopTimes } from '@/components/route/next-stop-times';
import { placeLabel, roughDistance } from '@/components/route/place-label';

const trip = { startDate: '2027-09-12', endDate: '2027-09-19', timeZone: 'Europe/London' };

describe('a new stop’s suggested stay', () => {
  it('when the route is empty, then it starts mid-afternoon on the trip’s first day and ends the next morning', () => {
    expect(nextStopTimes(trip, [])).toEqual({ arrive: '2027-09-12 15:00', depart: '2027-09-13 10:00' });
  });

  it('when stops exist, then it follows the one left last, whatever their order in the list', () => {
    const stops = [{ departAt: '2027-09-16T10:00+01:00' }, { departAt: '2027-09-14T10:00+01:00' }];
    expect(nextStopTimes(trip, stops)).toEqual({ arrive: '2027-09-16 15:00', depart: '2027-09-17 10:00' });
  });

  it('when the last stop is left late in the day, then the arrival is two hours after, on the quarter hour', () => {
    expect(nextStopTimes(trip, [{ departAt: '2027-09-14T15:10+01:00' }])).toEqual({
      arrive: '2027-09-14 17:15',
      depart: '2027-09-15 10:00',
    });
    expect(nextStopTimes(trip, [{ departAt: '2027-09-14T15:50+01:00' }]).arrive).toBe('2027-09-14 18:00');
  });

  it('when times are stored in another offset, then the stay is laid out in the trip’s own zone', () => {
    expect(nextStopTimes(trip, [{ departAt: '2027-09-14T09:00Z' }]).arrive).toBe('2027-09-14 15:00');
  });
});

describe('place labels', () => {
  it('when a place has a region, then the label names the place, the region and the country', () => {
    expect(placeLabel({ name: 'Fort William', region: 'Scotland', country: 'United Kingdom' })).toBe(
      'Fort William, Scotland, United Kingdom',
    );
    expect(placeLabel({ name: 'Tromsø', region: null, country: 'Norway' })).toBe('Tromsø, Norway');
  });

  it.each([
    [3.14, 'metric', '3.1 km'],
    [42.9, 'metric', '43 km'],
    [42.9, 'us', '27 mi'],
    [8, 'us', '5.0 mi'],
  ] as const)('when %f km is shown in %s units, then it reads %s', (km, units, text) => {
    expect(roughDistance(km, units)).toBe(text);
  });
});
