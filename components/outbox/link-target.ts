/**
 * Where a link in captured mail should go. A link to one of the app's own pages becomes a path that
 * opens in place; anything else (the API's own links, such as the password-reset step that redirects
 * back to the app, or another site) stays a full web link.
 */
export function linkTarget(url: string, origin: string): string {
  const path = url.startsWith(`${origin}/`) ? url.slice(origin.length) : null;
  return path && !path.startsWith('/api/') ? path : url;
}
