import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';

type Props = {
  label: string;
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
  busy?: boolean;
  tone?: 'danger' | 'secondary';
  testID: string;
};

/**
 * A button that asks before it acts, inline rather than in a dialog: native alerts do not exist on
 * the web, and the question stays next to the thing it is about.
 */
export function ConfirmAction({ label, question, confirmLabel, onConfirm, busy, tone = 'danger', testID }: Props) {
  const [asking, setAsking] = useState(false);
  if (!asking)
    return <Button testID={testID} label={label} tone="secondary" busy={busy} onPress={() => setAsking(true)} />;
  return (
    <View style={styles.box} testID={`${testID}-confirm`} role="group" aria-label={question}>
      <Text variant="label">{question}</Text>
      <View style={styles.row}>
        <Button
          testID={`${testID}-yes`}
          label={confirmLabel}
          tone={tone}
          busy={busy}
          onPress={() => {
            setAsking(false);
            onConfirm();
          }}
        />
        <Button testID={`${testID}-cancel`} label="Cancel" tone="quiet" onPress={() => setAsking(false)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  // The question takes a whole row of its own so it wraps instead of running off a phone's edge.
  box: {
    width: '100%',
    gap: space.sm,
    padding: space.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.dune,
  },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
