import { Text } from '@/components/ui/text';
import { useNearbyPlacesQuery } from '@/stores/queries/places';
import { useUnits } from '@/stores/units-store';
import { placeLabel, roughDistance } from './place-label';

/** "Nearest towns: Caol 3.1 km, Fort William 4.2 km" under the coordinates, so a moved pin can be checked. */
export function NearestTowns({ lat, lon, testID }: { lat: number | null; lon: number | null; testID: string }) {
  const units = useUnits();
  const known = lat !== null && lon !== null && !(lat === 0 && lon === 0);
  const near = useNearbyPlacesQuery(known ? { lat, lon } : null);
  if (!known || !near.data || near.data.places.length === 0) return null;
  const [first, ...rest] = near.data.places;
  if (!first) return null;
  return (
    <Text variant="caption" color="inkSoft" testID={testID} accessibilityLiveRegion="polite">
      Nearest towns: {placeLabel(first)} {roughDistance(first.distanceKm ?? 0, units)}
      {rest.map((p) => `, ${p.name} ${roughDistance(p.distanceKm ?? 0, units)}`).join('')}
    </Text>
  );
}
