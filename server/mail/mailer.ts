import nodemailer from 'nodemailer';
import type { Transporter } from 'nodemailer';

export type MailMessage = { to: string; subject: string; text: string; html: string };

export type Mailer = { send(message: MailMessage): Promise<void> };

const FROM = 'Trailtally <no-reply@trailtally.local>';

/**
 * How long one send may take, in total and for each step (connecting, the server's greeting, any
 * silence on the socket). A provider answers in well under a second; waiting longer only holds the
 * person who pressed "Send" (nodemailer's own defaults are 30 s to 10 min).
 */
export const MAIL_TIMEOUT_MS = 5000;

/**
 * A send that did not go through. `recipient`: the server refused this address (the next one may
 * work). `transport`: the server could not be reached, did not answer in time or refused the
 * session, so the next send would fail the same way.
 */
export class MailSendError extends Error {
  constructor(
    readonly kind: 'recipient' | 'transport',
    message: string,
  ) {
    super(message);
    this.name = 'MailSendError';
  }
}

function describeFailure(error: unknown): MailSendError {
  if (error instanceof MailSendError) return error;
  const code = (error as { code?: unknown } | null)?.code;
  // nodemailer marks a refused recipient with EENVELOPE; every other code is about the connection.
  if (code === 'EENVELOPE') return new MailSendError('recipient', 'The mail server refused this address.');
  if (code === 'ETIMEDOUT') return new MailSendError('transport', 'The mail server did not answer in time.');
  return new MailSendError('transport', 'The mail server could not be reached.');
}

/** A mailer over any nodemailer transport: a provider's SMTP, or the local fake. */
export function createMailer(transport: Transporter, timeoutMs = MAIL_TIMEOUT_MS): Mailer {
  return {
    async send(message) {
      const sending = transport.sendMail({ from: FROM, ...message });
      // The transport's own timeouts close the socket; this bounds the whole send even when a
      // server keeps trickling bytes, so a request waiting on it always answers.
      let timer: NodeJS.Timeout | undefined;
      const deadline = new Promise<never>((_resolve, reject) => {
        timer = setTimeout(
          () => reject(new MailSendError('transport', 'The mail server did not answer in time.')),
          timeoutMs,
        );
      });
      sending.catch(() => undefined);
      try {
        await Promise.race([sending, deadline]);
      } catch (error) {
        throw describeFailure(error);
      } finally {
        clearTimeout(timer);
      }
    },
  };
}

export function createSmtpMailer(smtpUrl: string, { timeoutMs = MAIL_TIMEOUT_MS } = {}): Mailer {
  const url = new URL(smtpUrl);
  const timeouts = { connectionTimeout: timeoutMs, greetingTimeout: timeoutMs, socketTimeout: timeoutMs };
  // The local fake speaks plain SMTP on loopback; a provider's URL carries its own TLS settings.
  const local = url.hostname === '127.0.0.1' || url.hostname === 'localhost';
  const transport = local
    ? nodemailer.createTransport({
        host: url.hostname,
        port: Number(url.port),
        secure: false,
        ignoreTLS: true,
        ...timeouts,
      })
    : nodemailer.createTransport({ url: smtpUrl, ...timeouts });
  return createMailer(transport, timeoutMs);
}
