import { useEffect, useState } from 'react';
import { watchForUpdate } from './watch-for-update';

/**
 * Registers the service worker built with the web app. A new release's worker takes over at once; when it replaces
 * one that was already in charge, the page is told so it can offer "updated — reload".
 */
export function useAppUpdate(): boolean {
  const [updated, setUpdated] = useState(false);
  useEffect(() => {
    if (!('serviceWorker' in navigator)) return;
    return watchForUpdate(navigator.serviceWorker, () => setUpdated(true));
  }, []);
  return updated;
}
