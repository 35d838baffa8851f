import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';
import { STALE } from './stale';

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        // Retrying a refusal (4xx) never helps; retry network hiccups and server errors twice.
        retry: (failureCount, error) =>
          failureCount < 2 && !(error instanceof ApiError && error.status >= 400 && error.status < 500),
        refetchOnWindowFocus: true,
        // Kept as long as the copy saved on the device, so a trip opened once still opens with no signal.
        gcTime: STALE.DAYS.SEVEN,
      },
    },
  });
}
