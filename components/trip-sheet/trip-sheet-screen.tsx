// The trip sheet: one printable page (two at most for a week's trip) with the route map, the stops and drives,
// each day's budget, the lowest charge, every flag with its fixes, the propane and fuel plan and the cautions.
// Black text on white with ruled tables, so it reads the same from a black-and-white printer.
import { Link } from 'expo-router';
import { DateTime } from 'luxon';
import { ScrollView, StyleSheet, View } from 'react-native';
import { energy, fuelAmount, mass, text as figureText } from '@/components/format/units';
import { duration } from '@/components/format/duration';
import { localMoment } from '@/components/format/time';
import { mapStops, RouteMap } from '@/components/route/route-map';
import { colors, fonts, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { CAUTIONS } from '@/components/ui/cautions';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { BudgetResult } from '@/shared/budget-result';
import { withFixes } from '@/shared/engine/check-fixes';
import type { FlagFixes } from '@/shared/engine/result-types';
import { FLAG_TITLE } from '@/shared/flag-titles';
import { distanceInUnits } from '@/shared/geo/drive-estimate';
import { chargeTone, lowestChargeByStop } from '@/shared/route-charge';
import type { TripDetail } from '@/shared/schemas/api';
import { PLACE_DATA_CREDIT } from '@/shared/schemas/places';
import type { UnitSystem } from '@/shared/units';
import { ApiError } from '@/stores/queries/api-client';
import { useBudgetFixesQuery, useBudgetQuery } from '@/stores/queries/budget';
import { useTripQuery } from '@/stores/queries/trips';
import { useUnits } from '@/stores/units-store';
import { Section, Table } from './sheet-parts';
import { printPage, usePrintPage } from './use-print-page';

const TONE_WORDS = { pine: 'comfortable', sunlit: 'close to reserve', ember: 'BELOW RESERVE' } as const;
const EXPOSURE: Record<string, string> = {
  open: 'open sky',
  'light-cover': 'light cover',
  'partial-shade': 'part shade',
  'deep-forest': 'deep forest',
};
const ESTIMATE =
  'A plan is an estimate: weather, smoke, canopy and appliance behaviour vary. Keep a reserve and a way to leave early — fires and road closures happen.';

/** The first fixes of each flag (the engine ranks them); the rest are a tap away, and the sheet stays on two pages. */
const SHEET_FIXES_PER_FLAG = 2;
const when = (iso: string) => DateTime.fromISO(iso, { setZone: true }).toFormat('ccc d LLL HH:mm');
const pct = (v: number | null) => (v === null ? '—' : `${Math.round(v)} %`);

function stopRows(detail: TripDetail, budget: BudgetResult | null, units: UnitSystem): string[][] {
  const lowest = budget ? lowestChargeByStop(budget.soc, detail.stops.length) : [];
  const reserve = budget?.headline.reservePct ?? 0;
  const rows: string[][] = [];
  detail.stops.forEach(({ stop }, i) => {
    const low = lowest[i] ?? null;
    const tone = budget ? chargeTone(low, reserve) : null;
    const site = [
      stop.exposure.kind === 'preset' ? EXPOSURE[stop.exposure.preset] : 'custom horizon',
      stop.hookup ? `hookup ${stop.hookup.amps} A` : 'no hookup',
      stop.generatorHours
        ? `generator ${String(stop.generatorHours.startHour).padStart(2, '0')}–${String(stop.generatorHours.endHour).padStart(2, '0')} h`
        : 'no generator',
    ].join(', ');
    rows.push([
      `${i + 1}`,
      stop.name,
      when(stop.arriveAt),
      when(stop.departAt),
      site,
      `${pct(low)}${tone ? ` ${TONE_WORDS[tone]}` : ''}`,
    ]);
    const drive = detail.drives[i]?.drive;
    if (drive && i < detail.stops.length - 1) {
      const d =
        drive.distanceKm === null || drive.distanceKm === undefined ? null : distanceInUnits(drive.distanceKm, units);
      rows.push([
        '→',
        `Drive to ${detail.stops[i + 1]?.stop.name ?? ''}`,
        d ? `${Math.round(d.value)} ${d.unit}` : '',
        duration(drive.hoursOnRoad),
        drive.vehicleCharging ? 'vehicle charging' : 'no vehicle charging',
        '',
      ]);
    }
  });
  return rows;
}

function dayRows(detail: TripDetail, budget: BudgetResult, units: UnitSystem): string[][] {
  return budget.days.map((day) => [
    DateTime.fromISO(day.date).toFormat('ccc d LLL'),
    day.stopIndexes.map((i) => `${i + 1}`).join(', ') + (day.travel ? ' (drive)' : ''),
    figureText(energy(day.harvestWh)),
    figureText(energy(day.useWh)),
    figureText(energy(day.netWh)),
    pct(day.lowestSocPct),
    day.generatorHours > 0 ? `${day.generatorHours} h` : '—',
    day.propaneUsedKg > 0 ? figureText(mass(day.propaneUsedKg, units)) : '—',
  ]);
}

function FuelPlan({ budget, units }: { budget: BudgetResult; units: UnitSystem }) {
  const h = budget.headline;
  const fuel = h.generatorFuel;
  return (
    <Text variant="caption" testID="trip-sheet-fuel">
      Propane: {figureText(mass(h.propaneStartKg, units))} at the start,{' '}
      {figureText(mass(h.propaneStartKg - h.propaneLeftKg, units))} used, {figureText(mass(h.propaneLeftKg, units))}{' '}
      left.{' '}
      {fuel
        ? `Generator: ${h.generatorHours} h, about ${figureText(fuelAmount(fuel.amount, fuel.unit, units))} of ${fuel.fuel}.`
        : h.generatorHours > 0
          ? `Generator: ${h.generatorHours} h.`
          : 'No generator running planned.'}
    </Text>
  );
}

type SheetProps = { detail: TripDetail; budget: BudgetResult | null; fixes: FlagFixes[] | null };

function Sheet({ detail, budget, fixes }: SheetProps) {
  const units = useUnits();
  const flags = budget ? withFixes(budget.flags, fixes ?? []) : [];
  const where = (f: BudgetResult['flags'][number]) =>
    f.where.kind === 'stop' ? `stop ${f.where.stopIndex + 1}` : `drive ${f.where.driveIndex + 1}`;
  return (
    <View style={styles.sheet} testID="trip-sheet">
      <View style={styles.head} testID="trip-sheet-head">
        <View style={styles.headText}>
          <Text variant="title" role="heading" aria-level={1}>
            {detail.trip.name}
          </Text>
          <Text variant="caption">
            {DateTime.fromISO(detail.trip.startDate).toFormat('d LLL yyyy')} –{' '}
            {DateTime.fromISO(detail.trip.endDate).toFormat('d LLL yyyy')} · {detail.rig.rig.name} · times are local to
            each stop
          </Text>
        </View>
        {budget ? (
          <View style={styles.lowest} testID="trip-sheet-lowest">
            <Text variant="caption">Lowest charge</Text>
            <Text variant="figure">{pct(budget.headline.lowestSocPct)}</Text>
            <Text variant="caption">
              {localMoment(budget.headline.lowestAtLocal)} · reserve {Math.round(budget.headline.reservePct)} %
              {budget.headline.energyShortWh > 0 ? ` · ${figureText(energy(budget.headline.energyShortWh))} short` : ''}
            </Text>
          </View>
        ) : null}
      </View>
      <View style={styles.mapRow}>
        <View style={styles.map}>
          <RouteMap
            testID="trip-sheet-map"
            compact
            height={190}
            label={`Map of ${detail.trip.name}`}
            stops={mapStops(detail.stops, budget)}
          />
        </View>
        <View style={styles.mapNotes}>
          <Text variant="caption">
            Markers: circle comfortable · ringed circle close to the reserve · square below it.
          </Text>
          {budget ? <FuelPlan budget={budget} units={units} /> : <Text variant="caption">No budget yet.</Text>}
          <Text variant="caption" color="inkSoft">
            {PLACE_DATA_CREDIT}
          </Text>
        </View>
      </View>
      <Section title="Stops and drives" testID="trip-sheet-stops">
        <Table
          testID="trip-sheet-stops-table"
          columns={[
            { title: '#', flex: 0.3 },
            { title: 'Stop', flex: 2.2 },
            { title: 'Arrive', flex: 1.3 },
            { title: 'Leave', flex: 1.3 },
            { title: 'Site', flex: 2.4 },
            { title: 'Lowest', flex: 1.4 },
          ]}
          rows={stopRows(detail, budget, units)}
        />
      </Section>
      {budget ? (
        <Section title="Day by day" testID="trip-sheet-days">
          <Table
            testID="trip-sheet-days-table"
            columns={[
              { title: 'Day', flex: 1.2 },
              { title: 'Stop', flex: 0.8 },
              { title: 'Harvest', flex: 1, align: 'right' },
              { title: 'Use', flex: 1, align: 'right' },
              { title: 'Net', flex: 1, align: 'right' },
              { title: 'Lowest', flex: 0.8, align: 'right' },
              { title: 'Generator', flex: 0.9, align: 'right' },
              { title: 'Propane', flex: 0.9, align: 'right' },
            ]}
            rows={dayRows(detail, budget, units)}
          />
        </Section>
      ) : null}
      {budget ? (
        <Section title={`Flags and fixes (${budget.flags.length})`} testID="trip-sheet-flags">
          {budget.flags.length === 0 ? <Text variant="caption">No flags: the plan holds as it stands.</Text> : null}
          {budget.flags.length > 0 && !fixes ? (
            <Text variant="caption" testID="trip-sheet-fixes-loading">
              Checking fixes…
            </Text>
          ) : null}
          {flags.map((flag, i) => (
            <View key={flag.id} style={styles.flag} testID={`trip-sheet-flag-${i}`}>
              <Text variant="caption" style={styles.bold}>
                {i + 1}. {FLAG_TITLE[flag.kind]} — {localMoment(flag.atLocal)}, {where(flag)}
              </Text>
              <Text variant="caption">{flag.cause}</Text>
              {flag.fixes.slice(0, SHEET_FIXES_PER_FLAG).map((fix, j) => (
                <Text key={j} variant="caption">
                  Fix: {fix.text}
                </Text>
              ))}
              {flag.fixes.length > SHEET_FIXES_PER_FLAG ? (
                <Text variant="caption">{flag.fixes.length - SHEET_FIXES_PER_FLAG} more on the Budget tab</Text>
              ) : null}
            </View>
          ))}
        </Section>
      ) : null}
      <Section title="Cautions" testID="trip-sheet-cautions">
        {[...Object.values(CAUTIONS), ESTIMATE].map((caution) => (
          <Text key={caution} variant="caption">
            • {caution}
          </Text>
        ))}
        <Text variant="caption">
          Follow your local codes and have a licensed installer check electrical and gas work.
        </Text>
      </Section>
    </View>
  );
}

export function TripSheetScreen({ tripId }: { tripId: string }) {
  usePrintPage();
  const trip = useTripQuery(tripId);
  const budget = useBudgetQuery(tripId);
  const version = budget.data?.result ? budget.data.version : null;
  const fixes = useBudgetFixesQuery(tripId, version, (budget.data?.result?.flags.length ?? 0) > 0);
  const signedOut = trip.error instanceof ApiError && trip.error.status === 401;
  return (
    <ScrollView style={styles.page} contentContainerStyle={styles.content} testID="trip-sheet-screen">
      <View style={styles.toolbar} testID="trip-sheet-toolbar">
        <Link href={{ pathname: '/trips/[tripId]/route', params: { tripId } }} style={styles.back}>
          <Text color="pine" variant="label">
            ← Back to the trip
          </Text>
        </Link>
        <Button testID="trip-sheet-print" label="Print" onPress={printPage} disabled={!trip.data} />
      </View>
      {signedOut ? (
        <Text testID="trip-sheet-signed-out">Sign in to see this trip sheet.</Text>
      ) : trip.error ? (
        <QueryError testID="trip-sheet-error" error={trip.error} onRetry={() => void trip.refetch()} />
      ) : !trip.data || budget.isPending ? (
        <Skeleton testID="trip-sheet-loading" height={600} />
      ) : (
        <Sheet
          detail={trip.data}
          budget={budget.data?.result ?? null}
          fixes={fixes.data?.version === version ? fixes.data.fixes : null}
        />
      )}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.white },
  content: { padding: space.lg, alignItems: 'center' },
  toolbar: {
    width: '100%',
    maxWidth: 720,
    flexDirection: 'row',
    justifyContent: 'space-between',
    alignItems: 'center',
    marginBottom: space.lg,
  },
  back: { paddingVertical: space.sm },
  sheet: { width: '100%', maxWidth: 720, gap: space.md, backgroundColor: colors.white },
  head: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  headText: { flex: 1, minWidth: 260, gap: 2 },
  lowest: { borderWidth: 2, borderColor: colors.ink, borderRadius: 8, padding: space.sm, minWidth: 170 },
  mapRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  map: { flexGrow: 1, flexBasis: 300 },
  mapNotes: { flexGrow: 1, flexBasis: 220, gap: space.xs },
  flag: { gap: 1 },
  bold: { fontFamily: fonts.bold },
});
