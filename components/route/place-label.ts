import type { Place } from '@/shared/schemas/places';

/** "Fort William, Scotland, United Kingdom": the name with what tells it apart from its namesakes. */
export function placeLabel(place: Pick<Place, 'name' | 'region' | 'country'>): string {
  return [place.name, place.region, place.country].filter(Boolean).join(', ');
}

/** "12 km" or "8 mi" from a searched point, rounded as a person would say it. */
export function roughDistance(km: number, units: 'metric' | 'us'): string {
  const value = units === 'us' ? km / 1.609344 : km;
  const unit = units === 'us' ? 'mi' : 'km';
  return `${value < 10 ? value.toFixed(1) : Math.round(value)} ${unit}`;
}
