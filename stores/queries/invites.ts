import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InvitePreview } from '@/shared/schemas/sharing';
import { ApiError, apiFetch } from './api-client';
import { clubKeys } from './clubs';
import { tripKeys } from './trips';

export type InviteKind = InvitePreview['kind'];

const basePath: Record<InviteKind, string> = { trip: '/api/invites', club: '/api/club-invites' };

export const inviteKeys = {
  root: ['invite-links'] as const,
  preview: (kind: InviteKind, token: string) => [...inviteKeys.root, kind, token] as const,
};

export type AcceptResult = { kind: 'trip'; tripId: string } | { kind: 'club'; clubId: string };

export function useInvitePreviewQuery(kind: InviteKind, token: string) {
  return useQuery({
    queryKey: inviteKeys.preview(kind, token),
    queryFn: () => apiFetch<{ invite: InvitePreview }>(`${basePath[kind]}/${encodeURIComponent(token)}`),
    // An unknown link stays unknown: asking again would only repeat the 404.
    retry: (count, error) => !(error instanceof ApiError && error.status < 500) && count < 2,
  });
}

export function useInviteAcceptMutation(kind: InviteKind, token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (): Promise<AcceptResult> => {
      const path = `${basePath[kind]}/${encodeURIComponent(token)}/accept`;
      if (kind === 'trip')
        return { kind, tripId: (await apiFetch<{ tripId: string }>(path, { method: 'POST' })).tripId };
      return { kind, clubId: (await apiFetch<{ clubId: string }>(path, { method: 'POST' })).clubId };
    },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: tripKeys.root }),
        queryClient.invalidateQueries({ queryKey: clubKeys.root }),
        queryClient.invalidateQueries({ queryKey: inviteKeys.preview(kind, token) }),
      ]),
  });
}
