import crypto from 'node:crypto';

/**
 * The version stamped into each signed-in browser's cached session (better-auth's cookie cache), per user: bumped
 * whenever one of that user's sessions ends or their account changes, so every cached copy made before it is refused
 * and the next request checks the database, where the ended session is gone. The prefix is new in each process, so a
 * restart (which forgets the counts) refuses every older copy once rather than trusting them.
 */
export function createSessionEpochs() {
  const boot = crypto.randomBytes(6).toString('base64url');
  const epochs = new Map<string, number>();
  return {
    versionOf: (userId: string): string => `${boot}.${epochs.get(userId) ?? 0}`,
    bump(userId: string): void {
      epochs.set(userId, (epochs.get(userId) ?? 0) + 1);
    },
  };
}
