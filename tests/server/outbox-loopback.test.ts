import fs from 'node:fs';
import http from 'node:http';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { arrivedOnLoopback, isLoopbackAddress } from '@/server/middleware/loopback-only';
import { loadEnv } from '@/server/env';
import type { CapturedMail } from '@/shared/schemas/outbox';
import { createTestApp, type TestContext } from '../factories/test-app';

const RESET_MAIL: CapturedMail = {
  id: 'm1',
  receivedAt: '2026-11-20T10:00:00.000Z',
  from: 'Trailtally <no-reply@trailtally.test>',
  to: ['someone@example.test'],
  subject: 'Reset your Trailtally password',
  text: 'http://localhost:8080/api/auth/reset-password/secret-token',
  html: '',
  links: ['http://localhost:8080/api/auth/reset-password/secret-token'],
};

/** This machine's first address that is not on the loopback interface, if it has one. */
const outsideAddress = Object.values(os.networkInterfaces())
  .flat()
  .find((entry) => entry && !entry.internal && entry.family === 'IPv4')?.address;

/** A plain GET over a real connection to `host`, signed out, with optional extra headers. */
function get(host: string, port: number, path: string, headers: Record<string, string> = {}) {
  return new Promise<{ status: number; body: string }>((resolve, reject) => {
    const request = http.get({ host, port, path, headers }, (response) => {
      let body = '';
      response.on('data', (chunk: Buffer) => (body += chunk.toString()));
      response.on('end', () => resolve({ status: response.statusCode ?? 0, body }));
    });
    request.on('error', reject);
  });
}

describe('the development Outbox answers only on loopback', () => {
  let ctx: TestContext;
  let server: http.Server;
  let port: number;
  let webDir: string;

  beforeAll(async () => {
    webDir = fs.mkdtempSync(path.join(os.tmpdir(), 'trailtally-web-'));
    fs.writeFileSync(path.join(webDir, 'shell.html'), '<!doctype html><title>Trailtally</title>');
    ctx = createTestApp({ outbox: { messages: () => [RESET_MAIL] }, webDir });
    server = ctx.app.listen(0, '0.0.0.0');
    await new Promise((resolve) => server.once('listening', resolve));
    port = (server.address() as AddressInfo).port;
  });
  afterAll(async () => {
    await new Promise((resolve) => server.close(resolve));
    ctx.close();
    fs.rmSync(webDir, { recursive: true, force: true });
  });

  it('when a signed-out request arrives on loopback, then the Outbox lists the captured mail', async () => {
    const response = await get('127.0.0.1', port, '/api/dev/outbox');
    expect(response.status).toBe(200);
    expect((JSON.parse(response.body) as { messages: CapturedMail[] }).messages[0]?.id).toBe('m1');
    expect((await get('127.0.0.1', port, '/outbox')).body).toContain('<title>Trailtally</title>');
  });

  it.skipIf(!outsideAddress)(
    'when a request arrives on a network interface, then the Outbox API and page answer 404 and no link leaks',
    async () => {
      const api = await get(outsideAddress ?? '', port, '/api/dev/outbox');
      expect(api.status).toBe(404);
      expect(api.body).not.toContain('secret-token');
      expect(JSON.parse(api.body)).toMatchObject({ error: { code: 'not_found' } });
      expect((await get(outsideAddress ?? '', port, '/outbox')).status).toBe(404);
      // The rest of the app is still served on that interface.
      expect((await get(outsideAddress ?? '', port, '/trips')).status).toBe(200);
    },
  );

  it('when a loopback request says it was relayed by a proxy, then the Outbox answers 404', async () => {
    const response = await get('127.0.0.1', port, '/api/dev/outbox', { 'X-Forwarded-For': '127.0.0.1' });
    expect(response.status).toBe(404);
  });
});

describe('arrivedOnLoopback', () => {
  /** A real request object on a socket whose addresses are set as an interface would set them. */
  function requestOn(localAddress: string, remoteAddress: string, headers: Record<string, string> = {}) {
    const socket = new net.Socket();
    Object.defineProperty(socket, 'localAddress', { value: localAddress });
    Object.defineProperty(socket, 'remoteAddress', { value: remoteAddress });
    const req = new http.IncomingMessage(socket);
    req.headers = headers;
    return req;
  }

  it.each([
    ['127.0.0.1', '127.0.0.1', true],
    ['::1', '::1', true],
    ['::ffff:127.0.0.1', '::ffff:127.0.0.1', true],
    ['192.0.2.2', '192.0.2.9', false],
    ['::ffff:192.0.2.2', '::ffff:127.0.0.1', false],
    ['fd00::2', 'fd00::9', false],
  ])('when the connection is %s ← %s, then loopback is %s', (local, remote, expected) => {
    expect(arrivedOnLoopback(requestOn(local, remote))).toBe(expected);
  });

  it('when a header claims a loopback client on a network connection, then it is not believed', () => {
    const req = requestOn('192.0.2.2', '192.0.2.9', { 'x-forwarded-for': '127.0.0.1', host: 'localhost:8080' });
    expect(arrivedOnLoopback(req)).toBe(false);
  });

  it.each([
    ['127.8.9.1', true],
    ['::1', true],
    ['128.0.0.1', false],
    ['', false],
    ['not-an-address', false],
  ])('when the address is %j, then loopback is %s', (address, expected) => {
    expect(isLoopbackAddress(address)).toBe(expected);
  });
});

describe('HOST default', () => {
  const base = { DATABASE_PATH: ':memory:', BETTER_AUTH_SECRET: 'x'.repeat(40) };
  it.each([
    ['development', undefined, '127.0.0.1'],
    ['test', undefined, '127.0.0.1'],
    ['production', undefined, '0.0.0.0'],
    ['development', '0.0.0.0', '0.0.0.0'],
  ] as const)('when NODE_ENV is %s and HOST is %s, then the server listens on %s', (nodeEnv, host, expected) => {
    const env = loadEnv({ ...base, NODE_ENV: nodeEnv, ...(host ? { HOST: host } : {}) });
    expect(env.HOST).toBe(expected);
  });
});
