import { useOutboxAvailableQuery } from '@/stores/queries/outbox';

export type NavItem = {
  href: '/' | '/clubs' | '/account' | '/outbox';
  label: string;
  testID: string;
  match: (path: string) => boolean;
  /** Shown only where the server keeps a development outbox. */
  devOnly?: boolean;
};

export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Trips', testID: 'nav-trips', match: (path) => path === '/' || path.startsWith('/trips') },
  { href: '/clubs', label: 'Clubs', testID: 'nav-clubs', match: (path) => path.startsWith('/clubs') },
  { href: '/account', label: 'Account', testID: 'nav-account', match: (path) => path.startsWith('/account') },
  {
    href: '/outbox',
    label: 'Outbox',
    testID: 'nav-outbox',
    match: (path) => path.startsWith('/outbox'),
    devOnly: true,
  },
];

/**
 * The exported web app is always a production build, so whether to show the Outbox is the
 * server's answer (its outbox route is 404 in production), not a build-time flag.
 */
export function useNavItems(): NavItem[] {
  const outbox = useOutboxAvailableQuery();
  return NAV_ITEMS.filter((item) => !item.devOnly || outbox.data === true);
}
