import { DateTime } from 'luxon';
import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { allZones, filterZones, placeOf } from './zone-filter';

type Props = { value: string; onPick: (zone: string) => void; onClose: () => void; testID: string };

/** The zone's offset today, which is what people recognise ("UTC+01:00") more often than the zone's name. */
const offsetOf = (zone: string) => DateTime.now().setZone(zone).toFormat("'UTC'ZZ");

/**
 * A searchable list of every IANA zone. Each match is a large button, reached by Tab; Enter in the search box
 * takes the first match, so a keyboard user can type "lond" and press Enter.
 */
export function ZonePicker({ value, onPick, onClose, testID }: Props) {
  const zones = useMemo(() => allZones(), []);
  const [query, setQuery] = useState('');
  const matches = filterZones(zones, query, 12);
  return (
    <View style={styles.box} testID={testID}>
      <TextField
        testID={`${testID}-search`}
        label="Search time zones"
        hint="a city or region, e.g. London or Denver"
        autoFocus
        value={query}
        onChangeText={setQuery}
        onSubmitEditing={() => {
          const first = matches.zones[0];
          if (first) onPick(first);
        }}
        autoCapitalize="none"
        autoCorrect={false}
      />
      <View role="list" aria-label="Matching time zones" style={styles.list}>
        {matches.zones.map((zone) => {
          const chosen = zone === value;
          return (
            <Pressable
              key={zone}
              testID={`${testID}-option-${zone}`}
              role="button"
              accessibilityLabel={`Use time zone ${zone}, ${offsetOf(zone)}${chosen ? ' (chosen now)' : ''}`}
              onPress={() => onPick(zone)}
              style={({ pressed }) => [styles.option, chosen ? styles.chosen : null, pressed ? styles.pressed : null]}
            >
              <View style={styles.optionText}>
                <Text variant="label">{placeOf(zone)}</Text>
                <Text variant="caption" color="inkSoft">
                  {zone}
                </Text>
              </View>
              <Text variant="caption" color="inkSoft">
                {offsetOf(zone)}
              </Text>
            </Pressable>
          );
        })}
      </View>
      <Text variant="caption" color="inkSoft" testID={`${testID}-count`} accessibilityLiveRegion="polite">
        {matches.zones.length === 0
          ? 'No zone matches; try a larger city nearby.'
          : matches.more > 0
            ? `${matches.more} more match: keep typing to narrow the list.`
            : `${matches.zones.length} ${matches.zones.length === 1 ? 'match' : 'matches'}.`}
      </Text>
      <Button testID={`${testID}-close`} tone="quiet" style={styles.close} label="Close the list" onPress={onClose} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: space.sm,
    padding: space.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.card,
  },
  list: { gap: space.xs },
  option: {
    minHeight: 52,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    borderRadius: radii.sm,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.white,
  },
  optionText: { flex: 1 },
  chosen: { borderColor: colors.pine, backgroundColor: colors.pineSoft },
  pressed: { opacity: 0.85 },
  close: { alignSelf: 'flex-start' },
});
