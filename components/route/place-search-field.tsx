import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { formatDecimal } from '@/shared/geo/parse-coordinates';
import type { Place } from '@/shared/schemas/places';
import { usePlaceSearchQuery } from '@/stores/queries/places';
import { useUnits } from '@/stores/units-store';
import { placeLabel, roughDistance } from './place-label';
import { useDebouncedValue } from './use-debounced-value';

export type PickedPlace = { name: string; lat: number; lon: number; timeZone: string | null };

type Props = {
  value: string;
  onChangeText: (text: string) => void;
  onBlur?: () => void;
  /** A place or a typed coordinate was chosen: fill in the position and the zone. */
  onPick: (picked: PickedPlace) => void;
  error?: string;
  testID: string;
};

const round5 = (v: number) => Math.round(v * 1e5) / 1e5;

type Option = { key: string; title: string; detail: string; picked: PickedPlace };

function optionsFor(data: ReturnType<typeof usePlaceSearchQuery>['data'], units: 'metric' | 'us'): Option[] {
  if (!data) return [];
  const places = data.places.map((place: Place) => ({
    key: place.id,
    title: place.name,
    detail: [
      [place.region, place.country].filter(Boolean).join(', '),
      place.distanceKm === undefined ? null : `${roughDistance(place.distanceKm, units)} away`,
    ]
      .filter(Boolean)
      .join(' · '),
    picked: { name: place.name, lat: round5(place.lat), lon: round5(place.lon), timeZone: place.timeZone },
  }));
  if (data.query.kind !== 'coordinates') return places;
  const { lat, lon, timeZone } = data.query;
  const nearest = data.places[0];
  return [
    {
      key: 'typed-point',
      title: `Use ${formatDecimal({ lat, lon })}`,
      detail: nearest ? `A pitch near ${placeLabel(nearest)}` : 'The coordinates as typed',
      picked: { name: nearest ? `Pitch near ${nearest.name}` : 'Pitch', lat: round5(lat), lon: round5(lon), timeZone },
    },
    ...places,
  ];
}

/**
 * The stop's name, which is also a place search: typing "fort wil" offers Fort William with its region and country;
 * typing or pasting coordinates ("57.12, -5.34", "57°07'N 5°20'W") offers that point and the towns nearest it.
 * Choosing fills in the position and the time zone. Enter takes the first suggestion.
 */
export function PlaceSearchField({ value, onChangeText, onBlur, onPick, error, testID }: Props) {
  const units = useUnits();
  const [searching, setSearching] = useState(false);
  const query = useDebouncedValue(searching ? value : '', 250);
  const search = usePlaceSearchQuery(query);
  const options = searching && query.trim().length >= 2 ? optionsFor(search.data, units) : [];
  const pick = (option: Option) => {
    setSearching(false);
    onPick(option.picked);
  };
  const status = !searching
    ? ''
    : value.trim().length < 2
      ? 'Type two letters or more to see places.'
      : search.isFetching && options.length === 0
        ? 'Looking…'
        : search.isError
          ? 'Place search is not answering; type the coordinates below instead.'
          : options.length === 0 && query === value
            ? 'No town by that name. Type coordinates, or the nearest town and move the pin.'
            : `${options.length} ${options.length === 1 ? 'suggestion' : 'suggestions'}.`;
  return (
    <View style={styles.wrap}>
      <TextField
        testID={testID}
        label="Name or place"
        hint="a town, or coordinates such as 57.12, -5.34 — the position and time zone fill in"
        value={value}
        error={error}
        autoCorrect={false}
        onChangeText={(text) => {
          setSearching(true);
          onChangeText(text);
        }}
        onBlur={onBlur}
        onSubmitEditing={() => {
          const first = options[0];
          if (first) pick(first);
        }}
      />
      {options.length > 0 ? (
        <View role="list" aria-label="Places matching the name" style={styles.list} testID={`${testID}-suggestions`}>
          {options.map((option, i) => (
            <Pressable
              key={option.key}
              testID={`${testID}-suggestion-${i}`}
              role="button"
              accessibilityLabel={`${option.title}, ${option.detail}`}
              onPress={() => pick(option)}
              style={({ pressed }) => [styles.option, pressed ? styles.pressed : null]}
            >
              <Text variant="label">{option.title}</Text>
              <Text variant="caption" color="inkSoft">
                {option.detail}
              </Text>
            </Pressable>
          ))}
          <Text variant="caption" color="inkSoft">
            Places: GeoNames (CC BY 4.0)
          </Text>
        </View>
      ) : null}
      {status ? (
        <Text variant="caption" color="inkSoft" accessibilityLiveRegion="polite" testID={`${testID}-status`}>
          {status}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  list: {
    gap: space.xs,
    padding: space.sm,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.card,
  },
  option: {
    minHeight: 48,
    justifyContent: 'center',
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    borderRadius: radii.sm,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.white,
  },
  pressed: { opacity: 0.85 },
});
