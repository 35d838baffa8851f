/**
 * True when the page now being drawn came with its first frame already in it: the export renders the sign-in pages
 * ahead of time, and the server sends one only to a visitor with no session cookie (server/web-static.ts). Such a
 * visitor cannot be signed in, so the app draws that frame at once instead of waiting for the session's answer, and
 * React adopts the markup already on screen rather than drawing it again. In Node, during the export, it is the
 * frame being rendered.
 */
export function isPrerenderedSignedOutPage(): boolean {
  if (typeof window === 'undefined') return true;
  // Set by the export in the head of every page it rendered; absent from the app's plain shell.
  return (globalThis as { __EXPO_ROUTER_HYDRATE__?: unknown }).__EXPO_ROUTER_HYDRATE__ === true;
}
