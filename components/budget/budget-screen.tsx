import { StyleSheet, View } from 'react-native';
import { Panes, TabScroll } from '@/components/trip/tab-scroll';
import { useApplyEdit } from '@/components/trip/use-apply-edit';
import { Banner } from '@/components/ui/banner';
import { EmptyState } from '@/components/ui/empty-state';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { space } from '@/components/theme/tokens';
import type { TripDetail } from '@/shared/schemas/api';
import { can } from '@/shared/schemas/roles';
import { useUnits } from '@/stores/units-store';
import { useTripWeatherQuery } from '@/stores/queries/weather';
import { clearWhatIf } from '@/stores/what-if-store';
import { editForFix } from './apply-fix';
import { DayBars } from './day-bars';
import { EstimateCaution } from './estimate-caution';
import { FlagList } from './flag-list';
import { HeadlineFigures } from './headline-figures';
import { PlanChance } from './plan-chance';
import { SocChartCard } from './soc-chart-card';
import { useBudgetView } from './use-budget-view';
import { UndoLastFix } from './undo-last-fix';
import { useFlagFixes } from './use-flag-fixes';
import { WhatItWouldTake } from './what-it-would-take';
import { editsForWhatIf, WhatIfPanel } from './what-if-panel';
import { BudgetRouteMap } from '@/components/route/route-mini-map';
import { CheckInForecast } from '@/components/check-ins/check-in-forecast';

export function BudgetScreen({ detail }: { detail: TripDetail }) {
  const units = useUnits();
  // Watches the stops' weather records: the budget is fetched again as they arrive.
  useTripWeatherQuery(detail.trip.id);
  const view = useBudgetView(detail);
  const fixes = useFlagFixes(detail.trip.id, view);
  const { apply, busy, undoLast, lastFix, undoCount } = useApplyEdit(detail);
  const canEdit = can(detail.trip.role, 'editTrip');
  const scrollKey = `budget-${detail.trip.id}`;

  const whatIf = (
    <WhatIfPanel
      detail={detail}
      canEdit={canEdit}
      busyKey={busy}
      lowestNow={view.state === 'ready' ? view.result.headline.lowestSocPct : undefined}
      onKeep={async (key) => {
        if (await apply(`keep-${key}`, editsForWhatIf(detail, key), detail.rig.version))
          clearWhatIf(detail.trip.id, key);
      }}
    />
  );

  if (view.state === 'loading') {
    return (
      <TabScroll testID="budget-screen-loading" scrollKey={scrollKey}>
        <Skeleton testID="budget-loading" height={120} />
        <Skeleton height={300} />
      </TabScroll>
    );
  }
  if (view.state === 'error') {
    return (
      <TabScroll testID="budget-screen-error" scrollKey={scrollKey}>
        <QueryError testID="budget-error" error={view.error} onRetry={view.retry} />
      </TabScroll>
    );
  }
  if (view.state === 'empty') {
    return (
      <TabScroll testID="budget-screen" scrollKey={scrollKey}>
        <EmptyState
          testID="budget-empty"
          title="No budget yet"
          body={`${view.reason} Open the Route tab to add stops, then Loads for appliances.`}
        />
        {whatIf}
      </TabScroll>
    );
  }
  const { result } = view;
  return (
    <TabScroll testID="budget-screen" scrollKey={scrollKey}>
      {view.whatIf ? (
        <Banner
          testID="what-if-banner"
          tone="info"
          message="Showing a what-if: these figures are not saved. Keep the change below, or discard it."
        />
      ) : null}
      <PlanChance result={result} stopCount={detail.stops.length} />
      {view.whatIf ? null : <CheckInForecast detail={detail} plan={result} />}
      <HeadlineFigures headline={result.headline} units={units} />
      <Panes
        main={
          <View style={styles.column}>
            <SocChartCard result={result} detail={detail} />
            <DayBars days={result.days} />
          </View>
        }
        side={
          <View style={styles.column}>
            <BudgetRouteMap detail={detail} result={result} />
            {whatIf}
            {view.whatIf ? null : <WhatItWouldTake detail={detail} />}
            {lastFix ? (
              <UndoLastFix summary={lastFix.summary} count={undoCount} busy={busy} onUndo={() => void undoLast()} />
            ) : null}
            <FlagList
              flags={result.flags}
              fixes={fixes}
              days={result.days}
              detail={detail}
              canEdit={canEdit && !view.whatIf}
              readOnlyReason={
                !canEdit
                  ? 'Only the trip owner or a planner can apply fixes.'
                  : 'Fixes can be applied once the what-ifs are kept or discarded.'
              }
              busyKey={busy}
              onApply={(key, fix, choice) => {
                const edit = editForFix(detail, fix, result.days, choice);
                if (edit) void apply(key, [edit], detail.rig.version);
              }}
            />
          </View>
        }
      />
      <EstimateCaution />
    </TabScroll>
  );
}

const styles = StyleSheet.create({ column: { gap: space.xl } });
