import type { Agent } from 'supertest';
import { latestInviteToken } from './memory-mailer';
import { signUpAgent, type TestContext } from './test-app';

/** A club organised by the agent's user, made through the API. */
export async function createClub(agent: Agent, name = 'Test Club'): Promise<string> {
  const response = await agent.post('/api/clubs').send({ name });
  if (response.status !== 201) throw new Error(`createClub: ${response.status} ${response.text}`);
  return (response.body as { club: { id: string } }).club.id;
}

/** A new household invited by the organiser through the API, signed up and joined through the mailed link. */
export async function joinClubByInvite(ctx: TestContext, organiser: Agent, clubId: string, name = 'Household') {
  const email = `${name.toLowerCase().replace(/\W+/g, '-')}-${crypto.randomUUID()}@example.test`;
  const invited = await organiser.post(`/api/clubs/${clubId}/invites`).send({ addresses: email });
  if (invited.status !== 201) throw new Error(`club invite: ${invited.status} ${invited.text}`);
  const member = await signUpAgent(ctx.app, name, email);
  const token = latestInviteToken(ctx.mailer.sent, email, 'club-invites');
  const joined = await member.agent.post(`/api/club-invites/${token}/accept`);
  if (joined.status !== 200) throw new Error(`club join: ${joined.status} ${joined.text}`);
  return member;
}
