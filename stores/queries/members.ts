import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { Member } from '@/shared/schemas/api';
import type { Role } from '@/shared/schemas/roles';
import type { CreateInviteRequest, PendingInvite } from '@/shared/schemas/sharing';
import { apiFetch } from './api-client';
import { clubKeys } from './clubs';
import { STALE } from './stale';
import { invalidateTrip, tripKeys } from './trips';

export const memberKeys = {
  members: (tripId: string) => tripKeys.members(tripId),
  invites: (tripId: string) => [...tripKeys.root, 'invites', tripId] as const,
};

type MembersResponse = { members: Member[] };

const membersPath = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}/members`;
const invitesPath = (tripId: string) => `/api/trips/${encodeURIComponent(tripId)}/invites`;

export function useTripMembersQuery(tripId: string) {
  return useQuery({
    queryKey: memberKeys.members(tripId),
    queryFn: () => apiFetch<MembersResponse>(membersPath(tripId)),
    staleTime: STALE.SECONDS.THIRTY,
  });
}

/** Only the owner and planners may list pending invites; everyone else never asks. */
export function useTripInvitesQuery(tripId: string, enabled: boolean) {
  return useQuery({
    queryKey: memberKeys.invites(tripId),
    queryFn: () => apiFetch<{ invites: PendingInvite[] }>(invitesPath(tripId)),
    staleTime: STALE.SECONDS.THIRTY,
    enabled,
  });
}

// A change of members touches the trip itself (roles, activity log, the caller's own role after a hand-over).
async function afterMembersChange(queryClient: QueryClient, tripId: string, members?: Member[]): Promise<void> {
  if (members) queryClient.setQueryData<MembersResponse>(memberKeys.members(tripId), { members });
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: memberKeys.members(tripId) }),
    queryClient.invalidateQueries({ queryKey: memberKeys.invites(tripId) }),
    // Removing someone also ends the club shares they made.
    queryClient.invalidateQueries({ queryKey: clubKeys.tripShares(tripId) }),
    invalidateTrip(queryClient, tripId),
  ]);
}

export function useMemberRoleMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Exclude<Role, 'owner'> }) =>
      apiFetch<MembersResponse>(`${membersPath(tripId)}/${encodeURIComponent(userId)}`, {
        method: 'PATCH',
        json: { role },
      }),
    onSuccess: (data) => afterMembersChange(queryClient, tripId, data.members),
  });
}

export function useMemberRemoveMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) =>
      apiFetch<void>(`${membersPath(tripId)}/${encodeURIComponent(userId)}`, { method: 'DELETE' }),
    onSuccess: () => afterMembersChange(queryClient, tripId),
  });
}

export function useHandOverMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) =>
      apiFetch<MembersResponse>(`${membersPath(tripId)}/hand-over`, { method: 'POST', json: { userId } }),
    onSuccess: (data) => afterMembersChange(queryClient, tripId, data.members),
  });
}

// An invite is saved even when its e-mail fails (502), so the lists refresh whatever the answer.
export function useInviteCreateMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInviteRequest) => apiFetch<unknown>(invitesPath(tripId), { method: 'POST', json: body }),
    onSettled: () => afterMembersChange(queryClient, tripId),
  });
}

/** "Resend", or "Retry" when the invite's e-mail did not go out. */
export function useInviteResendMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: string) =>
      apiFetch<unknown>(`${invitesPath(tripId)}/${encodeURIComponent(inviteId)}/resend`, { method: 'POST' }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: memberKeys.invites(tripId) }),
  });
}

export function useInviteRevokeMutation(tripId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: string) =>
      apiFetch<void>(`${invitesPath(tripId)}/${encodeURIComponent(inviteId)}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: memberKeys.invites(tripId) }),
  });
}
