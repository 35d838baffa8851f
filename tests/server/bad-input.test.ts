// Malformed bodies on every write route, the account routes included: whatever a client sends, the answer is
// never a 5xx and never carries a stack trace; a refused write leaves the database exactly as it was (checked
// after every request); our own routes answer 4xx with the stable error body. Over 5,000 bodies, deterministic.
import crypto from 'node:crypto';
import type { Server } from 'node:http';
import fc from 'fast-check';
import request, { type Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import * as api from '@/shared/schemas/api';
import * as sharing from '@/shared/schemas/sharing';
import { preferencesSchema } from '@/server/routes/preferences';
import { createTestApp, TEST_ORIGIN, TEST_PASSWORD, type TestContext } from '../factories/test-app';
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

const ORIGIN = TEST_ORIGIN;
const PASSWORD = TEST_PASSWORD;
/**
 * Bodies per route with a JSON body, per route that takes none, per account route, and per account route that
 * checks a password (each such check costs a deliberately slow hash).
 */
const RUNS = { body: 190, bodiless: 15, account: 150, passwordChecked: 40, gpx: 30 };
/** Several hundred requests per test on a shared machine. */
const FUZZ_TIMEOUT_MS = 90_000;

let ctx: TestContext;
let server: Server;
let agent: Agent;
/** A second account, for the account routes that need a session (change-password, update-user). */
let accountAgent: Agent;
let ownerEmail: string;
let sent = 0;
let newAccounts = 0;
/** The database as the last request left it, so each request hashes it once. */
let lastFingerprint = '';
let tripId: string;
let ids: {
  stop: string;
  drive: string;
  appliance: string;
  member: string;
  savedRig: string;
  club: string;
  invite: string;
  feed: string;
};
let snapshot: Awaited<ReturnType<typeof getDetail>>;

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
    name: 'POST calibration',
    method: 'post',
    path: () => `/api/trips/${tripId}/calibration`,
    schema: api.applyCalibrationRequestSchema,
    valid: () => ({
      stopId: snapshot.stops[0]?.id,
      stopVersion: snapshot.stops[0]?.version,
      skyOpennessPct: 50,
      loadScale: 1,
      appliances: snapshot.appliances.map((a) => ({ id: a.id, version: a.version })),
    }),
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

/** Write routes that take no body: only text that is not JSON at all can be malformed there. */
const BODILESS: { name: string; method: 'post' | 'delete'; path: () => string }[] = [
  { name: 'POST duplicate', method: 'post', path: () => `/api/trips/${tripId}/duplicate` },
  { name: 'POST based-on/seen', method: 'post', path: () => `/api/trips/${tripId}/based-on/seen` },
  { name: 'POST invite resend', method: 'post', path: () => `/api/trips/${tripId}/invites/${ids.invite}/resend` },
  { name: 'POST invite accept', method: 'post', path: () => `/api/invites/${'a'.repeat(43)}/accept` },
  { name: 'POST club invite accept', method: 'post', path: () => `/api/club-invites/${'a'.repeat(43)}/accept` },
  { name: 'DELETE trip', method: 'delete', path: () => `/api/trips/${tripId}` },
  { name: 'DELETE stop', method: 'delete', path: () => `/api/trips/${tripId}/stops/${ids.stop}` },
  { name: 'DELETE appliance', method: 'delete', path: () => `/api/trips/${tripId}/appliances/${ids.appliance}` },
  { name: 'DELETE member', method: 'delete', path: () => `/api/trips/${tripId}/members/${ids.member}` },
  { name: 'DELETE invite', method: 'delete', path: () => `/api/trips/${tripId}/invites/${ids.invite}` },
  { name: 'DELETE /rigs/:id', method: 'delete', path: () => `/api/rigs/${ids.savedRig}` },
  { name: 'DELETE club trip', method: 'delete', path: () => `/api/clubs/${ids.club}/trips/${tripId}` },
  { name: 'DELETE trip share', method: 'delete', path: () => `/api/trips/${tripId}/shares/${ids.club}` },
  {
    name: 'POST club invite resend',
    method: 'post',
    path: () => `/api/clubs/${ids.club}/invites/${ids.invite}/resend`,
  },
  { name: 'POST calendar feed', method: 'post', path: () => `/api/trips/${tripId}/calendar-feeds` },
  { name: 'DELETE calendar feed', method: 'delete', path: () => `/api/trips/${tripId}/calendar-feeds/${ids.feed}` },
];

/** The routes that read a GPX file rather than JSON. */
const GPX_ROUTES = [
  { name: 'POST gpx/preview', path: () => `/api/trips/${tripId}/gpx/preview` },
  { name: 'POST gpx/import', path: () => `/api/trips/${tripId}/gpx/import?tripVersion=1&replace=true` },
];

/** GPX that is broken: cut short, not XML, XML of another kind, or waypoints with impossible positions. */
const badGpx = fc.oneof(
  fc.constantFrom(
    '<gpx',
    '<?xml version="1.0"?><gpx version="1.1"><wpt lat="91" lon="0"><name>x</name></wpt></gpx>',
    '<?xml version="1.0"?><gpx version="1.1"><wpt lat="a" lon="b"/></gpx>',
    '<?xml version="1.0"?><kml></kml>',
    '<gpx version="1.1"><trk><trkseg><trkpt lat="1" lon="1"></trkseg></trk></gpx>',
    '<!DOCTYPE gpx [<!ENTITY x "xx">]><gpx>&x;&x;</gpx>',
  ),
  fc.string({ minLength: 1, maxLength: 200 }),
  // Every waypoint off the globe (a latitude past a pole or a longitude past the date line), or not a number.
  fc
    .array(
      fc.oneof(
        fc.tuple(
          fc.double().filter((lat) => !(Math.abs(lat) <= 90)),
          fc.double({ min: -180, max: 180 }),
        ),
        fc.tuple(
          fc.double({ min: -90, max: 90 }),
          fc.double().filter((lon) => !(Math.abs(lon) <= 180)),
        ),
      ),
      { minLength: 1, maxLength: 5 },
    )
    .map(
      (points) =>
        `<gpx version="1.1" xmlns="http://www.topografix.com/GPX/1/1">${points
          .map(([lat, lon]) => `<wpt lat="${lat}" lon="${lon}"><name>p</name></wpt>`)
          .join('')}</gpx>`,
    ),
);

/**
 * The account routes (better-auth's), with their bodies as the screens send them. `schema` is the body the product
 * means to take, strict: a body it refuses is malformed. The library may still take some of those (an extra
 * field, a long name); then the write happens and the check moves on from the new state.
 */
type AccountRoute = {
  name: string;
  path: string;
  signedIn: boolean;
  checksPassword: boolean;
  schema: z.ZodType;
  valid: () => Record<string, unknown>;
};

const newPassword = z.string().min(8).max(128);
const ACCOUNT_ROUTES: AccountRoute[] = [
  {
    name: 'POST sign-up/email',
    path: '/api/auth/sign-up/email',
    signedIn: false,
    checksPassword: false,
    schema: z.object({ name: z.string().trim().min(1).max(80), email: z.email(), password: newPassword }).strict(),
    valid: () => ({ name: 'New Traveller', email: `fuzz-new-${(newAccounts += 1)}@example.test`, password: PASSWORD }),
  },
  {
    name: 'POST sign-in/email',
    path: '/api/auth/sign-in/email',
    signedIn: false,
    checksPassword: true,
    schema: z.object({ email: z.email(), password: z.string().min(1).max(128) }).strict(),
    valid: () => ({ email: ownerEmail, password: PASSWORD }),
  },
  {
    name: 'POST request-password-reset',
    path: '/api/auth/request-password-reset',
    signedIn: false,
    checksPassword: false,
    schema: z.object({ email: z.email(), redirectTo: z.string().max(200) }).strict(),
    valid: () => ({ email: ownerEmail, redirectTo: `${ORIGIN}/reset-password` }),
  },
  {
    name: 'POST reset-password',
    path: '/api/auth/reset-password',
    signedIn: false,
    checksPassword: false,
    schema: z.object({ newPassword, token: z.string().min(1).max(200) }).strict(),
    valid: () => ({ newPassword: 'another-horse-battery', token: 'not-a-token-we-issued' }),
  },
  {
    name: 'POST change-password',
    path: '/api/auth/change-password',
    signedIn: true,
    checksPassword: true,
    schema: z
      .object({ currentPassword: z.string().min(1).max(128), newPassword, revokeOtherSessions: z.boolean() })
      .strict(),
    valid: () => ({ currentPassword: PASSWORD, newPassword: 'another-horse-battery', revokeOtherSessions: false }),
  },
  {
    name: 'POST update-user',
    path: '/api/auth/update-user',
    signedIn: true,
    checksPassword: false,
    schema: z.object({ name: z.string().trim().min(1).max(80) }).strict(),
    valid: () => ({ name: 'Renamed Traveller' }),
  },
];

const badValue = fc.oneof(
  fc.string({ maxLength: 20 }),
  fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e309', '', ' ', '0x10', '<script>', '\u0000', '\ud800'),
  fc.integer({ min: -1_000_000, max: -1 }),
  fc.integer({ min: 1_000_000, max: Number.MAX_SAFE_INTEGER }),
  fc.double(),
  fc.constant(null),
  fc.boolean(),
  fc.string({ minLength: 2_000, maxLength: 4_000 }),
  fc.array(fc.integer(), { maxLength: 3 }),
  fc.array(fc.constant(0), { minLength: 500, maxLength: 2_000 }),
  fc.dictionary(fc.string({ maxLength: 5 }), fc.integer(), { maxKeys: 3 }),
);

/** Text that is not JSON: cut short, single-quoted, a bare word, stray bytes. */
const notJson = fc
  .oneof(
    fc.constantFrom('{', '{"a":', '[1,', 'nul', '{"name":"x"', "{'a':1}", '\u0000', '{"a":1}}', '--', '{"a":01}'),
    fc.string({ minLength: 1, maxLength: 40 }),
  )
  .filter((text) => {
    try {
      JSON.parse(text);
      return false;
    } catch {
      return true;
    }
  });

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

/** Bodies as the text sent: a valid body with one part broken, an extra field, anything at all, or not JSON. */
function malformedBodies(schema: z.ZodType, valid: Json): fc.Arbitrary<string> {
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
  const json = fc
    .oneof(mutated, unknownField, fc.anything({ maxDepth: 2 }))
    // Keep only bodies the schema refuses.
    .filter((body) => !schema.safeParse(body).success)
    // JSON has no undefined: such a body goes out empty.
    .map((body) => JSON.stringify(body) ?? '');
  return fc.oneof({ weight: 9, arbitrary: json }, { weight: 1, arbitrary: notJson });
}

/** A hash of every row the app owns (sessions and verification tokens excluded: reading may refresh them). */
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

const STACK_TRACE = /\n\s+at\s|node_modules|\.(ts|js|mjs):\d+/;

/**
 * Sends one malformed body and checks the answer: never 5xx, never a stack trace; refused, the database is as
 * before. Returns the status, so a route's own expectations can be added.
 */
async function sendMalformed(
  client: Agent | ReturnType<typeof request>,
  method: 'post' | 'patch' | 'put' | 'delete',
  path: string,
  text: string,
  contentType = 'application/json',
): Promise<{ status: number; body: unknown }> {
  const response = await client[method](path).set('Content-Type', contentType).set('Origin', ORIGIN).send(text);
  sent += 1;
  const what = `${method.toUpperCase()} ${path} ${text.slice(0, 120)}`;
  expect(response.status, what).toBeLessThan(500);
  expect(response.text, what).not.toMatch(STACK_TRACE);
  const after = databaseFingerprint();
  if (response.status >= 400) expect(after, `${what} changed the database`).toBe(lastFingerprint);
  // A body the library took (an account route) changed the database on purpose: compare the next with that.
  lastFingerprint = after;
  return { status: response.status, body: response.body };
}

async function signUp(name: string, email: string): Promise<Agent> {
  // Every change must say it comes from the app's own page, as a browser's would.
  const client = request.agent(server).set('Origin', ORIGIN);
  const response = await client.post('/api/auth/sign-up/email').send({ name, email, password: PASSWORD });
  if (response.status !== 200) throw new Error(`sign-up failed: ${response.status} ${response.text}`);
  return client;
}

beforeAll(async () => {
  ctx = createTestApp();
  server = ctx.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  ownerEmail = `fuzz-owner-${Date.now()}@example.test`;
  agent = await signUp('Owner', ownerEmail);
  const memberEmail = `fuzz-member-${Date.now()}@example.test`;
  const member = await signUp('Member', memberEmail);
  accountAgent = await signUp('Account holder', `fuzz-account-${Date.now()}@example.test`);
  const memberId = (await member.get('/api/auth/get-session')).body.user.id as string;
  const { trip } = await createTrip(agent);
  tripId = trip.id;
  grant(ctx.db, tripId, memberId, 'viewer');
  const stop = await addStop(agent, tripId);
  await addStop(agent, tripId);
  const appliance = await addAppliance(agent, tripId);
  snapshot = await getDetail(agent, tripId);
  const saved = await agent.post('/api/rigs').send({ rig: snapshot.rig.rig });
  const club = await agent.post('/api/clubs').send({ name: 'Fuzz club' });
  const invite = await agent.post(`/api/trips/${tripId}/invites`).send({ email: 'invitee@example.test', role: 'crew' });
  const feed = await agent.post(`/api/trips/${tripId}/calendar-feeds`).send();
  ids = {
    stop: stop.id,
    drive: snapshot.drives[0]?.id ?? '',
    appliance: appliance.id,
    member: memberId,
    savedRig: saved.body.id,
    club: club.body.club.id,
    invite: invite.body.invite?.id ?? invite.body.id,
    feed: feed.body.feed?.id ?? feed.body.id,
  };
  lastFingerprint = databaseFingerprint();
});
afterAll(() => {
  server?.close();
  ctx?.close();
});

describe.each(ROUTES)('$name', (route) => {
  it(
    'when the body is malformed in any way, then 4xx with the error body, no trace, and the database unchanged',
    async () => {
      await fc.assert(
        fc.asyncProperty(malformedBodies(route.schema, route.valid()), async (text) => {
          const { status, body } = await sendMalformed(agent, route.method, route.path(), text);
          expect(status, text.slice(0, 200)).toBeGreaterThanOrEqual(400);
          expect((body as { error?: { code?: unknown } }).error?.code).toEqual(expect.any(String));
        }),
        { numRuns: RUNS.body, seed: 20261201 },
      );
    },
    FUZZ_TIMEOUT_MS,
  );
});

describe.each(BODILESS)('$name', (route) => {
  it(
    'when the body is not JSON at all, then 400 with the error body and the database unchanged',
    async () => {
      await fc.assert(
        fc.asyncProperty(notJson, async (text) => {
          const { status, body } = await sendMalformed(agent, route.method, route.path(), text);
          expect(status).toBe(400);
          expect((body as { error?: { code?: unknown } }).error?.code).toBe('bad_request');
        }),
        { numRuns: RUNS.bodiless, seed: 20261202 },
      );
    },
    FUZZ_TIMEOUT_MS,
  );
});

describe.each(GPX_ROUTES)('$name', (route) => {
  it(
    'when the GPX file is broken, then 4xx with the error body and the database unchanged',
    async () => {
      await fc.assert(
        fc.asyncProperty(badGpx, async (text) => {
          const { status, body } = await sendMalformed(agent, 'post', route.path(), text, 'application/gpx+xml');
          expect(status, text.slice(0, 200)).toBeGreaterThanOrEqual(400);
          expect((body as { error?: { code?: unknown } }).error?.code).toEqual(expect.any(String));
        }),
        { numRuns: RUNS.gpx, seed: 20261204 },
      );
    },
    FUZZ_TIMEOUT_MS,
  );
});

describe.each(ACCOUNT_ROUTES)('$name', (route) => {
  it(
    'when the body is malformed in any way, then no 5xx, no trace, and a refusal changes nothing',
    async () => {
      await fc.assert(
        fc.asyncProperty(malformedBodies(route.schema, route.valid()), async (text) => {
          // Signed-out routes go without cookies, so a sign-in that the library accepts does not change who is fuzzing.
          await sendMalformed(route.signedIn ? accountAgent : request(server), 'post', route.path, text);
        }),
        { numRuns: route.checksPassword ? RUNS.passwordChecked : RUNS.account, seed: 20261203 },
      );
    },
    FUZZ_TIMEOUT_MS,
  );

  it('when the body is well formed, then the route still works (the refusals above are about the bodies)', async () => {
    const response = await (route.signedIn ? accountAgent : request(server))
      .post(route.path)
      .set('Origin', ORIGIN)
      .send(route.valid());
    // Neither the origin nor the session stands in the way: the fuzzing above reached the route's own checks.
    expect([401, 403]).not.toContain(response.status);
    expect(response.status).toBeLessThan(500);
    expect(response.text).not.toMatch(STACK_TRACE);
    lastFingerprint = databaseFingerprint();
  });
});

describe('account bodies', () => {
  it('when an account update gives the picture as a list instead of text, then 400 and nothing changes', async () => {
    const before = databaseFingerprint();
    const response = await accountAgent
      .post('/api/auth/update-user')
      .set('Origin', ORIGIN)
      .send({ image: new Array(2_000).fill(0) });
    expect(response.status).toBe(400);
    expect(databaseFingerprint()).toBe(before);
  });

  it('when an account update names the person with a list instead of text, then 400 and nothing changes', async () => {
    const before = databaseFingerprint();
    const response = await accountAgent
      .post('/api/auth/update-user')
      .set('Origin', ORIGIN)
      .send({ name: new Array(2_000).fill(0) });
    expect(response.status).toBe(400);
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

// Last in the file, so it counts every body the suites above sent.
describe('the whole suite', () => {
  it('when every route has been fuzzed, then over 5,000 malformed bodies were sent', () => {
    expect(sent).toBeGreaterThanOrEqual(5_000);
  });
});
