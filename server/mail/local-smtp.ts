import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { CapturedMail } from '@/shared/schemas/outbox';

export type { CapturedMail };

export type LocalSmtp = {
  url: string;
  port: number;
  messages: () => CapturedMail[];
  clear: () => void;
  close: () => Promise<void>;
};

const MAX_KEPT = 500;
const LINK = /https?:\/\/[^\s<>"')]+/g;

/**
 * A real SMTP server on loopback that keeps what it receives in memory. The app sends through
 * nodemailer exactly as it would to a provider, so the whole path is exercised in development
 * and tests without any mail leaving the machine.
 */
export async function startLocalSmtp(port = 0): Promise<LocalSmtp> {
  const kept: CapturedMail[] = [];
  let counter = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Trailtally local mail',
    size: 1024 * 1024,
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          counter += 1;
          const text = parsed.text ?? '';
          kept.unshift({
            id: String(counter),
            receivedAt: new Date().toISOString(),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
            subject: parsed.subject ?? '',
            text,
            html: typeof parsed.html === 'string' ? parsed.html : '',
            links: [...new Set(text.match(LINK) ?? [])],
          });
          kept.splice(MAX_KEPT);
          callback();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${address.port}`,
    port: address.port,
    messages: () => [...kept],
    clear: () => kept.splice(0),
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
