import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';

type Props = { summary: string; count: number; busy: string | null; onUndo: () => void };

/** Takes back the latest fix applied in this visit; it stays while there is one left to take back. */
export function UndoLastFix({ summary, count, busy, onUndo }: Props) {
  return (
    <View style={styles.bar} testID="undo-last-fix">
      <Text variant="caption" style={styles.text} testID="undo-last-fix-text">
        Last fix: {summary}
        {count > 1 ? ` (${count} fixes can be undone, newest first)` : ''}
      </Text>
      <Button
        testID="undo-last-fix-button"
        tone="secondary"
        label="Undo last fix"
        accessibilityLabel={`Undo last fix: ${summary}`}
        busy={busy === 'undo'}
        disabled={busy !== null}
        onPress={onUndo}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
    padding: space.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.card,
  },
  text: { flex: 1, minWidth: 160 },
});
