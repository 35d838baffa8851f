import { useEffect } from 'react';
import type { PasswordOwner } from '@/shared/password-strength';

// The password rule carries megabytes of word lists: it is loaded with import(), so it lands in its own chunk
// and never in the web app's entry bundle. The server applies the same rule, so a chunk that fails to load
// only moves the refusal from the form to the server's answer.
const loadRule = () => import('@/shared/password-strength');

/** Starts loading the rule while the person types, so the check on submit does not wait for it. */
export function usePasswordRulePreload(): void {
  useEffect(() => {
    loadRule().catch(() => undefined);
  }, []);
}

/** Why the password would be refused, in plain words; undefined when it is fine or the rule could not load. */
export async function passwordProblemOf(password: string, owner: PasswordOwner): Promise<string | undefined> {
  try {
    const { passwordProblem } = await loadRule();
    return passwordProblem(password, owner);
  } catch {
    return undefined;
  }
}
