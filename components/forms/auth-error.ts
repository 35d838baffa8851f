import { ApiError, NETWORK_MESSAGE } from '@/stores/queries/api-client';

/**
 * better-auth answers `{ code, message }`; the limits in front of it (body size, attempts) answer the app's
 * `{ error: { code, message } }`. The auth client spreads either body into its error object.
 */
type AuthFailure =
  | {
      status?: number;
      code?: string;
      message?: string;
      fields?: unknown;
      error?: { code?: string; message?: string; fields?: unknown };
    }
  | null
  | undefined;

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
    // The server's message says why (the password is the e-mail address, or common; the name holds a line break).
    case 'PASSWORD_TOO_WEAK':
    case 'INVALID_NAME':
      return error.message || 'Please check the form and try again.';
    // The server's message names the address the app answers at.
    case 'INVALID_ORIGIN':
    case 'MISSING_OR_NULL_ORIGIN':
      return (
        error.message ||
        'This page was opened at an address the server does not accept. Open the address Trailtally was set up with.'
      );
    default:
      if (error.status === 429)
        return error.error?.message ?? 'Too many attempts. Please wait a few minutes and try again.';
      if (error.status === 413) return 'That was more than the server accepts. Please shorten what you typed.';
      if (error.status >= 500) return 'The server had a problem. Please try again in a moment.';
      return error.message || error.error?.message || 'That did not work. Please check the form and try again.';
  }
}

/** Per-field messages, kept only when they have the stable shape (field → list of sentences). */
function fieldsOf(value: unknown): Record<string, string[]> | undefined {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return undefined;
  const out: Record<string, string[]> = {};
  for (const [field, messages] of Object.entries(value))
    if (Array.isArray(messages) && messages.every((m) => typeof m === 'string')) out[field] = messages;
  return Object.keys(out).length > 0 ? out : undefined;
}

/**
 * An auth refusal as the API's error, so a form puts it beside its fields with `showServerRefusal`: the rules in
 * front of better-auth name their field; a wrong current password is about the field that holds it.
 */
export function authRefusal(error: AuthFailure, codeFields: Record<string, string> = {}): ApiError {
  const message = describeAuthError(error);
  if (!error?.status) return new ApiError(0, 'network', message);
  const code = error.code ?? error.error?.code ?? 'unprocessable';
  const named = fieldsOf(error.fields) ?? fieldsOf(error.error?.fields);
  const field = codeFields[code];
  const fields = named ?? (field ? { [field]: [message] } : undefined);
  return new ApiError(error.status, code, message, fields);
}
