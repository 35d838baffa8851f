import { StyleSheet, View } from 'react-native';
import { NotSentNote } from '@/components/invites/not-sent-note';
import { ConfirmAction } from '@/components/people/confirm-action';
import { Button } from '@/components/ui/button';
import { rowStyles } from '@/components/theme/rows';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import type { ClubDetail } from '@/shared/schemas/sharing';
import { ApiError } from '@/stores/queries/api-client';
import { useClubInviteResendMutation, useClubInviteRevokeMutation } from '@/stores/queries/clubs';
import { showToast } from '@/stores/toast-store';

export function ClubMembers({ detail }: { detail: ClubDetail }) {
  return (
    <View testID="club-members">
      {detail.members.map((member) => (
        <View key={member.userId} style={styles.row} testID={`club-member-${member.userId}`}>
          <Text variant="label" style={styles.name}>
            {member.name}
          </Text>
          <View style={styles.pill}>
            <Text variant="caption" color="pine">
              {member.role === 'organiser' ? 'Organiser' : 'Member'}
            </Text>
          </View>
        </View>
      ))}
    </View>
  );
}

const day = (iso: string) => new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short' });

const failed = (e: unknown) => showToast(e instanceof ApiError ? e.message : 'That did not work.', { tone: 'danger' });

export function ClubPendingInvites({ detail }: { detail: ClubDetail }) {
  const revoke = useClubInviteRevokeMutation(detail.club.id);
  const resend = useClubInviteResendMutation(detail.club.id);
  if (detail.pendingInvites.length === 0)
    return (
      <Text color="inkSoft" testID="club-invites-empty">
        No invites waiting. Households you invite appear here until they join.
      </Text>
    );
  return (
    <View testID="club-pending-invites">
      {detail.pendingInvites.map((invite) => (
        <View key={invite.id} style={rowStyles.wrapping} testID={`club-invite-${invite.id}`}>
          <View style={styles.name}>
            <Text variant="label">{invite.name ?? invite.email}</Text>
            <Text variant="caption" color="inkSoft">
              {invite.name ? `${invite.email} · ` : ''}link works until {day(invite.expiresAt)}
            </Text>
            {invite.mailFailed ? <NotSentNote testID={`club-invite-${invite.id}-not-sent`} /> : null}
          </View>
          {invite.mailFailed ? (
            <Button
              testID={`club-invite-${invite.id}-retry`}
              label="Retry"
              accessibilityLabel={`Retry: send the invite to ${invite.email}`}
              busy={resend.isPending && resend.variables === invite.id}
              onPress={() =>
                resend.mutate(invite.id, {
                  onSuccess: () => showToast(`The invite went to ${invite.email}.`),
                  onError: failed,
                })
              }
            />
          ) : null}
          <ConfirmAction
            testID={`club-invite-${invite.id}-revoke`}
            label="Revoke"
            question={`Revoke the invite to ${invite.email}?`}
            confirmLabel="Yes, revoke"
            busy={revoke.isPending}
            onConfirm={() =>
              revoke.mutate(invite.id, {
                onSuccess: () => showToast('Invite revoked.'),
                onError: failed,
              })
            }
          />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingVertical: space.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  name: { flex: 1, minWidth: 160 },
  pill: {
    backgroundColor: colors.pineSoft,
    borderRadius: radii.pill,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
  },
});
