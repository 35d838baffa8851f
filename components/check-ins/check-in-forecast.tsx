import type { BudgetResult } from '@/shared/budget-result';
import type { TripDetail } from '@/shared/schemas/api';
import { useCheckInsQuery } from '@/stores/queries/check-ins';
import { ReforecastCard } from './reforecast-card';
import { reforecastFor } from './use-reforecast';

/** On the Budget tab once the trip has check-ins: the forecast from the latest one, above the plan's figures. */
export function CheckInForecast({ detail, plan }: { detail: TripDetail; plan: BudgetResult }) {
  const checkIns = useCheckInsQuery(detail.trip.id);
  if (!checkIns.data || checkIns.data.length === 0) return null;
  return <ReforecastCard plan={plan} state={reforecastFor(detail, checkIns.data)} checkIns={checkIns.data} />;
}
