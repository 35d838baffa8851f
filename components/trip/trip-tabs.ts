export type TripTab = {
  segment: '' | 'road' | 'route' | 'loads' | 'rig' | 'people' | 'ledger';
  label: string;
  testID: string;
};

/** Budget first: it answers the question people open a trip for. */
export const TRIP_TABS: TripTab[] = [
  { segment: '', label: 'Budget', testID: 'tab-budget' },
  // On the road, reading the battery monitor is the next thing people do.
  { segment: 'road', label: 'Check in', testID: 'tab-check-in' },
  { segment: 'route', label: 'Route', testID: 'tab-route' },
  { segment: 'loads', label: 'Loads', testID: 'tab-loads' },
  { segment: 'rig', label: 'Rig', testID: 'tab-rig' },
  { segment: 'people', label: 'People', testID: 'tab-people' },
  { segment: 'ledger', label: 'Ledger', testID: 'tab-ledger' },
];

export function tabHref(tripId: string, tab: TripTab): string {
  return `/trips/${encodeURIComponent(tripId)}${tab.segment ? `/${tab.segment}` : ''}`;
}

export function activeTab(pathname: string, tripId: string): TripTab {
  const rest = pathname.split(`/trips/${tripId}`)[1] ?? '';
  const segment = rest.replace(/^\//, '').split('/')[0] ?? '';
  return (
    TRIP_TABS.find((t) => t.segment === segment) ??
    TRIP_TABS[0] ?? { segment: '', label: 'Budget', testID: 'tab-budget' }
  );
}
