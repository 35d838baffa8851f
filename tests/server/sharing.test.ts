import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { startLocalSmtp, type LocalSmtp } from '@/server/mail/local-smtp';
import { createSmtpMailer } from '@/server/mail/mailer';
import type { TripDetail } from '@/shared/schemas/api';
import { createTestApp, signUpAgent, TEST_ORIGIN, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, getDetail, grant, stopOnNextFreeDay } from '../factories/trip-factory';

const ORIGIN = 'http://localhost:8080';
let ctx: TestContext;
let smtp: LocalSmtp;
let clock: Date;

beforeEach(async () => {
  smtp = await startLocalSmtp();
  clock = new Date('2026-11-20T10:00:00Z');
  ctx = createTestApp({ mailer: createSmtpMailer(smtp.url), now: () => clock });
});
afterEach(async () => {
  ctx.close();
  await smtp.close();
});

/** The invite token from the newest captured message to `to`, read as a person would: from its link. */
function tokenFromMail(to: string, path: 'invites' | 'club-invites' = 'invites'): string {
  const message = smtp.messages().find((m) => m.to.includes(to) && m.links.some((url) => url.includes(`/${path}/`)));
  if (!message) throw new Error(`no invite mail to ${to}`);
  const link = message.links.find((url) => url.includes(`/${path}/`));
  if (!link) throw new Error('no invite link');
  expect(link.startsWith(`${ORIGIN}/${path}/`)).toBe(true);
  return link.split(`/${path}/`)[1] ?? '';
}

async function ownerWithTrip() {
  const owner = await signUpAgent(ctx.app, 'Isla Owner');
  const detail = await createTrip(owner.agent, { name: 'Loch weekend' });
  await addStop(owner.agent, detail.trip.id);
  await addAppliance(owner.agent, detail.trip.id);
  return { owner, tripId: detail.trip.id };
}

describe('trip invites over real SMTP on loopback', () => {
  it('when an owner invites by e-mail, then the message arrives with a link that lets the invitee sign up and join with the role', async () => {
    const { owner, tripId } = await ownerWithTrip();
    const sent = await owner.agent
      .post(`/api/trips/${tripId}/invites`)
      .send({ email: 'Rowan@Example.test', role: 'crew', message: 'Bring the kettle' });
    expect(sent.status).toBe(201);

    const message = smtp.messages()[0];
    expect(message?.to).toEqual(['rowan@example.test']);
    expect(message?.subject).toContain('Loch weekend');
    expect(message?.text).toContain('Bring the kettle');
    expect(message?.html).toContain('Trailtally');
    expect(message?.html).not.toMatch(/<img/i);
    const token = tokenFromMail('rowan@example.test');

    const preview = await request(ctx.app).get(`/api/invites/${token}`).expect(200);
    expect(preview.body.invite).toMatchObject({
      name: 'Loch weekend',
      role: 'crew',
      status: 'valid',
      email: 'rowan@example.test',
    });

    const rowan = await signUpAgent(ctx.app, 'Rowan', 'rowan@example.test');
    const joined = await rowan.agent.post(`/api/invites/${token}/accept`);
    expect(joined.status).toBe(200);
    expect(joined.body).toEqual({ tripId, role: 'crew' });
    const detail = await getDetail(rowan.agent, tripId);
    expect(detail.trip.role).toBe('crew');
    const members = (await owner.agent.get(`/api/trips/${tripId}/members`)).body.members;
    expect(members.map((m: { email: string; role: string }) => [m.email, m.role])).toContainEqual([
      'rowan@example.test',
      'crew',
    ]);
  });

  it('when the owner lists, resends and revokes, then only the newest link works until it is revoked', async () => {
    const { owner, tripId } = await ownerWithTrip();
    await owner.agent
      .post(`/api/trips/${tripId}/invites`)
      .send({ email: 'skye@example.test', role: 'viewer' })
      .expect(201);
    const firstToken = tokenFromMail('skye@example.test');
    const pending = (await owner.agent.get(`/api/trips/${tripId}/invites`).expect(200)).body.invites;
    expect(pending).toHaveLength(1);
    await owner.agent.post(`/api/trips/${tripId}/invites/${pending[0].id}/resend`).expect(200);
    const secondToken = tokenFromMail('skye@example.test');
    expect(secondToken).not.toBe(firstToken);
    const skye = await signUpAgent(ctx.app, 'Skye', 'skye@example.test');
    expect((await skye.agent.post(`/api/invites/${firstToken}/accept`)).status).toBe(404);
    await owner.agent.delete(`/api/trips/${tripId}/invites/${pending[0].id}`).expect(204);
    const refused = await skye.agent.post(`/api/invites/${secondToken}/accept`);
    expect(refused.status).toBe(410);
    expect(refused.body.error.code).toBe('invite_revoked');
    await skye.agent.get(`/api/trips/${tripId}`).expect(404);
  });
});

describe('token misuse is refused and grants nothing', () => {
  async function invited(email: string) {
    const setup = await ownerWithTrip();
    await setup.owner.agent.post(`/api/trips/${setup.tripId}/invites`).send({ email, role: 'crew' }).expect(201);
    return { ...setup, token: tokenFromMail(email) };
  }

  it('when the link has expired, then 410 invite_expired', async () => {
    const { tripId, token } = await invited('late@example.test');
    clock = new Date(clock.getTime() + 7 * 24 * 3_600_000 + 1_000);
    const late = await signUpAgent(ctx.app, 'Late', 'late@example.test');
    const response = await late.agent.post(`/api/invites/${token}/accept`);
    expect(response.status).toBe(410);
    expect(response.body.error.code).toBe('invite_expired');
    await late.agent.get(`/api/trips/${tripId}`).expect(404);
  });

  it('when the link is used twice, then the second use is 410 invite_used', async () => {
    const { token } = await invited('twice@example.test');
    const invitee = await signUpAgent(ctx.app, 'Twice', 'twice@example.test');
    await invitee.agent.post(`/api/invites/${token}/accept`).expect(200);
    const again = await invitee.agent.post(`/api/invites/${token}/accept`);
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('invite_used');
  });

  it('when the token is tampered with, then 404 invite_invalid', async () => {
    const { tripId, token } = await invited('tamper@example.test');
    const tampered = `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`;
    const invitee = await signUpAgent(ctx.app, 'Tamper', 'tamper@example.test');
    for (const bad of [tampered, 'short', `${token}x`.repeat(3)]) {
      const response = await invitee.agent.post(`/api/invites/${bad}/accept`);
      expect(response.status).toBe(404);
      expect(response.body.error.code).toBe('invite_invalid');
    }
    await invitee.agent.get(`/api/trips/${tripId}`).expect(404);
  });

  it('when someone signed in with another e-mail uses the link, then 403 and the invite still works for its address', async () => {
    const { tripId, token } = await invited('right@example.test');
    const other = await signUpAgent(ctx.app, 'Other', 'other@example.test');
    const refused = await other.agent.post(`/api/invites/${token}/accept`);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('invite_wrong_account');
    expect(refused.body.error.message).toContain('r•••@example.test');
    await other.agent.get(`/api/trips/${tripId}`).expect(404);
    const right = await signUpAgent(ctx.app, 'Right', 'right@example.test');
    await right.agent.post(`/api/invites/${token}/accept`).expect(200);
  });

  it('when nobody is signed in, then accepting is 401', async () => {
    const { token } = await invited('anon@example.test');
    expect((await request(ctx.app).post(`/api/invites/${token}/accept`).set('Origin', TEST_ORIGIN)).status).toBe(401);
  });
});

describe('escalation attempts', () => {
  it.each([
    ['crew inviting anyone', 'crew', { email: 'x@example.test', role: 'viewer' }, 403],
    ['a viewer inviting', 'viewer', { email: 'x@example.test', role: 'viewer' }, 403],
    ['a planner inviting an owner', 'planner', { email: 'x@example.test', role: 'owner' }, 400],
    ['a planner inviting a planner', 'planner', { email: 'x@example.test', role: 'planner' }, 403],
    ['a planner inviting crew', 'planner', { email: 'x@example.test', role: 'crew' }, 201],
  ] as const)('when %s (as %s), then the answer is the one the rules say', async (_label, role, body, status) => {
    const { tripId } = await ownerWithTrip();
    const member = await signUpAgent(ctx.app, 'Member');
    grant(ctx.db, tripId, member.userId, role);
    expect((await member.agent.post(`/api/trips/${tripId}/invites`).send(body)).status).toBe(status);
  });

  it('when a viewer tries to change roles or hand over the trip, then 403', async () => {
    const { owner, tripId } = await ownerWithTrip();
    const viewer = await signUpAgent(ctx.app, 'Viewer');
    grant(ctx.db, tripId, viewer.userId, 'viewer');
    expect(
      (await viewer.agent.patch(`/api/trips/${tripId}/members/${viewer.userId}`).send({ role: 'planner' })).status,
    ).toBe(403);
    expect(
      (await viewer.agent.post(`/api/trips/${tripId}/members/hand-over`).send({ userId: viewer.userId })).status,
    ).toBe(403);
    expect(
      (await owner.agent.get(`/api/trips/${tripId}/members`)).body.members.find(
        (m: { userId: string }) => m.userId === viewer.userId,
      ).role,
    ).toBe('viewer');
  });

  it('when a member is removed, then they can no longer read the trip', async () => {
    const { owner, tripId } = await ownerWithTrip();
    const crew = await signUpAgent(ctx.app, 'Crew');
    grant(ctx.db, tripId, crew.userId, 'crew');
    await crew.agent.get(`/api/trips/${tripId}`).expect(200);
    await owner.agent.delete(`/api/trips/${tripId}/members/${crew.userId}`).expect(204);
    expect((await crew.agent.get(`/api/trips/${tripId}`)).status).toBe(404);
    expect((await crew.agent.get(`/api/trips/${tripId}/budget`)).status).toBe(404);
  });

  it('when the owner hands the trip over, then the other member owns it and the old owner is a planner', async () => {
    const { owner, tripId } = await ownerWithTrip();
    const heir = await signUpAgent(ctx.app, 'Heir');
    grant(ctx.db, tripId, heir.userId, 'planner');
    await owner.agent.post(`/api/trips/${tripId}/members/hand-over`).send({ userId: heir.userId }).expect(200);
    expect((await getDetail(heir.agent, tripId)).trip.role).toBe('owner');
    expect((await getDetail(owner.agent, tripId)).trip.role).toBe('planner');
    expect((await owner.agent.delete(`/api/trips/${tripId}`)).status).toBe(403);
  });
});

describe('clubs', () => {
  it('when an organiser pastes 30 addresses with 3 bad ones, then 27 messages arrive and the report names the 3', async () => {
    const organiser = await signUpAgent(ctx.app, 'Organiser');
    const club = (await organiser.agent.post('/api/clubs').send({ name: 'Glen Touring Club' }).expect(201)).body.club;
    const good = Array.from({ length: 27 }, (_, i) => `household${i + 1}@example.test`);
    const bad = ['not-an-address', 'someone@', '@example.test'];
    // Count only the invites: forget the organiser's own sign-up confirmation.
    await expect.poll(() => smtp.messages().length).toBe(1);
    smtp.clear();
    const pasted = [good.slice(0, 10).join(', '), `Morag Household <${good[10]}>`, ...good.slice(11), ...bad].join(
      '\n',
    );
    const report = await organiser.agent.post(`/api/clubs/${club.id}/invites`).send({ addresses: pasted });
    expect(report.status).toBe(201);
    expect(report.body.sent).toHaveLength(27);
    expect(report.body.rejected.map((r: { value: string }) => r.value).sort()).toEqual([...bad].sort());
    await expect.poll(() => smtp.messages().length).toBe(27);
    expect(
      smtp
        .messages()
        .flatMap((m) => m.to)
        .sort(),
    ).toEqual([...good].sort());
    expect(report.body.sent.find((s: { email: string }) => s.email === good[10]).name).toBe('Morag Household');
  });

  it('when a CSV of names and e-mails is uploaded, then good rows are invited and bad rows reported by line', async () => {
    const organiser = await signUpAgent(ctx.app, 'Organiser');
    const club = (await organiser.agent.post('/api/clubs').send({ name: 'Coast Club' }).expect(201)).body.club;
    const csv = 'Name,Email\nAilsa Ross,ailsa@example.test\n"Bain, Fergus",fergus@example.test\nNo Address,nowhere\n';
    const report = (await organiser.agent.post(`/api/clubs/${club.id}/invites`).send({ csv }).expect(201)).body;
    expect(report.sent.map((s: { name: string }) => s.name)).toEqual(['Ailsa Ross', 'Bain, Fergus']);
    expect(report.rejected).toEqual([{ line: 4, value: 'nowhere', reason: 'Not an e-mail address.' }]);
  });

  it('when a member copies a club trip onto their rig, then its budget runs on that rig, the organiser sees the count, and the copy hears of route changes', async () => {
    const organiser = await signUpAgent(ctx.app, 'Organiser');
    const detail = await createTrip(organiser.agent, { name: 'Club rally' });
    const tripId = detail.trip.id;
    await addStop(organiser.agent, tripId);
    await addAppliance(organiser.agent, tripId);
    const club = (await organiser.agent.post('/api/clubs').send({ name: 'Rally Club' })).body.club;
    await organiser.agent.post(`/api/clubs/${club.id}/trips`).send({ tripId }).expect(201);
    await organiser.agent.post(`/api/clubs/${club.id}/invites`).send({ addresses: 'eilidh@example.test' }).expect(201);
    const token = tokenFromMail('eilidh@example.test', 'club-invites');

    const member = await signUpAgent(ctx.app, 'Eilidh', 'eilidh@example.test');
    await member.agent.get(`/api/trips/${tripId}`).expect(404);
    await member.agent.post(`/api/club-invites/${token}/accept`).expect(200);
    const shared = await getDetail(member.agent, tripId);
    expect(shared.trip.role).toBe('viewer');
    expect((await member.agent.post(`/api/trips/${tripId}/stops`).send({ stop: stopOnNextFreeDay() })).status).toBe(
      403,
    );

    const myRig = {
      ...shared.rig.rig,
      name: 'Eilidh’s van',
      battery: { ...shared.rig.rig.battery, chemistry: 'agm', capacityAh: 110, nominalV: 12 },
    };
    const saved = (await member.agent.post('/api/rigs').send({ rig: myRig }).expect(201)).body;
    const copy = (await member.agent.post(`/api/trips/${tripId}/copy`).send({ rigId: saved.id }).expect(201))
      .body as TripDetail;
    expect(copy.trip.role).toBe('owner');
    expect(copy.rig.rig.name).toBe('Eilidh’s van');
    expect(copy.stops.map((s) => s.stop.name)).toEqual(shared.stops.map((s) => s.stop.name));
    expect(copy.basedOn).toEqual({ tripId, name: 'Club rally', routeChanged: false });

    const budget = (await member.agent.get(`/api/trips/${copy.trip.id}/budget`).expect(200)).body;
    expect(budget.result.headline.capacityWh).toBeCloseTo(110 * 12, 6);
    const original = (await organiser.agent.get(`/api/trips/${tripId}/budget`).expect(200)).body;
    expect(original.result.headline.capacityWh).not.toBeCloseTo(110 * 12, 6);

    const clubView = (await organiser.agent.get(`/api/clubs/${club.id}`).expect(200)).body;
    expect(clubView.trips[0].copies).toBe(1);
    expect(JSON.stringify(clubView)).not.toContain(copy.trip.id);

    await addStop(organiser.agent, tripId);
    expect((await getDetail(member.agent, copy.trip.id)).basedOn?.routeChanged).toBe(true);
    await member.agent.post(`/api/trips/${copy.trip.id}/based-on/seen`).expect(200);
    expect((await getDetail(member.agent, copy.trip.id)).basedOn?.routeChanged).toBe(false);
  });

  it('when someone outside the club asks for it, then 404; a member cannot invite or share', async () => {
    const organiser = await signUpAgent(ctx.app, 'Organiser');
    const club = (await organiser.agent.post('/api/clubs').send({ name: 'Private Club' })).body.club;
    const outsider = await signUpAgent(ctx.app, 'Outsider');
    expect((await outsider.agent.get(`/api/clubs/${club.id}`)).status).toBe(404);
    await organiser.agent.post(`/api/clubs/${club.id}/invites`).send({ addresses: 'fiona@example.test' }).expect(201);
    const fiona = await signUpAgent(ctx.app, 'Fiona', 'fiona@example.test');
    await fiona.agent
      .post(`/api/club-invites/${tokenFromMail('fiona@example.test', 'club-invites')}/accept`)
      .expect(200);
    expect((await fiona.agent.post(`/api/clubs/${club.id}/invites`).send({ addresses: 'y@example.test' })).status).toBe(
      403,
    );
  });
});

describe('account e-mails', () => {
  it('when someone signs up, then a confirmation e-mail with a working link arrives', async () => {
    const { email } = await signUpAgent(ctx.app, 'Verifier');
    await expect.poll(() => smtp.messages().some((m) => m.to.includes(email))).toBe(true);
    const message = smtp.messages().find((m) => m.to.includes(email));
    expect(message?.subject).toMatch(/Confirm your e-mail/);
    const link = message?.links.find((url) => url.includes('/api/auth/verify-email'));
    expect(link).toBeTruthy();
    const path = new URL(link ?? '').pathname + new URL(link ?? '').search;
    const verified = await request(ctx.app).get(path);
    expect(verified.status).toBeLessThan(400);
  });

  it('when a password reset is asked for, then the e-mail carries a link with a token that sets a new password', async () => {
    const { email } = await signUpAgent(ctx.app, 'Forgetful');
    await request(ctx.app)
      .post('/api/auth/request-password-reset')
      .set('Origin', ORIGIN)
      .send({ email, redirectTo: `${ORIGIN}/reset-password` })
      .expect(200);
    await expect.poll(() => smtp.messages().some((m) => m.subject.includes('Reset'))).toBe(true);
    const link = smtp.messages().find((m) => m.subject.includes('Reset'))?.links[0] ?? '';
    const token = /reset-password\/([^?]+)/.exec(link)?.[1];
    expect(token).toBeTruthy();
    await request(ctx.app)
      .post('/api/auth/reset-password')
      .set('Origin', ORIGIN)
      .send({ token, newPassword: 'brand-new-password' })
      .expect(200);
    await request(ctx.app)
      .post('/api/auth/sign-in/email')
      .set('Origin', ORIGIN)
      .send({ email, password: 'brand-new-password' })
      .expect(200);
  });
});
