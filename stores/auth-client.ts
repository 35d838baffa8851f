import { createAuthClient } from 'better-auth/react';
import { API_BASE_URL } from './client-env';

function authBaseUrl(): string {
  if (API_BASE_URL) return `${API_BASE_URL}/api/auth`;
  // better-auth wants an absolute URL; on the web the app and the API share one origin.
  const origin = typeof window !== 'undefined' ? window.location.origin : 'http://localhost:8080';
  return `${origin}/api/auth`;
}

export const authClient = createAuthClient({
  baseURL: authBaseUrl(),
  fetchOptions: { credentials: 'include' },
});

export const useSession = authClient.useSession;
