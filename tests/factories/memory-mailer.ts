import type { MailMessage, Mailer } from '@/server/mail/mailer';

/** Keeps messages in memory, for tests that do not exercise SMTP itself. */
export function createMemoryMailer(): Mailer & { sent: MailMessage[] } {
  const sent: MailMessage[] = [];
  return {
    sent,
    async send(message) {
      sent.push(message);
    },
  };
}

/** The token in the newest invite link mailed to `to`, read from the text as a person would follow it. */
export function latestInviteToken(
  sent: MailMessage[],
  to: string,
  path: 'invites' | 'club-invites' = 'invites',
): string {
  const pattern = new RegExp(`/${path}/([A-Za-z0-9_-]+)`);
  for (const message of [...sent].reverse()) {
    const token = message.to === to ? pattern.exec(message.text)?.[1] : undefined;
    if (token) return token;
  }
  throw new Error(`no ${path} link mailed to ${to}`);
}
