import type { Persister } from '@tanstack/react-query-persist-client';

/** Only the web app keeps server data between visits for now. */
export const queryPersister: Persister | null = null;
