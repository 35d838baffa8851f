import nodemailer from 'nodemailer';
import type { Transporter } from 'nodemailer';

export type MailMessage = { to: string; subject: string; text: string; html: string };

export type Mailer = { send(message: MailMessage): Promise<void> };

const FROM = 'Trailtally <no-reply@trailtally.local>';

/** A mailer over any nodemailer transport: a provider's SMTP, or the local fake. */
export function createMailer(transport: Transporter): Mailer {
  return {
    async send(message) {
      await transport.sendMail({ from: FROM, ...message });
    },
  };
}

export function createSmtpMailer(smtpUrl: string): Mailer {
  const url = new URL(smtpUrl);
  // The local fake speaks plain SMTP on loopback; a provider's URL carries its own TLS settings.
  const local = url.hostname === '127.0.0.1' || url.hostname === 'localhost';
  const transport = local
    ? nodemailer.createTransport({ host: url.hostname, port: Number(url.port), secure: false, ignoreTLS: true })
    : nodemailer.createTransport(smtpUrl);
  return createMailer(transport);
}
