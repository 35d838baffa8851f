import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { greatCircleKm } from '@/shared/geo/great-circle';
import type { DriveRecord } from '@/shared/schemas/api';
import type { StopInput } from '@/shared/schemas/trip';
import type { TripSummary } from '@/shared/schemas/trip-summary';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addStop, createTrip, getDetail } from '../factories/trip-factory';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

const lochside = { lat: 56.98, lon: -5.12 };
const pinewood = { lat: 57.16, lon: -4.79 };
const coast = { lat: 57.58, lon: -5.78 };

const stop = (name: string, at: { lat: number; lon: number }, arrive: string, depart: string): StopInput => ({
  name,
  ...at,
  timeZone: 'Europe/London',
  arriveAt: arrive,
  departAt: depart,
  lowC: 8,
  highC: 15,
});

// Seven hours between leaving the first stop and reaching the second: room for any suggestion here.
const first = stop('Lochside', lochside, '2027-06-10T15:00+01:00', '2027-06-12T10:00+01:00');
const second = stop('Pinewood', pinewood, '2027-06-12T17:00+01:00', '2027-06-14T10:00+01:00');

async function twoStopTrip(agentUnits?: 'us') {
  const { agent } = await signUpAgent(ctx.app);
  if (agentUnits) await agent.put('/api/me/preferences').send({ units: agentUnits }).expect(200);
  const { trip } = await createTrip(agent);
  await addStop(agent, trip.id, first);
  const moved = await addStop(agent, trip.id, second);
  return { agent, tripId: trip.id, secondId: moved.id };
}

const onlyDrive = async (agent: Awaited<ReturnType<typeof twoStopTrip>>['agent'], tripId: string) => {
  const detail = await getDetail(agent, tripId);
  const drive = detail.drives[0];
  if (!drive) throw new Error('no drive');
  return drive;
};

describe('drives sized from their distance', () => {
  it('when two stops are added, then the drive is 1.3 × the great circle and timed at 70 km/h', async () => {
    const { agent, tripId } = await twoStopTrip();
    const { drive } = await onlyDrive(agent, tripId);
    const km = greatCircleKm(lochside, pinewood) * 1.3;
    expect(drive.distanceKm).toBeCloseTo(km, 1);
    expect(drive).toMatchObject({ distanceSource: 'great-circle', roadFactor: 1.3, averageSpeedKmh: 70 });
    expect(drive.hoursSource).toBe('suggested');
    expect(drive.hoursOnRoad).toBe(Math.max(0.25, Math.round((km / 70) * 4) / 4));
  });

  it('when the owner uses US units, then a new drive assumes 45 mph', async () => {
    const { agent, tripId } = await twoStopTrip('us');
    const { drive } = await onlyDrive(agent, tripId);
    expect(drive.averageSpeedKmh).toBeCloseTo(45 * 1.609344, 6);
  });

  it('when a stop moves further away, then the distance and the suggested time follow it', async () => {
    const { agent, tripId, secondId } = await twoStopTrip();
    const before = await onlyDrive(agent, tripId);
    const detail = await getDetail(agent, tripId);
    const record = detail.stops.find((s) => s.id === secondId);
    await agent
      .patch(`/api/trips/${tripId}/stops/${secondId}`)
      .send({ version: record?.version, stop: { ...second, ...coast } })
      .expect(200);
    const after = await onlyDrive(agent, tripId);
    expect(after.drive.distanceKm).toBeCloseTo(greatCircleKm(lochside, coast) * 1.3, 1);
    expect(after.drive.hoursOnRoad).toBeGreaterThan(before.drive.hoursOnRoad);
    expect(after.version).toBeGreaterThan(before.version);
  });

  it('when someone typed the hours, then moving a stop keeps them', async () => {
    const { agent, tripId, secondId } = await twoStopTrip();
    const drive = await onlyDrive(agent, tripId);
    // An older client sends only the hours: that is a typed time.
    await agent
      .patch(`/api/trips/${tripId}/drives/${drive.id}`)
      .send({ version: drive.version, drive: { hoursOnRoad: 3, vehicleCharging: true } })
      .expect(200);
    const record = (await getDetail(agent, tripId)).stops.find((s) => s.id === secondId);
    await agent
      .patch(`/api/trips/${tripId}/stops/${secondId}`)
      .send({ version: record?.version, stop: { ...second, ...coast } })
      .expect(200);
    const after = await onlyDrive(agent, tripId);
    expect(after.drive).toMatchObject({ hoursOnRoad: 3, hoursSource: 'typed' });
    expect(after.drive.distanceKm).toBeCloseTo(greatCircleKm(lochside, coast) * 1.3, 1);
  });

  it('when a distance is typed, then the suggested time follows it and the stops no longer move it', async () => {
    const { agent, tripId, secondId } = await twoStopTrip();
    const drive = await onlyDrive(agent, tripId);
    const response = await agent.patch(`/api/trips/${tripId}/drives/${drive.id}`).send({
      version: drive.version,
      drive: { hoursOnRoad: drive.drive.hoursOnRoad, vehicleCharging: true, distanceKm: 210 },
    });
    expect(response.status).toBe(200);
    expect((response.body as DriveRecord).drive).toMatchObject({
      distanceKm: 210,
      distanceSource: 'typed',
      hoursOnRoad: 3,
    });
    const record = (await getDetail(agent, tripId)).stops.find((s) => s.id === secondId);
    await agent
      .patch(`/api/trips/${tripId}/stops/${secondId}`)
      .send({ version: record?.version, stop: { ...second, ...coast } })
      .expect(200);
    expect((await onlyDrive(agent, tripId)).drive).toMatchObject({ distanceKm: 210, hoursOnRoad: 3 });
  });

  it('when the road factor or the speed changes, then the distance and the suggestion are worked out again', async () => {
    const { agent, tripId } = await twoStopTrip();
    const drive = await onlyDrive(agent, tripId);
    const response = await agent
      .patch(`/api/trips/${tripId}/drives/${drive.id}`)
      .send({ version: drive.version, drive: { ...drive.drive, roadFactor: 1.5, averageSpeedKmh: 40 } });
    expect(response.status).toBe(200);
    const km = greatCircleKm(lochside, pinewood) * 1.5;
    const saved = (response.body as DriveRecord).drive;
    expect(saved.distanceKm).toBeCloseTo(km, 1);
    expect(saved.hoursOnRoad).toBe(Math.round((km / 40) * 4) / 4);
  });

  it('when the suggestion would not fit the gap, then it is cut to the gap; a typed time that long is refused', async () => {
    const { agent, tripId } = await twoStopTrip();
    const drive = await onlyDrive(agent, tripId);
    const slow = await agent
      .patch(`/api/trips/${tripId}/drives/${drive.id}`)
      .send({ version: drive.version, drive: { ...drive.drive, averageSpeedKmh: 5 } });
    expect(slow.status).toBe(200);
    expect((slow.body as DriveRecord).drive.hoursOnRoad).toBe(7);
    const typed = await agent.patch(`/api/trips/${tripId}/drives/${drive.id}`).send({
      version: (slow.body as DriveRecord).version,
      drive: { ...drive.drive, hoursOnRoad: 9, hoursSource: 'typed' },
    });
    expect(typed.status).toBe(422);
    expect(typed.body.error.fields['drive.hoursOnRoad']).toBeDefined();
  });

  it('when trips are listed, then each card carries its stops’ positions for its small map', async () => {
    const { agent, tripId } = await twoStopTrip();
    // The list shows the figures last computed and never waits for them: the budget is computed first.
    await agent.get(`/api/trips/${tripId}/budget`).expect(200);
    const { trips } = (await agent.get('/api/trips').expect(200)).body as { trips: TripSummary[] };
    const card = trips.find((t) => t.id === tripId);
    expect(card?.route?.map(({ lat, lon }) => ({ lat, lon }))).toEqual([lochside, pinewood]);
    // Each stop's lowest charge, none of them below the trip's lowest (which may fall on a drive).
    expect(card?.budgetStatus).toBe('current');
    const lows = card?.route?.map((stop) => stop.lowestSocPct ?? NaN) ?? [];
    for (const low of lows) expect(low).toBeGreaterThanOrEqual(card?.lowestSocPct ?? Infinity);
    expect(Math.min(...lows)).toBeLessThanOrEqual(100);
  });

  it.each([
    ['a road factor below 1', { roadFactor: 0.8 }],
    ['a speed of 500 km/h', { averageSpeedKmh: 500 }],
    ['a negative distance', { distanceKm: -3 }],
    ['an unknown distance source', { distanceSource: 'guess' }],
  ])('when a drive is sent with %s, then it answers 400', async (_what, patch) => {
    const { agent, tripId } = await twoStopTrip();
    const drive = await onlyDrive(agent, tripId);
    const response = await agent
      .patch(`/api/trips/${tripId}/drives/${drive.id}`)
      .send({ version: drive.version, drive: { ...drive.drive, ...patch } });
    expect(response.status).toBe(400);
  });
});
