import { describe, expect, it } from 'vitest';
import { shiftDate, stopDates, stopWeatherRanges } from '@/shared/weather-ranges';

const stop = { lat: 56.94, lon: -5.06, arriveAt: '2027-06-10T14:00+01:00', departAt: '2027-06-12T10:00+01:00' };

describe('which weather a stop needs', () => {
  it('when 29 February is moved to a common year, then it falls on the 28th', () => {
    expect(shiftDate('2028-02-29', 1)).toBe('2027-02-28');
    expect(shiftDate('2028-02-29', 4)).toBe('2024-02-29');
  });

  it('when a stop departs on the hour, then its last hour is stamped that hour, the same date', () => {
    expect(stopDates(stop)).toEqual({ startDate: '2027-06-10', endDate: '2027-06-12' });
    expect(stopDates({ ...stop, departAt: '2027-06-12T23:30Z' }).endDate).toBe('2027-06-13');
  });

  it('when the trip is next summer, then the years start with the latest summer the archive holds', () => {
    const ranges = stopWeatherRanges(stop, new Date('2026-11-20T10:00Z'), 20);
    expect(ranges.place).toEqual({ latE1: 569, lonE1: -51 });
    expect(ranges.record).toHaveLength(20);
    expect(ranges.record[0]).toEqual({ shiftYears: 1, startDate: '2026-06-10', endDate: '2026-06-12' });
    expect(ranges.record[19]).toEqual({ shiftYears: 20, startDate: '2007-06-10', endDate: '2007-06-12' });
    expect(ranges.forecast).toBeNull();
  });

  it('when the stop is days away, then this year cannot be in the record yet and its days inside 16 are forecast', () => {
    const near = { ...stop, arriveAt: '2026-11-30T14:00Z', departAt: '2026-12-10T10:00Z' };
    const ranges = stopWeatherRanges(near, new Date('2026-11-20T10:00Z'), 3);
    expect(ranges.record.map((r) => r.startDate)).toEqual(['2025-11-30', '2024-11-30', '2023-11-30']);
    expect(ranges.forecast).toEqual({ startDate: '2026-11-30', endDate: '2026-12-05' });
  });
});
