import { StyleSheet, View } from 'react-native';
import { ROLE_LABEL } from '@/components/trip/role-label';
import { TabScroll } from '@/components/trip/tab-scroll';
import { colors, radii, space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { TripDetail } from '@/shared/schemas/api';
import { useActivityQuery, useMembersQuery } from '@/stores/queries/budget';

const ROLE_NOTE = {
  owner: 'everything, including members and deleting the trip',
  planner: 'the route, the rig and the loads',
  crew: 'appliances and their routines',
  viewer: 'reads the plan, the budget and the cautions',
} as const;

/** Who is on the trip and what they may do; invitations arrive in a later release. */
export function PeopleScreen({ detail }: { detail: TripDetail }) {
  const members = useMembersQuery(detail.trip.id);
  const activity = useActivityQuery(detail.trip.id);
  return (
    <TabScroll testID="people-screen">
      <Card testID="members">
        <Text variant="title" role="heading" aria-level={2}>
          People on this trip
        </Text>
        {members.isPending ? <Skeleton testID="members-loading" height={96} /> : null}
        {members.isError ? <QueryError testID="members-error" error={members.error} onRetry={() => void members.refetch()} /> : null}
        {members.data?.members.map((m) => (
          <View key={m.userId} style={styles.member} testID={`member-${m.userId}`}>
            <View style={styles.memberText}>
              <Text variant="label">{m.name}</Text>
              <Text variant="caption" color="inkSoft">
                {m.email}
              </Text>
            </View>
            <View style={styles.role}>
              <Text variant="caption" color="pine">
                {ROLE_LABEL[m.role]}
              </Text>
            </View>
          </View>
        ))}
        <Text variant="caption" color="inkSoft">
          Owner: {ROLE_NOTE.owner}. Planner: {ROLE_NOTE.planner}. Crew: {ROLE_NOTE.crew}. Viewer: {ROLE_NOTE.viewer}.
        </Text>
      </Card>
      <Card testID="activity">
        <Text variant="title" role="heading" aria-level={2}>
          Recent changes
        </Text>
        {activity.isPending ? <Skeleton height={96} /> : null}
        {activity.data?.entries.length === 0 ? <Text color="inkSoft">Nothing has changed yet.</Text> : null}
        {activity.data?.entries.slice(0, 20).map((e) => (
          <Text key={e.id} variant="caption">
            {new Date(e.at).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })} — {e.userName ?? 'Someone'} {e.summary}
          </Text>
        ))}
      </Card>
    </TabScroll>
  );
}

const styles = StyleSheet.create({
  member: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  memberText: { flex: 1 },
  role: { backgroundColor: colors.pineSoft, borderRadius: radii.pill, paddingHorizontal: space.md, paddingVertical: space.xs },
});
