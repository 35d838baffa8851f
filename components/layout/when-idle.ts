/**
 * Runs `task` once the browser is idle (the screen has drawn), or after a second where there is no idle callback
 * (native, older browsers); the returned function calls it off.
 */
export function whenIdle(task: () => void): () => void {
  if (typeof window !== 'undefined' && typeof window.requestIdleCallback === 'function') {
    const id = window.requestIdleCallback(task, { timeout: 3_000 });
    return () => window.cancelIdleCallback(id);
  }
  const timer = setTimeout(task, 1_000);
  return () => clearTimeout(timer);
}
