import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';

type Props = {
  testID: string;
  children: ReactNode;
  /** Saves the what-if ("Keep", "Accept"); disabled while it cannot be saved or the role may not. */
  save: { testID: string; label: string; busy: boolean; disabled: boolean; onPress: () => void };
  discard: { testID: string; onPress: () => void };
  /** Why this role cannot save it, or null when it can. */
  refusal: string | null;
};

/** A what-if shown but not saved yet: its figures, then save or discard, and why a role may not save it. */
export function UnsavedWhatIf({ testID, children, save, discard, refusal }: Props) {
  return (
    <View style={styles.panel} testID={testID} aria-live="polite">
      {children}
      <View style={styles.row}>
        <Button {...save} />
        <Button testID={discard.testID} label="Discard" tone="secondary" onPress={discard.onPress} />
      </View>
      {refusal ? (
        <Text variant="caption" color="inkSoft">
          {refusal}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { padding: space.md, borderRadius: radii.md, backgroundColor: colors.infoSoft, gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
