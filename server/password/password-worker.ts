// Runs in a worker thread (piscina): zxcvbn's word lists take tens of megabytes of heap and a check up to a tenth of
// a second of CPU, so they live in a thread that exists only while passwords are being chosen, never in the
// server's own heap nor on its event loop.
import { passwordProblem, type PasswordOwner } from '@/shared/password-strength';

export type PasswordTask = { password: string; owner: PasswordOwner };

/** Why the password is refused, in plain words, or null when it may be used (null crosses threads as itself). */
export default function checkPasswordTask({ password, owner }: PasswordTask): string | null {
  return passwordProblem(password, owner) ?? null;
}
