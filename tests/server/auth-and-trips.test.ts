import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { createTrip } from '../factories/trip-factory';

const ORIGIN = 'http://localhost:8080';
let ctx: TestContext;

beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

describe('accounts', () => {
  it('when a new user signs up, then a session cookie is set and the session names them', async () => {
    const agent = request.agent(ctx.app);
    const signUp = await agent
      .post('/api/auth/sign-up/email')
      .set('Origin', ORIGIN)
      .send({ name: 'Ailsa', email: 'ailsa@example.test', password: 'long-enough-pass' });
    expect(signUp.status).toBe(200);
    expect(String(signUp.headers['set-cookie'])).toMatch(/session_token=/);
    const session = await agent.get('/api/auth/get-session');
    expect(session.body.user.email).toBe('ailsa@example.test');
  });

  it('when the e-mail is taken, then sign-up is refused and no second user exists', async () => {
    const body = { name: 'A', email: 'taken@example.test', password: 'long-enough-pass' };
    await request(ctx.app).post('/api/auth/sign-up/email').set('Origin', ORIGIN).send(body).expect(200);
    const again = await request(ctx.app).post('/api/auth/sign-up/email').set('Origin', ORIGIN).send(body);
    expect(again.status).toBeGreaterThanOrEqual(400);
    expect(again.status).toBeLessThan(500);
    expect(again.body.code).toMatch(/USER_ALREADY_EXISTS/);
  });

  it('when the password is wrong, then sign-in is refused with 401 and no cookie', async () => {
    const { email } = await signUpAgent(ctx.app);
    const response = await request(ctx.app)
      .post('/api/auth/sign-in/email')
      .set('Origin', ORIGIN)
      .send({ email, password: 'not-the-password' });
    expect(response.status).toBe(401);
    expect(response.headers['set-cookie']).toBeUndefined();
  });

  it('when the password is right, then sign-in sets a session cookie that opens the API', async () => {
    const { email } = await signUpAgent(ctx.app);
    const agent = request.agent(ctx.app);
    await agent
      .post('/api/auth/sign-in/email')
      .set('Origin', ORIGIN)
      .send({ email, password: 'correct-horse-battery' })
      .expect(200);
    await agent.get('/api/trips').expect(200);
  });
});

describe('GET /api/trips', () => {
  it('when signed out, then 401 with the stable error body', async () => {
    const response = await request(ctx.app).get('/api/trips');
    expect(response.status).toBe(401);
    expect(response.body).toEqual({ error: { code: 'unauthorized', message: expect.any(String) } });
  });

  it('when two users each own trips, then each sees only their own', async () => {
    const first = await signUpAgent(ctx.app);
    const second = await signUpAgent(ctx.app);
    await createTrip(first.agent, { name: 'Coast run', startDate: '2027-05-01', endDate: '2027-05-04' });
    await createTrip(first.agent, { name: 'Glen weekend', startDate: '2027-06-01', endDate: '2027-06-03' });

    const mine = await first.agent.get('/api/trips').expect(200);
    expect(mine.body.trips.map((trip: { name: string }) => trip.name)).toEqual(['Coast run', 'Glen weekend']);

    const theirs = await second.agent.get('/api/trips').expect(200);
    expect(theirs.body.trips).toEqual([]);
  });

  it("when a user asks for another user's trip, then 404 as if it did not exist", async () => {
    const owner = await signUpAgent(ctx.app);
    const other = await signUpAgent(ctx.app);
    const { trip } = await createTrip(owner.agent, { name: 'Private' });
    await owner.agent.get(`/api/trips/${trip.id}`).expect(200);
    const response = await other.agent.get(`/api/trips/${trip.id}`);
    expect(response.status).toBe(404);
    expect(response.body.error.code).toBe('not_found');
  });
});

describe('sign-in rate limit', () => {
  it('when sign-in is tried too often, then 429 with the stable error body', async () => {
    const limited = createTestApp({ authLimits: { failedSignInsPerClient: 3 } });
    try {
      const attempt = () =>
        request(limited.app)
          .post('/api/auth/sign-in/email')
          .set('Origin', ORIGIN)
          .send({ email: 'x@example.test', password: 'wrong-password' });
      for (let i = 0; i < 3; i += 1) expect((await attempt()).status).toBe(401);
      const refused = await attempt();
      expect(refused.status).toBe(429);
      expect(refused.body.error.code).toBe('rate_limited');
    } finally {
      limited.close();
    }
  });
});

describe('errors and health', () => {
  it('when the JSON body is malformed, then 400 with the stable error body', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const response = await agent.post('/api/trips').set('Content-Type', 'application/json').send('{"name": ');
    expect(response.status).toBe(400);
    expect(response.body).toEqual({ error: { code: 'bad_request', message: 'The request body is not valid JSON.' } });
  });

  it('when the route is unknown, then 404 with the stable error body and no stack', async () => {
    const response = await request(ctx.app).get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body.error.code).toBe('not_found');
    expect(response.text).not.toMatch(/at .*\.ts:\d+/);
  });

  it('when the database answers, then health reports ok and the version', async () => {
    const response = await request(ctx.app).get('/api/health').expect(200);
    expect(response.body).toEqual({ status: 'ok', version: expect.stringMatching(/^\d+\.\d+\.\d+/), database: 'ok' });
  });
});
