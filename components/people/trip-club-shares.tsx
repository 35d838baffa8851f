import { StyleSheet, View } from 'react-native';
import { rowStyles } from '@/components/theme/rows';
import { space } from '@/components/theme/tokens';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { TripShare } from '@/shared/schemas/sharing';
import { ApiError } from '@/stores/queries/api-client';
import { useTripSharesQuery, useTripShareWithdrawMutation } from '@/stores/queries/clubs';
import { showToast } from '@/stores/toast-store';
import { ConfirmAction } from './confirm-action';
import { ShareToClub } from './share-to-club';

const day = (iso: string) => new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short' });

type Withdraw = ReturnType<typeof useTripShareWithdrawMutation>;

// The withdraw mutation lives in the list, not the row: the row unmounts when the share is gone,
// and a mutation's own callbacks (the toast) only run while its component is mounted.
function ShareRow({ share, withdraw }: { share: TripShare; withdraw?: Withdraw }) {
  const households = `${share.memberCount} ${share.memberCount === 1 ? 'household' : 'households'}`;
  return (
    <View style={rowStyles.wrapping} testID={`trip-share-${share.clubId}`}>
      <View style={rowStyles.text}>
        <Text variant="label">{share.clubName}</Text>
        <Text variant="caption" color="inkSoft">
          {households} can read it · shared{share.sharedByName ? ` by ${share.sharedByName}` : ''} on{' '}
          {day(share.sharedAt)}
        </Text>
      </View>
      {withdraw ? (
        <ConfirmAction
          testID={`trip-share-${share.clubId}-withdraw`}
          label="Withdraw"
          question={`Stop sharing with ${share.clubName}? Its members lose access at once; copies they made stay theirs.`}
          confirmLabel="Yes, withdraw"
          busy={withdraw.isPending && withdraw.variables === share.clubId}
          onConfirm={() =>
            withdraw.mutate(share.clubId, {
              onSuccess: () => showToast(`${share.clubName} no longer sees this trip.`),
              onError: (error) =>
                showToast(error instanceof ApiError ? error.message : 'That did not work. Please try again.', {
                  tone: 'danger',
                }),
            })
          }
        />
      ) : null}
    </View>
  );
}

/**
 * Every club that can read this trip, whoever shared it there. The owner withdraws any share and
 * shares to the clubs they organise; planners see the list.
 */
export function TripClubShares({ tripId, isOwner }: { tripId: string; isOwner: boolean }) {
  const shares = useTripSharesQuery(tripId, true);
  const withdraw = useTripShareWithdrawMutation(tripId);
  if (shares.isPending) return <Skeleton testID="trip-shares-loading" height={64} />;
  if (shares.isError)
    return <QueryError testID="trip-shares-error" error={shares.error} onRetry={() => void shares.refetch()} />;
  const list = shares.data.shares;
  return (
    <View style={styles.wrap}>
      {list.length === 0 ? (
        <Text color="inkSoft" testID="trip-shares-empty">
          Not shared with any club. Members of a club it is shared with can read it and copy it onto their rig.
        </Text>
      ) : (
        <View testID="trip-shares">
          {list.map((share) => (
            <ShareRow key={share.clubId} share={share} {...(isOwner ? { withdraw } : {})} />
          ))}
        </View>
      )}
      {isOwner ? (
        <ShareToClub tripId={tripId} sharedClubIds={list.map((share) => share.clubId)} />
      ) : (
        <Text variant="caption" color="inkSoft" testID="trip-shares-owner-only">
          Only the owner shares this trip to a club or withdraws it.
        </Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.lg } });
