import { Link, usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { SIDE_NAV_WIDTH, useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import { BrandMark } from './brand-mark';
import { NAV_ITEMS } from './nav-items';
import { ConnectionBanners } from '@/components/offline/connection-banners';
import { ServerStatusBanner } from './server-status-banner';
import { ToastHost } from './toast-host';
import { useSyncUnitsFromServer } from '@/stores/queries/preferences';

/** Signed-in frame: a side navigation on wide screens, bottom tabs on phones. */
export function AppShell({ children }: { children: ReactNode }) {
  useSyncUnitsFromServer();
  const wide = useIsWide();
  const pathname = usePathname();
  const links = NAV_ITEMS.map((item) => {
    const active = item.match(pathname);
    return (
      <Link key={item.href} href={item.href} asChild>
        <Pressable
          testID={item.testID}
          accessibilityRole="link"
          accessibilityLabel={item.label}
          aria-current={active ? 'page' : undefined}
          // Link's asChild merges styles onto the DOM node, which needs one flat object on the web.
          style={StyleSheet.flatten([wide ? styles.sideLink : styles.tabLink, active ? styles.activeLink : null])}
        >
          <Text variant="label" color={active ? 'pine' : 'inkSoft'}>
            {item.label}
          </Text>
        </Pressable>
      </Link>
    );
  });

  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <View style={styles.side} role="navigation" aria-label="Main">
          <View style={styles.brand}>
            <BrandMark size={36} />
            <Text variant="title" color="pine">
              Trailtally
            </Text>
          </View>
          {links}
        </View>
        <View style={styles.main} role="main">
          <ConnectionBanners />
          <ServerStatusBanner />
          {children}
        </View>
        <ToastHost />
      </View>
    );
  }
  return (
    <View style={styles.narrowRoot}>
      <View style={styles.main} role="main">
        <ConnectionBanners />
        <ServerStatusBanner />
        {children}
      </View>
      <View style={styles.tabs} role="navigation" aria-label="Main">
        {links}
      </View>
      <ToastHost />
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.dune },
  narrowRoot: { flex: 1, backgroundColor: colors.dune },
  side: {
    width: SIDE_NAV_WIDTH,
    paddingVertical: space.xl,
    paddingHorizontal: space.lg,
    gap: space.sm,
    borderRightWidth: 1,
    borderRightColor: colors.line,
    backgroundColor: colors.card,
  },
  brand: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    marginBottom: space.xl,
    paddingHorizontal: space.sm,
  },
  sideLink: { paddingVertical: space.md, paddingHorizontal: space.lg, borderRadius: radii.md },
  activeLink: { backgroundColor: colors.pineSoft },
  main: { flex: 1 },
  tabs: {
    flexDirection: 'row',
    borderTopWidth: 1,
    borderTopColor: colors.line,
    backgroundColor: colors.card,
    paddingHorizontal: space.sm,
    paddingVertical: 2,
  },
  // 44 px: a thumb's target, and no more, so the bar leaves the screen to the content.
  tabLink: { flex: 1, minHeight: 44, alignItems: 'center', justifyContent: 'center', borderRadius: radii.md },
});
