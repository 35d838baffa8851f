/**
 * The origins whose pages may change data through the API with a user's cookies: the app's own address and, in
 * `npm run dev`, the Expo web dev server. One list, read by better-auth's origin check and by the API's own, so
 * the two never disagree.
 */
export function trustedOrigins(config: { publicUrl: string; devWebOrigin?: string }): string[] {
  const origins = [config.publicUrl, ...(config.devWebOrigin ? [config.devWebOrigin] : [])];
  return [...new Set(origins.map((url) => new URL(url).origin))];
}
