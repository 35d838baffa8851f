// Every trip route × every kind of caller, each cell asserted: who may do what is the product's
// promise to a family sharing a plan, so it is checked exhaustively rather than by example.
import request, { type Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createClub, joinClubByInvite } from '../factories/club-factory';
import { createTestApp, signUpAgent, TEST_ORIGIN, type TestContext } from '../factories/test-app';
import {
  addAppliance,
  addStop,
  createTrip,
  getDetail,
  grant,
  LIGHTS,
  stopOnNextFreeDay,
} from '../factories/trip-factory';

/**
 * `clubReader`: no member, but in a club the owner shared the trip to. `removed`: a former planner (and
 * former owner, who shared the trip to a club of their own) whom the owner removed.
 */
const ACTORS = ['owner', 'planner', 'crew', 'viewer', 'clubReader', 'removed', 'stranger', 'anonymous'] as const;
type Actor = (typeof ACTORS)[number];
type Caller = { agent: Agent; userId: string };
type Cell = { method: 'get' | 'post' | 'patch' | 'put' | 'delete'; path: string; body?: object };
type World = {
  ctx: TestContext;
  tripId: string;
  /** The owner's club, which the trip is shared to and the club reader belongs to. */
  clubId: string;
  callers: Record<Exclude<Actor, 'anonymous'>, Caller>;
};
type Row = { name: string; prepare: (world: World, actor: Actor) => Promise<Cell>; expected: Record<Actor, number> };

/** Expected statuses by how much a route needs: read, editLoads, editTrip or owner-only. */
const needs = (level: 'read' | 'loads' | 'trip' | 'owner', ok = 200): Record<Actor, number> => ({
  owner: ok,
  planner: level === 'owner' ? 403 : ok,
  crew: level === 'read' || level === 'loads' ? ok : 403,
  viewer: level === 'read' ? ok : 403,
  // Reading through a club is reading as a viewer.
  clubReader: level === 'read' ? ok : 403,
  removed: 404,
  stranger: 404,
  anonymous: 401,
});

let world: World;

const owner = () => world.callers.owner.agent;
const base = () => `/api/trips/${world.tripId}`;

const READING = { at: '2027-06-10T18:00+01:00', socPct: 68, propane: [{ tank: 0, reading: { kind: 'full' } }] };

/**
 * A check-in the actor took when their role lets them take one (only its author may change it), else the owner's:
 * the refusal then comes from the role, before authorship is asked.
 */
async function readingBy(w: World, actor: Actor): Promise<{ id: string; version: number }> {
  const author = actor === 'planner' || actor === 'crew' ? w.callers[actor].agent : owner();
  const response = await author.post(`${base()}/check-ins`).send({ checkIn: READING });
  if (response.status !== 201) throw new Error(`check-in: ${response.status} ${response.text}`);
  return response.body as { id: string; version: number };
}

const ROWS: Row[] = [
  { name: 'GET trip', prepare: async () => ({ method: 'get', path: base() }), expected: needs('read') },
  { name: 'GET budget', prepare: async () => ({ method: 'get', path: `${base()}/budget` }), expected: needs('read') },
  { name: 'GET ledger', prepare: async () => ({ method: 'get', path: `${base()}/ledger` }), expected: needs('read') },
  {
    name: 'GET budget fixes',
    prepare: async () => ({ method: 'get', path: `${base()}/budget/fixes` }),
    expected: needs('read'),
  },
  { name: 'GET weather', prepare: async () => ({ method: 'get', path: `${base()}/weather` }), expected: needs('read') },
  {
    name: 'GET activity',
    prepare: async () => ({ method: 'get', path: `${base()}/activity` }),
    expected: needs('read'),
  },
  { name: 'GET members', prepare: async () => ({ method: 'get', path: `${base()}/members` }), expected: needs('read') },
  {
    name: 'POST duplicate',
    prepare: async () => ({ method: 'post', path: `${base()}/duplicate` }),
    expected: needs('read', 201),
  },
  {
    name: 'POST rig/save',
    prepare: async () => ({ method: 'post', path: `${base()}/rig/save`, body: { name: 'Kept rig' } }),
    expected: needs('read', 201),
  },
  {
    name: 'PATCH trip',
    prepare: async () => {
      const { trip } = await getDetail(owner(), world.tripId);
      return { method: 'patch', path: base(), body: { version: trip.version, notes: `edited ${Date.now()}` } };
    },
    expected: needs('trip'),
  },
  {
    name: 'DELETE trip',
    prepare: async () => {
      // A fresh trip per cell, with the same members, so one success does not spoil the next cell.
      const { trip } = await createTrip(owner(), { name: 'Doomed' });
      for (const role of ['planner', 'crew', 'viewer'] as const)
        grant(world.ctx.db, trip.id, world.callers[role].userId, role);
      await owner().post(`/api/clubs/${world.clubId}/trips`).send({ tripId: trip.id }).expect(201);
      return { method: 'delete', path: `/api/trips/${trip.id}` };
    },
    expected: needs('owner', 204),
  },
  {
    name: 'POST stop',
    prepare: async () => ({ method: 'post', path: `${base()}/stops`, body: { stop: stopOnNextFreeDay() } }),
    expected: needs('trip', 201),
  },
  {
    name: 'PATCH stop',
    prepare: async () => {
      const stop = (await getDetail(owner(), world.tripId)).stops[0];
      if (!stop) throw new Error('no stop');
      return {
        method: 'patch',
        path: `${base()}/stops/${stop.id}`,
        body: { version: stop.version, stop: { ...stop.stop, highC: stop.stop.highC + 0.5 } },
      };
    },
    expected: needs('trip'),
  },
  {
    name: 'DELETE stop',
    prepare: async () => {
      const stop = await addStop(owner(), world.tripId);
      return { method: 'delete', path: `${base()}/stops/${stop.id}` };
    },
    expected: needs('trip', 204),
  },
  {
    name: 'POST stops/reorder',
    prepare: async () => {
      const detail = await getDetail(owner(), world.tripId);
      return {
        method: 'post',
        path: `${base()}/stops/reorder`,
        body: { tripVersion: detail.trip.version, stopIds: detail.stops.map((s) => s.id) },
      };
    },
    expected: needs('trip'),
  },
  {
    name: 'PATCH drive',
    prepare: async () => {
      const drive = (await getDetail(owner(), world.tripId)).drives[0];
      if (!drive) throw new Error('no drive');
      return {
        method: 'patch',
        path: `${base()}/drives/${drive.id}`,
        body: { version: drive.version, drive: { hoursOnRoad: 1, vehicleCharging: !drive.drive.vehicleCharging } },
      };
    },
    expected: needs('trip'),
  },
  {
    name: 'PUT rig',
    prepare: async () => {
      const { rig } = await getDetail(owner(), world.tripId);
      return {
        method: 'put',
        path: `${base()}/rig`,
        body: { version: rig.version, rig: { ...rig.rig, name: `Rig ${Date.now()}` } },
      };
    },
    expected: needs('trip'),
  },
  {
    name: 'POST rig/replace',
    prepare: async (w, actor) => {
      const { rig } = await getDetail(owner(), world.tripId);
      // The replacement must be one of the caller's own saved rigs.
      const caller = actor === 'anonymous' ? w.callers.owner : w.callers[actor];
      const saved = await caller.agent.post('/api/rigs').send({ rig: { ...rig.rig, name: 'Spare' } });
      return { method: 'post', path: `${base()}/rig/replace`, body: { version: rig.version, rigId: saved.body.id } };
    },
    expected: needs('trip'),
  },
  {
    name: 'POST appliance',
    prepare: async () => ({ method: 'post', path: `${base()}/appliances`, body: { appliance: LIGHTS } }),
    expected: needs('loads', 201),
  },
  {
    name: 'PATCH appliance',
    prepare: async () => {
      const item = (await getDetail(owner(), world.tripId)).appliances[0];
      if (!item) throw new Error('no appliance');
      const { id: _id, ...fields } = item.appliance;
      return {
        method: 'patch',
        path: `${base()}/appliances/${item.id}`,
        body: { version: item.version, appliance: { ...fields, runningW: fields.runningW + 1 }, caretakerUserId: null },
      };
    },
    expected: needs('loads'),
  },
  {
    name: 'PUT appliance schedule',
    prepare: async () => {
      const item = (await getDetail(owner(), world.tripId)).appliances[0];
      if (!item) throw new Error('no appliance');
      return {
        method: 'put',
        path: `${base()}/appliances/${item.id}/schedule`,
        body: { version: item.version, schedule: { kind: 'always' } },
      };
    },
    expected: needs('loads'),
  },
  {
    name: 'DELETE appliance',
    prepare: async () => {
      const item = await addAppliance(owner(), world.tripId);
      return { method: 'delete', path: `${base()}/appliances/${item.id}` };
    },
    expected: needs('loads', 204),
  },
  {
    name: 'POST stop stay',
    prepare: async () => {
      const detail = await getDetail(owner(), world.tripId);
      const last = detail.stops[detail.stops.length - 1];
      if (!last) throw new Error('no stop');
      return {
        method: 'post',
        path: `${base()}/stops/${last.id}/stay`,
        body: { tripVersion: detail.trip.version, nights: 1, mode: 'shift-rest' },
      };
    },
    expected: needs('trip'),
  },
  {
    name: 'POST calibration',
    prepare: async () => {
      const detail = await getDetail(owner(), world.tripId);
      const stop = detail.stops[0];
      if (!stop) throw new Error('no stop');
      return {
        method: 'post',
        path: `${base()}/calibration`,
        body: {
          stopId: stop.id,
          stopVersion: stop.version,
          skyOpennessPct: 50,
          loadScale: 1,
          appliances: detail.appliances.map((a) => ({ id: a.id, version: a.version })),
        },
      };
    },
    expected: needs('trip'),
  },
  {
    name: 'GET check-ins',
    prepare: async () => ({ method: 'get', path: `${base()}/check-ins` }),
    expected: needs('read'),
  },
  {
    name: 'POST check-in',
    prepare: async () => ({ method: 'post', path: `${base()}/check-ins`, body: { checkIn: READING } }),
    expected: needs('loads', 201),
  },
  {
    name: 'PATCH own check-in',
    prepare: async (w, actor) => {
      const { id, version } = await readingBy(w, actor);
      return {
        method: 'patch',
        path: `${base()}/check-ins/${id}`,
        body: { version, checkIn: { ...READING, socPct: 61 } },
      };
    },
    expected: needs('loads'),
  },
  {
    name: 'DELETE own check-in',
    prepare: async (w, actor) => {
      const { id } = await readingBy(w, actor);
      return { method: 'delete', path: `${base()}/check-ins/${id}` };
    },
    expected: needs('loads', 204),
  },
  {
    name: 'PATCH member role',
    prepare: async (w) => {
      const extra = await signUpAgent(w.ctx.app, 'Extra');
      grant(w.ctx.db, world.tripId, extra.userId, 'viewer');
      return { method: 'patch', path: `${base()}/members/${extra.userId}`, body: { role: 'crew' } };
    },
    expected: needs('owner'),
  },
  { name: 'GET invites', prepare: async () => ({ method: 'get', path: `${base()}/invites` }), expected: needs('trip') },
  {
    name: 'POST invite (as viewer)',
    prepare: async () => ({
      method: 'post',
      path: `${base()}/invites`,
      body: { email: `guest-${crypto.randomUUID()}@example.test`, role: 'viewer' },
    }),
    expected: needs('trip', 201),
  },
  {
    name: 'POST invite resend',
    prepare: async () => {
      const created = await owner()
        .post(`${base()}/invites`)
        .send({ email: `resend-${crypto.randomUUID()}@example.test`, role: 'crew' });
      return { method: 'post', path: `${base()}/invites/${created.body.invite.id}/resend` };
    },
    expected: needs('owner'),
  },
  {
    name: 'DELETE invite',
    prepare: async () => {
      const created = await owner()
        .post(`${base()}/invites`)
        .send({ email: `revoke-${crypto.randomUUID()}@example.test`, role: 'crew' });
      return { method: 'delete', path: `${base()}/invites/${created.body.invite.id}` };
    },
    expected: needs('owner', 204),
  },
  {
    name: 'POST copy onto my rig',
    prepare: async (w, actor) => {
      const { rig } = await getDetail(owner(), world.tripId);
      const caller = actor === 'anonymous' ? w.callers.owner : w.callers[actor];
      const saved = await caller.agent.post('/api/rigs').send({ rig: { ...rig.rig, name: 'Mine' } });
      return { method: 'post', path: `${base()}/copy`, body: { rigId: saved.body.id } };
    },
    expected: needs('read', 201),
  },
  {
    name: 'GET shares (clubs the trip is shared with)',
    prepare: async () => ({ method: 'get', path: `${base()}/shares` }),
    expected: needs('trip'),
  },
  {
    name: 'POST share to a club the caller organises',
    prepare: async (w, actor) => {
      const caller = actor === 'anonymous' ? w.callers.owner : w.callers[actor];
      const clubId = await createClub(caller.agent, `${actor}'s club`);
      return { method: 'post', path: `/api/clubs/${clubId}/trips`, body: { tripId: world.tripId } };
    },
    expected: needs('owner', 201),
  },
  {
    name: 'DELETE share (withdraw from a club)',
    prepare: async () => {
      const clubId = await createClub(owner(), 'Short-lived club');
      await owner().post(`/api/clubs/${clubId}/trips`).send({ tripId: world.tripId }).expect(201);
      return { method: 'delete', path: `${base()}/shares/${clubId}` };
    },
    expected: needs('owner', 204),
  },
  {
    name: 'DELETE member',
    prepare: async (w) => {
      const extra = await signUpAgent(w.ctx.app, 'Extra');
      grant(w.ctx.db, world.tripId, extra.userId, 'viewer');
      return { method: 'delete', path: `${base()}/members/${extra.userId}` };
    },
    expected: needs('owner', 204),
  },
];

/**
 * The removed actor took every road back in that the app offers: they held the trip as owner, shared it
 * to their own club and handed it back, staying on as planner, before the owner removed them.
 */
async function removeAfterSharing(ctx: TestContext, tripId: string, ownerCaller: Caller, removed: Caller) {
  grant(ctx.db, tripId, removed.userId, 'planner');
  await ownerCaller.agent.post(`/api/trips/${tripId}/members/hand-over`).send({ userId: removed.userId }).expect(200);
  const theirClub = await createClub(removed.agent, 'Their own club');
  await removed.agent.post(`/api/clubs/${theirClub}/trips`).send({ tripId }).expect(201);
  await removed.agent.post(`/api/trips/${tripId}/members/hand-over`).send({ userId: ownerCaller.userId }).expect(200);
  await ownerCaller.agent.delete(`/api/trips/${tripId}/members/${removed.userId}`).expect(204);
}

beforeAll(async () => {
  const ctx = createTestApp();
  const [ownerCaller, planner, crew, viewer, removed, stranger] = await Promise.all(
    ['Owner', 'Planner', 'Crew', 'Viewer', 'Removed', 'Stranger'].map((name) => signUpAgent(ctx.app, name)),
  );
  if (!ownerCaller || !planner || !crew || !viewer || !removed || !stranger) throw new Error('sign-up failed');
  const { trip } = await createTrip(ownerCaller.agent);
  grant(ctx.db, trip.id, planner.userId, 'planner');
  grant(ctx.db, trip.id, crew.userId, 'crew');
  grant(ctx.db, trip.id, viewer.userId, 'viewer');
  const clubId = await createClub(ownerCaller.agent, 'Matrix club');
  await ownerCaller.agent.post(`/api/clubs/${clubId}/trips`).send({ tripId: trip.id }).expect(201);
  const clubReader = await joinClubByInvite(ctx, ownerCaller.agent, clubId, 'Club Reader');
  await removeAfterSharing(ctx, trip.id, ownerCaller, removed);
  world = {
    ctx,
    tripId: trip.id,
    clubId,
    callers: { owner: ownerCaller, planner, crew, viewer, clubReader, removed, stranger },
  };
  await addStop(ownerCaller.agent, trip.id);
  await addStop(ownerCaller.agent, trip.id);
  await addAppliance(ownerCaller.agent, trip.id);
});
afterAll(() => world?.ctx.close());

describe.each(ROWS)('$name', (row) => {
  it.each(ACTORS)('when called by %s, then the status is as the role rules say', async (actor) => {
    const cell = await row.prepare(world, actor);
    const client =
      actor === 'anonymous' ? request.agent(world.ctx.app).set('Origin', TEST_ORIGIN) : world.callers[actor].agent;
    const pending = client[cell.method](cell.path);
    const response = await (cell.body ? pending.send(cell.body) : pending);
    expect({ actor, status: response.status, body: response.status >= 400 ? response.body : undefined }).toMatchObject({
      actor,
      status: row.expected[actor],
    });
    if (response.status >= 400)
      expect(response.body.error).toEqual(
        expect.objectContaining({ code: expect.any(String), message: expect.any(String) }),
      );
  });
});
