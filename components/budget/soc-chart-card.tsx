import { useState } from 'react';
import { Pressable, StyleSheet, View, useWindowDimensions } from 'react-native';
import { energy, percent, text } from '@/components/format/units';
import { localMoment } from '@/components/format/time';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SideScroll } from '@/components/ui/side-scroll';
import { Text } from '@/components/ui/text';
import { webData } from '@/components/ui/web-data';
import type { BudgetResult } from '@/shared/budget-result';
import type { TripDetail } from '@/shared/schemas/api';
import { whereAt } from '@/shared/ledger-columns';
import { SocChartSurface } from './soc-chart';
import { dayRange, socSeries, wholeTrip, type SocSeries } from './soc-series';
import { solarReadout } from './solar-readout';
import { useLedgerView } from './use-budget-view';

type Props = { result: BudgetResult; detail: TripDetail };

type Mark = 'fill' | 'dashed' | 'ring' | 'pin';

function Legend({ color, label, mark = 'fill' }: { color: string; label: string; mark?: Mark }) {
  return (
    <View style={styles.legendItem}>
      {mark === 'pin' ? (
        // The chart marks a flag with a small downward triangle.
        <Text variant="caption" color="ember" style={styles.pin}>
          ▼
        </Text>
      ) : (
        <View
          style={[
            styles.swatch,
            { backgroundColor: mark === 'fill' ? color : 'transparent', borderColor: color },
            mark === 'dashed' ? styles.dashed : mark === 'ring' ? styles.ring : null,
          ]}
        />
      )}
      <Text variant="caption" color="inkSoft">
        {label}
      </Text>
    </View>
  );
}

/** Whole trip (the default) or one day at a time: a row of chips that scrolls sideways on a phone. */
function RangeChips({
  series,
  day,
  onChange,
}: {
  series: SocSeries;
  day: number | null;
  onChange: (d: number | null) => void;
}) {
  const options: { key: number | null; label: string; testID: string }[] = [
    { key: null, label: 'Whole trip', testID: 'soc-range-all' },
    ...series.days.map((d) => ({ key: d.dayIndex, label: d.label, testID: `soc-range-day-${d.dayIndex}` })),
  ];
  return (
    <SideScroll testID="soc-range" what="More days" fadeColor={colors.card} contentContainerStyle={styles.chips}>
      <View style={styles.chipRow} role="radiogroup" aria-label="Show on the chart">
        {options.map((o) => {
          const on = o.key === day;
          return (
            <Pressable
              key={o.testID}
              testID={o.testID}
              role="radio"
              aria-checked={on}
              accessibilityLabel={o.key === null ? 'Show the whole trip' : `Show ${o.label} only`}
              onPress={() => onChange(o.key)}
              style={[styles.chip, on ? styles.chipOn : null]}
            >
              <Text variant="caption" color={on ? 'white' : 'ink'}>
                {o.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </SideScroll>
  );
}

export function SocChartCard({ result, detail }: Props) {
  const stops = detail.stops;
  const wide = useIsWide();
  const { width } = useWindowDimensions();
  const [selected, setSelected] = useState<number | null>(null);
  // The whole trip by default; a day chip zooms in (null: whole trip).
  const [day, setDay] = useState<number | null>(null);
  const series = socSeries(result);
  const range = day === null || !series.days[day] ? wholeTrip(series) : dayRange(series, day);
  // The hour's place and charge come with the budget; its other figures from the ledger, asked for on first use.
  const ledger = useLedgerView(detail, selected !== null);
  const hour =
    selected === null || selected >= result.soc.socPct.length
      ? undefined
      : {
          local: result.soc.local[selected] ?? '',
          where: whereAt(result.soc, selected),
          socPct: result.soc.socPct[selected] ?? 0,
        };
  const row = selected === null || ledger.state !== 'ready' ? undefined : ledger.rows[selected];
  const solar = row ? solarReadout(row) : null;
  const step = (by: number) =>
    setSelected((s) => {
      const from = s === null || s < range.from || s > range.to ? (by > 0 ? range.from - 1 : range.to + 1) : s;
      return Math.max(range.from, Math.min(range.to, from + by));
    });
  const height = wide ? 300 : Math.max(220, Math.min(280, width * 0.7));
  const stopName = (i: number) => stops[i]?.stop.name ?? `Stop ${i + 1}`;

  return (
    <Card testID="soc-chart-card">
      <Text variant="title" role="heading" aria-level={2}>
        State of charge
      </Text>
      <View style={styles.legend}>
        <Legend color={colors.pine} label={result.socBand ? 'Median past year' : 'Planned sky'} />
        <Legend
          color={colors.sunlit}
          label={result.socBand ? '1 in 10 to 9 in 10 past years' : 'Better to worse sky'}
        />
        <Legend color={colors.ember} label="Reserve" mark="dashed" />
        <Legend color={colors.lake} label="Arrive at stop" mark="dashed" />
        <Legend color={colors.ember} label="Lowest point" mark="ring" />
        {result.flags.length > 0 ? <Legend color={colors.ember} label="Flag (numbered as below)" mark="pin" /> : null}
      </View>
      <RangeChips
        series={series}
        day={day}
        onChange={(d) => {
          setDay(d);
          setSelected(null);
        }}
      />
      <View
        accessible
        accessibilityRole="image"
        accessibilityLabel={`State of charge from ${localMoment(series.locals[range.from] ?? '')} to ${localMoment(series.locals[range.to] ?? '')}; lowest ${Math.round(result.headline.lowestSocPct)}% at ${localMoment(result.headline.lowestAtLocal)}; reserve ${Math.round(result.headline.reservePct)}%; ${result.flags.length} flags.`}
        testID="soc-chart"
        // The drawn range, for the browser tests (canvas content has no DOM to inspect).
        {...webData({ from: series.locals[range.from] ?? '', to: series.locals[range.to] ?? '' })}
      >
        <SocChartSurface series={series} range={range} height={height} selected={selected} onSelect={setSelected} />
      </View>
      <View style={styles.stops}>
        {series.stops.map((s) => (
          <Text key={s.x} variant="caption" color="lake">
            {s.stopIndex + 1} {stopName(s.stopIndex)}
          </Text>
        ))}
      </View>
      <View style={styles.readout} testID="soc-readout" aria-live="polite">
        {hour ? (
          <>
            <Text variant="label">{localMoment(hour.local)}</Text>
            <Text variant="caption" color="inkSoft">
              {hour.where.kind === 'stop' ? stopName(hour.where.stopIndex) : 'On the road'} · charge{' '}
              {text(percent(hour.socPct))}
              {row ? (
                <>
                  {' '}
                  · solar {text(energy(solar?.availableWh ?? 0))} available, {text(energy(solar?.usedWh ?? 0))} used,{' '}
                  {text(energy(solar?.wastedWh ?? 0))} wasted
                  {solar?.batteryFull ? ' (battery full)' : ''} · use {text(energy(row.acLoadWh + row.dcLoadWh))}
                  {row.hookupWh > 0 ? ` · hookup ${text(energy(row.hookupWh))}` : ''}
                  {row.generatorWh > 0 ? ` · generator ${text(energy(row.generatorWh))}` : ''}
                  {row.energyShortWh > 0 ? ` · short ${text(energy(row.energyShortWh))}` : ''}
                </>
              ) : ledger.state === 'error' ? (
                ' · this hour’s other figures could not be loaded.'
              ) : ledger.state === 'loading' ? (
                ' · loading this hour’s figures…'
              ) : null}
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
  ring: { width: 12, height: 12, borderRadius: 6, borderWidth: 2.5 },
  pin: { fontSize: 10, lineHeight: 12 },
  chips: { paddingRight: space.xs },
  chipRow: { flexDirection: 'row', gap: space.xs },
  chip: {
    minHeight: 40,
    paddingHorizontal: space.md,
    justifyContent: 'center',
    borderRadius: radii.pill,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.white,
  },
  chipOn: { backgroundColor: colors.pine, borderColor: colors.pine },
  stops: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md },
  readout: { minHeight: 48, padding: space.md, borderRadius: radii.md, backgroundColor: colors.dune, gap: 2 },
  stepRow: { flexDirection: 'row', gap: space.sm },
});
