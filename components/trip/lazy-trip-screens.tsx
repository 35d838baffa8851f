import { lazy, Suspense, type ComponentType } from 'react';
import { Skeleton } from '@/components/ui/skeleton';

// A type only: the screens themselves arrive through import() below, in their own chunk.
import type * as TripTabScreens from './trip-tab-screens';

type TripScreens = typeof TripTabScreens;

let loading: Promise<TripScreens> | undefined;

/** The trip's tab screens, fetched once; a failure is forgotten so the next tab opened tries again. */
function loadTripScreens(): Promise<TripScreens> {
  loading ??= import('./trip-tab-screens');
  loading.catch(() => {
    loading = undefined;
  });
  return loading;
}

/**
 * Starts fetching the trip's screens in the background (opening a trip, or idle time on the Trips screen); settles
 * when they have arrived or failed, so what comes next can wait for them.
 */
export function preloadTripScreens(): Promise<void> {
  return loadTripScreens().then(
    () => undefined,
    () => undefined,
  );
}

/** A tab screen that renders a placeholder of the tab's size while its chunk arrives. */
function lazyScreen<P extends object>(pick: (screens: TripScreens) => ComponentType<P>): ComponentType<P> {
  const Screen = lazy(async () => ({ default: pick(await loadTripScreens()) }));
  return function TripTabScreen(props: P) {
    return (
      <Suspense fallback={<Skeleton testID="trip-tab-loading" height={400} />}>
        <Screen {...props} />
      </Suspense>
    );
  };
}

export const BudgetScreen = lazyScreen((s) => s.BudgetScreen);
export const RoadScreen = lazyScreen((s) => s.RoadScreen);
export const LedgerScreen = lazyScreen((s) => s.LedgerScreen);
export const LoadsScreen = lazyScreen((s) => s.LoadsScreen);
export const PeopleScreen = lazyScreen((s) => s.PeopleScreen);
export const RigScreen = lazyScreen((s) => s.RigScreen);
export const RouteScreen = lazyScreen((s) => s.RouteScreen);
