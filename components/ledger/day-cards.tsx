import { StyleSheet, View } from 'react-native';
import { localDay } from '@/components/format/time';
import { colors, fonts, radii, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import type { DaySheet } from '@/shared/engine/result-types';
import { netIsWarning } from './day-net';

type Figure = { label: string; value: string; unit: string; warn?: boolean };

const wh = (v: number) => (Math.abs(v) < 0.5 ? '0' : Math.round(v).toLocaleString('en-GB'));

/** On a phone each day is a card of its own: nothing to scroll sideways, every figure readable at once. */
export function DayCards({ days, names, reservePct }: { days: DaySheet[]; names: string[]; reservePct: number }) {
  return (
    <View style={styles.list} role="list" aria-label="Day sheets">
      {days.map((d) => {
        const figures: Figure[] = [
          { label: 'Harvest', value: wh(d.harvestWh), unit: 'Wh' },
          { label: 'All sources', value: wh(d.sourcesWh), unit: 'Wh' },
          { label: 'Use', value: wh(d.useWh), unit: 'Wh' },
          { label: 'Net', value: wh(d.netWh), unit: 'Wh', warn: netIsWarning(d) },
          { label: 'Lowest', value: String(Math.round(d.lowestSocPct)), unit: '%', warn: d.lowestSocPct < reservePct },
          { label: 'Generator', value: d.generatorHours.toFixed(1), unit: 'h' },
          { label: 'Short', value: wh(d.energyShortWh), unit: 'Wh', warn: d.energyShortWh > 0 },
        ];
        return (
          <View key={d.dayIndex} style={styles.day} role="listitem" testID={`day-card-${d.dayIndex}`}>
            <Text variant="label">{localDay(`${d.date}T12:00`)}</Text>
            <Text variant="caption" color="inkSoft">
              {d.travel ? 'travel day' : d.stopIndexes.map((i) => names[i] ?? '').join(', ')}
            </Text>
            <View style={styles.grid}>
              {figures.map((f) => (
                <View key={f.label} style={styles.figure}>
                  <Text variant="caption" color="inkSoft">
                    {f.label}
                  </Text>
                  <Text variant="label" color={f.warn ? 'ember' : 'ink'}>
                    <Text style={styles.number} color={f.warn ? 'ember' : 'ink'}>
                      {f.value}
                    </Text>{' '}
                    <Text variant="caption" color={f.warn ? 'ember' : 'inkSoft'}>
                      {f.unit}
                    </Text>
                  </Text>
                </View>
              ))}
            </View>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  day: {
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.white,
    padding: space.md,
    gap: 2,
  },
  grid: { flexDirection: 'row', flexWrap: 'wrap', rowGap: space.sm, marginTop: space.sm },
  figure: { width: '33.33%', gap: 0 },
  number: { fontSize: 18, lineHeight: 22, fontFamily: fonts.extraBold },
});
