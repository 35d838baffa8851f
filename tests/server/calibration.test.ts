// Accepting a calibration from check-ins: the stop's exposure and every appliance's draws change in one request, from
// the versions the fit was made on, and the undo puts every record back as it was, versions included.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApplyCalibrationRequest, TripDetail, UndoFixRequest } from '@/shared/schemas/api';
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

type Caller = Awaited<ReturnType<typeof signUpAgent>>;
let ctx: TestContext;
let owner: Caller;
let crew: Caller;
let viewer: Caller;

beforeAll(async () => {
  ctx = createTestApp();
  owner = await signUpAgent(ctx.app, 'Morag');
  crew = await signUpAgent(ctx.app, 'Ewan');
  viewer = await signUpAgent(ctx.app, 'Isla');
});
afterAll(() => ctx.close());

/** A trip with a pine-forest pitch and two loads, shared with crew and a viewer. */
async function forestTrip(): Promise<TripDetail> {
  const { trip } = await createTrip(owner.agent);
  await addStop(owner.agent, trip.id, {
    ...stopOnNextFreeDay('Pinewood'),
    exposure: { kind: 'preset', preset: 'deep-forest' },
  });
  await addAppliance(owner.agent, trip.id);
  await addAppliance(owner.agent, trip.id, { ...LIGHTS, name: 'Fridge', runningW: 60, standbyW: 2 });
  grant(ctx.db, trip.id, crew.userId, 'crew');
  grant(ctx.db, trip.id, viewer.userId, 'viewer');
  return getDetail(owner.agent, trip.id);
}

function request(detail: TripDetail, change: Partial<ApplyCalibrationRequest> = {}): ApplyCalibrationRequest {
  const stop = detail.stops[0];
  return {
    stopId: stop?.id ?? 'missing',
    stopVersion: stop?.version ?? 1,
    skyOpennessPct: 12,
    loadScale: 1.25,
    appliances: detail.appliances.map((a) => ({ id: a.id, version: a.version })),
    ...change,
  };
}

const calibrate = (caller: Caller, tripId: string, body: object) =>
  caller.agent.post(`/api/trips/${tripId}/calibration`).send(body);

/** What a calibration may touch: the stops and the appliances, versions included. */
const touched = (d: TripDetail) => ({ stops: d.stops, appliances: d.appliances });

describe('accepting a calibration', () => {
  it('when the owner accepts, then the stop becomes a canopy of the fitted openness and every draw is scaled, each record one version on', async () => {
    const before = await forestTrip();
    const response = await calibrate(owner, before.trip.id, request(before));
    expect(response.status, response.text).toBe(200);
    const after = response.body as TripDetail;
    // The deep-forest preset's leaf-area index is kept (5); only the openness is fitted.
    expect(after.stops[0]?.stop.exposure).toEqual({
      kind: 'canopy',
      skyOpennessPct: 12,
      leafAreaIndex: 5,
      deciduous: false,
    });
    expect(after.stops[0]?.version).toBe((before.stops[0]?.version ?? 0) + 1);
    expect(after.appliances.map((a) => [a.appliance.runningW, a.appliance.standbyW])).toEqual([
      [12.5, 0],
      [75, 2.5],
    ]);
    expect(after.appliances.map((a) => a.version)).toEqual(before.appliances.map((a) => a.version + 1));
    expect(await getDetail(viewer.agent, before.trip.id)).toMatchObject(touched(after));
  });

  it('when the accepted calibration is undone, then the stop and every appliance are as they were, versions included', async () => {
    const before = await forestTrip();
    const after = (await calibrate(owner, before.trip.id, request(before)).expect(200)).body as TripDetail;
    const undo: UndoFixRequest = {
      kind: 'calibration',
      stop: {
        stopId: after.stops[0]?.id ?? '',
        version: after.stops[0]?.version ?? 0,
        restore: {
          version: before.stops[0]?.version ?? 0,
          exposure: before.stops[0]?.stop.exposure ?? { kind: 'preset', preset: 'open' },
        },
      },
      appliances: before.appliances.map((a, i) => ({
        applianceId: a.id,
        version: after.appliances[i]?.version ?? 0,
        restore: { version: a.version, runningW: a.appliance.runningW, standbyW: a.appliance.standbyW },
      })),
    };
    // Crew may not put a stop's sky back either: 403, nothing moves.
    const byCrew = await crew.agent.post(`/api/trips/${before.trip.id}/undo-fix`).send(undo);
    expect(byCrew.status).toBe(403);
    expect(touched(await getDetail(owner.agent, before.trip.id))).toEqual(touched(after));
    const response = await owner.agent.post(`/api/trips/${before.trip.id}/undo-fix`).send(undo);
    expect(response.status, response.text).toBe(200);
    expect(touched(await getDetail(owner.agent, before.trip.id))).toEqual(touched(before));

    // A second undo of the same calibration meets records already back at their old versions: 409, nothing moves.
    const again = await owner.agent.post(`/api/trips/${before.trip.id}/undo-fix`).send(undo);
    expect(again.status).toBe(409);
    expect(touched(await getDetail(owner.agent, before.trip.id))).toEqual(touched(before));
  });

  it.each([
    ['an appliance was changed since the fit', 'edit'],
    ['an appliance was added since the fit', 'add'],
    ['the stop was changed since the fit', 'stop'],
  ])('when %s, then 409 carries the trip as it stands and nothing is written', async (_what, change) => {
    const before = await forestTrip();
    const tripId = before.trip.id;
    const fridge = before.appliances[1];
    const stop = before.stops[0];
    if (!fridge || !stop) throw new Error('no fridge or stop');
    if (change === 'edit')
      await owner.agent
        .patch(`/api/trips/${tripId}/appliances/${fridge.id}`)
        .send({ version: fridge.version, appliance: { ...LIGHTS, name: 'Fridge', runningW: 80, standbyW: 2 } })
        .expect(200);
    if (change === 'add') await addAppliance(owner.agent, tripId, { ...LIGHTS, name: 'Fan' });
    if (change === 'stop')
      await owner.agent
        .patch(`/api/trips/${tripId}/stops/${stop.id}`)
        .send({ version: stop.version, stop: { ...stop.stop, lowC: 2 }, notes: '' })
        .expect(200);
    const standing = touched(await getDetail(owner.agent, tripId));
    const response = await calibrate(owner, tripId, request(before));
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('conflict');
    expect(touched(response.body.current as TripDetail)).toEqual(standing);
    expect(touched(await getDetail(owner.agent, tripId))).toEqual(standing);
  });

  it.each([
    ['a viewer', () => viewer],
    ['crew (they change loads, not stops)', () => crew],
  ])('when %s accepts a calibration, then 403 in the usual error shape and nothing is written', async (_who, who) => {
    const before = await forestTrip();
    const response = await calibrate(who(), before.trip.id, request(before));
    expect(response.status).toBe(403);
    expect(response.body).toEqual({ error: { code: 'forbidden', message: expect.any(String) } });
    expect(touched(await getDetail(owner.agent, before.trip.id))).toEqual(touched(before));
  });

  it.each([
    ['a load scale past five times', { loadScale: 9 }, 'loadScale'],
    ['a load scale of nothing', { loadScale: 0 }, 'loadScale'],
    ['an openness past 100 %', { skyOpennessPct: 140 }, 'skyOpennessPct'],
    ['no stop version', { stopVersion: undefined }, 'stopVersion'],
    ['an appliance named twice', 'twice', 'appliances'],
    ['a field the contract does not know', { extra: 1 }, ''],
  ])('when the request has %s, then 400 names the field and nothing is written', async (_what, change, field) => {
    const before = await forestTrip();
    const body: Record<string, unknown> =
      typeof change === 'string'
        ? request(before, { appliances: [...request(before).appliances, ...request(before).appliances.slice(0, 1)] })
        : { ...request(before), ...change };
    const response = await calibrate(owner, before.trip.id, body);
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('validation_failed');
    if (field) expect(Object.keys(response.body.error.fields)).toContain(field);
    expect(touched(await getDetail(owner.agent, before.trip.id))).toEqual(touched(before));
  });

  it('when the scale would take an appliance past the most an appliance may draw, then 422 on the load scale', async () => {
    const before = await forestTrip();
    await addAppliance(owner.agent, before.trip.id, { ...LIGHTS, name: 'Kettle', circuit: 'ac', runningW: 3000 });
    const detail = await getDetail(owner.agent, before.trip.id);
    const response = await calibrate(owner, before.trip.id, request(detail, { loadScale: 4 }));
    expect(response.status).toBe(422);
    expect(response.body.error.fields.loadScale[0]).toContain('Kettle');
    expect(touched(await getDetail(owner.agent, before.trip.id))).toEqual(touched(detail));
  });
});
