import crypto from 'node:crypto';

// Which of the exported pages the server sends for a page request. The export renders every screen ahead of time;
// only the signed-out pages are kept, because their first frame does not depend on who is asking. Everything else
// loads the plain shell (an empty root the app draws into), as does every page once the service worker serves it.

/** The app's shell: no prerendered screen in it, so it suits every route and every visitor. */
export const SHELL_FILE = 'shell.html';

/** Signed-out pages sent with their first frame already drawn, by URL path. */
export const PRERENDERED_PAGES: Readonly<Record<string, string>> = {
  // The app's address: signed out, it shows the sign-in form there.
  '/': 'index.html',
  '/sign-in': 'sign-in.html',
  '/sign-up': 'sign-up.html',
  '/forgot-password': 'forgot-password.html',
};

/**
 * The one inline script in a prerendered page, written by the export: it tells the app to adopt the drawn markup
 * (hydrate) instead of drawing it again. The content security policy allows exactly this text by its hash.
 */
export const HYDRATE_FLAG_SCRIPT = 'globalThis.__EXPO_ROUTER_HYDRATE__=true;';
export const HYDRATE_FLAG_SCRIPT_HASH = `'sha256-${crypto.createHash('sha256').update(HYDRATE_FLAG_SCRIPT).digest('base64')}'`;
