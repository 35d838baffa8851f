import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { senderOrigin } from '@/server/middleware/require-trusted-origin';
import { trustedOrigins } from '@/server/trusted-origins';
import { createTestApp, signUpAgent, TEST_ORIGIN, type TestContext } from '../factories/test-app';
import { createTrip } from '../factories/trip-factory';

let ctx: TestContext;
let cookie: string;
let tripId: string;

beforeAll(async () => {
  ctx = createTestApp();
  const owner = await signUpAgent(ctx.app, 'Origin Owner');
  tripId = (await createTrip(owner.agent)).trip.id;
  // The session cookie alone, sent without the agent's Origin, as a browser sends it from another page of the site.
  const signIn = await request(ctx.app)
    .post('/api/auth/sign-in/email')
    .set('Origin', TEST_ORIGIN)
    .send({ email: owner.email, password: 'correct-horse-battery' })
    .expect(200);
  cookie = ([] as string[])
    .concat(signIn.headers['set-cookie'] ?? [])
    .map((c) => c.split(';')[0])
    .join('; ');
});
afterAll(() => ctx.close());

async function tripCount(): Promise<number> {
  const response = await request(ctx.app).get('/api/trips').set('Cookie', cookie).expect(200);
  return (response.body as { trips: unknown[] }).trips.length;
}

describe('changes must come from the app’s own pages', () => {
  it.each([
    ['no Origin or Referer', {}],
    ['another port on the same host', { Origin: 'http://localhost:8081' }],
    ['another site', { Origin: 'https://evil.example' }],
    ['an opaque origin', { Origin: 'null' }],
    ['a Referer from another site', { Referer: 'https://evil.example/page' }],
    ['a look-alike host', { Origin: 'http://localhost:8080.evil.example' }],
  ])(
    'when a signed-in duplicate arrives with %s, then it is refused with 403 and nothing is copied',
    async (_name, headers) => {
      const before = await tripCount();
      const response = await request(ctx.app).post(`/api/trips/${tripId}/duplicate`).set('Cookie', cookie).set(headers);
      expect(response.status).toBe(403);
      expect(response.body).toEqual({
        error: { code: 'forbidden_origin', message: expect.stringContaining(`Open ${TEST_ORIGIN}`) },
      });
      expect(await tripCount()).toBe(before);
    },
  );

  it.each(['put', 'patch', 'delete'] as const)(
    'when a %s arrives from another origin, then it is refused',
    async (method) => {
      const client = request(ctx.app);
      const response = await client[method](`/api/trips/${tripId}`)
        .set('Cookie', cookie)
        .set('Origin', 'https://evil.example')
        .send({});
      expect(response.status).toBe(403);
      expect(response.body.error.code).toBe('forbidden_origin');
    },
  );

  it('when a sign-up arrives without an Origin, then it is refused before better-auth sees it', async () => {
    const response = await request(ctx.app)
      .post('/api/auth/sign-up/email')
      .send({ name: 'No Origin', email: 'no-origin@example.test', password: 'correct-horse-battery' });
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('forbidden_origin');
  });

  it('when a change carries the app’s Origin, then it goes through', async () => {
    const before = await tripCount();
    await request(ctx.app)
      .post(`/api/trips/${tripId}/duplicate`)
      .set('Cookie', cookie)
      .set('Origin', TEST_ORIGIN)
      .expect(201);
    expect(await tripCount()).toBe(before + 1);
  });

  it('when a change has no Origin but a Referer from the app, then it goes through', async () => {
    await request(ctx.app)
      .post(`/api/trips/${tripId}/duplicate`)
      .set('Cookie', cookie)
      .set('Referer', `${TEST_ORIGIN}/trips/${tripId}`)
      .expect(201);
  });

  it('when a read arrives from another origin, then it is answered (reads change nothing)', async () => {
    await request(ctx.app)
      .get(`/api/trips/${tripId}`)
      .set('Cookie', cookie)
      .set('Origin', 'https://evil.example')
      .expect(200);
  });
});

describe('trustedOrigins', () => {
  it('when the public URL has a path or a trailing slash, then only its origin is trusted', () => {
    expect(trustedOrigins({ publicUrl: 'https://trips.example.org/app/' })).toEqual(['https://trips.example.org']);
  });
  it('when a dev web origin is set, then it is trusted too', () => {
    expect(
      trustedOrigins({ publicUrl: 'http://localhost:8080', devWebOrigin: 'http://localhost:8081', production: true }),
    ).toEqual(['http://localhost:8080', 'http://localhost:8081']);
  });
});

describe('senderOrigin', () => {
  it.each([
    [{ origin: 'http://localhost:8080', referer: 'https://evil.example/' }, 'http://localhost:8080'],
    [{ referer: 'http://localhost:8080/trips/1?x=1' }, 'http://localhost:8080'],
    [{ origin: 'null', referer: 'http://localhost:8080/' }, undefined],
    [{ referer: 'not a url' }, undefined],
    [{}, undefined],
  ])('when the headers are %j, then the sender is %s', (headers, expected) => {
    expect(senderOrigin(headers)).toBe(expected);
  });
});
