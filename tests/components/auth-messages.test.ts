import { describe, expect, it } from 'vitest';
import { describeAuthError } from '@/components/forms/auth-error';

describe('describeAuthError', () => {
  it('when the page is at an address the server refuses, then the message names the address to open', () => {
    const message =
      'This page is open at an address Trailtally does not take sign-ins from. Open http://localhost:8080 and try again.';
    expect(describeAuthError({ status: 403, code: 'INVALID_ORIGIN', message })).toBe(message);
  });

  it('when an origin refusal carries no message, then it still says to open the address the app was set up with', () => {
    expect(describeAuthError({ status: 403, code: 'MISSING_OR_NULL_ORIGIN' })).toMatch(/Open the address/);
  });

  it('when attempts are limited, then the wait the server gives is shown', () => {
    const message = 'Too many wrong passwords for this account. Try again in 14 minutes, or reset the password.';
    expect(describeAuthError({ status: 429, error: { code: 'rate_limited', message } })).toBe(message);
  });

  it('when the body was too large, then the person is asked to shorten what they typed', () => {
    expect(describeAuthError({ status: 413, error: { code: 'payload_too_large', message: 'x' } })).toMatch(/shorten/);
  });

  it.each(['PASSWORD_TOO_WEAK', 'INVALID_NAME'])(
    'when the server refuses with %s, then its reason is shown',
    (code) => {
      expect(
        describeAuthError({ status: 400, code, message: 'Password: That is one of the most used passwords.' }),
      ).toBe('Password: That is one of the most used passwords.');
    },
  );
});
