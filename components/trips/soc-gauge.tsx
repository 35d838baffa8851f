import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';

/** The trip's lowest charge as a small horizontal gauge with the reserve marked. */
export function SocGauge({
  lowestPct,
  reservePct,
  testID,
}: {
  lowestPct: number;
  reservePct: number | null;
  testID: string;
}) {
  const below = reservePct !== null && lowestPct < reservePct;
  const pct = Math.max(0, Math.min(100, lowestPct));
  return (
    <View
      style={styles.wrap}
      testID={testID}
      accessible
      accessibilityLabel={`Lowest charge ${Math.round(lowestPct)}%${reservePct !== null ? `, reserve ${Math.round(reservePct)}%` : ''}`}
    >
      <View style={styles.labels}>
        <Text variant="caption" color="inkSoft">
          Lowest charge
        </Text>
        <Text variant="label" color={below ? 'ember' : 'pine'}>
          {Math.round(lowestPct)}%
        </Text>
      </View>
      <View style={styles.track}>
        <View style={[styles.fill, { width: `${pct}%`, backgroundColor: below ? colors.ember : colors.pine }]} />
        {reservePct !== null ? <View style={[styles.reserve, { left: `${reservePct}%` }]} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs, flex: 1, minWidth: 120 },
  labels: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline' },
  track: { height: 10, borderRadius: radii.pill, backgroundColor: colors.line, overflow: 'hidden' },
  fill: { height: 10, borderRadius: radii.pill },
  reserve: { position: 'absolute', top: 0, bottom: 0, width: 2, backgroundColor: colors.ink },
});
