// Password strength is judged in one worker thread that starts on the first check and exits once checks stop, so
// zxcvbn's word lists occupy memory only while people sign up, reset or change a password.
import { Piscina } from 'piscina';
import type { PasswordOwner } from '@/shared/password-strength';
import { workerFile } from '../worker-file';
import type { PasswordTask } from './password-worker';

/** The pool could not check the password (queue full, too slow, the thread failed): the request may be retried. */
export class PasswordCheckUnavailableError extends Error {
  constructor(cause: unknown) {
    super('The password could not be checked just now.', { cause });
    this.name = 'PasswordCheckUnavailableError';
  }
}

export type PasswordCheckerOptions = {
  /** How long the thread outlives the last check; by default 10 s (starting it again takes a few hundred ms). */
  idleTimeoutMs?: number;
};

export type PasswordChecker = {
  /** Why the password is refused, or undefined when it may be used. */
  problem: (password: string, owner: PasswordOwner) => Promise<string | undefined>;
  /** Worker threads now running (0 once idle). */
  threadCount: () => number;
  close: () => Promise<void>;
};

const DEFAULT_IDLE_TIMEOUT_MS = 10_000;
/** A check takes at most about 0.1 s: this is only for a thread that is stuck or a machine that is swamped. */
const TIME_LIMIT_MS = 10_000;
/** Sign-ups and resets are rate-limited per network; this bounds what many networks at once may queue. */
const QUEUE_LIMIT = 32;

export function createPasswordChecker(options: PasswordCheckerOptions = {}): PasswordChecker {
  let pool: Piscina<PasswordTask, string | null> | undefined;
  const open = () =>
    (pool ??= new Piscina<PasswordTask, string | null>({
      filename: workerFile(__dirname, 'password-worker.cjs', 'password-worker.mjs'),
      minThreads: 0,
      maxThreads: 1,
      maxQueue: QUEUE_LIMIT,
      idleTimeout: options.idleTimeoutMs ?? DEFAULT_IDLE_TIMEOUT_MS,
      // The word lists and the estimator's tables take about 30 MB of heap.
      resourceLimits: { maxOldGenerationSizeMb: 64, maxYoungGenerationSizeMb: 8 },
    }));
  return {
    async problem(password, owner) {
      try {
        const problem = await open().run(
          { password, owner: { email: owner.email ?? null, name: owner.name ?? null } },
          { signal: AbortSignal.timeout(TIME_LIMIT_MS) },
        );
        return problem ?? undefined;
      } catch (error) {
        throw new PasswordCheckUnavailableError(error);
      }
    },
    threadCount: () => pool?.threads.length ?? 0,
    async close() {
      const open = pool;
      pool = undefined;
      await open?.destroy();
    },
  };
}

/** The server's checker (the auth routes' rules use it). */
export const passwordChecks = createPasswordChecker();
