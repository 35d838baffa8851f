import { StyleSheet, View } from 'react-native';
import { EstimateCaution } from '@/components/budget/estimate-caution';
import { Panes, TabScroll } from '@/components/trip/tab-scroll';
import { space } from '@/components/theme/tokens';
import { Caution } from '@/components/ui/cautions';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import type { TripDetail } from '@/shared/schemas/api';
import { can } from '@/shared/schemas/roles';
import { useSession } from '@/stores/auth-client';
import { useBudgetQuery } from '@/stores/queries/budget';
import { useCheckInsQuery, type CheckInSave } from '@/stores/queries/check-ins';
import { queuedSaveKeys, useKeptSaves } from '@/stores/queries/offline-queue';
import { CalibrateCard } from './calibrate-card';
import { CheckInForm } from './check-in-form';
import { CheckInList } from './check-in-list';
import { withKeptCheckIns } from './kept-check-ins';
import { ReforecastCard } from './reforecast-card';
import { StayControl } from './stay-control';
import { reforecastFor } from './use-reforecast';

/** The trip on the road: check in, see the forecast from the latest reading, and every reading so far. */
export function RoadScreen({ detail }: { detail: TripDetail }) {
  const tripId = detail.trip.id;
  const me = useSession().data?.user.id;
  const checkIns = useCheckInsQuery(tripId);
  const budget = useBudgetQuery(tripId);
  const kept = useKeptSaves<CheckInSave>(queuedSaveKeys.checkIn);
  const canAdd = can(detail.trip.role, 'editLoads');
  const tanks = detail.rig.rig.propaneTanks;

  if (checkIns.isPending) return <Skeleton testID="road-loading" height={200} />;
  if (checkIns.isError)
    return <QueryError testID="road-error" error={checkIns.error} onRetry={() => void checkIns.refetch()} />;
  const plan = budget.data?.result;
  const shown = withKeptCheckIns(checkIns.data, kept, tripId, 'You, waiting to sync');
  return (
    <TabScroll testID="road-screen">
      <Panes
        main={
          <View style={styles.column}>
            {plan ? <ReforecastCard plan={plan} state={reforecastFor(detail, shown)} checkIns={shown} /> : null}
            <CalibrateCard detail={detail} checkIns={shown} />
            {canAdd ? <CheckInForm key={tripId} tripId={tripId} tanks={tanks} /> : null}
            <StayControl detail={detail} checkIns={shown} />
          </View>
        }
        side={
          <View style={styles.column}>
            <CheckInList tripId={tripId} checkIns={shown} tanks={tanks} me={me} canAdd={canAdd} />
            <Caution kind="generator" />
            {tanks.length > 0 ? <Caution kind="propane" /> : null}
          </View>
        }
      />
      <EstimateCaution />
    </TabScroll>
  );
}

const styles = StyleSheet.create({ column: { gap: space.xl } });
