export type NavItem = { href: '/' | '/account'; label: string; testID: string; match: (path: string) => boolean };

export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Trips', testID: 'nav-trips', match: (path) => path === '/' || path.startsWith('/trips') },
  { href: '/account', label: 'Account', testID: 'nav-account', match: (path) => path.startsWith('/account') },
];
