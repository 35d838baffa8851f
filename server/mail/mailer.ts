import nodemailer from 'nodemailer';
import type { Transporter } from 'nodemailer';

export type MailMessage = { to: string; subject: string; text: string; html: string };

export type Mailer = { send(message: MailMessage): Promise<void> };

const FROM = 'Trailtally <no-reply@trailtally.local>';

/** A mailer over any nodemailer transport (SMTP in real use). */
export function createMailer(transport: Transporter): Mailer {
  return {
    async send(message) {
      await transport.sendMail({ from: FROM, ...message });
    },
  };
}

/** Keeps messages in memory; for tests and for running without any SMTP configured. */
export function createMemoryMailer(): Mailer & { sent: MailMessage[] } {
  const sent: MailMessage[] = [];
  return {
    sent,
    async send(message) {
      sent.push(message);
    },
  };
}

export function createSmtpMailer(smtpUrl: string): Mailer {
  return createMailer(nodemailer.createTransport(smtpUrl));
}
