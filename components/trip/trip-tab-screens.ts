// The screens of a trip's tabs, gathered so they load as one chunk of their own (see lazy-trip-screens.tsx): the
// first screens (sign-in, Trips) never wait for them, nor for the engine, forms and maps only they use.
export { BudgetScreen } from '@/components/budget/budget-screen';
export { RoadScreen } from '@/components/check-ins/road-screen';
export { LedgerScreen } from '@/components/ledger/ledger-screen';
export { LoadsScreen } from '@/components/loads/loads-screen';
export { PeopleScreen } from '@/components/people/people-screen';
export { RigScreen } from '@/components/rig/rig-screen';
export { RouteScreen } from '@/components/route/route-screen';
