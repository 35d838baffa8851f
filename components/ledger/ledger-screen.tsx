import { useState } from 'react';
import { FlatList, StyleSheet, View } from 'react-native';
import { useBudgetView, useLedgerView } from '@/components/budget/use-budget-view';
import { localDay, localMoment } from '@/components/format/time';
import { useIsWide } from '@/components/theme/breakpoints';
import { temperature } from '@/components/format/units';
import { colors, space } from '@/components/theme/tokens';
import { TabScroll } from '@/components/trip/tab-scroll';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { EmptyState } from '@/components/ui/empty-state';
import { QueryError } from '@/components/ui/query-error';
import { SideScroll } from '@/components/ui/side-scroll';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { LedgerRow } from '@/shared/engine/result-types';
import type { TripDetail } from '@/shared/schemas/api';
import { DayCards } from './day-cards';
import { netIsWarning } from './day-net';
import { useUnits } from '@/stores/units-store';
import { daysCsv, filterLedger, ledgerCsv } from './ledger-csv';
import { downloadFile } from './download-file';

type Col = { title: string; width: number; get: (r: LedgerRow) => string; tone?: (r: LedgerRow) => 'ember' | 'ink' };
const wh = (v: number) => (Math.abs(v) < 0.5 ? '·' : String(Math.round(v)));

type RowProps = {
  cells: { text: string; width: number; tone?: 'ember' | 'ink' }[];
  header?: boolean;
  testID?: string;
  table?: boolean;
};

/** One table row; `table` gives it table roles, which only hold where rows are the table's direct children. */
function Row({ cells, header, testID, table = false }: RowProps) {
  return (
    <View style={[styles.row, header ? styles.headerRow : null]} testID={testID} role={table ? 'row' : undefined}>
      {cells.map((c, i) => (
        <Text
          key={i}
          variant={header ? 'caption' : 'body'}
          color={c.tone ?? 'ink'}
          role={table ? (header ? 'columnheader' : 'cell') : undefined}
          style={[styles.cell, { width: c.width }, i > 1 ? styles.num : null]}
          numberOfLines={header ? 2 : 1}
        >
          {c.text}
        </Text>
      ))}
    </View>
  );
}

export function LedgerScreen({ detail }: { detail: TripDetail }) {
  const view = useBudgetView(detail);
  const wide = useIsWide();
  const names = detail.stops.map((s) => s.stop.name);

  if (view.state === 'loading')
    return (
      <TabScroll testID="ledger-screen-loading">
        <Skeleton testID="ledger-loading" height={400} />
      </TabScroll>
    );
  if (view.state === 'error')
    return (
      <TabScroll testID="ledger-screen-error">
        <QueryError testID="ledger-error" error={view.error} onRetry={view.retry} />
      </TabScroll>
    );
  if (view.state === 'empty')
    return (
      <TabScroll testID="ledger-screen">
        <EmptyState
          testID="ledger-empty"
          title="No ledger yet"
          body={`${view.reason} Add stops on the Route tab and appliances on Loads.`}
        />
      </TabScroll>
    );

  const { result } = view;
  const slug = detail.trip.name.toLowerCase().replace(/[^a-z0-9]+/g, '-');

  return (
    <TabScroll testID="ledger-screen">
      <Card testID="day-sheets">
        <View style={styles.titleRow}>
          <Text variant="title" role="heading" aria-level={2}>
            Day sheets
          </Text>
          <Button
            testID="days-csv"
            tone="secondary"
            label="Download days (CSV)"
            onPress={() => downloadFile(`${slug}-days.csv`, daysCsv(result.days, names))}
          />
        </View>
        {wide ? null : <DayCards days={result.days} names={names} reservePct={result.headline.reservePct} />}
        {wide ? (
          <SideScroll
            testID="day-table-scroll"
            what="More columns"
            fadeColor={colors.card}
            focusable
            accessibilityLabel="Day sheets table, scrolls sideways"
          >
            <View role="table" aria-label="Day sheets">
              <Row
                table
                header
                cells={[
                  'Day',
                  'Stops',
                  'Harvest Wh',
                  'All sources Wh',
                  'Use Wh',
                  'Net Wh',
                  'Generator h',
                  'Lowest %',
                  'Short Wh',
                ].map((t, i) => ({ text: t, width: i === 0 ? 110 : i === 1 ? 200 : 90 }))}
              />
              {result.days.map((d) => (
                <Row
                  table
                  key={d.dayIndex}
                  testID={`day-row-${d.dayIndex}`}
                  cells={[
                    { text: localDay(`${d.date}T12:00`), width: 110 },
                    { text: d.travel ? 'travel day' : d.stopIndexes.map((i) => names[i] ?? '').join(', '), width: 200 },
                    { text: wh(d.harvestWh), width: 90 },
                    { text: wh(d.sourcesWh), width: 90 },
                    { text: wh(d.useWh), width: 90 },
                    { text: String(Math.round(d.netWh)), width: 90, tone: netIsWarning(d) ? 'ember' : 'ink' },
                    { text: d.generatorHours.toFixed(1), width: 90 },
                    {
                      text: String(Math.round(d.lowestSocPct)),
                      width: 90,
                      tone: d.lowestSocPct < result.headline.reservePct ? 'ember' : 'ink',
                    },
                    { text: wh(d.energyShortWh), width: 90, tone: d.energyShortWh > 0 ? 'ember' : 'ink' },
                  ]}
                />
              ))}
            </View>
          </SideScroll>
        ) : null}
      </Card>
      <HourlyLedger detail={detail} names={names} reservePct={result.headline.reservePct} slug={slug} />
    </TabScroll>
  );
}

type HourlyProps = { detail: TripDetail; names: string[]; reservePct: number; slug: string };

/** The hour-by-hour table: its rows come apart from the budget, so the day sheets above never wait for them. */
function HourlyLedger({ detail, names, reservePct, slug }: HourlyProps) {
  const ledger = useLedgerView(detail);
  const [stop, setStop] = useState('all');
  const [shortOnly, setShortOnly] = useState(false);
  const units = useUnits();
  const tUnit = temperature(0, units).unit;
  const cols: Col[] = [
    { title: 'Time', width: 150, get: (r) => localMoment(r.local) },
    {
      title: 'Where',
      width: 170,
      get: (r) => (r.where.kind === 'stop' ? (names[r.where.stopIndex] ?? '') : `Drive ${r.where.driveIndex + 1}`),
    },
    {
      title: 'Charge %',
      width: 80,
      get: (r) => String(Math.round(r.socPct)),
      tone: (r) => (r.socPct < reservePct ? 'ember' : 'ink'),
    },
    { title: 'Solar Wh', width: 80, get: (r) => wh(r.solarUsedWh) },
    { title: 'Use Wh', width: 80, get: (r) => wh(r.acLoadWh + r.dcLoadWh) },
    { title: 'Hookup Wh', width: 90, get: (r) => wh(r.hookupWh) },
    { title: 'Vehicle Wh', width: 90, get: (r) => wh(r.vehicleWh) },
    { title: 'Gen. Wh', width: 80, get: (r) => wh(r.generatorWh) },
    {
      title: 'Short Wh',
      width: 80,
      get: (r) => wh(r.energyShortWh),
      tone: (r) => (r.energyShortWh > 0 ? 'ember' : 'ink'),
    },
    { title: `Outside ${tUnit}`, width: 80, get: (r) => temperature(r.ambientC, units).value },
    { title: `Cabin ${tUnit}`, width: 80, get: (r) => temperature(r.cabinC, units).value },
    { title: `Battery ${tUnit}`, width: 80, get: (r) => temperature(r.batteryC, units).value },
    {
      title: 'Battery gives %',
      width: 90,
      get: (r) => String(Math.round(r.batteryCapacityPct)),
      tone: (r) => (r.batteryCapacityPct < 100 ? 'ember' : 'ink'),
    },
  ];
  const tableWidth = cols.reduce((s, c) => s + c.width, 0) + space.md * 2;

  if (ledger.state === 'loading') return <Skeleton testID="hourly-ledger-loading" height={400} />;
  if (ledger.state === 'error')
    return <QueryError testID="hourly-ledger-error" error={ledger.error} onRetry={ledger.retry} />;
  if (ledger.state === 'empty') return null;
  const rows = filterLedger(ledger.rows, { stopIndex: stop === 'all' ? null : Number(stop), shortOnly });
  const header = <Row header cells={cols.map((c) => ({ text: c.title, width: c.width }))} />;

  return (
    <Card testID="hourly-ledger">
      <View style={styles.titleRow}>
        <Text variant="title" role="heading" aria-level={2}>
          Hour by hour
        </Text>
        <Button
          testID="ledger-csv"
          tone="secondary"
          label="Download hours (CSV)"
          onPress={() => downloadFile(`${slug}-ledger.csv`, ledgerCsv(rows, names))}
        />
      </View>
      <ChoiceChips
        testID="ledger-stop"
        label="Show"
        value={stop}
        onChange={setStop}
        options={[{ value: 'all', label: 'Whole trip' }, ...names.map((n, i) => ({ value: String(i), label: n }))]}
      />
      <ChoiceChips
        testID="ledger-short"
        label="Hours"
        value={shortOnly ? 'short' : 'all'}
        onChange={(v) => setShortOnly(v === 'short')}
        options={[
          { value: 'all', label: 'Every hour' },
          { value: 'short', label: 'Only shortfalls' },
        ]}
      />
      <Text variant="caption" color="inkSoft" testID="ledger-count">
        {rows.length} of {ledger.rows.length} hours
      </Text>
      <SideScroll
        testID="ledger-scroll"
        what="More columns"
        fadeColor={colors.card}
        focusable
        accessibilityLabel="Hourly ledger, scrolls sideways"
      >
        <View style={{ width: tableWidth }}>
          <FlatList
            testID="ledger-list"
            // Focusable so keyboard users can scroll the hours (axe: scrollable-region-focusable).
            focusable
            accessibilityLabel="Hourly ledger rows"
            style={styles.list}
            data={rows}
            keyExtractor={(r) => String(r.index)}
            // The header is the list's first item so it sticks while the hours scroll under it.
            ListHeaderComponent={header}
            stickyHeaderIndices={[0]}
            initialNumToRender={30}
            windowSize={7}
            getItemLayout={(_d, index) => ({ length: ROW_H, offset: HEADER_H + ROW_H * index, index })}
            renderItem={({ item }) => (
              <Row
                testID={`ledger-row-${item.index}`}
                cells={cols.map((c) => ({ text: c.get(item), width: c.width, tone: c.tone?.(item) }))}
              />
            )}
            ListEmptyComponent={
              <Text color="inkSoft" style={styles.emptyList}>
                No hours match these filters.
              </Text>
            }
          />
        </View>
      </SideScroll>
    </Card>
  );
}

const ROW_H = 41;
const HEADER_H = 52;

const styles = StyleSheet.create({
  titleRow: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    justifyContent: 'space-between',
    alignItems: 'center',
    gap: space.sm,
  },
  list: { height: 480 },
  row: {
    flexDirection: 'row',
    minHeight: ROW_H,
    alignItems: 'center',
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    paddingHorizontal: space.md,
    backgroundColor: colors.card,
  },
  headerRow: { minHeight: HEADER_H, backgroundColor: colors.dune, borderBottomColor: colors.mist },
  cell: { paddingHorizontal: space.xs },
  num: { textAlign: 'right' },
  emptyList: { padding: space.lg },
});
