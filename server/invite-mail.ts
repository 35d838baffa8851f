// Sending invite e-mail: the hourly cap per person, sending a batch without hammering a dead mail
// server, and the answer a client gets when mail did not go out.
import type { Response } from 'express';
import type { DbExecutor } from '@/db/client';
import { listMailingTimesSince, recordMailings } from '@/db/queries/invites';
import { HttpError } from './errors';
import { MailSendError, type MailMessage, type Mailer } from './mail/mailer';

const HOUR_MS = 60 * 60 * 1000;

/** Mail goes out a few at a time: fast for a club of dozens, gentle on a provider's rate limits. */
const SEND_CONCURRENCY = 4;

/**
 * Counts `count` invite e-mails against the user's hourly cap, or refuses the whole request with
 * 429, the time the cap frees enough room (`retryAt`, and `Retry-After` in seconds). Call it inside
 * the transaction that writes the invites, so two requests at once cannot both slip under the cap.
 */
export function claimInviteMailings(
  db: DbExecutor,
  res: Response,
  { userId, count, at, perHour }: { userId: string; count: number; at: Date; perHour: number },
): void {
  const windowStart = new Date(at.getTime() - HOUR_MS);
  const recent = listMailingTimesSince(db, userId, windowStart);
  const left = Math.max(perHour - recent.length, 0);
  if (count > left) {
    // Room for `count` comes back when enough of the oldest mailings leave the window.
    const mustExpire = count - left;
    const freedBy = count > perHour ? undefined : recent[mustExpire - 1];
    const retryAt = new Date((freedBy ?? at).getTime() + HOUR_MS);
    const seconds = Math.max(Math.ceil((retryAt.getTime() - at.getTime()) / 1000), 1);
    res.setHeader('Retry-After', String(seconds));
    const room = left === 0 ? 'none is left' : `${left} ${left === 1 ? 'is' : 'are'} left`;
    throw new HttpError(
      429,
      'rate_limited',
      `You can send ${perHour} invites an hour and ${room}; this needs ${count}. Try again in ${Math.ceil(seconds / 60)} min.`,
      undefined,
      { retryAt: retryAt.toISOString(), retryAfterSeconds: seconds },
    );
  }
  recordMailings(db, userId, count, at, windowStart);
}

/** The answer when invite e-mail did not go out: 502 with what to do, plus whatever the screen needs. */
export function mailFailed(error: unknown, what: string, extra?: Record<string, unknown>): HttpError {
  const reason = error instanceof MailSendError ? error.message : 'The mail server could not be reached.';
  return new HttpError(
    502,
    'mail_failed',
    `${reason} ${what} It is listed as not sent; press Retry to send it again.`,
    undefined,
    extra,
  );
}

export type Delivery<T> = {
  sent: T[];
  failed: { item: T; reason: string }[];
  /** The mail server itself failed (unreachable, silent, refusing the session): nothing more was tried. */
  serverDown: boolean;
};

/**
 * Sends letters a few at a time. After a failure of the server itself the rest are not tried, so a
 * dead or silent server costs one timeout, not one per address; they are reported as not sent.
 */
export async function deliverAll<T>(
  mailer: Mailer,
  letters: { item: T; message: MailMessage }[],
): Promise<Delivery<T>> {
  const delivery: Delivery<T> = { sent: [], failed: [], serverDown: false };
  for (let i = 0; i < letters.length; i += SEND_CONCURRENCY) {
    const batch = letters.slice(i, i + SEND_CONCURRENCY);
    if (delivery.serverDown) {
      for (const { item } of batch)
        delivery.failed.push({ item, reason: 'Not sent: the mail server could not be reached.' });
      continue;
    }
    const results = await Promise.allSettled(batch.map(({ message }) => mailer.send(message)));
    results.forEach((result, j) => {
      const letter = batch[j];
      if (!letter) return;
      if (result.status === 'fulfilled') {
        delivery.sent.push(letter.item);
        return;
      }
      const error = result.reason instanceof MailSendError ? result.reason : undefined;
      if (error?.kind !== 'recipient') delivery.serverDown = true;
      delivery.failed.push({ item: letter.item, reason: error?.message ?? 'The mail server could not be reached.' });
    });
  }
  return delivery;
}
