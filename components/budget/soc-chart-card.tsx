import { useState } from 'react';
import { StyleSheet, View, useWindowDimensions } from 'react-native';
import { energy, percent, text } from '@/components/format/units';
import { localMoment } from '@/components/format/time';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { SimulationResult } from '@/shared/engine/result-types';
import type { StopRecord } from '@/shared/schemas/api';
import { SocChartSurface } from './soc-chart';
import { socSeries } from './soc-series';

type Props = { result: SimulationResult; stops: StopRecord[] };

function Legend({ color, label, dashed }: { color: string; label: string; dashed?: boolean }) {
  return (
    <View style={styles.legendItem}>
      <View
        style={[
          styles.swatch,
          { backgroundColor: dashed ? 'transparent' : color, borderColor: color },
          dashed ? styles.dashed : null,
        ]}
      />
      <Text variant="caption" color="inkSoft">
        {label}
      </Text>
    </View>
  );
}

export function SocChartCard({ result, stops }: Props) {
  const wide = useIsWide();
  const { width } = useWindowDimensions();
  const [selected, setSelected] = useState<number | null>(null);
  // About 70 px per day label; the chart is the window less the side navigation and the card's padding.
  const chartWidth = wide ? Math.min(width - 240, 1320) - 560 : width - 80;
  const series = socSeries(result, Math.floor(chartWidth / 70));
  const row = selected === null ? undefined : result.ledger[selected];
  const last = result.ledger.length - 1;
  const step = (by: number) => setSelected((s) => Math.max(0, Math.min(last, (s ?? (by > 0 ? -1 : last + 1)) + by)));
  const height = wide ? 300 : Math.max(220, Math.min(280, width * 0.7));
  const stopName = (i: number) => stops[i]?.stop.name ?? `Stop ${i + 1}`;

  return (
    <Card testID="soc-chart-card">
      <Text variant="title" role="heading" aria-level={2}>
        State of charge
      </Text>
      <View style={styles.legend}>
        <Legend color={colors.pine} label="Planned sky" />
        <Legend color={colors.sunlit} label="Better to worse sky" />
        <Legend color={colors.ember} label="Reserve" dashed />
        <Legend color={colors.lake} label="Arrive at stop" dashed />
      </View>
      <View
        accessible
        accessibilityRole="image"
        accessibilityLabel={`State of charge over the trip; lowest ${Math.round(result.headline.lowestSocPct)}% at ${localMoment(result.headline.lowestAtLocal)}; reserve ${Math.round(result.headline.reservePct)}%.`}
        testID="soc-chart"
      >
        <SocChartSurface series={series} height={height} selected={selected} onSelect={setSelected} />
      </View>
      <View style={styles.stops}>
        {series.stops.map((s) => (
          <Text key={s.x} variant="caption" color="lake">
            {s.stopIndex + 1} {stopName(s.stopIndex)}
          </Text>
        ))}
      </View>
      <View style={styles.readout} testID="soc-readout" aria-live="polite">
        {row ? (
          <>
            <Text variant="label">{localMoment(row.local)}</Text>
            <Text variant="caption" color="inkSoft">
              {row.where.kind === 'stop' ? stopName(row.where.stopIndex) : 'On the road'} · charge{' '}
              {text(percent(row.socPct))} · solar {text(energy(row.solarUsedWh))} · use{' '}
              {text(energy(row.acLoadWh + row.dcLoadWh))}
              {row.hookupWh > 0 ? ` · hookup ${text(energy(row.hookupWh))}` : ''}
              {row.generatorWh > 0 ? ` · generator ${text(energy(row.generatorWh))}` : ''}
              {row.energyShortWh > 0 ? ` · short ${text(energy(row.energyShortWh))}` : ''}
            </Text>
          </>
        ) : (
          <Text variant="caption" color="inkSoft">
            Point at the chart, or step through the hours, to see that hour's figures.
          </Text>
        )}
      </View>
      <View style={styles.stepRow}>
        <Button
          testID="soc-prev-hour"
          label="‹ Hour"
          tone="secondary"
          accessibilityLabel="Previous hour"
          onPress={() => step(-1)}
        />
        <Button
          testID="soc-next-hour"
          label="Hour ›"
          tone="secondary"
          accessibilityLabel="Next hour"
          onPress={() => step(1)}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 16, height: 10, borderRadius: 3, borderWidth: 2 },
  dashed: { borderStyle: 'dashed', height: 0, borderWidth: 1.5 },
  stops: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md },
  readout: { minHeight: 48, padding: space.md, borderRadius: radii.md, backgroundColor: colors.dune, gap: 2 },
  stepRow: { flexDirection: 'row', gap: space.sm },
});
