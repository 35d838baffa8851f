export type NavItem = {
  href: '/' | '/rigs' | '/clubs' | '/account';
  label: string;
  testID: string;
  match: (path: string) => boolean;
};

/** The main navigation. Development tools (the Outbox) are linked from Account and sign-in, not from here. */
export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Trips', testID: 'nav-trips', match: (path) => path === '/' || path.startsWith('/trips') },
  { href: '/rigs', label: 'My rigs', testID: 'nav-rigs', match: (path) => path.startsWith('/rigs') },
  { href: '/clubs', label: 'Clubs', testID: 'nav-clubs', match: (path) => path.startsWith('/clubs') },
  { href: '/account', label: 'Account', testID: 'nav-account', match: (path) => path.startsWith('/account') },
];
