import type http from 'node:http';
import zlib from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asciiJson, readyBody } from '@/server/budget/ready-body';
import { listen, rawGet } from '../factories/raw-get';
import { createTestApp, TEST_ORIGIN, TEST_PASSWORD, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip } from '../factories/trip-factory';

describe('the budget body', () => {
  let ctx: TestContext;
  let server: http.Server;
  let cookie: string;
  let path: string;

  beforeAll(async () => {
    ctx = createTestApp();
    server = await listen(ctx.app);
    const { agent, email } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    await addStop(agent, trip.id);
    await addAppliance(agent, trip.id);
    path = `/api/trips/${trip.id}/budget`;
    const signIn = await request(ctx.app)
      .post('/api/auth/sign-in/email')
      .set('Origin', TEST_ORIGIN)
      .send({ email, password: TEST_PASSWORD });
    cookie = (signIn.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
    await agent.get(path).expect(200); // computed once, in a worker
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
    const parsed = JSON.parse(plain.body.toString('utf8')) as { version: number; result: { ledger: unknown[] } };
    expect(parsed.result.ledger.length).toBeGreaterThanOrEqual(20);
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

  it('when a body is made ready, then its gzip and Brotli forms decode to its plain bytes', () => {
    const body = readyBody(JSON.stringify({ hours: Array.from({ length: 200 }, (_, i) => ({ i, soc: 80 - i / 10 })) }));
    expect(zlib.gunzipSync(body.gzip).equals(Buffer.from(body.identity))).toBe(true);
    expect(zlib.brotliDecompressSync(body.br).equals(Buffer.from(body.identity))).toBe(true);
    expect(body.br.byteLength).toBeLessThan(body.identity.byteLength / 4);
  });
});
