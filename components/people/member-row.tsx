import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ROLE_LABEL } from '@/components/trip/role-label';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Text } from '@/components/ui/text';
import type { Member } from '@/shared/schemas/api';
import type { InviteRole } from '@/shared/schemas/sharing';
import { ApiError } from '@/stores/queries/api-client';
import { useHandOverMutation, useMemberRemoveMutation, useMemberRoleMutation } from '@/stores/queries/members';
import { showToast } from '@/stores/toast-store';
import { ConfirmAction } from './confirm-action';

const ROLE_OPTIONS: { value: InviteRole; label: string }[] = [
  { value: 'planner', label: 'Planner' },
  { value: 'crew', label: 'Crew' },
  { value: 'viewer', label: 'Viewer' },
];

function failed(error: unknown): void {
  showToast(error instanceof ApiError ? error.message : 'That did not work. Please try again.', { tone: 'danger' });
}

type Props = { tripId: string; member: Member; isMe: boolean; canManage: boolean };

/** One person on the trip; the owner can open it to change the role, remove them or hand the trip over. */
export function MemberRow({ tripId, member, isMe, canManage }: Props) {
  const [open, setOpen] = useState(false);
  const roleChange = useMemberRoleMutation(tripId);
  const remove = useMemberRemoveMutation(tripId);
  const handOver = useHandOverMutation(tripId);
  const manageable = canManage && !isMe && member.role !== 'owner';
  const id = member.userId;

  return (
    <View style={styles.row} testID={`member-${id}`}>
      <View style={styles.head}>
        <View style={styles.text}>
          <Text variant="label">
            {member.name}
            {isMe ? ' (you)' : ''}
          </Text>
          {member.email ? (
            <Text variant="caption" color="inkSoft">
              {member.email}
            </Text>
          ) : null}
        </View>
        <View style={styles.pill}>
          <Text variant="caption" color="pine" testID={`member-${id}-role`}>
            {ROLE_LABEL[member.role]}
          </Text>
        </View>
        {manageable ? (
          <Button
            testID={`member-${id}-manage`}
            label={open ? 'Close' : 'Change'}
            accessibilityLabel={
              open ? `Close the choices for ${member.name}` : `Change ${member.name}'s role or membership`
            }
            tone="quiet"
            aria-expanded={open}
            onPress={() => setOpen((v) => !v)}
            style={styles.toggle}
          />
        ) : null}
      </View>
      {manageable && open && member.role !== 'owner' ? (
        <View style={styles.panel}>
          <ChoiceChips
            testID={`member-${id}-role-picker`}
            label={`Role for ${member.name}`}
            options={ROLE_OPTIONS}
            value={member.role}
            disabled={roleChange.isPending}
            onChange={(role) =>
              roleChange.mutate(
                { userId: id, role },
                { onSuccess: () => showToast(`${member.name} is now ${ROLE_LABEL[role]}.`), onError: failed },
              )
            }
          />
          <View style={styles.actions}>
            <ConfirmAction
              testID={`member-${id}-hand-over`}
              label="Hand over ownership"
              question={`Make ${member.name} the owner? You will stay on as a planner.`}
              confirmLabel="Yes, hand over"
              tone="secondary"
              busy={handOver.isPending}
              onConfirm={() =>
                handOver.mutate(id, {
                  onSuccess: () => showToast(`${member.name} now owns this trip.`),
                  onError: failed,
                })
              }
            />
            <ConfirmAction
              testID={`member-${id}-remove`}
              label="Remove from trip"
              question={`Remove ${member.name}? They lose access to this trip at once, invites waiting for their address are withdrawn, and clubs they shared it to lose it too.`}
              confirmLabel="Yes, remove"
              busy={remove.isPending}
              onConfirm={() =>
                remove.mutate(id, { onSuccess: () => showToast(`${member.name} was removed.`), onError: failed })
              }
            />
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line, gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  text: { flex: 1, minWidth: 120 },
  toggle: { paddingHorizontal: space.md },
  pill: {
    backgroundColor: colors.pineSoft,
    borderRadius: radii.pill,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
  },
  panel: { gap: space.md, paddingBottom: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'flex-start' },
});
