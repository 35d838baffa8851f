import { useEffect, useState } from 'react';
import { chartBytesFirstSettled } from '@/components/budget/chart-loader';
import { watchForUpdate } from './watch-for-update';

/** A page that never fetches the chart registers the worker after this long: its own first downloads are done. */
const REGISTER_AT_LATEST_MS = 20_000;

/**
 * Registers the service worker built with the web app. A new release's worker takes over at once; when it replaces
 * one that was already in charge, the page is told so it can offer "updated — reload".
 *
 * A first registration fetches the whole app for use offline (about 4 MB). On a slow link that would take its share
 * of the link from the chart's 2.6 MB the Trips screen and a trip start fetching at once, so the worker waits for the
 * chart's bytes (or 20 s); its copies of the files the page already has then come from the browser's cache.
 */
export function useAppUpdate(): boolean {
  const [updated, setUpdated] = useState(false);
  useEffect(() => {
    if (!('serviceWorker' in navigator)) return;
    let stopWatching: (() => void) | undefined;
    let unmounted = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const atLatest = new Promise<void>((resolve) => (timer = setTimeout(resolve, REGISTER_AT_LATEST_MS)));
    void Promise.race([chartBytesFirstSettled(), atLatest]).then(() => {
      if (!unmounted) stopWatching = watchForUpdate(navigator.serviceWorker, () => setUpdated(true));
    });
    return () => {
      unmounted = true;
      clearTimeout(timer);
      stopWatching?.();
    };
  }, []);
  return updated;
}
