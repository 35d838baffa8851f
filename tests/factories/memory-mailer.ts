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
