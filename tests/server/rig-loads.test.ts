// A saved rig keeps the household's usual loads; a club plan copied onto it brings the plan's route, the rig's own
// loads and only the plan's appliances the household ticked.
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { SavedRigRecord, TripDetail } from '@/shared/schemas/api';
import type { ApplianceFields } from '@/shared/schemas/appliance';
import { createClub, joinClubByInvite } from '../factories/club-factory';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, LIGHTS } from '../factories/trip-factory';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

const load = (name: string, runningW: number): ApplianceFields => ({
  ...LIGHTS,
  name,
  runningW,
  schedule: { kind: 'always' },
});
const AIR_CON = load('Roof air conditioner', 1300);
const SATELLITE = load('Satellite terminal', 60);
const RALLY_LIGHTS = load('Rally field lights (shared)', 20);
const OUR_FRIDGE = load('Our fridge', 45);

async function clubPlanWithHousehold() {
  const organiser = await signUpAgent(ctx.app, 'Organiser');
  const plan = await createTrip(organiser.agent, { name: 'Autumn rally' });
  await addStop(organiser.agent, plan.trip.id);
  const ids: Record<string, string> = {};
  for (const appliance of [AIR_CON, SATELLITE, RALLY_LIGHTS])
    ids[appliance.name] = (await addAppliance(organiser.agent, plan.trip.id, appliance)).id;
  const clubId = await createClub(organiser.agent, 'Glen rally club');
  await organiser.agent.post(`/api/clubs/${clubId}/trips`).send({ tripId: plan.trip.id }).expect(201);
  const household = await joinClubByInvite(ctx, organiser.agent, clubId, 'Household');
  return { planId: plan.trip.id, rig: plan.rig.rig, ids, household };
}

describe('a rig’s own loads', () => {
  it('when a rig is saved with loads and its loads are changed, then My rigs keeps them with the rig, versioned', async () => {
    const { agent } = await signUpAgent(ctx.app, 'Household');
    const { rig } = await createTrip(agent);
    const created = (await agent.post('/api/rigs').send({ rig: { ...rig.rig, name: 'Our van' }, loads: [OUR_FRIDGE] }))
      .body as SavedRigRecord;
    expect(created.loads.map((l) => l.name)).toEqual(['Our fridge']);

    const changed = (
      await agent
        .put(`/api/rigs/${created.id}/loads`)
        .send({ version: created.version, loads: [OUR_FRIDGE, load('Water pump', 60)] })
        .expect(200)
    ).body as SavedRigRecord;
    expect(changed.version).toBe(created.version + 1);
    expect((await agent.get('/api/rigs').expect(200)).body.rigs[0].loads.map((l: ApplianceFields) => l.name)).toEqual([
      'Our fridge',
      'Water pump',
    ]);
    // A stale version is refused with the rig as it now stands.
    const stale = await agent.put(`/api/rigs/${created.id}/loads`).send({ version: created.version, loads: [] });
    expect(stale.status).toBe(409);
  });

  it('when loads are refused, then the fields say why in plain words', async () => {
    const { agent } = await signUpAgent(ctx.app, 'Household');
    const { rig } = await createTrip(agent);
    const created = (await agent.post('/api/rigs').send({ rig: rig.rig })).body as SavedRigRecord;
    const bad = await agent
      .put(`/api/rigs/${created.id}/loads`)
      .send({ version: created.version, loads: [{ ...OUR_FRIDGE, runningW: -1 }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['loads.0.runningW']).toEqual(['Enter 0 W or more.']);
  });

  it('when a trip’s rig is saved to My rigs, then the trip’s appliances become the rig’s loads', async () => {
    const { agent } = await signUpAgent(ctx.app, 'Household');
    const { trip } = await createTrip(agent);
    await addAppliance(agent, trip.id, OUR_FRIDGE);
    const saved = (await agent.post(`/api/trips/${trip.id}/rig/save`).send({ name: 'Our van' }).expect(201)).body.rig;
    expect(saved.loads.map((l: ApplianceFields) => l.name)).toEqual(['Our fridge']);
  });
});

describe('copying a club plan onto my rig', () => {
  it('when a household copies the plan, then the copy has the plan’s stops, its own rig’s loads and only the ticked shared load', async () => {
    const { planId, rig, ids, household } = await clubPlanWithHousehold();
    const saved = (
      await household.agent
        .post('/api/rigs')
        .send({ rig: { ...rig, name: 'Household van' }, loads: [OUR_FRIDGE] })
        .expect(201)
    ).body as SavedRigRecord;
    const copy = (
      await household.agent
        .post(`/api/trips/${planId}/copy`)
        .send({ rigId: saved.id, sharedApplianceIds: [ids['Rally field lights (shared)']] })
        .expect(201)
    ).body as TripDetail;
    expect(copy.rig.rig.name).toBe('Household van');
    expect(copy.stops).toHaveLength(1);
    expect(copy.appliances.map((a) => a.appliance.name)).toEqual(['Our fridge', 'Rally field lights (shared)']);
  });

  it('when nothing is ticked, then none of the organiser’s appliances come along', async () => {
    const { planId, rig, household } = await clubPlanWithHousehold();
    const saved = (await household.agent.post('/api/rigs').send({ rig }).expect(201)).body as SavedRigRecord;
    const copy = (await household.agent.post(`/api/trips/${planId}/copy`).send({ rigId: saved.id }).expect(201))
      .body as TripDetail;
    expect(copy.appliances).toEqual([]);
  });

  it('when an appliance that is not the plan’s is ticked, then 422 names the field and no trip is made', async () => {
    const { planId, rig, household } = await clubPlanWithHousehold();
    const saved = (await household.agent.post('/api/rigs').send({ rig }).expect(201)).body as SavedRigRecord;
    const before = (await household.agent.get('/api/trips')).body.trips.length;
    const response = await household.agent
      .post(`/api/trips/${planId}/copy`)
      .send({ rigId: saved.id, sharedApplianceIds: ['not-in-the-plan'] });
    expect(response.status).toBe(422);
    expect(Object.keys(response.body.error.fields)).toEqual(['sharedApplianceIds']);
    expect((await household.agent.get('/api/trips')).body.trips.length).toBe(before);
  });
});
