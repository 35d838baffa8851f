// Who reads a trip through a club, for how long, and what they see: sharing is the owner's call,
// the owner sees and withdraws every share, and removing someone takes away every way back in.
import type { Agent } from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { activity } from '@/db/schema/activity';
import { clubTrips } from '@/db/schema/clubs';
import { createClub, joinClubByInvite } from '../factories/club-factory';
import { latestInviteToken } from '../factories/memory-mailer';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, grant } from '../factories/trip-factory';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

async function ownerWithTrip(name = 'Owner') {
  const owner = await signUpAgent(ctx.app, name);
  const { trip } = await createTrip(owner.agent, { name: 'Trip D' });
  await addStop(owner.agent, trip.id);
  await addAppliance(owner.agent, trip.id);
  return { owner, tripId: trip.id };
}

/** What someone who may read the trip can do with it; every one of them must be closed to someone who may not. */
async function readStatuses(agent: Agent, tripId: string) {
  return {
    trip: (await agent.get(`/api/trips/${tripId}`)).status,
    budget: (await agent.get(`/api/trips/${tripId}/budget`)).status,
    members: (await agent.get(`/api/trips/${tripId}/members`)).status,
    duplicate: (await agent.post(`/api/trips/${tripId}/duplicate`)).status,
  };
}
const CLOSED = { trip: 404, budget: 404, members: 404, duplicate: 404 };
const OPEN = { trip: 200, budget: 200, members: 200, duplicate: 201 };

describe('sharing a trip to a club', () => {
  it('when the owner shares a trip to a club, then the trips list names that club on the trip for the owner and planners only', async () => {
    const { owner, tripId } = await ownerWithTrip();
    const planner = await signUpAgent(ctx.app, 'Planner');
    grant(ctx.db, tripId, planner.userId, 'planner');
    const crew = await signUpAgent(ctx.app, 'Crew');
    grant(ctx.db, tripId, crew.userId, 'crew');
    const listed = async (agent: Agent) =>
      (await agent.get('/api/trips').expect(200)).body.trips.find((t: { id: string }) => t.id === tripId);
    expect((await listed(owner.agent)).sharedWith).toEqual([]);

    const clubId = await createClub(owner.agent, 'Rally club');
    await owner.agent.post(`/api/clubs/${clubId}/trips`).send({ tripId }).expect(201);
    expect((await listed(owner.agent)).sharedWith).toEqual(['Rally club']);
    expect((await listed(planner.agent)).sharedWith).toEqual(['Rally club']);
    expect((await listed(crew.agent)).sharedWith).toBeUndefined();
  });

  it('when a planner shares the trip to a club they organise and is then removed, then the share was refused and neither they nor their club read the trip', async () => {
    const { owner, tripId } = await ownerWithTrip();
    const planner = await signUpAgent(ctx.app, 'Planner');
    grant(ctx.db, tripId, planner.userId, 'planner');
    const clubId = await createClub(planner.agent, 'Planner’s own club');
    const invitee = await joinClubByInvite(ctx, planner.agent, clubId, 'Invitee');

    const shared = await planner.agent.post(`/api/clubs/${clubId}/trips`).send({ tripId });
    expect(shared.status).toBe(403);
    expect(shared.body.error).toMatchObject({ code: 'forbidden', message: expect.stringMatching(/owner/) });

    await owner.agent.delete(`/api/trips/${tripId}/members/${planner.userId}`).expect(204);
    expect(await readStatuses(planner.agent, tripId)).toEqual(CLOSED);
    expect(await readStatuses(invitee.agent, tripId)).toEqual(CLOSED);
  });

  it('when a former owner who shared the trip is removed after handing it over, then their share ends and their club reads nothing', async () => {
    const { owner: founder, tripId } = await ownerWithTrip('Founder');
    const clubId = await createClub(founder.agent, 'Founder’s club');
    const household = await joinClubByInvite(ctx, founder.agent, clubId, 'Household');
    await founder.agent.post(`/api/clubs/${clubId}/trips`).send({ tripId }).expect(201);
    expect(await readStatuses(household.agent, tripId)).toEqual(OPEN);

    const heir = await signUpAgent(ctx.app, 'Heir');
    grant(ctx.db, tripId, heir.userId, 'planner');
    await founder.agent.post(`/api/trips/${tripId}/members/hand-over`).send({ userId: heir.userId }).expect(200);
    const listed = (await heir.agent.get(`/api/trips/${tripId}/shares`).expect(200)).body.shares;
    expect(listed).toEqual([
      expect.objectContaining({ clubId, clubName: 'Founder’s club', sharedByName: 'Founder', memberCount: 2 }),
    ]);

    await heir.agent.delete(`/api/trips/${tripId}/members/${founder.userId}`).expect(204);
    expect(await readStatuses(founder.agent, tripId)).toEqual(CLOSED);
    expect(await readStatuses(household.agent, tripId)).toEqual(CLOSED);
    expect((await heir.agent.get(`/api/trips/${tripId}/shares`).expect(200)).body.shares).toEqual([]);
  });

  it('when the trip is shared by someone else, then the owner sees that club on the trip and withdraws the share', async () => {
    const { owner, tripId } = await ownerWithTrip();
    const planner = await signUpAgent(ctx.app, 'Planner');
    grant(ctx.db, tripId, planner.userId, 'planner');
    const crew = await signUpAgent(ctx.app, 'Crew');
    grant(ctx.db, tripId, crew.userId, 'crew');
    const clubId = await createClub(planner.agent, 'Rally club');
    const household = await joinClubByInvite(ctx, planner.agent, clubId, 'Household');
    // A share a planner made while planners could still share: it stays until someone ends it.
    ctx.db.insert(clubTrips).values({ clubId, tripId, sharedBy: planner.userId, sharedAt: new Date() }).run();
    expect(await readStatuses(household.agent, tripId)).toEqual(OPEN);

    const shares = (await owner.agent.get(`/api/trips/${tripId}/shares`).expect(200)).body.shares;
    expect(shares).toEqual([
      { clubId, clubName: 'Rally club', sharedByName: 'Planner', sharedAt: expect.any(String), memberCount: 2 },
    ]);
    await planner.agent.get(`/api/trips/${tripId}/shares`).expect(200);
    expect((await crew.agent.get(`/api/trips/${tripId}/shares`)).status).toBe(403);
    expect((await household.agent.get(`/api/trips/${tripId}/shares`)).status).toBe(403);
    expect((await planner.agent.delete(`/api/trips/${tripId}/shares/${clubId}`)).status).toBe(403);

    await owner.agent.delete(`/api/trips/${tripId}/shares/${clubId}`).expect(204);
    expect(await readStatuses(household.agent, tripId)).toEqual(CLOSED);
    expect((await owner.agent.get(`/api/trips/${tripId}/shares`)).body.shares).toEqual([]);
    const again = await owner.agent.delete(`/api/trips/${tripId}/shares/${clubId}`);
    expect(again.status).toBe(404);
    expect(again.body.error.code).toBe('not_found');
  });
});

describe('removing a member', () => {
  it('when a removed member opens an older invite still waiting for their address, then it is refused and grants nothing', async () => {
    const { owner, tripId } = await ownerWithTrip();
    const email = `returning-${crypto.randomUUID()}@example.test`;
    await owner.agent.post(`/api/trips/${tripId}/invites`).send({ email, role: 'crew' }).expect(201);
    const olderCrewLink = latestInviteToken(ctx.mailer.sent, email);
    await owner.agent.post(`/api/trips/${tripId}/invites`).send({ email, role: 'viewer' }).expect(201);
    const viewerLink = latestInviteToken(ctx.mailer.sent, email);
    const member = await signUpAgent(ctx.app, 'Returning', email);
    await member.agent.post(`/api/invites/${viewerLink}/accept`).expect(200);

    await owner.agent.delete(`/api/trips/${tripId}/members/${member.userId}`).expect(204);
    const refused = await member.agent.post(`/api/invites/${olderCrewLink}/accept`);
    expect(refused.status).toBe(410);
    expect(refused.body.error.code).toBe('invite_revoked');
    expect(await readStatuses(member.agent, tripId)).toEqual(CLOSED);
    const waiting = (await owner.agent.get(`/api/trips/${tripId}/invites`).expect(200)).body.invites;
    expect(waiting.map((invite: { email: string }) => invite.email)).not.toContain(email);
  });
});

describe('what a reader through a club sees', () => {
  it('when a club member reads a shared trip, then members come with names and no addresses, and the feed has no invite or share lines', async () => {
    const { owner, tripId } = await ownerWithTrip('Isla Owner');
    const viewer = await signUpAgent(ctx.app, 'Trip Viewer');
    grant(ctx.db, tripId, viewer.userId, 'viewer');
    await owner.agent
      .post(`/api/trips/${tripId}/invites`)
      .send({ email: 'guest@example.test', role: 'crew' })
      .expect(201);
    // A line written before lines had an audience still names an address.
    ctx.db
      .insert(activity)
      .values({ tripId, userId: null, at: new Date(), summary: 'invited old@example.test as viewer' })
      .run();
    const clubId = await createClub(owner.agent, 'Glen club');
    await owner.agent.post(`/api/clubs/${clubId}/trips`).send({ tripId }).expect(201);
    const reader = await joinClubByInvite(ctx, owner.agent, clubId, 'Club Reader');

    const members = (await reader.agent.get(`/api/trips/${tripId}/members`).expect(200)).body.members;
    expect(members.map((m: { name: string }) => m.name).sort()).toEqual(['Isla Owner', 'Trip Viewer']);
    for (const member of members) expect(Object.keys(member).sort()).toEqual(['name', 'role', 'userId']);
    const feed = (await reader.agent.get(`/api/trips/${tripId}/activity`).expect(200)).body.entries;
    expect(feed.map((e: { summary: string }) => e.summary)).toContain('created the trip "Trip D"');
    expect(JSON.stringify(feed)).not.toMatch(/@|invite|shared/);
    expect(JSON.stringify(await reader.agent.get(`/api/trips/${tripId}`).then((r) => r.body))).not.toContain('@');

    // The trip's own members still see addresses and the whole feed.
    const forViewer = (await viewer.agent.get(`/api/trips/${tripId}/members`).expect(200)).body.members;
    expect(forViewer.every((m: { email?: string }) => m.email?.includes('@'))).toBe(true);
    const ownerFeed = (await owner.agent.get(`/api/trips/${tripId}/activity`).expect(200)).body.entries;
    expect(ownerFeed.map((e: { summary: string }) => e.summary)).toEqual(
      expect.arrayContaining(['invited guest@example.test as crew', 'shared the trip with the club "Glen club"']),
    );
  });
});
