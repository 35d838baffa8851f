import pino from 'pino';
import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { createLogger, REDACTED, requestForLog } from '@/server/logger';
import { createTestApp, type TestContext } from '../factories/test-app';

const ORIGIN = 'http://localhost:8080';
const BEARER = 'Bearer not-for-the-log-8f3a';

/** A pino destination that keeps every line, so a test can read what would have reached the log. */
function memoryStream() {
  const lines: string[] = [];
  return { lines, stream: { write: (line: string) => void lines.push(line) } };
}

/** The session token's value from a sign-up's Set-Cookie header. */
function sessionToken(setCookie: string[] | string | undefined): string {
  const cookies = Array.isArray(setCookie) ? setCookie : [setCookie ?? ''];
  const match = cookies.map((c) => /session_token=([^;]+)/.exec(c)).find(Boolean);
  if (!match?.[1]) throw new Error(`no session cookie in ${cookies.join(' | ')}`);
  return decodeURIComponent(match[1]);
}

let ctx: TestContext | undefined;
afterEach(() => ctx?.close());

describe('logs never carry credentials', () => {
  it('when a signed-in request fails with a 5xx, then its log lines hold no cookie, set-cookie or authorization value', async () => {
    const log = memoryStream();
    let clockBroken = false;
    ctx = createTestApp({
      logger: createLogger('info', log.stream),
      now: () => {
        if (clockBroken) throw new Error('the clock failed');
        return new Date('2026-11-20T10:00:00Z');
      },
    });
    const signUp = await request(ctx.app)
      .post('/api/auth/sign-up/email')
      .set('Origin', ORIGIN)
      .send({ name: 'Log Reader', email: 'log-reader@example.test', password: 'correct-horse-battery' })
      .expect(200);
    const token = sessionToken(signUp.headers['set-cookie']);
    const cookie = `better-auth.session_token=${encodeURIComponent(token)}`;

    clockBroken = true;
    const failed = await request(ctx.app)
      .post('/api/trips')
      .set('Origin', ORIGIN)
      .set('Cookie', cookie)
      .set('Authorization', BEARER)
      .send({
        name: 'Glen weekend',
        startDate: '2027-06-01',
        endDate: '2027-06-03',
        timeZone: 'Europe/London',
        rigSource: { kind: 'preset', presetId: 'caravan-lithium' },
      });
    expect(failed.status).toBe(500);

    const text = log.lines.join('');
    const [tokenId = token] = token.split('.');
    expect(text).not.toContain(tokenId);
    expect(text).not.toContain('not-for-the-log');
    const failures = log.lines.map((line) => JSON.parse(line) as Record<string, unknown>).filter((l) => l.level === 50);
    expect(failures.length).toBeGreaterThan(0);
    for (const line of failures) {
      const req = line.req as { headers: Record<string, string> };
      expect(req.headers.cookie).toBe(REDACTED);
      expect(req.headers.authorization).toBe(REDACTED);
    }
    const signUpLine = log.lines.find((line) => line.includes('sign-up'));
    // A successful request's line carries no headers at all, so the session its response set cannot appear.
    expect(signUpLine).toBeDefined();
    expect(signUpLine).not.toContain('set-cookie');
  });

  it('when a logger was made without redaction, then the request serializers still censor the headers', async () => {
    const log = memoryStream();
    ctx = createTestApp({ logger: pino({ level: 'info' }, log.stream) });
    await request(ctx.app).get('/api/health').set('Cookie', 'better-auth.session_token=abc123secret').expect(200);
    const text = log.lines.join('');
    expect(text).toContain('/api/health');
    expect(text).not.toContain('abc123secret');
  });

  it('when anything logs an object with headers, then the logger censors them', () => {
    const log = memoryStream();
    createLogger('info', log.stream).info(
      { headers: { cookie: 'c1', 'set-cookie': 's1' }, upstream: { headers: { authorization: 'a1' } } },
      'x',
    );
    const line = JSON.parse(log.lines[0] ?? '{}') as {
      headers: Record<string, string>;
      upstream: { headers: Record<string, string> };
    };
    expect(line.headers).toEqual({ cookie: REDACTED, 'set-cookie': REDACTED });
    expect(line.upstream.headers.authorization).toBe(REDACTED);
  });

  it('when headers are censored for a log, then the live request keeps them', () => {
    const headers = { cookie: 'live', accept: 'json' };
    const serialized = requestForLog({ method: 'GET', url: '/api/trips', headers });
    expect(serialized.headers).toEqual({ cookie: REDACTED, accept: 'json' });
    expect(headers.cookie).toBe('live');
  });
});

describe('the access log', () => {
  it('when an API request succeeds, then one line names its id, method, path, status and time, and nothing of its headers', async () => {
    const log = memoryStream();
    ctx = createTestApp({ logger: createLogger('info', log.stream) });
    await request(ctx.app)
      .get('/api/health?probe=sensitive-query-value')
      .set('Cookie', 'better-auth.session_token=abc123secret')
      .set('User-Agent', 'log-probe-agent')
      .expect(200);
    const lines = log.lines.map((line) => JSON.parse(line) as Record<string, unknown>);
    const completed = lines.filter((l) => l.msg === 'request completed');
    expect(completed).toHaveLength(1);
    expect(completed[0]).toMatchObject({ level: 30, method: 'GET', path: '/api/health', status: 200 });
    expect(typeof completed[0]?.reqId).toBe('number');
    expect(typeof completed[0]?.responseTime).toBe('number');
    const text = log.lines.join('');
    expect(text).not.toContain('abc123secret');
    expect(text).not.toContain('log-probe-agent');
    expect(text).not.toContain('sensitive-query-value');
  });

  it('when the log level is warn, then a successful request writes no line', async () => {
    const log = memoryStream();
    ctx = createTestApp({ logger: createLogger('warn', log.stream) });
    await request(ctx.app).get('/api/health').expect(200);
    expect(log.lines).toEqual([]);
  });

  it('when an invite link or a calendar feed is requested, then its log line does not carry the token', async () => {
    const log = memoryStream();
    ctx = createTestApp({ logger: createLogger('info', log.stream) });
    await request(ctx.app).get('/api/invites/invite-token-not-for-the-log');
    await request(ctx.app).get('/api/club-invites/club-token-not-for-the-log');
    await request(ctx.app).get('/api/calendar/feed-name-not-for-the-log.ics');
    const paths = log.lines
      .map((line) => JSON.parse(line) as Record<string, unknown>)
      .filter((l) => l.msg === 'request completed')
      .map((l) => l.path);
    expect(paths).toEqual(['/api/invites/[redacted]', '/api/club-invites/[redacted]', '/api/calendar/[redacted]']);
    expect(log.lines.join('')).not.toContain('not-for-the-log');
  });
});
