import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TripDetail } from '@/shared/schemas/api';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addStop, createTrip, getDetail, grant } from '../factories/trip-factory';

type Caller = Awaited<ReturnType<typeof signUpAgent>>;
let ctx: TestContext;
let owner: Caller;
let crew: Caller;

beforeAll(async () => {
  ctx = createTestApp();
  owner = await signUpAgent(ctx.app, 'Morag');
  crew = await signUpAgent(ctx.app, 'Ewan');
});
afterAll(() => ctx.close());

const pitch = (name: string, arriveAt: string, departAt: string) => ({
  name,
  lat: 56.9,
  lon: -5.1,
  timeZone: 'Europe/London',
  arriveAt,
  departAt,
  lowC: 8,
  highC: 16,
});

/** Three pitches, the last leaving on the trip's last day. */
async function threeStops(): Promise<TripDetail> {
  const { trip } = await createTrip(owner.agent, { startDate: '2027-07-01', endDate: '2027-07-06' });
  await addStop(owner.agent, trip.id, pitch('Loch', '2027-07-01T14:00+01:00', '2027-07-03T10:00+01:00'));
  await addStop(owner.agent, trip.id, pitch('Forest', '2027-07-03T15:00+01:00', '2027-07-05T10:00+01:00'));
  await addStop(owner.agent, trip.id, pitch('Coast', '2027-07-05T15:00+01:00', '2027-07-06T10:00+01:00'));
  grant(ctx.db, trip.id, crew.userId, 'crew');
  return getDetail(owner.agent, trip.id);
}

const times = (d: TripDetail) => d.stops.map((s) => [Date.parse(s.stop.arriveAt), Date.parse(s.stop.departAt)]);
const DAY = 86_400_000;

function stay(caller: Caller, d: TripDetail, stopIndex: number, body: object) {
  const stopId = d.stops[stopIndex]?.id ?? 'missing';
  return caller.agent
    .post(`/api/trips/${d.trip.id}/stops/${stopId}/stay`)
    .send({ tripVersion: d.trip.version, ...body });
}

describe('stay longer or leave early', () => {
  it('when a night is added and the rest shifts, then every later stop moves a day and the trip grows to hold them', async () => {
    const before = await threeStops();
    const response = await stay(owner, before, 1, { nights: 1, mode: 'shift-rest' });
    expect(response.status, response.text).toBe(200);
    const after = response.body as TripDetail;
    const [a, b, c] = [times(before), times(after), 0];
    expect(b[0]).toEqual(a[0]);
    expect(b[1]).toEqual([a[1]?.[0], (a[1]?.[1] ?? 0) + DAY]);
    expect(b[2]).toEqual([(a[2]?.[0] ?? 0) + DAY, (a[2]?.[1] ?? 0) + DAY]);
    expect(c).toBe(0);
    expect(after.trip.endDate).toBe('2027-07-07');
    expect(after.trip.version).toBe(before.trip.version + 1);
  });

  it('when a night is added and taken from the next stop, then only that stop arrives later and the trip keeps its dates', async () => {
    const before = await threeStops();
    const response = await stay(owner, before, 0, { nights: 1, mode: 'next-stop' });
    expect(response.status, response.text).toBe(200);
    const after = response.body as TripDetail;
    expect(times(after)[0]?.[1]).toBe((times(before)[0]?.[1] ?? 0) + DAY);
    expect(times(after)[1]).toEqual([(times(before)[1]?.[0] ?? 0) + DAY, times(before)[1]?.[1]]);
    expect(times(after)[2]).toEqual(times(before)[2]);
    expect(after.trip.endDate).toBe('2027-07-06');
  });

  it('when leaving a night early shifts the rest, then later stops move a day earlier', async () => {
    const before = await threeStops();
    const response = await stay(owner, before, 0, { nights: -1, mode: 'shift-rest' });
    expect(response.status, response.text).toBe(200);
    expect(times(response.body as TripDetail)[2]?.[0]).toBe((times(before)[2]?.[0] ?? 0) - DAY);
  });

  it.each([
    ['more nights removed than the stop has', { nights: -3, mode: 'shift-rest' }, 0, 422],
    ['nights taken from after the last stop', { nights: 1, mode: 'next-stop' }, 2, 422],
    ['the next stop left with no time', { nights: 2, mode: 'next-stop' }, 1, 422],
    ['no nights at all', { nights: 0, mode: 'shift-rest' }, 0, 400],
    ['half a night', { nights: 0.5, mode: 'shift-rest' }, 0, 400],
  ])('when the change asks for %s, then it is refused and nothing moves', async (_what, body, index, status) => {
    const before = await threeStops();
    const response = await stay(owner, before, index, body);
    expect(response.status).toBe(status);
    expect(response.body.error.code).toBe(status === 400 ? 'validation_failed' : 'unprocessable');
    expect(times(await getDetail(owner.agent, before.trip.id))).toEqual(times(before));
  });

  it('when the trip changed since it was opened, then 409 carries the trip as it stands', async () => {
    const before = await threeStops();
    await owner.agent.patch(`/api/trips/${before.trip.id}`).send({ version: before.trip.version, notes: 'moved' });
    const response = await stay(owner, before, 0, { nights: 1, mode: 'shift-rest' });
    expect(response.status).toBe(409);
    expect(response.body.current.trip.version).toBe(before.trip.version + 1);
    expect(times(await getDetail(owner.agent, before.trip.id))).toEqual(times(before));
  });

  it('when crew try to change a stay, then 403 (only planners and the owner move stops)', async () => {
    const before = await threeStops();
    expect((await stay(crew, before, 0, { nights: 1, mode: 'shift-rest' })).status).toBe(403);
  });
});
