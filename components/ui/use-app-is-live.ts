import { useSyncExternalStore } from 'react';

const nothingToWatch = () => () => undefined;

/**
 * False while React takes over a page that arrived already drawn (a signed-out page on the web: see
 * server/web-pages.ts), true once the app answers presses. A prerendered button is only markup until then, so it
 * shows as not yet usable instead of taking a press that does nothing. Pages the app draws itself are live at once.
 */
export function useAppIsLive(): boolean {
  return useSyncExternalStore(
    nothingToWatch,
    () => true,
    () => false,
  );
}
