import { Link } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { ApiError } from '@/stores/queries/api-client';
import { useClubsQuery, useShareTripToClubMutation } from '@/stores/queries/clubs';
import { showToast } from '@/stores/toast-store';

/** The owner shares this trip to a club they organise: every member may view it and copy it onto their rig. */
export function ShareToClub({ tripId, sharedClubIds }: { tripId: string; sharedClubIds: string[] }) {
  const clubs = useClubsQuery();
  const share = useShareTripToClubMutation();
  const [picked, setPicked] = useState<string>();
  if (clubs.isPending) return <Skeleton testID="share-club-loading" height={48} />;
  if (clubs.isError)
    return <QueryError testID="share-club-error" error={clubs.error} onRetry={() => void clubs.refetch()} />;
  const organised = clubs.data.clubs.filter((club) => club.role === 'organiser');
  const mine = organised.filter((club) => !sharedClubIds.includes(club.id));
  if (organised.length > 0 && mine.length === 0)
    return (
      <Text color="inkSoft" testID="share-club-all-done">
        Shared with every club you organise.
      </Text>
    );
  if (mine.length === 0)
    return (
      <View style={styles.wrap} testID="share-club-none">
        <Text color="inkSoft">
          You organise no club yet. Create one, invite its households, then share this trip to it.
        </Text>
        <Link href="/clubs" testID="share-club-go-clubs" accessibilityLabel="Go to Clubs">
          <Text variant="label" color="pine">
            Go to Clubs ›
          </Text>
        </Link>
      </View>
    );
  const clubId = mine.find((club) => club.id === picked)?.id ?? mine[0]?.id ?? '';
  const name = mine.find((club) => club.id === clubId)?.name ?? '';
  return (
    <View style={styles.wrap} testID="share-club">
      <ChoiceChips
        testID="share-club-pick"
        label="Share to a club"
        options={mine.map((club) => ({ value: club.id, label: club.name }))}
        value={clubId}
        onChange={setPicked}
      />
      <Button
        testID="share-club-submit"
        label="Share to club"
        accessibilityLabel={`Share this trip to ${name}`}
        busy={share.isPending}
        style={styles.button}
        onPress={() =>
          share.mutate(
            { clubId, tripId },
            {
              onSuccess: () => showToast(`Shared to ${name}. Its members can view it and copy it onto their rig.`),
              onError: (error) =>
                showToast(error instanceof ApiError ? error.message : 'Sharing did not work. Please try again.', {
                  tone: 'danger',
                }),
            },
          )
        }
      />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.md }, button: { alignSelf: 'flex-start' } });
