import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { loadEnv } from '@/server/env';
import { waitText } from '@/server/middleware/auth-guards';
import { createTestApp, signUpAgent, TEST_PASSWORD, type TestContext } from '../factories/test-app';

const ORIGIN = 'http://localhost:8080';
const contexts: TestContext[] = [];
afterEach(() => {
  for (const ctx of contexts.splice(0)) ctx.close();
});

function appWith(options: Parameters<typeof createTestApp>[0]): TestContext {
  const ctx = createTestApp(options);
  contexts.push(ctx);
  return ctx;
}

const userCount = (ctx: TestContext) =>
  (ctx.db.$client.prepare('select count(*) as n from user').get() as { n: number }).n;

function signIn(ctx: TestContext, email: string, password: string, forwardedFor?: string) {
  const req = request(ctx.app).post('/api/auth/sign-in/email').set('Origin', ORIGIN);
  if (forwardedFor) req.set('X-Forwarded-For', forwardedFor);
  return req.send({ email, password });
}

describe('auth body size', () => {
  it('when sign-up sends a 10 MB name, then 413 with the stable error body and no user is made', async () => {
    const ctx = appWith({});
    const response = await request(ctx.app)
      .post('/api/auth/sign-up/email')
      .set('Origin', ORIGIN)
      .send({ name: 'x'.repeat(10 * 1024 * 1024), email: 'big@example.test', password: TEST_PASSWORD });
    expect(response.status).toBe(413);
    expect(response.body).toEqual({ error: { code: 'payload_too_large', message: expect.any(String) } });
    expect(userCount(ctx)).toBe(0);
  });

  it('when an auth route gets a 200 KB body, then 413 before better-auth reads it', async () => {
    const ctx = appWith({});
    const { agent } = await signUpAgent(ctx.app, 'Ailsa');
    const response = await agent
      .post('/api/auth/update-user')
      .set('Origin', ORIGIN)
      .send({ name: 'Ailsa', padding: 'x'.repeat(200 * 1024) });
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('payload_too_large');
  });

  it('when a body arrives in chunks without a length, then the limit still holds', async () => {
    const ctx = appWith({});
    const req = request(ctx.app)
      .post('/api/auth/sign-up/email')
      .set('Origin', ORIGIN)
      .set('Content-Type', 'application/json');
    req.write('{"name":"');
    for (let i = 0; i < 20; i += 1) req.write('x'.repeat(10 * 1024));
    req.write(`","email":"chunks@example.test","password":"${TEST_PASSWORD}"}`);
    const response = await req;
    expect(response.status).toBe(413);
    expect(userCount(ctx)).toBe(0);
  });

  it('when an auth body is malformed JSON, then better-auth still answers a 4xx, not a 5xx', async () => {
    const ctx = appWith({});
    const response = await request(ctx.app)
      .post('/api/auth/sign-in/email')
      .set('Origin', ORIGIN)
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(response.status).toBeGreaterThanOrEqual(400);
    expect(response.status).toBeLessThan(500);
  });
});

describe('sign-in limits', () => {
  it("when one account gets too many wrong passwords, then that account waits but another's right password works", async () => {
    const ctx = appWith({ authLimits: { failedSignInsPerAccount: 3 } });
    const a = await signUpAgent(ctx.app, 'Account A');
    const b = await signUpAgent(ctx.app, 'Account B');
    for (let i = 0; i < 3; i += 1) expect((await signIn(ctx, a.email, 'wrong-password-guess')).status).toBe(401);

    const refused = await signIn(ctx, a.email, 'wrong-password-guess');
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe('rate_limited');
    expect(refused.body.error.message).toMatch(/this account\. Try again in \d+ (minute|second)s?/);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    // The account is held even with the right password, and the address is matched whatever its case.
    expect((await signIn(ctx, a.email.toUpperCase(), TEST_PASSWORD)).status).toBe(429);

    expect((await signIn(ctx, b.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('when one client fails too often across accounts, then it waits, and says for how long', async () => {
    const ctx = appWith({ authLimits: { failedSignInsPerClient: 3 } });
    const { email } = await signUpAgent(ctx.app);
    for (let i = 0; i < 3; i += 1) await signIn(ctx, `nobody${i}@example.test`, 'wrong-password-guess');
    const refused = await signIn(ctx, email, TEST_PASSWORD);
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toMatch(/device or network\. Try again in \d+ (minute|second)s?\.$/);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('when sign-ins succeed, then they do not count towards either limit', async () => {
    const ctx = appWith({ authLimits: { failedSignInsPerClient: 2, failedSignInsPerAccount: 2 } });
    const { email } = await signUpAgent(ctx.app);
    for (let i = 0; i < 6; i += 1) expect((await signIn(ctx, email, TEST_PASSWORD)).status).toBe(200);
  });

  it('when the sign-in limits are spent, then session reads are never limited', async () => {
    const ctx = appWith({ authLimits: { failedSignInsPerClient: 2, failedSignInsPerAccount: 2 } });
    const { agent, email } = await signUpAgent(ctx.app);
    for (let i = 0; i < 3; i += 1) await signIn(ctx, email, 'wrong-password-guess');
    expect((await signIn(ctx, email, 'wrong-password-guess')).status).toBe(429);
    for (let i = 0; i < 30; i += 1) {
      const session = await agent.get('/api/auth/get-session');
      expect(session.status).toBe(200);
      expect(session.body.user.email).toBe(email);
    }
  });

  it('when a client sends its own X-Forwarded-For and no proxy is trusted, then it stays in its own bucket', async () => {
    const ctx = appWith({ authLimits: { failedSignInsPerClient: 2 } });
    await signIn(ctx, 'a@example.test', 'wrong-password-guess', '203.0.113.1');
    await signIn(ctx, 'b@example.test', 'wrong-password-guess', '203.0.113.2');
    expect((await signIn(ctx, 'c@example.test', 'wrong-password-guess', '203.0.113.3')).status).toBe(429);
  });

  it('when TRUST_PROXY names the proxy, then X-Forwarded-For tells clients apart', async () => {
    const ctx = appWith({ authLimits: { failedSignInsPerClient: 2 }, trustProxy: ['loopback'] });
    await signIn(ctx, 'a@example.test', 'wrong-password-guess', '203.0.113.1');
    await signIn(ctx, 'b@example.test', 'wrong-password-guess', '203.0.113.1');
    expect((await signIn(ctx, 'c@example.test', 'wrong-password-guess', '203.0.113.1')).status).toBe(429);
    expect((await signIn(ctx, 'c@example.test', 'wrong-password-guess', '203.0.113.2')).status).toBe(401);
  });
});

describe('account actions', () => {
  it('when one client signs up too many accounts, then it waits, with Retry-After', async () => {
    const ctx = appWith({ authLimits: { accountActionsPerClient: 2 } });
    await signUpAgent(ctx.app);
    await signUpAgent(ctx.app);
    const refused = await request(ctx.app)
      .post('/api/auth/sign-up/email')
      .set('Origin', ORIGIN)
      .send({ name: 'Third', email: 'third@example.test', password: TEST_PASSWORD });
    expect(refused.status).toBe(429);
    expect(refused.headers['retry-after']).toBeDefined();
    expect(userCount(ctx)).toBe(2);
  });
});

describe('TRUST_PROXY setting', () => {
  const env = (TRUST_PROXY?: string) =>
    loadEnv({
      NODE_ENV: 'test',
      BETTER_AUTH_SECRET: 'x'.repeat(40),
      ...(TRUST_PROXY === undefined ? {} : { TRUST_PROXY }),
    });

  it.each([
    [undefined, false],
    ['false', false],
    ['1', 1],
    ['loopback', ['loopback']],
    ['loopback, 10.0.0.0/8, 192.168.1.4, fd00::/8', ['loopback', '10.0.0.0/8', '192.168.1.4', 'fd00::/8']],
  ])('when TRUST_PROXY is %s, then Express is told %j', (value, expected) => {
    expect(env(value).TRUST_PROXY).toEqual(expected);
  });

  it.each(['true', 'everyone', '10.0.0.0/33', '300.1.1.1'])('when TRUST_PROXY is %s, then start-up stops', (value) => {
    expect(() => env(value)).toThrow(/TRUST_PROXY/);
  });
});

describe('waitText', () => {
  it.each([
    [1_000, '1 second'],
    [40_000, '40 seconds'],
    [60_000, '1 minute'],
    [61_000, '2 minutes'],
    [15 * 60_000, '15 minutes'],
  ])('when the count resets in %i ms, then the wait reads "%s"', (ms, text) => {
    expect(waitText(new Date(1_000_000 + ms), 1_000_000)).toBe(text);
  });
});
