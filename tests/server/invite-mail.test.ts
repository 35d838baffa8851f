// Invite e-mail that cannot become mass mail or hang a request: a bounded batch, no second mail to a
// waiting invite, an hourly cap per person, and a mail server that never answers costs one timeout.
import net from 'node:net';
import type { AddressInfo } from 'node:net';
import type { Agent } from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { startLocalSmtp, type LocalSmtp } from '@/server/mail/local-smtp';
import { createSmtpMailer, MAIL_TIMEOUT_MS, type Mailer } from '@/server/mail/mailer';
import { MAX_CLUB_INVITES_PER_REQUEST } from '@/shared/schemas/sharing';
import { createClub } from '../factories/club-factory';
import { createMemoryMailer } from '../factories/memory-mailer';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { createTrip } from '../factories/trip-factory';

let ctx: TestContext | undefined;
const cleanups: (() => Promise<void> | void)[] = [];
afterEach(async () => {
  ctx?.close();
  ctx = undefined;
  for (const cleanup of cleanups.splice(0)) await cleanup();
});

const addresses = (n: number, prefix = 'household') =>
  Array.from({ length: n }, (_, i) => `${prefix}${i + 1}@example.test`);

async function pendingClubInvites(agent: Agent, clubId: string) {
  return (await agent.get(`/api/clubs/${clubId}`).expect(200)).body.pendingInvites as {
    id: string;
    email: string;
    mailFailed: boolean;
  }[];
}

describe('club invites in bulk', () => {
  it(`when one request carries more than ${MAX_CLUB_INVITES_PER_REQUEST} addresses, then 400 names the field and the limit, and nothing is stored or mailed`, async () => {
    ctx = createTestApp();
    const organiser = await signUpAgent(ctx.app, 'Organiser');
    const clubId = await createClub(organiser.agent);
    const mailedBefore = ctx.mailer.sent.length;
    for (const body of [
      { addresses: addresses(MAX_CLUB_INVITES_PER_REQUEST + 1).join('\n') },
      {
        csv: `name,email\n${addresses(MAX_CLUB_INVITES_PER_REQUEST + 1, 'row')
          .map((a) => `Row,${a}`)
          .join('\n')}`,
      },
    ]) {
      const refused = await organiser.agent.post(`/api/clubs/${clubId}/invites`).send(body);
      expect(refused.status).toBe(400);
      expect(refused.body.error.code).toBe('validation_failed');
      const field = Object.keys(body)[0] ?? '';
      expect(refused.body.error.fields[field][0]).toMatch(/At most 200 addresses per request; this one has 201/);
    }
    expect(ctx.mailer.sent.length).toBe(mailedBefore);
    expect(await pendingClubInvites(organiser.agent, clubId)).toEqual([]);
    // Exactly the limit goes through.
    const full = await organiser.agent
      .post(`/api/clubs/${clubId}/invites`)
      .send({ addresses: addresses(MAX_CLUB_INVITES_PER_REQUEST).join('\n') });
    expect(full.status).toBe(201);
    expect(full.body.sent).toHaveLength(MAX_CLUB_INVITES_PER_REQUEST);
  });

  it('when addresses that already have a waiting invite are sent again, then only the new one is mailed and the others are reported by line', async () => {
    ctx = createTestApp();
    const organiser = await signUpAgent(ctx.app, 'Organiser');
    const clubId = await createClub(organiser.agent);
    await organiser.agent
      .post(`/api/clubs/${clubId}/invites`)
      .send({ addresses: 'ailsa@example.test\nbrodie@example.test' })
      .expect(201);
    const mailedBefore = ctx.mailer.sent.length;

    const again = await organiser.agent
      .post(`/api/clubs/${clubId}/invites`)
      .send({ addresses: `calum@example.test\nAilsa <ailsa@example.test>\n${organiser.email}\nbrodie@example.test` });
    expect(again.status).toBe(201);
    expect(again.body.sent).toEqual([{ email: 'calum@example.test', name: null }]);
    expect(again.body.skipped).toEqual([
      { line: 2, email: 'ailsa@example.test', why: 'pending', reason: expect.stringMatching(/not sent again/) },
      { line: 3, email: organiser.email.toLowerCase(), why: 'member', reason: 'Already in the club.' },
      { line: 4, email: 'brodie@example.test', why: 'pending', reason: expect.stringMatching(/not sent again/) },
    ]);
    expect(ctx.mailer.sent.slice(mailedBefore).map((m) => m.to)).toEqual(['calum@example.test']);
    expect((await pendingClubInvites(organiser.agent, clubId)).map((i) => i.email)).toEqual([
      'ailsa@example.test',
      'brodie@example.test',
      'calum@example.test',
    ]);
  });
});

describe('hourly cap on invites per person', () => {
  it('when trip and club invites together pass the hourly cap, then 429 says when to retry, nothing more is sent, and an hour later it works', async () => {
    let clock = new Date('2026-11-20T10:00:00Z');
    ctx = createTestApp({ invitesPerHour: 5, now: () => clock });
    const organiser = await signUpAgent(ctx.app, 'Organiser');
    const clubId = await createClub(organiser.agent);
    const { trip } = await createTrip(organiser.agent);
    const firstAt = clock;
    await organiser.agent
      .post(`/api/clubs/${clubId}/invites`)
      .send({ addresses: addresses(3, 'club').join(',') })
      .expect(201);
    clock = new Date(clock.getTime() + 10 * 60_000);
    await organiser.agent
      .post(`/api/trips/${trip.id}/invites`)
      .send({ email: 'trip1@example.test', role: 'viewer' })
      .expect(201);
    const mailedBefore = ctx.mailer.sent.length;

    // Four of five used: a request for two is refused whole, and says when the oldest frees room.
    const refused = await organiser.agent
      .post(`/api/clubs/${clubId}/invites`)
      .send({ addresses: addresses(2, 'late').join(',') });
    expect(refused.status).toBe(429);
    expect(refused.body).toEqual({
      error: { code: 'rate_limited', message: expect.stringMatching(/5 invites an hour and 1 is left; this needs 2/) },
      retryAt: new Date(firstAt.getTime() + 3_600_000).toISOString(),
      retryAfterSeconds: 50 * 60,
    });
    expect(refused.headers['retry-after']).toBe(String(50 * 60));
    expect(await pendingClubInvites(organiser.agent, clubId)).toHaveLength(3);

    await organiser.agent
      .post(`/api/trips/${trip.id}/invites`)
      .send({ email: 'trip2@example.test', role: 'viewer' })
      .expect(201);
    const tripRefused = await organiser.agent
      .post(`/api/trips/${trip.id}/invites`)
      .send({ email: 'trip3@example.test', role: 'viewer' });
    expect(tripRefused.status).toBe(429);
    expect(tripRefused.body.error.code).toBe('rate_limited');
    expect(ctx.mailer.sent.length).toBe(mailedBefore + 1);

    clock = new Date(firstAt.getTime() + 3_600_000 + 1_000);
    await organiser.agent
      .post(`/api/clubs/${clubId}/invites`)
      .send({ addresses: addresses(2, 'late').join(',') })
      .expect(201);
  });
});

/** A real TCP server on loopback that takes the connection and never says a word. */
async function silentMailServer(): Promise<string> {
  const sockets = new Set<net.Socket>();
  const server = net.createServer((socket) => {
    sockets.add(socket);
    socket.on('close', () => sockets.delete(socket));
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  cleanups.push(
    () =>
      new Promise<void>((resolve) => {
        for (const socket of sockets) socket.destroy();
        server.close(() => resolve());
      }),
  );
  return `smtp://127.0.0.1:${(server.address() as AddressInfo).port}`;
}

/** A mailer whose server can be swapped mid-test, as when a provider goes away or comes back. */
function swappableMailer() {
  let current: Mailer = createMemoryMailer();
  const mailer: Mailer = { send: (message) => current.send(message) };
  return { mailer, swap: (next: Mailer) => (current = next) };
}

async function workingSmtp(): Promise<LocalSmtp> {
  const smtp = await startLocalSmtp();
  cleanups.push(() => smtp.close());
  return smtp;
}

describe('a mail server that never answers', () => {
  it('when a trip invite is sent, then the request answers 502 mail_failed within the mail timeout, the invite stays as not sent, and Retry sends it', async () => {
    const { mailer, swap } = swappableMailer();
    ctx = createTestApp({ mailer });
    const owner = await signUpAgent(ctx.app, 'Owner');
    const { trip } = await createTrip(owner.agent);
    swap(createSmtpMailer(await silentMailServer()));

    const started = Date.now();
    const sent = await owner.agent
      .post(`/api/trips/${trip.id}/invites`)
      .send({ email: 'rowan@example.test', role: 'crew' });
    const elapsed = Date.now() - started;
    expect(sent.status).toBe(502);
    expect(sent.body.error).toEqual({
      code: 'mail_failed',
      message: expect.stringMatching(/did not answer in time.*saved.*press Retry/),
    });
    expect(sent.body.invite).toMatchObject({ email: 'rowan@example.test', mailFailed: true });
    // The shipped timeout, plus room for a busy test machine; nodemailer's own default would be 30 s or more.
    expect(elapsed).toBeLessThan(MAIL_TIMEOUT_MS + 2_000);
    const [waiting] = (await owner.agent.get(`/api/trips/${trip.id}/invites`).expect(200)).body.invites;
    expect(waiting).toMatchObject({ email: 'rowan@example.test', mailFailed: true, sentByMe: true });

    const smtp = await workingSmtp();
    swap(createSmtpMailer(smtp.url));
    await owner.agent.post(`/api/trips/${trip.id}/invites/${waiting.id}/resend`).expect(200);
    const [retried] = (await owner.agent.get(`/api/trips/${trip.id}/invites`).expect(200)).body.invites;
    expect(retried).toMatchObject({ id: waiting.id, mailFailed: false });
    const link = smtp.messages().find((m) => m.to.includes('rowan@example.test'))?.links[0] ?? '';
    const rowan = await signUpAgent(ctx.app, 'Rowan', 'rowan@example.test');
    await rowan.agent.post(`/api/invites/${link.split('/invites/')[1] ?? ''}/accept`).expect(200);
  });

  it('when a club batch is sent, then one timeout ends it with 502, every invite stays as not sent, and each can be retried', async () => {
    const timeoutMs = 1_500;
    const { mailer, swap } = swappableMailer();
    ctx = createTestApp({ mailer });
    const organiser = await signUpAgent(ctx.app, 'Organiser');
    const clubId = await createClub(organiser.agent);
    swap(createSmtpMailer(await silentMailServer(), { timeoutMs }));

    const started = Date.now();
    // Ten addresses go out four at a time: trying every batch would take three timeouts.
    const response = await organiser.agent
      .post(`/api/clubs/${clubId}/invites`)
      .send({ addresses: addresses(10).join('\n') });
    const elapsed = Date.now() - started;
    expect(response.status).toBe(502);
    expect(response.body.error.code).toBe('mail_failed');
    expect(response.body.report.sent).toEqual([]);
    expect(response.body.report.failed).toHaveLength(10);
    expect(elapsed).toBeLessThan(2 * timeoutMs);
    const waiting = await pendingClubInvites(organiser.agent, clubId);
    expect(waiting).toHaveLength(10);
    expect(waiting.every((invite) => invite.mailFailed)).toBe(true);

    const smtp = await workingSmtp();
    swap(createSmtpMailer(smtp.url));
    const first = waiting[0];
    if (!first) throw new Error('no invite');
    await organiser.agent.post(`/api/clubs/${clubId}/invites/${first.id}/resend`).expect(200);
    const after = await pendingClubInvites(organiser.agent, clubId);
    expect(after.find((invite) => invite.id === first.id)?.mailFailed).toBe(false);
    expect(after.filter((invite) => invite.mailFailed)).toHaveLength(9);
    await expect.poll(() => smtp.messages().flatMap((m) => m.to)).toEqual([first.email]);
  });
});
