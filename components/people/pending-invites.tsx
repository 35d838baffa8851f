import { StyleSheet, View } from 'react-native';
import { ROLE_LABEL } from '@/components/trip/role-label';
import { colors, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { PendingInvite } from '@/shared/schemas/sharing';
import { ApiError } from '@/stores/queries/api-client';
import { useInviteResendMutation, useInviteRevokeMutation, useTripInvitesQuery } from '@/stores/queries/members';
import { showToast } from '@/stores/toast-store';
import { NotSentNote } from '@/components/invites/not-sent-note';
import { ConfirmAction } from './confirm-action';

const day = (iso: string) => new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short' });

function failed(error: unknown): void {
  showToast(error instanceof ApiError ? error.message : 'That did not work. Please try again.', { tone: 'danger' });
}

function InviteRow({ tripId, invite, canManage }: { tripId: string; invite: PendingInvite; canManage: boolean }) {
  const resend = useInviteResendMutation(tripId);
  const revoke = useInviteRevokeMutation(tripId);
  // The owner resends any invite; a planner can retry or resend the ones they sent.
  const canResend = canManage || invite.sentByMe;
  const again = invite.mailFailed ? 'Retry' : 'Resend';
  return (
    <View style={styles.row} testID={`invite-${invite.id}`}>
      <Text variant="label">{invite.email}</Text>
      <Text variant="caption" color="inkSoft">
        {ROLE_LABEL[invite.role]} · {invite.mailFailed ? 'saved' : 'sent'} {day(invite.createdAt)}
        {invite.invitedByName ? ` by ${invite.invitedByName}` : ''} · link works until {day(invite.expiresAt)}
      </Text>
      {invite.mailFailed ? <NotSentNote testID={`invite-${invite.id}-not-sent`} /> : null}
      {canResend || canManage ? (
        <View style={styles.actions}>
          {canResend ? (
            <Button
              testID={`invite-${invite.id}-resend`}
              label={again}
              accessibilityLabel={`${again}: send the invite to ${invite.email}${invite.mailFailed ? '' : ' again'}`}
              tone={invite.mailFailed ? 'primary' : 'secondary'}
              busy={resend.isPending}
              onPress={() =>
                resend.mutate(invite.id, {
                  onSuccess: () => showToast(`A new link went to ${invite.email}.`),
                  onError: failed,
                })
              }
            />
          ) : null}
          {canManage ? (
            <ConfirmAction
              testID={`invite-${invite.id}-revoke`}
              label="Revoke"
              question={`Revoke the invite to ${invite.email}? Its link stops working.`}
              confirmLabel="Yes, revoke"
              busy={revoke.isPending}
              onConfirm={() =>
                revoke.mutate(invite.id, { onSuccess: () => showToast('Invite revoked.'), onError: failed })
              }
            />
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

/** Invites not yet accepted; the owner may send a fresh link or revoke one. */
export function PendingInvites({ tripId, canManage }: { tripId: string; canManage: boolean }) {
  const invites = useTripInvitesQuery(tripId, true);
  if (invites.isPending) return <Skeleton testID="invites-loading" height={64} />;
  if (invites.isError)
    return <QueryError testID="invites-error" error={invites.error} onRetry={() => void invites.refetch()} />;
  if (invites.data.invites.length === 0)
    return (
      <Text color="inkSoft" testID="invites-empty">
        No invites waiting. People you invite appear here until they join.
      </Text>
    );
  return (
    <View testID="pending-invites">
      {invites.data.invites.map((invite) => (
        <InviteRow key={invite.id} tripId={tripId} invite={invite} canManage={canManage} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line, gap: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'flex-start', paddingTop: space.xs },
});
