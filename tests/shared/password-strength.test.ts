import { describe, expect, it } from 'vitest';
import { PASSWORD_MESSAGES, passwordProblem } from '@/shared/password-strength';

const owner = { email: 'ailsa.macleod@example.test', name: 'Ailsa MacLeod' };

describe('passwordProblem', () => {
  it.each([
    ['the e-mail address', 'ailsa.macleod@example.test', PASSWORD_MESSAGES.isEmail],
    ['the e-mail address with spaces and capitals', ' Ailsa.MacLeod@Example.test ', PASSWORD_MESSAGES.isEmail],
    ['12345678', '12345678', PASSWORD_MESSAGES.common],
    ['password', 'password', PASSWORD_MESSAGES.common],
    ['qwertyuiop', 'qwertyuiop', PASSWORD_MESSAGES.common],
    ['the surname and digits', 'macleod123', PASSWORD_MESSAGES.personal],
    ["the app's name", 'trailtally', PASSWORD_MESSAGES.personal],
  ])('when the password is %s, then it is refused with the reason in plain words', (_what, password, message) => {
    expect(passwordProblem(password, owner)).toBe(message);
  });

  it('when the password is a run of one character, then the refusal says why it is guessable', () => {
    expect(passwordProblem('aaaaaaaaaaaa', owner)).toMatch(/^That password would be easy to guess: Repeated/);
  });

  it.each(['correct-horse-battery', 'rally-field-2027', 'moorland walk at dawn', 'x7#kQ9!zLp'])(
    'when the password is %s, then it is accepted',
    (password) => {
      expect(passwordProblem(password, owner)).toBeUndefined();
    },
  );

  it('when the e-mail address is not known, then a strong address-like password is accepted', () => {
    expect(passwordProblem('traveller1@example.test')).toBeUndefined();
  });
});
