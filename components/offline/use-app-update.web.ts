import { useEffect, useState } from 'react';

/**
 * Registers the service worker built with the web app. A new release's worker takes over at once; when it replaces
 * one that was already in charge, the page is told so it can offer "updated — reload".
 */
export function useAppUpdate(): boolean {
  const [updated, setUpdated] = useState(false);
  useEffect(() => {
    if (!('serviceWorker' in navigator)) return;
    const hadController = !!navigator.serviceWorker.controller;
    const onChange = () => {
      if (hadController) setUpdated(true);
    };
    navigator.serviceWorker.addEventListener('controllerchange', onChange);
    // A development server has no worker: the registration fails quietly and the app runs without one.
    navigator.serviceWorker.register('/sw.js').catch(() => undefined);
    return () => navigator.serviceWorker.removeEventListener('controllerchange', onChange);
  }, []);
  return updated;
}
