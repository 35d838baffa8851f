import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { ApplianceRecord } from '@/shared/schemas/api';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import {
  addAppliance,
  addStop,
  createTrip,
  getDetail,
  grant,
  LIGHTS,
  stopOnNextFreeDay,
} from '../factories/trip-factory';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

describe('conflict-safe edits', () => {
  it('when two sessions update the same appliance from one version, then one wins, one gets 409 with the stored record, and one change is logged', async () => {
    const parent = await signUpAgent(ctx.app, 'Parent');
    const child = await signUpAgent(ctx.app, 'Child');
    const { trip } = await createTrip(parent.agent);
    grant(ctx.db, trip.id, child.userId, 'crew');
    const created = await addAppliance(parent.agent, trip.id);
    const path = `/api/trips/${trip.id}/appliances/${created.id}`;
    const before = (await parent.agent.get(`/api/trips/${trip.id}/activity`)).body.entries.length;

    const laptop = {
      version: created.version,
      appliance: { ...LIGHTS, name: 'Lights (parent)', runningW: 12 },
      caretakerUserId: null,
    };
    const phone = {
      version: created.version,
      appliance: { ...LIGHTS, name: 'Lights (child)', runningW: 30 },
      caretakerUserId: null,
    };
    const [first, second] = await Promise.all([
      parent.agent.patch(path).send(laptop),
      child.agent.patch(path).send(phone),
    ]);

    const statuses = [first.status, second.status].sort();
    expect(statuses).toEqual([200, 409]);
    const winner = first.status === 200 ? first : second;
    const loser = first.status === 409 ? first : second;
    expect(loser.body.error.code).toBe('conflict');
    expect((loser.body.current as ApplianceRecord).appliance.name).toBe(winner.body.appliance.name);

    const stored = (await getDetail(parent.agent, trip.id)).appliances[0];
    expect(stored?.appliance.name).toBe(winner.body.appliance.name);
    expect(stored?.version).toBe(created.version + 1);
    const after = (await parent.agent.get(`/api/trips/${trip.id}/activity`)).body.entries;
    expect(after.length - before).toBe(1);
    expect(after[0].summary).toContain(winner.body.appliance.name);
  });

  it('when a stale trip version is sent, then 409 carries the current trip and nothing changes', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    await agent.patch(`/api/trips/${trip.id}`).send({ version: trip.version, name: 'First rename' }).expect(200);
    const stale = await agent.patch(`/api/trips/${trip.id}`).send({ version: trip.version, name: 'Second rename' });
    expect(stale.status).toBe(409);
    expect(stale.body.current.name).toBe('First rename');
    expect((await getDetail(agent, trip.id)).trip.name).toBe('First rename');
  });
});

describe('semantic checks answer 422 with the field', () => {
  it.each([
    [
      'departure before arrival',
      { arriveAt: '2027-06-10T14:00+01:00', departAt: '2027-06-10T09:00+01:00' },
      'stop.departAt',
    ],
    [
      'a stop before the trip starts',
      { arriveAt: '2027-05-20T14:00+01:00', departAt: '2027-05-21T10:00+01:00' },
      'stop.arriveAt',
    ],
    [
      'a stop after the trip ends',
      { arriveAt: '2027-07-31T14:00+01:00', departAt: '2027-08-02T10:00+01:00' },
      'stop.departAt',
    ],
  ])('when a stop has %s, then 422 names the field', async (_label, times, field) => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    const response = await agent
      .post(`/api/trips/${trip.id}/stops`)
      .send({ stop: { ...stopOnNextFreeDay(), ...times } });
    expect(response.status).toBe(422);
    expect(Object.keys(response.body.error.fields)).toContain(field);
  });

  it('when two stops overlap, then the second is refused with 422', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    const stop = stopOnNextFreeDay('Loch');
    await addStop(agent, trip.id, stop);
    const response = await agent.post(`/api/trips/${trip.id}/stops`).send({ stop: { ...stop, name: 'Clash' } });
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/overlap/);
  });
});

describe('stops and drives', () => {
  it('when stops are added out of order, then they are kept in time order with one drive per gap', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    const late = {
      ...stopOnNextFreeDay('Late'),
      arriveAt: '2027-06-20T14:00+01:00',
      departAt: '2027-06-22T10:00+01:00',
    };
    const early = {
      ...stopOnNextFreeDay('Early'),
      arriveAt: '2027-06-10T14:00+01:00',
      departAt: '2027-06-12T10:00+01:00',
    };
    const middle = {
      ...stopOnNextFreeDay('Middle'),
      arriveAt: '2027-06-15T14:00+01:00',
      departAt: '2027-06-16T10:00+01:00',
    };
    for (const stop of [late, early, middle]) await addStop(agent, trip.id, stop);
    const detail = await getDetail(agent, trip.id);
    expect(detail.stops.map((s) => s.stop.name)).toEqual([early.name, middle.name, late.name]);
    expect(detail.drives).toHaveLength(2);
  });

  it('when stops are reordered, then each keeps its length of stay and the route is laid out from the first arrival', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    const a = { ...stopOnNextFreeDay('A'), arriveAt: '2027-06-10T14:00+01:00', departAt: '2027-06-12T10:00+01:00' };
    const b = { ...stopOnNextFreeDay('B'), arriveAt: '2027-06-12T14:00+01:00', departAt: '2027-06-13T10:00+01:00' };
    await addStop(agent, trip.id, a);
    await addStop(agent, trip.id, b);
    const before = await getDetail(agent, trip.id);
    const reversed = before.stops.map((s) => s.id).reverse();
    const response = await agent
      .post(`/api/trips/${trip.id}/stops/reorder`)
      .send({ tripVersion: before.trip.version, stopIds: reversed });
    expect(response.status).toBe(200);
    const [first, second] = response.body.stops;
    expect(first.stop.name).toBe(b.name);
    expect(Date.parse(first.stop.arriveAt)).toBe(Date.parse(a.arriveAt));
    expect(Date.parse(first.stop.departAt) - Date.parse(first.stop.arriveAt)).toBe(20 * 3_600_000);
    expect(Date.parse(second.stop.arriveAt) - Date.parse(first.stop.departAt)).toBe(4 * 3_600_000);
  });
});

describe('GET /api/trips/:id/budget', () => {
  it("when a trip has stops and loads, then the engine's result comes back, and a repeat with its ETag is 304", async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    await addStop(agent, trip.id);
    await addAppliance(agent, trip.id);
    const first = await agent.get(`/api/trips/${trip.id}/budget`);
    expect(first.status).toBe(200);
    expect(first.body.result.soc.socPct.length).toBeGreaterThanOrEqual(20);
    expect(first.body.result.headline.lowestSocPct).toBeGreaterThanOrEqual(0);
    const etag = String(first.headers.etag);
    expect(etag).toMatch(/^".+"$/);
    await agent.get(`/api/trips/${trip.id}/budget`).set('If-None-Match', etag).expect(304);

    // Any change to the trip renews the ETag.
    await addAppliance(agent, trip.id, { ...LIGHTS, name: 'Fan', runningW: 40 });
    const changed = await agent.get(`/api/trips/${trip.id}/budget`).set('If-None-Match', etag);
    expect(changed.status).toBe(200);
    expect(changed.headers.etag).not.toBe(etag);
  });

  it('when a trip has no stop yet, then the budget is empty with a reason', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    const response = await agent.get(`/api/trips/${trip.id}/budget`).expect(200);
    expect(response.body.result).toBeNull();
    expect(response.body.reason).toMatch(/Add a stop/);
  });
});

describe('the seeded demo trips', () => {
  it('when the demo data is seeded, then each trip budget equals the engine run on the same plan', async () => {
    const { seedDemo, DEMO_ACCOUNT } = await import('@/db/seed');
    const { DEMO_TRIPS, simulateTrip } = await import('@/shared/engine');
    await seedDemo(ctx.db, ctx.app.locals.auth, new Date('2026-11-20T10:00:00Z'));
    const request = (await import('supertest')).default;
    const agent = request.agent(ctx.app);
    await agent
      .post('/api/auth/sign-in/email')
      .set('Origin', 'http://localhost:8080')
      .send({ email: DEMO_ACCOUNT.email, password: DEMO_ACCOUNT.password })
      .expect(200);
    const { trips } = (await agent.get('/api/trips').expect(200)).body as { trips: { id: string; name: string }[] };
    expect(trips.map((t) => t.name).sort()).toEqual(['Desert spring loop', 'Highland loop']);
    for (const [name, draft] of [
      ['Highland loop', DEMO_TRIPS.highlandLoop],
      ['Desert spring loop', DEMO_TRIPS.desertSpringLoop],
    ] as const) {
      const trip = trips.find((t) => t.name === name);
      const budget = (await agent.get(`/api/trips/${trip?.id}/budget`).expect(200)).body;
      const direct = simulateTrip(draft);
      expect(budget.result.headline).toEqual(direct.headline);
      expect(budget.result.days).toEqual(direct.days);
      expect(budget.result.flags.map((f: { kind: string }) => f.kind)).toEqual(direct.flags.map((f) => f.kind));
    }
  });
});

describe('partial updates', () => {
  it('when only the name is sent, then the notes and dates stay as they were', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent, { notes: 'Book the rally field early' });
    const renamed = (
      await agent.patch(`/api/trips/${trip.id}`).send({ version: trip.version, name: 'Renamed' }).expect(200)
    ).body;
    expect(renamed.trip).toMatchObject({
      name: 'Renamed',
      notes: 'Book the rally field early',
      startDate: trip.startDate,
      endDate: trip.endDate,
    });
  });
});
