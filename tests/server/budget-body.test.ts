import type http from 'node:http';
import zlib from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asciiJson, plainBytes, readyBody, readyBodySize } from '@/server/budget/ready-body';
import { simulateTrip } from '@/shared/engine';
import { fromLedgerColumns } from '@/shared/ledger-columns';
import type { TripDetail } from '@/shared/schemas/api';
import { budgetResponseSchema, ledgerResponseSchema } from '@/shared/schemas/budget-response';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { listen, rawGet } from '../factories/raw-get';
import { createTestApp, TEST_ORIGIN, TEST_PASSWORD, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip } from '../factories/trip-factory';

/** A listening test app and a trip with a stop and an appliance, with the owner's cookies for raw requests. */
async function tripWithCookies(ctx: TestContext): Promise<{ server: http.Server; cookie: string; tripId: string }> {
  const server = await listen(ctx.app);
  const { agent, email } = await signUpAgent(ctx.app);
  const { trip } = await createTrip(agent);
  await addStop(agent, trip.id);
  await addAppliance(agent, trip.id);
  const signIn = await request(ctx.app)
    .post('/api/auth/sign-in/email')
    .set('Origin', TEST_ORIGIN)
    .send({ email, password: TEST_PASSWORD });
  const cookie = (signIn.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
  return { server, cookie, tripId: trip.id };
}

describe('the budget body', () => {
  let ctx: TestContext;
  let server: http.Server;
  let cookie: string;
  let path: string;

  beforeAll(async () => {
    ctx = createTestApp();
    const made = await tripWithCookies(ctx);
    ({ server, cookie } = made);
    path = `/api/trips/${made.tripId}/budget`;
    await request(ctx.app).get(path).set('Cookie', cookie).expect(200); // computed once, in a worker
  }, 60_000);
  afterAll(async () => {
    await new Promise((resolve) => server.close(resolve));
    ctx.close();
  });

  it('when the browser accepts Brotli, then the kept Brotli bytes go out, decoding to the same JSON as plain', async () => {
    const br = await rawGet(server, path, { Cookie: cookie, 'Accept-Encoding': 'gzip, deflate, br, zstd' });
    const plain = await rawGet(server, path, { Cookie: cookie, 'Accept-Encoding': 'identity' });
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers.vary).toMatch(/Accept-Encoding/);
    expect(br.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(Number(br.headers['content-length'])).toBe(br.body.length);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(Number(plain.headers['content-length'])).toBe(plain.body.length);
    expect(zlib.brotliDecompressSync(br.body).equals(plain.body)).toBe(true);
    const parsed = JSON.parse(plain.body.toString('utf8')) as {
      version: number;
      result: { soc: { socPct: unknown[] } };
    };
    expect(parsed.result.soc.socPct.length).toBeGreaterThanOrEqual(20);
  });

  it('when a client accepts only gzip, then the kept gzip bytes go out', async () => {
    const gz = await rawGet(server, path, { Cookie: cookie, 'Accept-Encoding': 'gzip' });
    const plain = await rawGet(server, path, { Cookie: cookie, 'Accept-Encoding': 'identity' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(zlib.gunzipSync(gz.body).equals(plain.body)).toBe(true);
  });

  it('when the budget is sent, then every byte is ASCII (text past ASCII is escaped)', async () => {
    const plain = await rawGet(server, path, { Cookie: cookie, 'Accept-Encoding': 'identity' });
    expect(plain.body.every((byte) => byte < 0x80)).toBe(true);
  });

  it('when asked again with its ETag, then 304 and no body, whatever the encoding', async () => {
    const first = await rawGet(server, path, { Cookie: cookie, 'Accept-Encoding': 'br' });
    const again = await rawGet(server, path, {
      Cookie: cookie,
      'Accept-Encoding': 'br',
      'If-None-Match': String(first.headers.etag),
    });
    expect(again.status).toBe(304);
    expect(again.body.length).toBe(0);
  });
});

describe('asciiJson and readyBody', () => {
  it('when text holds an en-dash or an accent, then it is written as a \\u escape and reads back the same', () => {
    const value = { cause: 'Low at 03:00–04:00', place: 'Loch Ness, Écosse' };
    const json = asciiJson(JSON.stringify(value));
    expect(json).toContain('\\u2013');
    expect(json).toContain('\\u00c9');
    expect([...json].every((char) => char.charCodeAt(0) < 0x80)).toBe(true);
    expect(JSON.parse(json)).toEqual(value);
  });

  it('when a body is made ready, then only its gzip and Brotli forms are kept, both decoding to the same JSON', async () => {
    const json = JSON.stringify({ hours: Array.from({ length: 200 }, (_, i) => ({ i, soc: 80 - i / 10 })) });
    const body = readyBody(json);
    expect(Object.keys(body).sort()).toEqual(['br', 'gzip']);
    const plain = await plainBytes(body);
    expect(plain.toString('latin1')).toBe(json);
    expect(zlib.brotliDecompressSync(body.br).equals(plain)).toBe(true);
    expect(body.br.byteLength).toBeLessThan(plain.byteLength / 4);
    expect(readyBodySize(body)).toBe(body.gzip.byteLength + body.br.byteLength);
  });
});

describe('the ledger route', () => {
  let ctx: TestContext;
  let server: http.Server;
  let cookie: string;
  let tripId: string;

  beforeAll(async () => {
    ctx = createTestApp();
    ({ server, cookie, tripId } = await tripWithCookies(ctx));
  }, 60_000);
  afterAll(async () => {
    await new Promise((resolve) => server.close(resolve));
    ctx.close();
  });

  const get = (part: 'budget' | 'ledger', headers: Record<string, string> = {}) =>
    rawGet(server, `/api/trips/${tripId}/${part}`, { Cookie: cookie, 'Accept-Encoding': 'identity', ...headers });
  const json = (body: Buffer): unknown => JSON.parse(body.toString('utf8'));

  it('when both are asked for, then the budget has a state-of-charge track and no ledger, the ledger its columns', async () => {
    const budget = budgetResponseSchema.parse(json((await get('budget')).body));
    const ledgerAnswer = await get('ledger');
    expect(ledgerAnswer.status).toBe(200);
    expect(ledgerAnswer.headers['content-type']).toBe('application/json; charset=utf-8');
    const ledger = ledgerResponseSchema.parse(json(ledgerAnswer.body));
    if (!budget.result || !ledger.ledger) throw new Error('no budget');
    expect(budget.result).not.toHaveProperty('ledger');
    expect(ledger.version).toBe(budget.version);
    expect(ledger.ledger.socPct).toEqual(budget.result.soc.socPct);
    expect(ledger.ledger.local).toEqual(budget.result.soc.local);
    expect(ledgerAnswer.body.every((byte) => byte < 0x80)).toBe(true);
  });

  it("when the stored plan is simulated in the test, then the ledger's rows equal the engine's", async () => {
    const detail = (await request(ctx.app).get(`/api/trips/${tripId}`).set('Cookie', cookie).expect(200))
      .body as TripDetail;
    const input = toEngineInput(detail);
    if (!input) throw new Error('no input');
    const ledger = ledgerResponseSchema.parse(json((await get('ledger')).body));
    if (!ledger.ledger) throw new Error('no ledger');
    expect(fromLedgerColumns(ledger.ledger)).toEqual(JSON.parse(JSON.stringify(simulateTrip(input).ledger)));
  });

  it('when a file is made from the trip, then it reads the whole result with the ledger rows rebuilt', async () => {
    const result = await ctx.app.locals.budgets.resultForFile(tripId);
    const ledger = ledgerResponseSchema.parse(json((await get('ledger')).body));
    if (!result || !ledger.ledger) throw new Error('no result');
    expect(result).not.toHaveProperty('soc');
    expect(result.ledger).toEqual(fromLedgerColumns(ledger.ledger));
  });

  it('when asked again with its ETag, then 304; the budget and the ledger carry different ETags', async () => {
    const first = await get('ledger', { 'Accept-Encoding': 'br' });
    expect(first.headers['content-encoding']).toBe('br');
    const etag = String(first.headers.etag);
    expect(etag).not.toBe(String((await get('budget')).headers.etag));
    const again = await get('ledger', { 'If-None-Match': etag });
    expect(again.status).toBe(304);
    expect(again.body.length).toBe(0);
    expect((await get('ledger', { 'If-None-Match': String((await get('budget')).headers.etag) })).status).toBe(200);
  });

  it('when no one is signed in, then 401 in the error shape', async () => {
    const answer = await rawGet(server, `/api/trips/${tripId}/ledger`, {});
    expect(answer.status).toBe(401);
    expect(json(answer.body)).toMatchObject({ error: { code: 'unauthorized' } });
  });

  it('when someone who is not on the trip asks, then it is not found', async () => {
    const { agent } = await signUpAgent(ctx.app, 'Stranger');
    const answer = await agent.get(`/api/trips/${tripId}/ledger`);
    expect(answer.status).toBe(404);
    expect(answer.body).toMatchObject({ error: { code: 'not_found' } });
  });

  it('when the trip has no stops yet, then the ledger is null with the reason', async () => {
    const { agent } = await signUpAgent(ctx.app, 'Planner');
    const { trip } = await createTrip(agent);
    const answer = await agent.get(`/api/trips/${trip.id}/ledger`).expect(200);
    expect(ledgerResponseSchema.parse(answer.body)).toMatchObject({ ledger: null, reason: expect.any(String) });
  });
});
