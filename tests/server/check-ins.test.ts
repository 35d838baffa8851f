import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertCheckIn } from '@/db/queries/check-ins';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { LIMITS } from '@/shared/schemas/limits';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { createTrip, grant } from '../factories/trip-factory';

type Caller = Awaited<ReturnType<typeof signUpAgent>>;
let ctx: TestContext;
let owner: Caller;
let crew: Caller;
let tripId: string;
const NOW = new Date('2027-06-12T17:30:00Z');
const READING = { at: '2027-06-10T18:00+01:00', socPct: 68 };

beforeAll(async () => {
  ctx = createTestApp({ now: () => NOW });
  owner = await signUpAgent(ctx.app, 'Morag');
  crew = await signUpAgent(ctx.app, 'Ewan');
  tripId = (await createTrip(owner.agent)).trip.id;
  grant(ctx.db, tripId, crew.userId, 'crew');
});
afterAll(() => ctx.close());

const path = (id = '') => `/api/trips/${tripId}/check-ins${id ? `/${id}` : ''}`;

async function add(caller: Caller, checkIn: object): Promise<CheckInRecord> {
  const response = await caller.agent.post(path()).send({ checkIn });
  expect(response.status, response.text).toBe(201);
  return response.body as CheckInRecord;
}

describe('check-ins', () => {
  it('when a crew member checks in without a time, then the reading is stored at now with its author and listed in time order', async () => {
    const late = await add(crew, {
      socPct: 79.5,
      propane: [{ tank: 1, reading: { kind: 'weight', kg: 3.2 } }],
      harvestWh: 250,
      note: ' fan ran all night ',
    });
    expect(late.checkIn).toEqual({
      at: NOW.toISOString(),
      socPct: 79.5,
      propane: [{ tank: 1, reading: { kind: 'weight', kg: 3.2 } }],
      harvestWh: 250,
      note: 'fan ran all night',
    });
    expect(late).toMatchObject({ authorId: crew.userId, authorName: 'Ewan', version: 1 });
    const early = await add(owner, READING);
    const list = (await owner.agent.get(path())).body.checkIns as CheckInRecord[];
    const mine = list.filter((c) => c.id === early.id || c.id === late.id).map((c) => c.id);
    expect(mine).toEqual([early.id, late.id]);
  });

  it('when someone other than the author edits or removes a reading, then 403 and the reading is unchanged', async () => {
    const reading = await add(crew, READING);
    const edit = await owner.agent.patch(path(reading.id)).send({ version: 1, checkIn: { ...READING, socPct: 10 } });
    expect(edit.status).toBe(403);
    expect(edit.body.error.code).toBe('forbidden');
    expect((await owner.agent.delete(path(reading.id))).status).toBe(403);
    const list = (await owner.agent.get(path())).body.checkIns as CheckInRecord[];
    expect(list.find((c) => c.id === reading.id)?.checkIn.socPct).toBe(68);
  });

  it('when the author edits from a stale version, then 409 carries the reading as it stands', async () => {
    const reading = await add(crew, READING);
    const first = await crew.agent.patch(path(reading.id)).send({ version: 1, checkIn: { ...READING, socPct: 70 } });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(2);
    const stale = await crew.agent.patch(path(reading.id)).send({ version: 1, checkIn: { ...READING, socPct: 55 } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.current.checkIn.socPct).toBe(70);
  });

  it('when the author removes a reading, then it is gone from the list', async () => {
    const reading = await add(crew, READING);
    expect((await crew.agent.delete(path(reading.id))).status).toBe(204);
    const list = (await crew.agent.get(path())).body.checkIns as CheckInRecord[];
    expect(list.some((c) => c.id === reading.id)).toBe(false);
    expect((await crew.agent.delete(path(reading.id))).status).toBe(404);
  });

  it.each([
    ['a charge above 100 %', { ...READING, socPct: 101 }, 'checkIn.socPct'],
    ['a time without an offset', { ...READING, at: '2027-06-10T18:00' }, 'checkIn.at'],
    [
      'a fraction above 1',
      { ...READING, propane: [{ tank: 0, reading: { kind: 'fraction', share: 1.5 } }] },
      'checkIn.propane.0.reading.share',
    ],
    ['a negative harvest', { ...READING, harvestWh: -1 }, 'checkIn.harvestWh'],
    ['a note past its limit', { ...READING, note: 'x'.repeat(LIMITS.checkInNoteChars + 1) }, 'checkIn.note'],
    [
      'a cylinder read twice',
      {
        ...READING,
        propane: [
          { tank: 0, reading: { kind: 'full' } },
          { tank: 0, reading: { kind: 'full' } },
        ],
      },
      'checkIn.propane',
    ],
    ['an unknown field', { ...READING, voltage: 13.1 }, 'checkIn'],
  ])('when a check-in has %s, then 400 validation_failed names the field', async (_what, checkIn, field) => {
    const response = await crew.agent.post(path()).send({ checkIn });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('validation_failed');
    expect(Object.keys(response.body.error.fields)).toContain(field);
  });

  it.each([
    ['a time outside the trip', { ...READING, at: '2027-09-01T12:00Z' }, 'checkIn.at'],
    [
      'a cylinder the rig does not have',
      { ...READING, propane: [{ tank: 7, reading: { kind: 'full' } }] },
      'checkIn.propane.0.tank',
    ],
  ])('when a check-in has %s, then 422 names the field', async (_what, checkIn, field) => {
    const response = await crew.agent.post(path()).send({ checkIn });
    expect(response.status).toBe(422);
    expect(Object.keys(response.body.error.fields)).toEqual([field]);
  });

  it('when the trip holds as many check-ins as it may, then one more is 400 limit_reached', async () => {
    const other = (await createTrip(owner.agent)).trip.id;
    ctx.db.transaction((tx) => {
      for (let i = 0; i < LIMITS.checkInsPerTrip; i++)
        insertCheckIn(tx, other, owner.userId, { ...READING, propane: [], harvestWh: null, note: '' }, NOW);
    });
    const response = await owner.agent.post(`/api/trips/${other}/check-ins`).send({ checkIn: READING });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('limit_reached');
  });
});
