import { DateTime } from 'luxon';
import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { ZonePicker } from '@/components/route/zone-picker';
import { placeOf } from '@/components/route/zone-filter';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';

type Props = {
  label: string;
  value: string;
  onChange: (zone: string) => void;
  error?: string;
  /** Another way to set the zone, shown beside Change (e.g. from the stop's coordinates). */
  extraAction?: ReactNode;
  testID: string;
};

/** A time zone chosen from the searchable list of zones (no IANA names to type), showing the one chosen now. */
export function ZoneField({ label, value, onChange, error, extraAction, testID }: Props) {
  const [open, setOpen] = useState(false);
  const offset = DateTime.now().setZone(value);
  return (
    <View style={styles.wrap}>
      <Text variant="label">{label}</Text>
      <View style={styles.row}>
        <Text testID={`${testID}-value`} style={styles.value}>
          {offset.isValid ? `${placeOf(value)} (${value}, ${offset.toFormat("'UTC'ZZ")})` : value || 'None chosen'}
        </Text>
        <Button
          testID={`${testID}-change`}
          tone="secondary"
          label={open ? 'Hide the list' : 'Change'}
          accessibilityLabel={open ? 'Hide the time zone list' : `Change the ${label.toLowerCase()}`}
          aria-expanded={open}
          onPress={() => setOpen(!open)}
        />
        {extraAction}
      </View>
      {error ? (
        <Text variant="caption" color="ember" role="alert">
          {error}
        </Text>
      ) : null}
      {open ? (
        <ZonePicker
          testID={`${testID}-list`}
          value={value}
          onClose={() => setOpen(false)}
          onPick={(zone) => {
            onChange(zone);
            setOpen(false);
          }}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  value: { flexGrow: 1, flexBasis: 200 },
});
