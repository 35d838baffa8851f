import type { ReactNode } from 'react';
import { StyleSheet } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Card } from './card';
import { Text } from './text';

export function EmptyState({
  title,
  body,
  action,
  testID,
}: {
  title: string;
  body: string;
  action?: ReactNode;
  testID: string;
}) {
  return (
    <Card testID={testID} style={styles.card}>
      <Text variant="title">{title}</Text>
      <Text color="inkSoft">{body}</Text>
      {action}
    </Card>
  );
}

const styles = StyleSheet.create({ card: { alignItems: 'flex-start', gap: space.md } });
