import { StyleSheet, View } from 'react-native';
import { energy, text } from '@/components/format/units';
import { localDay } from '@/components/format/time';
import { colors, radii, space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { DaySheet } from '@/shared/engine/result-types';

const BAR_HEIGHT = 120;

/** Values under the bars are kWh to one decimal: short enough for eight days side by side on a phone. */
const kwh = (wh: number) => (wh / 1000).toLocaleString('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });

/** Harvest against use per day, drawn with plain views so it shows before the chart library loads. */
export function DayBars({ days }: { days: DaySheet[] }) {
  const max = Math.max(1, ...days.flatMap((d) => [d.harvestWh + d.hookupWh + d.vehicleWh + d.generatorWh, d.useWh]));
  return (
    <Card testID="day-bars">
      <Text variant="title" role="heading" aria-level={2}>
        Each day: harvest and use
      </Text>
      <View style={styles.legend}>
        {[
          { color: colors.sunlit, label: 'Solar' },
          { color: colors.lake, label: 'Hookup, vehicle, generator' },
          { color: colors.mist, label: 'Use' },
        ].map((k) => (
          <View key={k.label} style={styles.legendItem}>
            <View style={[styles.key, { backgroundColor: k.color }]} />
            <Text variant="caption">{k.label}</Text>
          </View>
        ))}
      </View>
      <View style={styles.row} role="list">
        {days.map((d) => {
          const other = d.hookupWh + d.vehicleWh + d.generatorWh;
          const label = `${localDay(`${d.date}T12:00`)}: solar ${text(energy(d.harvestWh))}, other charging ${text(energy(other))}, use ${text(energy(d.useWh))}`;
          return (
            <View
              key={d.dayIndex}
              style={styles.day}
              role="listitem"
              accessible
              accessibilityLabel={label}
              testID={`day-bar-${d.dayIndex}`}
            >
              <View style={styles.bars}>
                <View style={styles.stack}>
                  <View style={[styles.bar, { height: (other / max) * BAR_HEIGHT, backgroundColor: colors.lake }]} />
                  <View
                    style={[styles.bar, { height: (d.harvestWh / max) * BAR_HEIGHT, backgroundColor: colors.sunlit }]}
                  />
                </View>
                <View style={[styles.bar, styles.use, { height: (d.useWh / max) * BAR_HEIGHT }]} />
              </View>
              <Text variant="caption" color={d.energyShortWh > 0 ? 'ember' : 'inkSoft'} numberOfLines={1}>
                {d.date.slice(8)}
              </Text>
              <Text variant="caption" color="ink" numberOfLines={1} testID={`day-bar-${d.dayIndex}-in`}>
                {kwh(d.harvestWh + other)}
              </Text>
              <Text variant="caption" color="inkSoft" numberOfLines={1} testID={`day-bar-${d.dayIndex}-use`}>
                {kwh(d.useWh)}
              </Text>
            </View>
          );
        })}
      </View>
      <Text variant="caption" color="inkSoft">
        Under each day: kWh charged in (solar and other), then kWh used. A day number in orange had an energy shortfall.
      </Text>
    </Card>
  );
}

const styles = StyleSheet.create({
  legend: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', rowGap: space.xs, columnGap: space.md },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  key: { width: 12, height: 12, borderRadius: 3 },
  row: { flexDirection: 'row', alignItems: 'flex-end', gap: space.xs, justifyContent: 'space-between' },
  day: { flex: 1, alignItems: 'center', gap: space.xs, minWidth: 0 },
  bars: { height: BAR_HEIGHT, flexDirection: 'row', alignItems: 'flex-end', gap: 2 },
  stack: { justifyContent: 'flex-end' },
  bar: { width: 10, borderTopLeftRadius: radii.sm / 2, borderTopRightRadius: radii.sm / 2 },
  use: { backgroundColor: colors.mist },
});
