import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { PasswordCheckUnavailableError, passwordChecks } from '@/server/password/password-pool';
import { PASSWORD_MESSAGES } from '@/shared/password-strength';
import { createTestApp, signUpAgent, TEST_PASSWORD, type TestContext } from '../factories/test-app';

const ORIGIN = 'http://localhost:8080';
let ctx: TestContext;

beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => {
  vi.restoreAllMocks();
  ctx.close();
});

const signUp = (body: Record<string, unknown>) =>
  request(ctx.app).post('/api/auth/sign-up/email').set('Origin', ORIGIN).send(body);

const userCount = () => (ctx.db.$client.prepare('select count(*) as n from user').get() as { n: number }).n;

/** The reset token from the last reset mail sent to `email`. */
async function requestResetToken(email: string): Promise<string> {
  await request(ctx.app)
    .post('/api/auth/request-password-reset')
    .set('Origin', ORIGIN)
    .send({ email, redirectTo: `${ORIGIN}/reset-password` })
    .expect(200);
  const mail = ctx.mailer.sent.filter((m) => m.to === email && /reset/i.test(m.subject)).at(-1);
  const token = /reset-password\/([^?"\s]+)/.exec(mail?.text ?? '')?.[1];
  if (!token) throw new Error('no reset token in the mail');
  return token;
}

describe('user names on the auth routes', () => {
  it('when a name has spaces around it, then it is stored trimmed', async () => {
    const response = await signUp({ name: '  Ailsa  ', email: 'ailsa@example.test', password: TEST_PASSWORD });
    expect(response.status).toBe(200);
    expect(response.body.user.name).toBe('Ailsa');
  });

  it.each([
    ['a line break', 'Ailsa\nMacLeod'],
    ['a NUL', 'Ailsa\u0000'],
    ['an escape sequence', '\u001B[2JAilsa'],
    ['a lone surrogate', 'Ailsa \uD83D'],
    ['only spaces', '   '],
    ['81 characters', 'x'.repeat(81)],
    ['a 5,000-character name', 'x'.repeat(5_000)],
  ])('when sign-up names the user with %s, then 400 names the field and no user is made', async (_what, name) => {
    const response = await signUp({ name, email: 'ailsa@example.test', password: TEST_PASSWORD });
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(/^Name: /);
    expect(response.body.fields.name).toHaveLength(1);
    expect(userCount()).toBe(0);
  });

  it('when a signed-in user renames themselves with a control character, then 400 and the name stays', async () => {
    const { agent } = await signUpAgent(ctx.app, 'Ailsa');
    const refused = await agent.post('/api/auth/update-user').set('Origin', ORIGIN).send({ name: 'Ai\tlsa' });
    expect(refused.status).toBe(400);
    expect(refused.body.fields.name).toBeDefined();
    const saved = await agent.post('/api/auth/update-user').set('Origin', ORIGIN).send({ name: ' Ailsa M ' });
    expect(saved.status).toBe(200);
    expect((await agent.get('/api/auth/get-session')).body.user.name).toBe('Ailsa M');
  });
});

describe('passwords', () => {
  it.each([
    ['the e-mail address itself', 'ailsa@example.test', PASSWORD_MESSAGES.isEmail],
    ['the e-mail address in capitals', 'AILSA@EXAMPLE.TEST', PASSWORD_MESSAGES.isEmail],
    ['12345678', '12345678', PASSWORD_MESSAGES.common],
    ['password', 'password', PASSWORD_MESSAGES.common],
    ['the name and a year', 'ailsa2024', PASSWORD_MESSAGES.personal],
  ])('when sign-up uses %s as the password, then it is refused with the reason', async (_what, password, message) => {
    const response = await signUp({ name: 'Ailsa', email: 'ailsa@example.test', password });
    expect(response.status).toBe(400);
    expect(response.body.code).toBe('PASSWORD_TOO_WEAK');
    expect(response.body.fields.password).toEqual([message]);
    expect(userCount()).toBe(0);
  });

  it('when the password cannot be checked just now, then sign-up answers 503 and no user is made', async () => {
    vi.spyOn(passwordChecks, 'problem').mockRejectedValue(new PasswordCheckUnavailableError(new Error('queue full')));
    const response = await signUp({ name: 'Ailsa', email: 'ailsa@example.test', password: TEST_PASSWORD });
    expect(response.status).toBe(503);
    expect(response.body.code).toBe('PASSWORD_CHECK_UNAVAILABLE');
    expect(userCount()).toBe(0);
  });

  it('when a reset chooses a common password, then it is refused and the old password still works', async () => {
    const { email } = await signUpAgent(ctx.app);
    const token = await requestResetToken(email);
    const refused = await request(ctx.app)
      .post('/api/auth/reset-password')
      .set('Origin', ORIGIN)
      .send({ token, newPassword: 'password1' });
    expect(refused.status).toBe(400);
    expect(refused.body.fields.newPassword).toEqual([PASSWORD_MESSAGES.common]);
    await request(ctx.app)
      .post('/api/auth/sign-in/email')
      .set('Origin', ORIGIN)
      .send({ email, password: TEST_PASSWORD })
      .expect(200);
  });

  it('when a password change chooses the e-mail address, then it is refused', async () => {
    const { agent, email } = await signUpAgent(ctx.app);
    const refused = await agent
      .post('/api/auth/change-password')
      .set('Origin', ORIGIN)
      .send({ currentPassword: TEST_PASSWORD, newPassword: email });
    expect(refused.status).toBe(400);
    expect(refused.body.fields.newPassword).toEqual([PASSWORD_MESSAGES.isEmail]);
  });
});

describe('sessions after a password reset or change', () => {
  it('when the password is reset, then every session of that user ends', async () => {
    const { agent: laptop, email } = await signUpAgent(ctx.app);
    const phone = request.agent(ctx.app);
    await phone.post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email, password: TEST_PASSWORD });
    await laptop.get('/api/trips').expect(200);
    await phone.get('/api/trips').expect(200);

    const token = await requestResetToken(email);
    await request(ctx.app)
      .post('/api/auth/reset-password')
      .set('Origin', ORIGIN)
      .send({ token, newPassword: 'brand-new-moorland-walk' })
      .expect(200);

    await laptop.get('/api/trips').expect(401);
    await phone.get('/api/trips').expect(401);
  });

  it('when the password is changed without asking to sign out elsewhere, then the other sessions end anyway', async () => {
    const { agent: laptop, email } = await signUpAgent(ctx.app);
    const phone = request.agent(ctx.app);
    await phone.post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email, password: TEST_PASSWORD });

    await laptop
      .post('/api/auth/change-password')
      .set('Origin', ORIGIN)
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'brand-new-moorland-walk', revokeOtherSessions: false })
      .expect(200);

    await phone.get('/api/trips').expect(401);
    // The device that made the change stays signed in (on a fresh session).
    await laptop.get('/api/trips').expect(200);
  });
});
