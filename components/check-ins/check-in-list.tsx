import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { localMoment } from '@/components/format/time';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { CheckInRecord, PropaneReading } from '@/shared/schemas/check-in';
import type { PropaneTank } from '@/shared/schemas/rig';
import { useCheckInDeleteMutation, type CheckInSave } from '@/stores/queries/check-ins';
import { queuedSaveKeys, useRefusedSaves } from '@/stores/queries/offline-queue';
import { CheckInForm } from './check-in-form';
import { isKept } from './kept-check-ins';

function propaneText(reading: PropaneReading): string {
  if (reading.kind === 'full') return 'full';
  if (reading.kind === 'fraction') return `${Math.round(reading.share * 100)} %`;
  return `${reading.kg} kg`;
}

type Props = {
  tripId: string;
  checkIns: readonly CheckInRecord[];
  tanks: readonly PropaneTank[];
  /** The signed-in user: only a reading's author changes or removes it. */
  me: string | undefined;
  canAdd: boolean;
};

/** Every reading, newest first, with who took it and when. */
export function CheckInList({ tripId, checkIns, tanks, me, canAdd }: Props) {
  const [editing, setEditing] = useState<string | null>(null);
  const remove = useCheckInDeleteMutation(tripId);
  // A change the server refused while it was away (someone else changed the reading) opens for a choice.
  const refused = useRefusedSaves<CheckInSave>(queuedSaveKeys.checkIn).map((save) => save.checkInId);
  const newestFirst = [...checkIns].reverse();
  return (
    <Card testID="check-in-list">
      <Text variant="title" role="heading" aria-level={2}>
        Check-ins
      </Text>
      {newestFirst.length === 0 ? (
        <Text color="inkSoft" testID="check-in-list-empty">
          No check-ins yet. Read the battery monitor at camp and check in: the rest of the trip is forecast from it.
        </Text>
      ) : null}
      {newestFirst.map((c) =>
        editing === c.id || refused.includes(c.id) ? (
          <CheckInForm
            key={`${c.id}-${c.version}`}
            tripId={tripId}
            tanks={tanks}
            editing={c}
            onDone={() => setEditing(null)}
          />
        ) : (
          <View key={c.id} style={styles.item} testID={`check-in-${c.id}`}>
            <Text variant="label">
              {localMoment(c.checkIn.at)} · {Math.round(c.checkIn.socPct)} %
            </Text>
            <Text variant="caption" color="inkSoft">
              {c.authorName}
              {c.checkIn.propane.length > 0
                ? ` · propane ${c.checkIn.propane.map((p) => `${tanks[p.tank]?.name ?? `cylinder ${p.tank + 1}`} ${propaneText(p.reading)}`).join(', ')}`
                : ''}
              {c.checkIn.harvestWh !== null ? ` · harvest ${Math.round(c.checkIn.harvestWh)} Wh` : ''}
            </Text>
            {c.checkIn.note ? <Text variant="caption">{c.checkIn.note}</Text> : null}
            {isKept(c) ? (
              <Text variant="caption" color="lakeInk" testID={`check-in-${c.id}-waiting`}>
                Waiting to sync: kept on this phone until there is a signal.
              </Text>
            ) : null}
            {canAdd && c.authorId === me && !isKept(c) ? (
              <View style={styles.row}>
                <Button
                  testID={`check-in-${c.id}-edit`}
                  label="Change"
                  tone="secondary"
                  accessibilityLabel={`Change the check-in of ${localMoment(c.checkIn.at)}`}
                  onPress={() => setEditing(c.id)}
                />
                <Button
                  testID={`check-in-${c.id}-remove`}
                  label="Remove"
                  tone="quiet"
                  busy={remove.isPending && remove.variables === c.id}
                  accessibilityLabel={`Remove the check-in of ${localMoment(c.checkIn.at)}`}
                  onPress={() => remove.mutate(c.id)}
                />
              </View>
            ) : null}
          </View>
        ),
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  item: { padding: space.md, borderRadius: radii.md, backgroundColor: colors.dune, gap: 2 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
});
