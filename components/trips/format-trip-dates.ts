import { DateTime } from 'luxon';

/** "12–19 Sep 2027", "28 Sep – 3 Oct 2027" or across years in full; nights counted between dates. */
export function formatTripDates(startDate: string, endDate: string): string {
  const start = DateTime.fromISO(startDate, { zone: 'utc' });
  const end = DateTime.fromISO(endDate, { zone: 'utc' });
  if (!start.isValid || !end.isValid) return `${startDate} – ${endDate}`;
  if (start.year !== end.year) return `${start.toFormat('d LLL yyyy')} – ${end.toFormat('d LLL yyyy')}`;
  if (start.month !== end.month) return `${start.toFormat('d LLL')} – ${end.toFormat('d LLL yyyy')}`;
  return `${start.toFormat('d')}–${end.toFormat('d LLL yyyy')}`;
}

export function countNights(startDate: string, endDate: string): number {
  const start = DateTime.fromISO(startDate, { zone: 'utc' });
  const end = DateTime.fromISO(endDate, { zone: 'utc' });
  return Math.max(0, Math.round(end.diff(start, 'days').days));
}
