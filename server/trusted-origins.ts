import type { BetterAuthPlugin } from 'better-auth';

const LOOPBACK_HOSTS = ['localhost', '127.0.0.1', '[::1]'];

/**
 * The origins whose pages may sign in and write: PUBLIC_URL and the Expo dev server. Outside production a
 * loopback PUBLIC_URL is trusted under each of its spellings (localhost, 127.0.0.1, [::1]) on the same port,
 * since a newcomer may type any of them.
 */
export function trustedOrigins(config: { publicUrl: string; devWebOrigin?: string; production?: boolean }): string[] {
  const origins = new Set<string>();
  const publicOrigin = new URL(config.publicUrl);
  origins.add(publicOrigin.origin);
  if (!config.production && LOOPBACK_HOSTS.includes(publicOrigin.hostname)) {
    for (const host of LOOPBACK_HOSTS) {
      const spelling = new URL(publicOrigin.origin);
      spelling.hostname = host;
      origins.add(spelling.origin);
    }
  }
  if (config.devWebOrigin) origins.add(new URL(config.devWebOrigin).origin);
  return [...origins];
}

/** What to tell someone whose page is at an address the server does not take sign-ins from. */
export const openPublicUrlAdvice = (publicUrl: string) =>
  `This page is open at an address Trailtally does not take sign-ins from. Open ${new URL(publicUrl).origin} and try again.`;

const ORIGIN_REFUSALS = new Set(['INVALID_ORIGIN', 'MISSING_OR_NULL_ORIGIN']);

/** Replaces better-auth's bare "Invalid origin" with advice naming the address to open. */
export function originRefusalAdvice(publicUrl: string): BetterAuthPlugin {
  return {
    id: 'origin-refusal-advice',
    onResponse: async (response) => {
      if (response.status !== 403) return;
      const body: unknown = await response
        .clone()
        .json()
        .catch(() => null);
      const code = (body as { code?: unknown } | null)?.code;
      if (typeof code !== 'string' || !ORIGIN_REFUSALS.has(code)) return;
      const headers = new Headers(response.headers);
      headers.delete('content-length');
      const advice = { code, message: openPublicUrlAdvice(publicUrl), publicUrl: new URL(publicUrl).origin };
      return { response: new Response(JSON.stringify(advice), { status: 403, headers }) };
    },
  };
}
