// The password rule runs in a worker thread that exists only while passwords are being checked: zxcvbn's word lists
// never stay in the server's heap, and a check never holds its event loop.
import { afterEach, describe, expect, it } from 'vitest';
import { createPasswordChecker, type PasswordChecker } from '@/server/password/password-pool';
import { PASSWORD_MESSAGES } from '@/shared/password-strength';

let checker: PasswordChecker | undefined;
afterEach(async () => checker?.close());

describe('password checks in a worker thread', () => {
  it('when passwords are checked, then the worker judges them as the shared rule does', async () => {
    checker = createPasswordChecker();
    expect(await checker.problem('password', {})).toBe(PASSWORD_MESSAGES.common);
    expect(await checker.problem('ailsa2024', { email: 'ailsa@example.test', name: 'Ailsa' })).toBe(
      PASSWORD_MESSAGES.personal,
    );
    expect(await checker.problem('brand-new-moorland-walk', { email: 'ailsa@example.test' })).toBeUndefined();
  });

  it('when checks stop, then the worker thread exits and the next check starts a new one', async () => {
    checker = createPasswordChecker({ idleTimeoutMs: 100 });
    await checker.problem('password', {});
    expect(checker.threadCount()).toBe(1);
    await expect.poll(() => checker?.threadCount(), { timeout: 5_000 }).toBe(0);
    expect(await checker.problem('12345678', {})).toBe(PASSWORD_MESSAGES.common);
  });
});
