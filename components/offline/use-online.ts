import { onlineManager } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';

// TanStack Query starts out "online" and only learns of a change from the browser's online and offline events; a
// page loaded with no signal gets neither, so it is told once at start.
if (typeof navigator !== 'undefined' && navigator.onLine === false) onlineManager.setOnline(false);

/** Whether the device has a connection, as TanStack Query tracks it. */
export function useOnline(): boolean {
  return useSyncExternalStore(
    (notify) => onlineManager.subscribe(notify),
    () => onlineManager.isOnline(),
    () => true,
  );
}
