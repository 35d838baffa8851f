import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { QueryError } from '@/components/ui/query-error';
import { Screen } from '@/components/ui/screen';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { ClubSummary } from '@/shared/schemas/sharing';
import { useClubsQuery } from '@/stores/queries/clubs';
import { CreateClubForm } from './create-club-form';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function ClubCard({ club, wide }: { club: ClubSummary; wide: boolean }) {
  const summary = `${plural(club.memberCount, 'household', 'households')} · ${plural(club.sharedTripCount, 'shared trip', 'shared trips')}`;
  return (
    <Link href={{ pathname: '/clubs/[clubId]', params: { clubId: club.id } }} asChild>
      <Pressable
        testID={`club-card-${club.id}`}
        accessibilityRole="link"
        accessibilityLabel={`${club.name}, ${summary}`}
        // Link's asChild needs one flat style object on the web.
        style={StyleSheet.flatten([styles.card, wide ? styles.cardWide : null])}
      >
        <Text variant="title">{club.name}</Text>
        <Text color="inkSoft">{summary}</Text>
        <View style={styles.pill}>
          <Text variant="caption" color="pine">
            {club.role === 'organiser' ? 'Organiser' : 'Member'}
          </Text>
        </View>
      </Pressable>
    </Link>
  );
}

/** Clubs I organise or belong to, and a form to start one. */
export function ClubListScreen() {
  const router = useRouter();
  const wide = useIsWide();
  const clubs = useClubsQuery();
  const [creating, setCreating] = useState(false);
  const none = clubs.data?.clubs.length === 0;
  const form = (
    <Card testID="create-club-card">
      <Text variant="title" role="heading" aria-level={2}>
        Create a club
      </Text>
      <CreateClubForm onCreated={(club) => router.push({ pathname: '/clubs/[clubId]', params: { clubId: club.id } })} />
    </Card>
  );
  return (
    <Screen
      testID="clubs-screen"
      title="Clubs"
      subtitle="Share a rally plan with many households; each copies it onto their own rig."
      actions={
        // Only once the list is known: while it loads, an empty list may still turn out to hold the form itself.
        clubs.data && !none && !creating ? (
          <Button testID="clubs-new" label="Create a club" tone="secondary" onPress={() => setCreating(true)} />
        ) : null
      }
    >
      {clubs.isPending ? <Skeleton testID="clubs-loading" height={120} /> : null}
      {clubs.isError ? (
        <QueryError testID="clubs-error" error={clubs.error} onRetry={() => void clubs.refetch()} />
      ) : null}
      {none ? (
        <EmptyState
          testID="clubs-empty"
          title="No clubs yet"
          body="Create a club, invite member households by e-mail (paste a list or choose a CSV file), then share a trip to it from the trip's People tab."
        />
      ) : null}
      {none || creating ? form : null}
      {clubs.data && !none ? (
        <View style={styles.grid} testID="club-list">
          {clubs.data.clubs.map((club) => (
            <ClubCard key={club.id} club={club} wide={wide} />
          ))}
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  card: {
    width: '100%',
    gap: space.xs,
    padding: space.xl,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.card,
  },
  cardWide: { width: 340 },
  pill: {
    alignSelf: 'flex-start',
    backgroundColor: colors.pineSoft,
    borderRadius: radii.pill,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    marginTop: space.xs,
  },
});
