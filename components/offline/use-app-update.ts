/** Native builds update through the store; only the web app has a service worker. */
export function useAppUpdate(): boolean {
  return false;
}
