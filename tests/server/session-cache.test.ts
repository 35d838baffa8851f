import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/db/schema/auth';
import { createTestApp, signUpAgent, TEST_ORIGIN, TEST_PASSWORD, type TestContext } from '../factories/test-app';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

/** Signs in and returns the browser's cookies as a Cookie header, so a test can replay a copy of them. */
async function signInCookies(email: string): Promise<string> {
  const response = await request(ctx.app)
    .post('/api/auth/sign-in/email')
    .set('Origin', TEST_ORIGIN)
    .send({ email, password: TEST_PASSWORD })
    .expect(200);
  const setCookies = response.headers['set-cookie'] as unknown as string[];
  return setCookies.map((c) => c.split(';')[0]).join('; ');
}

describe('the cached session', () => {
  it('when a signed-in request is made, then the session is read from its signed cookie, not the database', async () => {
    const { email } = await signUpAgent(ctx.app);
    const cookies = await signInCookies(email);
    expect(cookies).toMatch(/session_data=/);
    // Rows removed behind the server's back (no sign-out): only the cookie can still vouch for the session.
    ctx.db.delete(session).run();
    await request(ctx.app).get('/api/trips').set('Cookie', cookies).expect(200);
  });

  it('when the user signs out, then a copy of the old cookies (cache included) is refused at once', async () => {
    const { email } = await signUpAgent(ctx.app);
    const cookies = await signInCookies(email);
    await request(ctx.app).get('/api/trips').set('Cookie', cookies).expect(200);
    await request(ctx.app)
      .post('/api/auth/sign-out')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', cookies)
      .send({})
      .expect(200);
    await request(ctx.app).get('/api/trips').set('Cookie', cookies).expect(401);
  });

  it('when one device signs out, then another device of the same user stays signed in', async () => {
    const { email } = await signUpAgent(ctx.app);
    const laptop = await signInCookies(email);
    const phone = await signInCookies(email);
    await request(ctx.app)
      .post('/api/auth/sign-out')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', laptop)
      .send({})
      .expect(200);
    await request(ctx.app).get('/api/trips').set('Cookie', phone).expect(200);
  });

  it('when the password is changed on one device, then a cached session on another is refused at once', async () => {
    const { email } = await signUpAgent(ctx.app);
    const laptop = await signInCookies(email);
    const phone = await signInCookies(email);
    await request(ctx.app).get('/api/trips').set('Cookie', phone).expect(200);
    await request(ctx.app)
      .post('/api/auth/change-password')
      .set('Origin', TEST_ORIGIN)
      .set('Cookie', laptop)
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'brand-new-moorland-walk', revokeOtherSessions: true })
      .expect(200);
    await request(ctx.app).get('/api/trips').set('Cookie', phone).expect(401);
  });

  it('when the same cookies come again within seconds, then the session is not checked again; other cookies are', async () => {
    const { email } = await signUpAgent(ctx.app);
    const cookies = await signInCookies(email);
    const check = vi.spyOn(ctx.app.locals.auth.api, 'getSession');
    await request(ctx.app).get('/api/trips').set('Cookie', cookies).expect(200);
    await request(ctx.app).get('/api/trips').set('Cookie', cookies).expect(200);
    expect(check).toHaveBeenCalledTimes(1);
    // A cookie that differs in any way is checked afresh (and refused here: its signature no longer matches).
    await request(ctx.app)
      .get('/api/trips')
      .set('Cookie', cookies.replace(/session_token=./, 'session_token=x'))
      .expect(401);
    expect(check).toHaveBeenCalledTimes(2);
  });
});
