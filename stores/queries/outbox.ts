import { useQuery } from '@tanstack/react-query';
import { ApiError, apiFetch } from './api-client';
import { STALE } from './stale';
import type { CapturedMail } from '@/shared/schemas/outbox';

/** One message the development mail fake caught. */
export type OutboxMessage = CapturedMail;

export const outboxKeys = {
  root: ['outbox'] as const,
  messages: () => [...outboxKeys.root, 'messages'] as const,
};

const fetchOutbox = () => apiFetch<{ messages: OutboxMessage[] }>('/api/dev/outbox');

// Mail arrives while the page is open (an invite sent in another tab); check now and then.
const OUTBOX_POLL_MS = 5_000;

export function useOutboxQuery() {
  return useQuery({
    queryKey: outboxKeys.messages(),
    queryFn: fetchOutbox,
    refetchInterval: OUTBOX_POLL_MS,
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });
}

/**
 * Whether this server has an outbox at all. The exported web app is always a production build, so
 * the answer comes from the server (404 in production), asked once and remembered.
 */
export function useOutboxAvailableQuery() {
  return useQuery({
    queryKey: [...outboxKeys.root, 'available'] as const,
    queryFn: async () => {
      try {
        await fetchOutbox();
        return true;
      } catch (error) {
        if (error instanceof ApiError && error.status === 404) return false;
        throw error;
      }
    },
    staleTime: STALE.MINUTES.FIVE,
    retry: false,
  });
}
