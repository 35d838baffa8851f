import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from './button';
import { Text } from './text';

type Props = {
  what: string;
  theirVersion: number;
  theirs?: string[];
  onKeepMine: () => void;
  onTakeTheirs: () => void;
  busy?: boolean;
  testID: string;
};

/** Shown when a save met a newer version on the server: the user decides whose change stands. */
export function ConflictNotice({ what, theirVersion, theirs = [], onKeepMine, onTakeTheirs, busy, testID }: Props) {
  return (
    <View style={styles.box} testID={testID} role="alert">
      <Text variant="label" color="ember">
        This {what} was changed by someone else since you opened it (now version {theirVersion}).
      </Text>
      {theirs.length > 0 ? (
        <Text variant="caption" testID={`${testID}-theirs`}>
          Their version: {theirs.join(' · ')}
        </Text>
      ) : null}
      <Text variant="caption">
        Keep yours to save over their change, or take theirs to drop your edits and see what they saved.
      </Text>
      <View style={styles.row}>
        <Button testID={`${testID}-keep-mine`} label="Keep mine" busy={busy} onPress={onKeepMine} />
        <Button
          testID={`${testID}-take-theirs`}
          label="Take theirs"
          tone="secondary"
          disabled={busy}
          onPress={onTakeTheirs}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    borderWidth: 2,
    borderColor: colors.ember,
    backgroundColor: colors.emberSoft,
    borderRadius: radii.md,
    padding: space.lg,
    gap: space.sm,
  },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
