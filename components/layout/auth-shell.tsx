import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { BrandMark } from './brand-mark';

type Props = { title: string; subtitle: string; children: ReactNode; footer: ReactNode; testID: string };

export function AuthShell({ title, subtitle, children, footer, testID }: Props) {
  return (
    <ScrollView testID={testID} style={styles.scroll} contentContainerStyle={styles.content}>
      <View style={styles.column}>
        <View style={styles.brand}>
          <BrandMark size={44} />
          <Text variant="title" color="pine">
            Trailtally
          </Text>
        </View>
        <Card style={styles.card}>
          <Text variant="display" role="heading" aria-level={1}>
            {title}
          </Text>
          <Text color="inkSoft">{subtitle}</Text>
          <View style={styles.body}>{children}</View>
        </Card>
        <View style={styles.footer}>{footer}</View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.dune },
  content: { flexGrow: 1, justifyContent: 'center', padding: space.lg },
  column: { width: '100%', maxWidth: 440, alignSelf: 'center', gap: space.xl },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.md, justifyContent: 'center' },
  card: { padding: space.xl, gap: space.sm },
  body: { marginTop: space.lg },
  footer: { alignItems: 'center', gap: space.sm },
});
