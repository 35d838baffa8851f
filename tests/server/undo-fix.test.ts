// Undo of an applied fix: the record goes back exactly as it was, version included, unless someone changed it since.
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { trips } from '@/db/schema';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, getDetail, grant } from '../factories/trip-factory';

let ctx: TestContext;
const revisionOf = (tripId: string): number =>
  ctx.db.select({ revision: trips.revision }).from(trips).where(eq(trips.id, tripId)).get()?.revision ?? -1;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

describe('undo of an applied fix', () => {
  it('when a battery fix is applied and undone, then the rig is as it was, version included, and the trip revision moves on', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const before = await createTrip(agent);
    const rig = before.rig.rig;
    const applied = await agent
      .put(`/api/trips/${before.trip.id}/rig`)
      .send({
        version: before.rig.version,
        rig: { ...rig, battery: { ...rig.battery, capacityAh: rig.battery.capacityAh + 100 } },
      })
      .expect(200);
    const revisionAfterApply = revisionOf(before.trip.id);
    const undone = await agent
      .post(`/api/trips/${before.trip.id}/undo-fix`)
      .send({ kind: 'rig', version: applied.body.version, restore: { version: before.rig.version, rig } })
      .expect(200);
    expect(undone.body.version).toBe(before.rig.version);
    const after = await getDetail(agent, before.trip.id);
    expect(after.rig).toEqual(before.rig);
    // The budget's cache key moves on: the undo is a change like any other.
    expect(revisionOf(before.trip.id)).toBe(revisionAfterApply + 1);
  });

  it('when two fixes to the rig are applied in a row, then they undo newest first back to the rig as it was', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const before = await createTrip(agent);
    const tripId = before.trip.id;
    const rig0 = before.rig.rig;
    const rig1 = { ...rig0, battery: { ...rig0.battery, capacityAh: rig0.battery.capacityAh + 100 } };
    const first = await agent
      .put(`/api/trips/${tripId}/rig`)
      .send({ version: before.rig.version, rig: rig1 })
      .expect(200);
    const rig2 = { ...rig1, battery: { ...rig1.battery, heatedSpace: true } };
    const second = await agent
      .put(`/api/trips/${tripId}/rig`)
      .send({ version: first.body.version, rig: rig2 })
      .expect(200);
    // Each undo request is what the client pushed on its stack when the fix went through.
    const undoFirst = { kind: 'rig', version: first.body.version, restore: { version: before.rig.version, rig: rig0 } };
    const undoSecond = {
      kind: 'rig',
      version: second.body.version,
      restore: { version: first.body.version, rig: rig1 },
    };
    // Out of order, the older one finds the record changed since and is refused; nothing is lost.
    await agent.post(`/api/trips/${tripId}/undo-fix`).send(undoFirst).expect(409);
    expect((await getDetail(agent, tripId)).rig.rig).toEqual(rig2);
    await agent.post(`/api/trips/${tripId}/undo-fix`).send(undoSecond).expect(200);
    expect((await getDetail(agent, tripId)).rig).toEqual({ ...before.rig, version: first.body.version, rig: rig1 });
    await agent.post(`/api/trips/${tripId}/undo-fix`).send(undoFirst).expect(200);
    expect((await getDetail(agent, tripId)).rig).toEqual(before.rig);
  });

  it('when a hookup fix on a stop is undone, then the stop is as it was', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const trip = await createTrip(agent);
    await addStop(agent, trip.trip.id);
    const before = await getDetail(agent, trip.trip.id);
    const record = before.stops[0];
    if (!record) throw new Error('no stop');
    const applied = await agent
      .patch(`/api/trips/${trip.trip.id}/stops/${record.id}`)
      .send({ version: record.version, stop: { ...record.stop, hookup: { amps: 30, volts: 120 } } })
      .expect(200);
    await agent
      .post(`/api/trips/${trip.trip.id}/undo-fix`)
      .send({
        kind: 'stop',
        stopId: record.id,
        version: applied.body.version,
        restore: { version: record.version, stop: record.stop, notes: record.notes },
      })
      .expect(200);
    expect((await getDetail(agent, trip.trip.id)).stops[0]).toEqual(record);
  });

  it('when an appliance fix is undone by crew, then its schedule and version are as they were', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const crew = await signUpAgent(ctx.app, 'Crew Member');
    const trip = await createTrip(agent);
    await addStop(agent, trip.trip.id);
    const added = await addAppliance(agent, trip.trip.id);
    grant(ctx.db, trip.trip.id, crew.userId, 'crew');
    const before = (await getDetail(agent, trip.trip.id)).appliances.find((a) => a.id === added.id);
    if (!before) throw new Error('no appliance');
    const applied = await crew.agent
      .put(`/api/trips/${trip.trip.id}/appliances/${added.id}/schedule`)
      .send({ version: before.version, schedule: { kind: 'always' } })
      .expect(200);
    await crew.agent
      .post(`/api/trips/${trip.trip.id}/undo-fix`)
      .send({
        kind: 'appliance',
        applianceId: added.id,
        version: applied.body.version,
        restore: { version: before.version, schedule: before.appliance.schedule },
      })
      .expect(200);
    const after = (await getDetail(agent, trip.trip.id)).appliances.find((a) => a.id === added.id);
    expect(after).toEqual(before);
    // Crew cannot put back a rig.
    const detail = await getDetail(agent, trip.trip.id);
    await crew.agent
      .post(`/api/trips/${trip.trip.id}/undo-fix`)
      .send({
        kind: 'rig',
        version: detail.rig.version + 1,
        restore: { version: detail.rig.version, rig: detail.rig.rig },
      })
      .expect(403);
  });

  it('when someone changed the record after the fix, then the undo is refused with the record as it now stands', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const before = await createTrip(agent);
    const rig = before.rig.rig;
    const applied = await agent
      .put(`/api/trips/${before.trip.id}/rig`)
      .send({ version: before.rig.version, rig: { ...rig, name: 'Changed once' } })
      .expect(200);
    await agent
      .put(`/api/trips/${before.trip.id}/rig`)
      .send({ version: applied.body.version, rig: { ...rig, name: 'Changed twice' } })
      .expect(200);
    const refused = await agent
      .post(`/api/trips/${before.trip.id}/undo-fix`)
      .send({ kind: 'rig', version: applied.body.version, restore: { version: before.rig.version, rig } })
      .expect(409);
    expect(refused.body.error.code).toBe('conflict');
    expect((await getDetail(agent, before.trip.id)).rig.rig.name).toBe('Changed twice');
  });

  it('when the version to restore is not earlier than the current one, then the undo is refused (422)', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const before = await createTrip(agent);
    const res = await agent
      .post(`/api/trips/${before.trip.id}/undo-fix`)
      .send({ kind: 'rig', version: before.rig.version, restore: { version: before.rig.version, rig: before.rig.rig } })
      .expect(422);
    expect(res.body.error.fields).toHaveProperty(['restore.version']);
  });
});
