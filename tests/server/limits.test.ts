// The documented maxima (LIMITS): what passes one is refused with 400 naming the field and the limit, trip days a
// routine names must be days of the trip (422), and nothing refused is stored.
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LIMITS } from '@/shared/schemas/limits';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, getDetail, LIGHTS } from '../factories/trip-factory';
import { createLargestTrip } from '../factories/largest-trip';
import { insertTrip } from '@/db/queries/trips';

let ctx: TestContext;
let agent: Agent;

beforeAll(async () => {
  ctx = createTestApp();
  ({ agent } = await signUpAgent(ctx.app, 'Limit tester'));
});
afterAll(() => ctx.close());

const tripDays = (dayIndexes: number[]) => ({
  ...LIGHTS,
  schedule: {
    kind: 'routine' as const,
    windows: [{ days: { kind: 'trip-days' as const, dayIndexes }, startHour: 7, startMinute: 0, minutes: 30 }],
  },
});

describe('routine day lists', () => {
  it('when a window names 49,000 days, then 400 names the day list and its limit, and nothing is stored', async () => {
    const { trip } = await createTrip(agent);
    const response = await agent
      .post(`/api/trips/${trip.id}/appliances`)
      .send({ appliance: tripDays(new Array<number>(49_000).fill(0)) });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('validation_failed');
    const messages = response.body.error.fields['appliance.schedule.windows.0.days.dayIndexes'];
    expect(messages?.join(' ')).toContain(String(LIMITS.tripDays + 1));
    expect((await getDetail(agent, trip.id)).appliances).toHaveLength(0);
  });

  it('when a window names a day twice, then 400 names the day list', async () => {
    const { trip } = await createTrip(agent);
    const response = await agent.post(`/api/trips/${trip.id}/appliances`).send({ appliance: tripDays([1, 1]) });
    expect(response.status).toBe(400);
    expect(response.body.error.fields['appliance.schedule.windows.0.days.dayIndexes']).toEqual(['Name each day once.']);
  });

  it("when a window names a day past the trip's last day, then 422 names it, on create and on a schedule change", async () => {
    // The default trip runs 2027-06-01 to 2027-07-31: 61 days, numbered 0 to 60.
    const { trip } = await createTrip(agent);
    const created = await agent.post(`/api/trips/${trip.id}/appliances`).send({ appliance: tripDays([0, 61]) });
    expect(created.status).toBe(422);
    expect(created.body.error.fields['appliance.schedule.windows.0.days.dayIndexes']?.[0]).toContain('61 days');

    const appliance = await addAppliance(agent, trip.id, tripDays([0, 60]));
    const changed = await agent
      .put(`/api/trips/${trip.id}/appliances/${appliance.id}/schedule`)
      .send({ version: appliance.version, schedule: tripDays([61]).schedule });
    expect(changed.status).toBe(422);
    expect(changed.body.error.fields).toHaveProperty(['schedule.windows.0.days.dayIndexes']);
  });

  it("when a generator routine names a day past the trip's last day, then 422 names it", async () => {
    const { trip, rig } = await createTrip(agent);
    const generator = {
      ratedW: 2000,
      mode: {
        kind: 'routine',
        windows: [{ days: { kind: 'trip-days', dayIndexes: [70] }, startHour: 9, minutes: 60 }],
      },
    };
    const response = await agent
      .put(`/api/trips/${trip.id}/rig`)
      .send({ version: rig.version, rig: { ...rig.rig, generator } });
    expect(response.status).toBe(422);
    expect(response.body.error.fields).toHaveProperty(['rig.generator.mode.windows.0.days.dayIndexes']);
  });
});

describe('trip length', () => {
  const postTrip = (fields: { startDate: string; endDate: string; timeZone?: string }) =>
    agent.post('/api/trips').send({
      name: 'Long way round',
      timeZone: 'Europe/London',
      rigSource: { kind: 'preset', presetId: 'van-small' },
      ...fields,
    });

  it('when a trip runs from 0001-01-01 to 9999-12-31, then 400 names endDate and the limit', async () => {
    const before = (await agent.get('/api/trips')).body.trips.length;
    const response = await postTrip({ startDate: '0001-01-01', endDate: '9999-12-31' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.endDate).toEqual([`A trip lasts at most ${LIMITS.tripDays} days.`]);
    expect((await agent.get('/api/trips')).body.trips).toHaveLength(before);
  });

  it('when a trip lasts exactly the limit, then it is created; one day more is refused', async () => {
    const longest = await postTrip({ startDate: '2027-06-01', endDate: '2027-09-28' });
    expect(longest.status).toBe(201);
    const tooLong = await agent
      .patch(`/api/trips/${longest.body.trip.id}`)
      .send({ version: longest.body.trip.version, endDate: '2027-09-29' });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.code).toBe('limit_reached');
    expect(tooLong.body.error.fields.endDate?.[0]).toContain(String(LIMITS.tripDays));
  });

  it('when a time zone name is thousands of characters long, then 400 names the field', async () => {
    const response = await postTrip({
      startDate: '2027-06-01',
      endDate: '2027-06-02',
      timeZone: 'Europe/'.repeat(2000),
    });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty('timeZone');
  });
});

describe('counts per trip and per person', () => {
  let largest: Awaited<ReturnType<typeof createLargestTrip>>;
  beforeAll(async () => {
    largest = await createLargestTrip(agent);
  }, 120_000);

  it('when the largest plan is stored through the API, then every part of it is kept', () => {
    expect(largest.stops).toHaveLength(LIMITS.stopsPerTrip);
    expect(largest.drives).toHaveLength(LIMITS.stopsPerTrip - 1);
    expect(largest.appliances).toHaveLength(LIMITS.appliancesPerTrip);
    expect(largest.rig.rig.solarArrays).toHaveLength(LIMITS.solarArraysPerRig);
  });

  it('when a trip holds the most appliances, then one more is refused with 400 naming the limit', async () => {
    const response = await agent.post(`/api/trips/${largest.trip.id}/appliances`).send({ appliance: LIGHTS });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('limit_reached');
    expect(response.body.error.fields.appliances?.[0]).toContain(String(LIMITS.appliancesPerTrip));
    expect((await getDetail(agent, largest.trip.id)).appliances).toHaveLength(LIMITS.appliancesPerTrip);
  });

  it('when a trip holds the most stops, then one more is refused with 400 naming the limit', async () => {
    const response = await agent.post(`/api/trips/${largest.trip.id}/stops`).send({
      stop: { ...largest.stops[0]?.stop, arriveAt: '2027-09-28T23:00-06:00', departAt: '2027-09-28T23:30-06:00' },
    });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.stops?.[0]).toContain(String(LIMITS.stopsPerTrip));
    expect((await getDetail(agent, largest.trip.id)).stops).toHaveLength(LIMITS.stopsPerTrip);
  });

  it('when a window list is one longer than the limit, then 400 names it', async () => {
    const window = { days: { kind: 'all' }, startHour: 1, startMinute: 0, minutes: 10 };
    const response = await agent.post(`/api/trips/${(await createTrip(agent)).trip.id}/appliances`).send({
      appliance: {
        ...LIGHTS,
        schedule: { kind: 'routine', windows: new Array(LIMITS.windowsPerAppliance + 1).fill(window) },
      },
    });
    expect(response.status).toBe(400);
    expect(response.body.error.fields['appliance.schedule.windows']?.[0]).toContain(String(LIMITS.windowsPerAppliance));
  });

  it('when a person organises the most clubs, then another is refused with 400 naming the limit', async () => {
    const { agent: organiser } = await signUpAgent(ctx.app, 'Club organiser');
    for (let i = 0; i < LIMITS.clubsPerUser; i++)
      expect((await organiser.post('/api/clubs').send({ name: `Club ${i + 1}` })).status).toBe(201);
    const response = await organiser.post('/api/clubs').send({ name: 'One too many' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.clubs?.[0]).toContain(String(LIMITS.clubsPerUser));
    expect((await organiser.get('/api/clubs')).body.clubs).toHaveLength(LIMITS.clubsPerUser);
  });

  it('when a person owns the most trips, then a new trip and a duplicate are refused with 400 naming the limit', async () => {
    const { agent: keeper, userId } = await signUpAgent(ctx.app, 'Trip keeper');
    const { trip } = await createTrip(keeper);
    // The rest written straight to the database: the count is what is checked, not how the trips came.
    ctx.db.transaction((tx) => {
      for (let i = 1; i < LIMITS.tripsPerUser; i++)
        insertTrip(
          tx,
          { ownerId: userId, name: `Trip ${i}`, startDate: '2027-06-01', endDate: '2027-06-03', timeZone: 'UTC' },
          new Date(),
        );
    });
    const created = await keeper.post('/api/trips').send({
      name: 'One too many',
      startDate: '2027-06-01',
      endDate: '2027-06-03',
      timeZone: 'Europe/London',
      rigSource: { kind: 'preset', presetId: 'caravan-lithium' },
    });
    expect(created.status).toBe(400);
    expect(created.body.error.code).toBe('limit_reached');
    expect(created.body.error.fields.trips?.[0]).toContain(String(LIMITS.tripsPerUser));
    const duplicated = await keeper.post(`/api/trips/${trip.id}/duplicate`);
    expect(duplicated.status).toBe(400);
    expect(duplicated.body.error.fields.trips?.[0]).toContain(String(LIMITS.tripsPerUser));
    expect((await keeper.get('/api/trips')).body.trips).toHaveLength(LIMITS.tripsPerUser);
  });

  it('when a person keeps the most rigs, then saving another, new or from a trip, is refused with 400 naming the limit', async () => {
    const { agent: keeper } = await signUpAgent(ctx.app, 'Rig keeper');
    const { trip } = await createTrip(keeper);
    const { rig } = (await getDetail(keeper, trip.id)).rig;
    for (let i = 0; i < LIMITS.savedRigsPerUser; i++)
      expect((await keeper.post('/api/rigs').send({ rig: { ...rig, name: `Rig ${i + 1}` } })).status).toBe(201);
    const created = await keeper.post('/api/rigs').send({ rig: { ...rig, name: 'One too many' } });
    expect(created.status).toBe(400);
    expect(created.body.error.fields.rigs?.[0]).toContain(String(LIMITS.savedRigsPerUser));
    const saved = await keeper.post(`/api/trips/${trip.id}/rig/save`).send({ name: 'Also too many' });
    expect(saved.status).toBe(400);
    expect((await keeper.get('/api/rigs')).body.rigs).toHaveLength(LIMITS.savedRigsPerUser);
  });

  it('when a small trip adds a stop, then the limit does not stand in its way', async () => {
    const { trip } = await createTrip(agent);
    await addStop(agent, trip.id);
    expect((await getDetail(agent, trip.id)).stops).toHaveLength(1);
  });
});
