import { StyleSheet, View } from 'react-native';
import { colors, space } from '@/components/theme/tokens';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { useActivityQuery } from '@/stores/queries/budget';

// Enough to answer "who changed what lately" without a long page on a phone.
const SHOWN = 20;

export function ActivityList({ tripId }: { tripId: string }) {
  const activity = useActivityQuery(tripId);
  if (activity.isPending) return <Skeleton testID="activity-loading" height={96} />;
  if (activity.isError)
    return <QueryError testID="activity-error" error={activity.error} onRetry={() => void activity.refetch()} />;
  if (activity.data.entries.length === 0)
    return <Text color="inkSoft">Nothing has changed yet. Edits by anyone on the trip show up here.</Text>;
  return (
    <View testID="activity-list">
      {activity.data.entries.slice(0, SHOWN).map((entry) => (
        <View key={entry.id} style={styles.entry}>
          <Text variant="caption" color="inkSoft">
            {new Date(entry.at).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })}
          </Text>
          <Text>
            <Text variant="label">{entry.userName ?? 'Someone'}</Text> {entry.summary}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  entry: { paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
});
