import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';
import { defineApplianceSaves } from './appliances';
import { defineCheckInSave } from './check-ins';
import { STALE } from './stale';

export function createQueryClient(): QueryClient {
  const queryClient = new QueryClient({
    defaultOptions: {
      queries: {
        // Retrying a refusal (4xx) never helps; retry network hiccups and server errors twice.
        retry: (failureCount, error) =>
          failureCount < 2 && !(error instanceof ApiError && error.status >= 400 && error.status < 500),
        refetchOnWindowFocus: true,
        // Kept as long as the copy saved on the device, so a trip opened once still opens with no signal.
        gcTime: STALE.DAYS.SEVEN,
      },
      // Only the saves defined below wait for the connection; any other change is refused at once with no signal
      // (the network message), rather than spinning until the connection returns.
      mutations: { networkMode: 'always' },
    },
  });
  defineCheckInSave(queryClient);
  defineApplianceSaves(queryClient);
  return queryClient;
}
