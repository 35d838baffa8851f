/**
 * Registers the service worker and calls `onUpdated` when a new release's worker takes over a page that an older one
 * already controlled (the first worker taking over a fresh page is no update). Plain DOM, no React, so the release
 * check can run it in a page of its own. Returns a function that stops listening.
 */
export function watchForUpdate(
  container: ServiceWorkerContainer,
  onUpdated: () => void,
  scriptUrl = '/sw.js',
): () => void {
  const hadController = !!container.controller;
  const onChange = () => {
    if (hadController) onUpdated();
  };
  container.addEventListener('controllerchange', onChange);
  // A development server has no worker: the registration fails quietly and the app runs without one.
  container.register(scriptUrl).catch(() => undefined);
  return () => container.removeEventListener('controllerchange', onChange);
}
