import { NETWORK_MESSAGE } from '@/stores/queries/api-client';

type AuthFailure = { status?: number; code?: string; message?: string } | null | undefined;

/** Turns better-auth's error answers into sentences a person can act on. */
export function describeAuthError(error: AuthFailure): string {
  if (!error) return 'Something went wrong. Please try again.';
  if (!error.status) return NETWORK_MESSAGE;
  switch (error.code) {
    case 'INVALID_EMAIL_OR_PASSWORD':
      return 'That e-mail and password do not match an account. Check both and try again.';
    case 'USER_ALREADY_EXISTS':
    case 'USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL':
      return 'An account with that e-mail already exists. Sign in instead, or use another e-mail.';
    case 'PASSWORD_TOO_SHORT':
      return 'That password is too short: use at least 8 characters.';
    default:
      if (error.status === 429) return 'Too many attempts. Please wait a few minutes and try again.';
      if (error.status >= 500) return 'The server had a problem. Please try again in a moment.';
      return error.message || 'That did not work. Please check the form and try again.';
  }
}
