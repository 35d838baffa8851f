import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import type { Persister } from '@tanstack/react-query-persist-client';
import { del, get, set } from 'idb-keyval';

/**
 * Server data kept in IndexedDB, so a trip opened once opens again with no signal. Signing out clears the query
 * cache, and with it this copy.
 */
export const queryPersister: Persister | null =
  typeof indexedDB === 'undefined'
    ? null
    : createAsyncStoragePersister({
        key: 'trailtally-queries',
        storage: {
          getItem: async (key: string) => (await get<string>(key)) ?? null,
          setItem: (key: string, value: string) => set(key, value),
          removeItem: (key: string) => del(key),
        },
      });
