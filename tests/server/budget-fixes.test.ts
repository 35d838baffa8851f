// The flags' checked fixes come from their own route, computed in the budget workers and kept per trip revision.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FlagFixes, SimulationResult } from '@/shared/engine/result-types';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, LIGHTS } from '../factories/trip-factory';

type Agent = Awaited<ReturnType<typeof signUpAgent>>['agent'];

/** A DC heater left on all trip: more than the bank holds, so the budget has a shortfall flag. */
const HEATER = { ...LIGHTS, name: 'Fan heater', runningW: 400, schedule: { kind: 'always' as const } };

describe('GET /api/trips/:tripId/budget/fixes', () => {
  let ctx: TestContext;
  let agent: Agent;
  let tripId: string;

  beforeAll(async () => {
    ctx = createTestApp();
    ({ agent } = await signUpAgent(ctx.app));
    const { trip } = await createTrip(agent);
    tripId = trip.id;
    await addStop(agent, tripId);
    await addAppliance(agent, tripId, HEATER);
  }, 60_000);
  afterAll(() => ctx.close());

  it('when the budget has flags, then its body carries no fixes and the fixes route gives each flag its checked fixes', async () => {
    const budget = await agent.get(`/api/trips/${tripId}/budget`).expect(200);
    const { version, result } = budget.body as { version: number; result: SimulationResult };
    expect(result.flags.length).toBeGreaterThan(0);
    for (const flag of result.flags) expect(flag).not.toHaveProperty('fixes');

    const answer = await agent.get(`/api/trips/${tripId}/budget/fixes`).expect(200);
    const body = answer.body as { version: number; fixes: FlagFixes[] };
    expect(body.version).toBe(version);
    expect(body.fixes.map((f) => f.flagId)).toEqual(result.flags.map((f) => f.id));
    const shortfall = body.fixes.find(
      (f) => f.flagId.startsWith('energy-short') || f.flagId.startsWith('below-reserve'),
    );
    expect(shortfall?.fixes.length).toBeGreaterThan(0);
    for (const fix of shortfall?.fixes ?? []) expect(fix.check).toBeDefined();
  }, 60_000);

  it('when asked again with its ETag, then 304; when the trip changes, then a new ETag and new fixes', async () => {
    const first = await agent.get(`/api/trips/${tripId}/budget/fixes`).expect(200);
    const etag = String(first.headers.etag);
    expect(etag).toMatch(/^"fixes-.+"$/);
    await agent.get(`/api/trips/${tripId}/budget/fixes`).set('If-None-Match', etag).expect(304);
    await addAppliance(agent, tripId, { ...LIGHTS, name: 'Reading lamp' });
    const changed = await agent.get(`/api/trips/${tripId}/budget/fixes`).set('If-None-Match', etag);
    expect(changed.status).toBe(200);
    expect(changed.headers.etag).not.toBe(etag);
    expect((changed.body as { version: number }).version).toBeGreaterThan((first.body as { version: number }).version);
  }, 60_000);

  it('when a trip has no stops yet, then the fixes route says why and gives none', async () => {
    const { trip } = await createTrip(agent);
    const answer = await agent.get(`/api/trips/${trip.id}/budget/fixes`).expect(200);
    expect(answer.body).toMatchObject({ fixes: [], reason: expect.any(String) });
  });
});
