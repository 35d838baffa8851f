import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, space } from '@/components/theme/tokens';
import { Text } from './text';

type ScreenProps = { title?: string; subtitle?: string; actions?: ReactNode; children: ReactNode; testID: string };

/** A scrolling page with the product background, an optional heading and a readable maximum width. */
export function Screen({ title, subtitle, actions, children, testID }: ScreenProps) {
  return (
    <ScrollView testID={testID} style={styles.scroll} contentContainerStyle={styles.content}>
      <View style={styles.inner}>
        {title ? (
          <View style={styles.header}>
            <View style={styles.headerText}>
              <Text variant="display" role="heading" aria-level={1}>
                {title}
              </Text>
              {subtitle ? <Text color="inkSoft">{subtitle}</Text> : null}
            </View>
            {actions}
          </View>
        ) : null}
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.dune },
  content: { padding: space.lg, paddingBottom: space.xxxl },
  inner: { width: '100%', maxWidth: 1100, alignSelf: 'center', gap: space.xl },
  header: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    justifyContent: 'space-between',
    gap: space.md,
  },
  headerText: { flexShrink: 1, gap: space.xs },
});
