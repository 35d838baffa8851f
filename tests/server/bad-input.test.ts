// Malformed bodies on every write route: whatever a client sends, the answer is a 4xx with the
// stable error body, never a 500, and the database is exactly as it was.
import crypto from 'node:crypto';
import fc from 'fast-check';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import * as api from '@/shared/schemas/api';
import * as sharing from '@/shared/schemas/sharing';
import { preferencesSchema } from '@/server/routes/preferences';
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

type Route = {
  name: string;
  method: 'post' | 'patch' | 'put';
  path: () => string;
  schema: z.ZodType;
  valid: () => Record<string, unknown>;
};

let ctx: TestContext;
let agent: Agent;
let tripId: string;
let ids: { stop: string; drive: string; appliance: string; member: string; savedRig: string; club: string };
let snapshot: Awaited<ReturnType<typeof getDetail>>;

/** A hash of every row the app owns (auth sessions excluded: reading them may refresh them). */
function databaseFingerprint(): string {
  const sqlite = ctx.db.$client;
  const tables = sqlite
    .prepare(
      "select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not like '__drizzle%' and name not in ('session', 'verification') order by name",
    )
    .all() as { name: string }[];
  const hash = crypto.createHash('sha256');
  for (const { name } of tables)
    hash.update(name + JSON.stringify(sqlite.prepare(`select * from "${name}" order by rowid`).all()));
  return hash.digest('hex');
}

const ROUTES: Route[] = [
  {
    name: 'POST /trips',
    method: 'post',
    path: () => '/api/trips',
    schema: api.createTripRequestSchema,
    valid: () => ({
      name: 'T',
      startDate: '2027-06-01',
      endDate: '2027-06-05',
      timeZone: 'Europe/London',
      rigSource: { kind: 'preset', presetId: 'van-small' },
    }),
  },
  {
    name: 'PATCH /trips/:id',
    method: 'patch',
    path: () => `/api/trips/${tripId}`,
    schema: api.updateTripRequestSchema,
    valid: () => ({ version: snapshot.trip.version, name: 'Renamed' }),
  },
  {
    name: 'POST stops',
    method: 'post',
    path: () => `/api/trips/${tripId}/stops`,
    schema: api.createStopRequestSchema,
    valid: () => ({ stop: stopOnNextFreeDay() }),
  },
  {
    name: 'PATCH stop',
    method: 'patch',
    path: () => `/api/trips/${tripId}/stops/${ids.stop}`,
    schema: api.updateStopRequestSchema,
    valid: () => ({ version: snapshot.stops[0]?.version, stop: snapshot.stops[0]?.stop }),
  },
  {
    name: 'POST reorder',
    method: 'post',
    path: () => `/api/trips/${tripId}/stops/reorder`,
    schema: api.reorderStopsRequestSchema,
    valid: () => ({ tripVersion: snapshot.trip.version, stopIds: snapshot.stops.map((s) => s.id) }),
  },
  {
    name: 'PATCH drive',
    method: 'patch',
    path: () => `/api/trips/${tripId}/drives/${ids.drive}`,
    schema: api.updateDriveRequestSchema,
    valid: () => ({ version: 1, drive: { hoursOnRoad: 1, vehicleCharging: true } }),
  },
  {
    name: 'POST appliance',
    method: 'post',
    path: () => `/api/trips/${tripId}/appliances`,
    schema: api.createApplianceRequestSchema,
    valid: () => ({ appliance: LIGHTS }),
  },
  {
    name: 'PATCH appliance',
    method: 'patch',
    path: () => `/api/trips/${tripId}/appliances/${ids.appliance}`,
    schema: api.updateApplianceRequestSchema,
    valid: () => ({ version: 1, appliance: LIGHTS, caretakerUserId: null }),
  },
  {
    name: 'PUT schedule',
    method: 'put',
    path: () => `/api/trips/${tripId}/appliances/${ids.appliance}/schedule`,
    schema: api.updateScheduleRequestSchema,
    valid: () => ({ version: 1, schedule: { kind: 'always' } }),
  },
  {
    name: 'PUT trip rig',
    method: 'put',
    path: () => `/api/trips/${tripId}/rig`,
    schema: api.updateRigRequestSchema,
    valid: () => ({ version: snapshot.rig.version, rig: snapshot.rig.rig }),
  },
  {
    name: 'POST rig/save',
    method: 'post',
    path: () => `/api/trips/${tripId}/rig/save`,
    schema: api.saveTripRigRequestSchema,
    valid: () => ({ name: 'Saved' }),
  },
  {
    name: 'POST rig/replace',
    method: 'post',
    path: () => `/api/trips/${tripId}/rig/replace`,
    schema: api.replaceTripRigRequestSchema,
    valid: () => ({ version: snapshot.rig.version, rigId: ids.savedRig }),
  },
  {
    name: 'PATCH member',
    method: 'patch',
    path: () => `/api/trips/${tripId}/members/${ids.member}`,
    schema: api.updateMemberRoleRequestSchema,
    valid: () => ({ role: 'crew' }),
  },
  {
    name: 'POST /rigs',
    method: 'post',
    path: () => '/api/rigs',
    schema: api.createRigRequestSchema,
    valid: () => ({ rig: snapshot.rig.rig }),
  },
  {
    name: 'PUT /rigs/:id',
    method: 'put',
    path: () => `/api/rigs/${ids.savedRig}`,
    schema: api.updateRigRequestSchema,
    valid: () => ({ version: 1, rig: snapshot.rig.rig }),
  },
  {
    name: 'POST invite',
    method: 'post',
    path: () => `/api/trips/${tripId}/invites`,
    schema: sharing.createInviteRequestSchema,
    valid: () => ({ email: 'new@example.test', role: 'crew' }),
  },
  {
    name: 'POST hand-over',
    method: 'post',
    path: () => `/api/trips/${tripId}/members/hand-over`,
    schema: sharing.handOverRequestSchema,
    valid: () => ({ userId: ids.member }),
  },
  {
    name: 'POST copy',
    method: 'post',
    path: () => `/api/trips/${tripId}/copy`,
    schema: sharing.copyTripRequestSchema,
    valid: () => ({ rigId: ids.savedRig }),
  },
  {
    name: 'POST /clubs',
    method: 'post',
    path: () => '/api/clubs',
    schema: sharing.createClubRequestSchema,
    valid: () => ({ name: 'Club' }),
  },
  {
    name: 'POST club invites',
    method: 'post',
    path: () => `/api/clubs/${ids.club}/invites`,
    schema: sharing.clubInviteRequestSchema,
    valid: () => ({ addresses: 'a@example.test' }),
  },
  {
    name: 'POST club trips',
    method: 'post',
    path: () => `/api/clubs/${ids.club}/trips`,
    schema: sharing.shareTripRequestSchema,
    valid: () => ({ tripId }),
  },
  {
    name: 'PUT /me/preferences',
    method: 'put',
    path: () => '/api/me/preferences',
    schema: preferencesSchema,
    valid: () => ({ units: 'us' }),
  },
];

const badValue = fc.oneof(
  fc.string({ maxLength: 20 }),
  fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e309', '', ' ', '0x10', '<script>'),
  fc.integer({ min: -1_000_000, max: -1 }),
  fc.double(),
  fc.constant(null),
  fc.boolean(),
  fc.string({ minLength: 2_000, maxLength: 4_000 }),
  fc.array(fc.integer(), { maxLength: 3 }),
  fc.dictionary(fc.string({ maxLength: 5 }), fc.integer(), { maxKeys: 3 }),
);

type Json = Record<string, unknown>;

/** Paths to every leaf of a valid body, so a mutation can hit nested fields too. */
function leafPaths(value: unknown, prefix: string[] = []): string[][] {
  if (value === null || typeof value !== 'object') return [prefix];
  const entries = Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value);
  return [prefix, ...entries.flatMap(([key, v]) => leafPaths(v, [...prefix, key]))];
}

function mutate(body: Json, path: string[], change: { kind: 'set'; value: unknown } | { kind: 'delete' }): unknown {
  if (path.length === 0) return change.kind === 'set' ? change.value : undefined;
  const copy: Json = JSON.parse(JSON.stringify(body));
  let node: Json = copy;
  for (const key of path.slice(0, -1)) node = node[key] as Json;
  const last = path[path.length - 1] as string;
  if (change.kind === 'set') node[last] = change.value;
  else delete node[last];
  return copy;
}

function malformedBodies(route: Route) {
  const valid = route.valid();
  const paths = leafPaths(valid);
  const mutated = fc
    .tuple(
      fc.constantFrom(...paths),
      fc.oneof(
        badValue.map((value) => ({ kind: 'set' as const, value })),
        fc.constant({ kind: 'delete' as const }),
      ),
    )
    .map(([path, change]) => mutate(valid, path, change));
  const unknownField = fc
    .string({ minLength: 1, maxLength: 12 })
    .filter((key) => !(key in valid))
    .map((key) => ({ ...valid, [key]: 1 }));
  return (
    fc
      .oneof(mutated, unknownField, fc.anything({ maxDepth: 2 }))
      // Keep only bodies the shared schema refuses: those must never change anything.
      .filter((body) => !route.schema.safeParse(body).success)
  );
}

beforeAll(async () => {
  ctx = createTestApp();
  const owner = await signUpAgent(ctx.app, 'Owner');
  const member = await signUpAgent(ctx.app, 'Member');
  agent = owner.agent;
  const { trip } = await createTrip(agent);
  tripId = trip.id;
  grant(ctx.db, tripId, member.userId, 'viewer');
  const stop = await addStop(agent, tripId);
  await addStop(agent, tripId);
  const appliance = await addAppliance(agent, tripId);
  snapshot = await getDetail(agent, tripId);
  const saved = await agent.post('/api/rigs').send({ rig: snapshot.rig.rig });
  const club = await agent.post('/api/clubs').send({ name: 'Fuzz club' });
  ids = {
    stop: stop.id,
    drive: snapshot.drives[0]?.id ?? '',
    appliance: appliance.id,
    member: member.userId,
    savedRig: saved.body.id,
    club: club.body.club.id,
  };
});
afterAll(() => ctx.close());

describe.each(ROUTES)('$name', (route) => {
  it('when the body is malformed in any way, then the answer is 4xx with the error body and the database is unchanged', async () => {
    const before = databaseFingerprint();
    await fc.assert(
      fc.asyncProperty(malformedBodies(route), async (body) => {
        // JSON has no undefined: such a body goes out empty.
        const text = JSON.stringify(body) ?? '';
        const response = await agent[route.method](route.path()).set('Content-Type', 'application/json').send(text);
        expect(response.status, text.slice(0, 200)).toBeGreaterThanOrEqual(400);
        expect(response.status).toBeLessThan(500);
        expect(response.body.error.code).toEqual(expect.any(String));
      }),
      { numRuns: 40, seed: 20261201 },
    );
    expect(databaseFingerprint()).toBe(before);
  });
});

describe('request limits', () => {
  it('when a body is larger than the limit, then 413 with the error body', async () => {
    const response = await agent.post(`/api/trips/${tripId}/rig/save`).send({ name: 'x'.repeat(200_000) });
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('payload_too_large');
  });

  it('when a path id is absurd, then 404, never 500', async () => {
    const response = await agent.get(`/api/trips/${'x'.repeat(500)}`);
    expect(response.status).toBe(404);
  });
});
